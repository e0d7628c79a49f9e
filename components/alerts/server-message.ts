import { CombinedGraphQLErrors } from "@apollo/client";

const FIELD_LABEL: Record<string, string> = { caseKey: "Case", branch: "Branch", mode: "Delivery" };

// What the server said about a refused mutation, in one sentence for the form:
// the field names as the form shows them, not as the API spells them.
export function serverMessage(error: unknown): { message: string; fields: Record<string, string> } {
  if (CombinedGraphQLErrors.is(error)) {
    const fields: Record<string, string> = {};
    for (const e of error.errors) {
      const issues = Array.isArray(e.extensions?.issues) ? (e.extensions.issues as { path: string; message: string }[]) : [];
      for (const i of issues) fields[i.path.replace(/^input\.?/, "")] ??= i.message;
    }
    const named = Object.entries(fields).map(([key, message]) => `${FIELD_LABEL[key] ?? key} ${message}.`);
    return { message: named.length ? named.join(" ") : (error.errors[0]?.message ?? "The server refused the change."), fields };
  }
  return { message: error instanceof Error ? error.message : "The request failed; try again.", fields: {} };
}
