import { formattedGraphQLErrors as formatted, issuesOf } from "@/graphql/client/graphql-errors";

// A refused mutation as the forms show it: per-field messages (the server's
// extensions.issues, "input.email" → "email") and one line for the whole form.

export function readServerError(error: unknown): { fields: Record<string, string>; message: string } {
  const errors = formatted(error);
  const fields: Record<string, string> = {};
  for (const e of errors) {
    for (const i of issuesOf(e)) fields[i.path.replace(/^input\.?/, "") || "form"] ??= i.message;
  }
  const first = errors[0];
  if (!first) return { fields, message: error instanceof Error ? error.message : "The request failed; try again." };
  if (first.extensions?.code === "BAD_USER_INPUT" && Object.keys(fields).length) return { fields, message: "The server refused the marked fields." };
  return { fields, message: first.message };
}
