import { CombinedGraphQLErrors } from "@apollo/client";

// What the server said about a refused mutation, in one sentence for the form.
export function serverMessage(error: unknown): { message: string; fields: Record<string, string> } {
  if (CombinedGraphQLErrors.is(error)) {
    const fields: Record<string, string> = {};
    for (const e of error.errors) {
      const issues = Array.isArray(e.extensions?.issues) ? (e.extensions.issues as { path: string; message: string }[]) : [];
      for (const i of issues) fields[i.path.replace(/^input\.?/, "")] ??= i.message;
    }
    return { message: error.errors[0]?.message ?? "The server refused the change.", fields };
  }
  return { message: error instanceof Error ? error.message : "The request failed; try again.", fields: {} };
}
