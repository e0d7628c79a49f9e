import { CombinedGraphQLErrors, ServerError } from "@apollo/client/errors";

// The server answers a bad input with per-field issues ("input.upper", ...) in
// extensions.issues; the forms show them under the same fields as their own checks.

interface Issue {
  path: string;
  message: string;
}

interface FormattedError {
  message: string;
  extensions?: { code?: unknown; issues?: unknown };
}

function formattedErrors(error: unknown): FormattedError[] {
  if (CombinedGraphQLErrors.is(error)) return error.errors as FormattedError[];
  // A 4xx answer may reach the client as a ServerError with the GraphQL body as text.
  if (ServerError.is(error)) {
    try {
      const body = JSON.parse(error.bodyText) as { errors?: FormattedError[] };
      if (Array.isArray(body.errors)) return body.errors;
    } catch {
      // not JSON: fall through to the plain message
    }
  }
  return [];
}

/** Field errors keyed like the form's own ("upper", "fitSettings.logLawWindow.yPlusMax") and one message for the form. */
export function errorsFromServer(error: unknown): { fields: Record<string, string>; message: string } {
  const errors = formattedErrors(error);
  const fields: Record<string, string> = {};
  for (const e of errors) {
    const issues = Array.isArray(e.extensions?.issues) ? (e.extensions.issues as Issue[]) : [];
    for (const i of issues) {
      const key = i.path.replace(/^input\.?/, "").replace(/\[(\d+)\]/g, ".$1") || "form";
      fields[key] ??= i.message;
    }
  }
  const first = errors[0];
  if (!first) return { fields, message: error instanceof Error ? error.message : "The request failed; try again." };
  const code = first.extensions?.code;
  if (code === "FORBIDDEN") return { fields, message: `Refused by the server: ${first.message}` };
  if (code === "BAD_USER_INPUT") return { fields, message: Object.keys(fields).length ? "The server refused some fields; see the marked ones." : first.message };
  return { fields, message: first.message };
}
