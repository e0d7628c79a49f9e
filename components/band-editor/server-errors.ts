import { formattedGraphQLErrors as formattedErrors, issuesOf } from "@/graphql/client/graphql-errors";

// The server answers a bad input with per-field issues ("input.upper", ...) in
// extensions.issues; the forms show them under the same fields as their own checks.

/** Field errors keyed like the form's own ("upper", "fitSettings.logLawWindow.yPlusMax") and one message for the form. */
export function errorsFromServer(error: unknown): { fields: Record<string, string>; message: string } {
  const errors = formattedErrors(error);
  const fields: Record<string, string> = {};
  for (const e of errors) {
    for (const i of issuesOf(e)) {
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
