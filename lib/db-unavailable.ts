// Which errors mean "PostgreSQL is not there right now" (stopped, restarting,
// connection cut, out of connection slots) rather than "this request is wrong".
// Such a request was not applied (its transaction never committed) and may
// simply be retried, so the API answers 503 with Retry-After instead of a 500.
//
// Codes: Node's socket errors, and PostgreSQL's SQLSTATE classes 08 (connection
// exception) and 57P (operator intervention: admin/crash shutdown, cannot
// connect now, idle-session timeout), plus 53300 too_many_connections
// (PostgreSQL documentation, Appendix A "PostgreSQL Error Codes").
const UNAVAILABLE_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "EPIPE",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "ENOTFOUND",
  "EAI_AGAIN",
  "57P01",
  "57P02",
  "57P03",
  "57P05",
  "53300",
  "08000",
  "08001",
  "08003",
  "08004",
  "08006",
]);

// The messages node-pg and Knex use when a connection dies under them: the
// original error is often replaced by the failed ROLLBACK's ("ROLLBACK - Client
// has encountered a connection error and is not queryable"), which has no code.
const UNAVAILABLE_MESSAGE =
  /ECONNREFUSED|terminating connection|Connection terminated|Connection ended unexpectedly|the database system is|Client has encountered a connection error|Knex: Timeout acquiring a connection|sorry, too many clients/i;

function looksUnavailable(error: unknown, depth: number): boolean {
  if (!(error instanceof Error)) return false;
  const code = (error as Error & { code?: unknown }).code;
  if (typeof code === "string" && UNAVAILABLE_CODES.has(code)) return true;
  if (UNAVAILABLE_MESSAGE.test(error.message)) return true;
  // A wrapper (AggregateError of a multi-address connect, an Error with a cause) hides the socket error inside.
  const inner = error instanceof AggregateError ? error.errors : [(error as Error & { cause?: unknown }).cause];
  return depth < 3 && inner.some((e) => looksUnavailable(e, depth + 1));
}

export function isDatabaseUnavailable(error: unknown): boolean {
  return looksUnavailable(error, 0);
}
