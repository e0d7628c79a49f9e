import { CombinedGraphQLErrors, ServerError } from "@apollo/client/errors";

// A refused mutation as the forms show it: per-field messages (the server's
// extensions.issues, "input.email" → "email") and one line for the whole form.

interface Formatted {
  message: string;
  extensions?: { code?: unknown; issues?: unknown };
}

function formatted(error: unknown): Formatted[] {
  if (CombinedGraphQLErrors.is(error)) return error.errors as Formatted[];
  // A 4xx answer can arrive as a ServerError whose body is the GraphQL response.
  if (ServerError.is(error)) {
    try {
      const body = JSON.parse(error.bodyText) as { errors?: Formatted[] };
      if (Array.isArray(body.errors)) return body.errors;
    } catch {
      // not JSON: use the plain message below
    }
  }
  return [];
}

export function readServerError(error: unknown): { fields: Record<string, string>; message: string } {
  const errors = formatted(error);
  const fields: Record<string, string> = {};
  for (const e of errors) {
    const issues = Array.isArray(e.extensions?.issues) ? (e.extensions.issues as { path: string; message: string }[]) : [];
    for (const i of issues) fields[i.path.replace(/^input\.?/, "") || "form"] ??= i.message;
  }
  const first = errors[0];
  if (!first) return { fields, message: error instanceof Error ? error.message : "The request failed; try again." };
  if (first.extensions?.code === "BAD_USER_INPUT" && Object.keys(fields).length) return { fields, message: "The server refused the marked fields." };
  return { fields, message: first.message };
}
