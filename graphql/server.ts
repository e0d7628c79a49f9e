import { GraphQLError } from "graphql";
import { useCSRFPrevention } from "@graphql-yoga/plugin-csrf-prevention";
import { createYoga, maskError as defaultMaskError, type Plugin } from "graphql-yoga";
import { getEnv } from "@/lib/env";
import { AppError, GRAPHQL_CODE, HTTP_STATUS } from "@/lib/errors";
import { isDatabaseUnavailable } from "@/lib/db-unavailable";
import { createContext, type GraphQLContext } from "./context";
import { executionPlugins } from "./plugins/execution";
import { schema } from "./schema";

const production = process.env.NODE_ENV === "production";

/**
 * The header a browser client must send on requests a cross-site form could also
 * send (multipart/form-data, url-encoded, text/plain, GET). A page on another
 * origin cannot set a custom header without a CORS preflight, which we never
 * grant, so a forged upload riding on the user's cookie is refused with 403.
 * JSON posts (CI curl, Apollo) are preflighted anyway and need nothing extra.
 */
export const CSRF_HEADER = "x-tauline-request";

/** Refuses a body larger than MAX_BODY_BYTES (plus room for the multipart envelope) before reading it. */
function useBodyLimit(): Plugin {
  return {
    onRequest({ request, endResponse, fetchAPI }) {
      const declared = Number(request.headers.get("content-length") ?? "0");
      const limit = getEnv().MAX_BODY_BYTES + 1024 * 1024;
      if (Number.isFinite(declared) && declared > limit) {
        const message = `The request body is ${(declared / 2 ** 20).toFixed(1)} MB; the limit is ${(limit / 2 ** 20).toFixed(0)} MB (MAX_BODY_BYTES).`;
        endResponse(
          new fetchAPI.Response(JSON.stringify({ errors: [{ message, extensions: { code: "PAYLOAD_TOO_LARGE" } }] }), {
            status: 413,
            headers: { "content-type": "application/json" },
          }),
        );
      }
    },
  };
}

/**
 * The one API for CI and the browser. AppErrors keep their message, code, HTTP
 * status and per-field issues; anything else is masked as an internal error.
 */
export const yoga = createYoga<{ request: Request }, GraphQLContext>({
  schema,
  graphqlEndpoint: "/api/graphql",
  context: createContext,
  fetchAPI: { Response },
  graphiql: !production,
  landingPage: false,
  plugins: [useBodyLimit(), useCSRFPrevention({ requestHeaders: [CSRF_HEADER] }), ...executionPlugins],
  maskedErrors: {
    maskError(error, message, isDev) {
      const original = error instanceof GraphQLError ? error.originalError : error;
      if (original instanceof AppError) {
        return new GraphQLError(original.message, {
          nodes: error instanceof GraphQLError ? error.nodes : undefined,
          path: error instanceof GraphQLError ? error.path : undefined,
          extensions: { code: GRAPHQL_CODE[original.code], http: { status: HTTP_STATUS[original.code] }, issues: original.issues },
        });
      }
      if (isDatabaseUnavailable(original)) {
        return new GraphQLError("The database is not reachable; retry shortly.", {
          extensions: { code: "SERVICE_UNAVAILABLE", http: { status: 503, headers: { "Retry-After": "5" } } },
        });
      }
      return defaultMaskError(error, message, isDev);
    },
  },
});
