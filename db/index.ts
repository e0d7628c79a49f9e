import knexFactory, { type Knex } from "knex";
import pg from "pg";
import { createKnexConfig } from "../knexfile";

// numeric and bigint (ids, count(*)) come back as JS numbers while they are
// exactly representable; a bigint beyond 2^53 stays a string rather than rounding.
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => {
  const n = Number(v);
  return Number.isSafeInteger(n) ? n : v;
});

// One pool per process, kept on globalThis so Next's dev reloads don't open new ones.
const globalForDb = globalThis as unknown as { taulineDb?: Knex };

export function getDb(): Knex {
  if (!globalForDb.taulineDb) globalForDb.taulineDb = knexFactory(createKnexConfig());
  return globalForDb.taulineDb;
}

export async function closeDb(): Promise<void> {
  if (globalForDb.taulineDb) {
    await globalForDb.taulineDb.destroy();
    globalForDb.taulineDb = undefined;
  }
}

export type Db = Knex | Knex.Transaction;
