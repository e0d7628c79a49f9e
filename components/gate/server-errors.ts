import { formattedGraphQLErrors as formattedErrors, issuesOf, type ServerIssue } from "@/graphql/client/graphql-errors";

// A refused gate mutation comes back with a code and, for bad input or a refused
// approval, a list of issues. A 4xx answer (409 for a refused approval) can reach
// Apollo as a ServerError with the GraphQL body as text, so both are read.

export type GateIssue = ServerIssue;

/** The server's message, its code, and its issues (paths without the "input." prefix). */
export function readServerError(error: unknown): { message: string; code: string | null; issues: GateIssue[] } {
  const [first] = formattedErrors(error);
  if (!first) return { message: error instanceof Error ? error.message : "The request failed; try again.", code: null, issues: [] };
  const raw = issuesOf(first);
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
