import { AsyncLocalStorage } from "node:async_hooks";
import type { Plugin } from "graphql-yoga";
import type { Knex } from "knex";
import { getDb } from "@/db";
import { currentRequestId, getLogger } from "@/lib/log";

// How many SQL statements one GraphQL request sends, written on one log line
// per request ("graphql statements", with the request id the route's logger
// adds). A count that grows with the rows shown is an N+1 query; the build
// page's count must not depend on its run count (issue 5), which
// tests/integration/build-statements.test.ts checks through this line.
//
// Counting happens in the app because many requests share the pool's
// connections at once: PostgreSQL's statement log cannot tell whose statement
// it ran, while the async context of the request that issued a query can.
// Every query Knex sends emits 'query' synchronously inside that context.

interface Tally {
  statements: number;
}

const globalForCount = globalThis as unknown as { __taulineStatementScope?: AsyncLocalStorage<Tally>; __taulineCountedPools?: WeakSet<Knex> };

// Process-wide, like the pool: Next may load this module more than once.
const scope = (globalForCount.__taulineStatementScope ??= new AsyncLocalStorage<Tally>());
const countedPools = (globalForCount.__taulineCountedPools ??= new WeakSet<Knex>());

function countQueriesOf(db: Knex): void {
  if (countedPools.has(db)) return;
  countedPools.add(db);
  db.on("query", () => {
    const tally = scope.getStore();
    if (tally) tally.statements += 1;
  });
}

/** Counts the statements of each request (context building, resolvers, everything inside yoga) and logs the count. */
export function useStatementCount(): Plugin {
  return {
    instrumentation: {
      request: (_payload, wrapped) => {
        countQueriesOf(getDb());
        const tally: Tally = { statements: 0 };
        return scope.run(tally, async () => {
          await wrapped();
          // The logger's mixin adds the request id too (pino merges both into one key);
          // named here as well because the test looks the line up by it.
          getLogger().info({ requestId: currentRequestId(), statements: tally.statements }, "graphql statements");
        });
      },
    },
  };
}
