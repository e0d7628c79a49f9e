import { GraphQLError } from "graphql";
import { createYoga, maskError as defaultMaskError } from "graphql-yoga";
import { AppError, GRAPHQL_CODE, HTTP_STATUS } from "@/lib/errors";
import { createContext, type GraphQLContext } from "./context";
import { schema } from "./schema";

const production = process.env.NODE_ENV === "production";

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
      if (original instanceof Error && /ECONNREFUSED|terminating connection|Connection terminated|the database system is/i.test(original.message)) {
        return new GraphQLError("The database is not reachable; retry shortly.", {
          extensions: { code: "SERVICE_UNAVAILABLE", http: { status: 503, headers: { "Retry-After": "5" } } },
        });
      }
      return defaultMaskError(error, message, isDev);
    },
  },
});
