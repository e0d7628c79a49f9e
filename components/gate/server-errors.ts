import { CombinedGraphQLErrors, ServerError } from "@apollo/client/errors";

// A refused gate mutation comes back with a code and, for bad input or a refused
// approval, a list of issues. A 4xx answer (409 for a refused approval) can reach
// Apollo as a ServerError with the GraphQL body as text, so both are read.

export interface GateIssue {
  path: string;
  message: string;
}

interface FormattedError {
  message: string;
  extensions?: { code?: unknown; issues?: unknown };
}

function formattedErrors(error: unknown): FormattedError[] {
  if (CombinedGraphQLErrors.is(error)) return error.errors as FormattedError[];
  if (ServerError.is(error)) {
    try {
      const body = JSON.parse(error.bodyText) as { errors?: FormattedError[] };
      if (Array.isArray(body.errors)) return body.errors;
    } catch {
      // not JSON: the plain message below
    }
  }
  return [];
}

/** The server's message, its code, and its issues (paths without the "input." prefix). */
export function readServerError(error: unknown): { message: string; code: string | null; issues: GateIssue[] } {
  const [first] = formattedErrors(error);
  if (!first) return { message: error instanceof Error ? error.message : "The request failed; try again.", code: null, issues: [] };
  const raw = Array.isArray(first.extensions?.issues) ? (first.extensions.issues as GateIssue[]) : [];
  return {
    message: first.message,
    code: typeof first.extensions?.code === "string" ? first.extensions.code : null,
    issues: raw.map((i) => ({ path: i.path.replace(/^input\./, ""), message: i.message })),
  };
}

/** Field errors keyed by field name, for a form. */
export function fieldErrors(issues: GateIssue[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues) out[i.path] ??= i.message;
  return out;
}
