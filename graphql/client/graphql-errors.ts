import { CombinedGraphQLErrors, ServerError } from "@apollo/client/errors";

// What a refused GraphQL call said, however Apollo delivered it: as GraphQL
// errors, or — for a 4xx answer (400 bad input, 403, 409 refused approval) — as
// a ServerError whose body text is the GraphQL response.

export interface ServerIssue {
  path: string;
  message: string;
}

export interface FormattedGraphQLError {
  message: string;
  extensions?: { code?: unknown; issues?: unknown };
}

export function formattedGraphQLErrors(error: unknown): FormattedGraphQLError[] {
  if (CombinedGraphQLErrors.is(error)) return error.errors as FormattedGraphQLError[];
  if (ServerError.is(error)) {
    try {
      const body = JSON.parse(error.bodyText) as { errors?: FormattedGraphQLError[] };
      if (Array.isArray(body.errors)) return body.errors;
    } catch {
      // not JSON: the caller falls back to the plain message
    }
  }
  return [];
}

/** The per-field issues the server attached (extensions.issues), as sent. */
export function issuesOf(error: FormattedGraphQLError): ServerIssue[] {
  return Array.isArray(error.extensions?.issues) ? (error.extensions.issues as ServerIssue[]) : [];
}
