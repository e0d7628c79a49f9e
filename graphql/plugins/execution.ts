import { useGraphQlJit } from "@envelop/graphql-jit";
import { getOperationAST, type ExecutionArgs } from "graphql";
import { getVariableValues } from "graphql/execution/values";
import type { Plugin } from "graphql-yoga";
import { useStatementCount } from "./statement-count";

// Plugins that change how operations execute (owned by the read-path work of
// issue 5). graphql/server.ts appends them after the HTTP-level plugins.

/**
 * Reads run through graphql-jit: each query document is compiled once into a
 * function that walks the answer without graphql-js's per-field bookkeeping
 * (build(id) returns 7,000 quantity objects). The resolvers with their role
 * checks, the scalars' serialize and the error masking stay as they are: jit
 * calls the same resolver functions and keeps each error's originalError.
 *
 * graphql-js keeps two things, so that answers do not depend on the executor:
 * mutations (a submission's variables are coerced and its errors reported as
 * the CI contract says), and any operation whose variables do not coerce —
 * jit words those errors differently and answers them 200 instead of 400.
 * Checking the variables first costs little: a read's variables are a few
 * scalars. jit needs the schema's `graphql` module to be its own: the package
 * is a server external (next.config.mjs), otherwise the bundle holds an ESM
 * and a CJS copy and type checks across them fail.
 *
 * Production builds only (`next start`, hence `npm test` and the bench): in
 * `next dev` graphql-js's own executor keeps hot reloads simple, and a dev
 * server started before the external setting would still hold both copies.
 */
function runsCompiled(args: ExecutionArgs): boolean {
  const operation = getOperationAST(args.document, args.operationName);
  if (operation?.operation !== "query") return false;
  const coerced = getVariableValues(args.schema, operation.variableDefinitions ?? [], args.variableValues ?? {}, { maxErrors: 1 });
  return coerced.errors === undefined;
}

// An envelop plugin is a yoga plugin without the HTTP hooks; the types differ only in their context parameter.
const jit = useGraphQlJit({}, { enableIf: runsCompiled }) as Plugin;

const production = process.env.NODE_ENV === "production";

export const executionPlugins: Plugin[] = production ? [useStatementCount(), jit] : [useStatementCount()];
