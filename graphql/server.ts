import { GraphQLError } from "graphql";
import { createYoga, maskError as defaultMaskError } from "graphql-yoga";
import { AppError, GRAPHQL_CODE, HTTP_STATUS } from "@/lib/errors";
import { isDatabaseUnavailable } from "@/lib/db-unavailable";
import type { RequestNote } from "@/lib/http/request-log";
import { getEnv } from "@/lib/env";
import { ENVELOPE_ALLOWANCE } from "@/lib/http/body-limit";
import { getLogger } from "@/lib/log";
import { Utf8Response } from "@/lib/http/utf8-response";
import { createContext, type GraphQLContext } from "./context";
import { documentLimitPlugins } from "./guards/limits";
import { useRequestGate } from "./guards/request-gate";
import { useRequestNotes } from "./guards/request-notes";
import { executionPlugins } from "./plugins/execution";
import { schema } from "./schema";

export { CSRF_HEADER } from "./guards/request-gate";

const production = process.env.NODE_ENV === "production";

function forwardToLog(level: "debug" | "info" | "warn" | "error", [first, ...rest]: unknown[]): void {
  const fields = first instanceof Error ? { err: first } : rest.length > 0 ? { details: rest } : {};
  getLogger()[level](fields, first instanceof Error ? first.message : String(first));
}

/** What the route hands yoga besides the request: the note for its closing log line. */
export interface ServerContext {
  request: Request;
  note?: RequestNote;
}

/**
 * The one API for CI and the browser. The request gate (content type, origin,
 * CSRF header) runs before parsing; the body limit is the route's
 * (app/api/graphql/route.ts), since it must count the bytes as they stream.
 * AppErrors keep their message, code, HTTP status and per-field issues;
 * anything else is logged with its stack and masked as an internal error.
 */
export const yoga = createYoga<ServerContext, GraphQLContext>({
  schema,
  graphqlEndpoint: "/api/graphql",
  context: createContext,
  fetchAPI: { Response: Utf8Response },
  graphiql: !production,
  landingPage: false,
  // yoga's own messages (parse failures, plugin warnings) as pino lines with the
  // request id, not as plain console text beside the JSON log.
  logging: {
    debug: (...args: unknown[]) => forwardToLog("debug", args),
    info: (...args: unknown[]) => forwardToLog("info", args),
    warn: (...args: unknown[]) => forwardToLog("warn", args),
    error: (...args: unknown[]) => forwardToLog("error", args),
  },
  // One operation per request: no client of ours batches, and a batch of
  // thousands of cheap queries would slip past every per-document limit.
  batching: false,
  // No CORS: the API serves its own pages and CI, never another site's scripts.
  // (yoga's default grants every origin's preflight, with credentials, which
  // would void the custom-header argument of the request gate.)
  cors: false,
  // yoga's own streamed limit (25 MB by default, which quietly undercut
  // MAX_BODY_BYTES) set to the same figure: the route's counter answers first,
  // this one still guards in-process callers of yoga.fetch.
  maxRequestBodySize: getEnv().MAX_BODY_BYTES + ENVELOPE_ALLOWANCE,
  plugins: [useRequestGate(), ...documentLimitPlugins(production), useRequestNotes(), ...executionPlugins],
  maskedErrors: {
    maskError(error, message, isDev) {
      const original = error instanceof GraphQLError ? error.originalError : error;
      if (original instanceof AppError) {
        return new GraphQLError(original.message, {
          nodes: error instanceof GraphQLError ? error.nodes : undefined,
          path: error instanceof GraphQLError ? error.path : undefined,
          // A 401 names the scheme that would be accepted (RFC 6750 §3), also when no credentials came at all.
          extensions: { code: GRAPHQL_CODE[original.code], http: { status: HTTP_STATUS[original.code], ...(original.code === "unauthorized" ? { headers: { "WWW-Authenticate": "Bearer" } } : {}) }, issues: original.issues },
        });
      }
      if (isDatabaseUnavailable(original)) {
        getLogger().warn({ err: original }, "database unavailable");
        return new GraphQLError("The database is not reachable; retry shortly.", {
          extensions: { code: "SERVICE_UNAVAILABLE", http: { status: 503, headers: { "Retry-After": "5" } } },
        });
      }
      const masked = defaultMaskError(error, message, isDev);
      if (masked !== error) {
        const path = error instanceof GraphQLError ? error.path?.join(".") : undefined;
        getLogger().error({ err: original ?? error, path }, "masked error");
      }
      return masked;
    },
  },
});
