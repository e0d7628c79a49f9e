import { AsyncLocalStorage } from "node:async_hooks";
import { randomUUID } from "node:crypto";
import pino, { type Logger } from "pino";

// One structured logger for the server: JSON lines on stdout (pino), each line
// of a request carrying that request's id, so one slow or failed submission can
// be followed through GraphQL, the ingest transaction and the mail queue.
// The request id comes from the caller's `x-request-id` header when it is a
// sane token (a CI job can then grep for its own id), else a fresh UUID.

interface RequestContext {
  requestId: string;
}

// Process-wide like the logger below: Next bundles this module more than once
// (instrumentation, route handlers), and the logger created by one copy must
// see the request ids set by another.
const globalForContext = globalThis as unknown as { __taulineRequestContext?: AsyncLocalStorage<RequestContext> };
globalForContext.__taulineRequestContext ??= new AsyncLocalStorage<RequestContext>();
const requestContext = globalForContext.__taulineRequestContext;

const REQUEST_ID = /^[A-Za-z0-9._:-]{1,100}$/;

function createLogger(): Logger {
  return pino({
    level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === "test" ? "warn" : "info"),
    base: { service: "tauline" },
    timestamp: pino.stdTimeFunctions.isoTime,
    // Never let a credential reach a log line, whatever a caller passes in.
    redact: {
      paths: ["authorization", "*.authorization", "headers.authorization", "headers.cookie", "password", "*.password", "token", "*.token"],
      censor: "[redacted]",
    },
    mixin() {
      const context = requestContext.getStore();
      return context ? { requestId: context.requestId } : {};
    },
  });
}

const globalForLog = globalThis as unknown as { __taulineLogger?: Logger };

/** The process-wide logger (one per process, also across Next's module copies). */
export function getLogger(): Logger {
  globalForLog.__taulineLogger ??= createLogger();
  return globalForLog.__taulineLogger;
}

/** The id a request is logged under: the caller's x-request-id when well-formed, else a new UUID. */
export function pickRequestId(headers: Headers): string {
  const offered = headers.get("x-request-id");
  return offered && REQUEST_ID.test(offered) ? offered : randomUUID();
}

/** Runs `work` with `requestId` attached to every log line written inside it. */
export function runWithRequestId<T>(requestId: string, work: () => T): T {
  return requestContext.run({ requestId }, work);
}

/** The id of the request being served, if any. */
export function currentRequestId(): string | undefined {
  return requestContext.getStore()?.requestId;
}
