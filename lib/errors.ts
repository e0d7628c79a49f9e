// One error vocabulary for every transport: services throw AppError, the GraphQL
// layer maps `code` to `extensions.code` and HTTP status, everything else is masked.
export type AppErrorCode = "invalid_input" | "not_found" | "forbidden" | "unauthorized" | "conflict" | "unavailable";

export interface FieldIssue {
  path: string;
  message: string;
}

export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly issues: FieldIssue[];

  constructor(code: AppErrorCode, message: string, issues: FieldIssue[] = []) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.issues = issues;
  }
}

export const HTTP_STATUS: Record<AppErrorCode, number> = {
  invalid_input: 400,
  not_found: 404,
  forbidden: 403,
  unauthorized: 401,
  conflict: 409,
  unavailable: 503,
};

export const GRAPHQL_CODE: Record<AppErrorCode, string> = {
  invalid_input: "BAD_USER_INPUT",
  not_found: "NOT_FOUND",
  forbidden: "FORBIDDEN",
  unauthorized: "UNAUTHENTICATED",
  conflict: "CONFLICT",
  unavailable: "SERVICE_UNAVAILABLE",
};

/** Formats a zod-style path (["runs", 3, "series", 0, "x", 17]) as runs[3].series[0].x[17]. */
export function formatPath(path: ReadonlyArray<PropertyKey>, prefix = ""): string {
  let out = prefix;
  for (const part of path) {
    if (typeof part === "number") out += `[${part}]`;
    else out += out ? `.${String(part)}` : String(part);
  }
  return out;
}
