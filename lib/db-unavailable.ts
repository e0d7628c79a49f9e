// Which errors mean "PostgreSQL is not there right now" (stopped, restarting,
// connection cut) rather than "this request is wrong". Such a request was not
// applied (its transaction never committed) and may simply be retried, so the
// API answers 503 with Retry-After instead of a 500.
const UNAVAILABLE_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "57P01", "57P02", "57P03", "08000", "08001", "08003", "08006"]);
const UNAVAILABLE_MESSAGE = /ECONNREFUSED|terminating connection|Connection terminated|the database system is|Client has encountered a connection error|Knex: Timeout acquiring a connection/i;

export function isDatabaseUnavailable(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  const code = (error as Error & { code?: unknown }).code;
  if (typeof code === "string" && UNAVAILABLE_CODES.has(code)) return true;
  return UNAVAILABLE_MESSAGE.test(error.message);
}
