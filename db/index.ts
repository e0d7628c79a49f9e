import knexFactory, { type Knex } from "knex";
import pg from "pg";
import { createKnexConfig } from "../knexfile";
import { getLogger } from "../lib/log";

// numeric and bigint (ids, count(*)) come back as JS numbers while they are
// exactly representable; a bigint beyond 2^53 stays a string rather than rounding.
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => {
  const n = Number(v);
  return Number.isSafeInteger(n) ? n : v;
});

// One pool per process, kept on globalThis so Next's dev reloads don't open new ones.
const globalForDb = globalThis as unknown as { taulineDb?: Knex; taulineHealthDb?: Knex };

/**
 * Connection settings for an outage. A connection that PostgreSQL closed (a
 * restart, `pg_ctl stop -m immediate`) is flagged by Knex's pg dialect on its
 * 'error'/'end' event and dropped at the next acquire, so the pool recovers on
 * its own once the server is back. connectionTimeoutMillis bounds a connect to
 * a host that does not answer at all (a refused port fails at once anyway);
 * keepAlive lets the OS notice a peer that vanished without closing.
 */
function createPoolConfig(databaseUrl?: string, pool?: Knex.PoolConfig): Knex.Config {
  const base = createKnexConfig(databaseUrl);
  return {
    ...base,
    connection: { connectionString: String(base.connection), connectionTimeoutMillis: 5_000, keepAlive: true },
    pool: { ...base.pool, ...pool },
    log: knexLog,
  };
}

// Knex's own warnings (a dropped dead connection, a refused connect) as JSON
// log lines with the request id, instead of bare console text.
const knexLog = {
  warn: (message: unknown) => getLogger().warn({ component: "db", detail: String(message) }, "knex warning"),
  error: (message: unknown) => getLogger().error({ component: "db", detail: String(message) }, "knex error"),
  deprecate: (method: unknown, alternative: unknown) => getLogger().warn({ component: "db", detail: `${String(method)} is deprecated; use ${String(alternative)}` }, "knex deprecation"),
  debug: (message: unknown) => getLogger().debug({ component: "db", detail: typeof message === "string" ? message : JSON.stringify(message) }, "knex debug"),
};

export function getDb(): Knex {
  if (!globalForDb.taulineDb) globalForDb.taulineDb = knexFactory(createPoolConfig());
  return globalForDb.taulineDb;
}

/**
 * A pool of its own for /api/health: whether the database answers must not
 * depend on a free slot in the application's pool (busy under load, which is
 * not an outage). Two connections at most, and a short wait for one.
 */
export function getHealthDb(): Knex {
  globalForDb.taulineHealthDb ??= knexFactory({ ...createPoolConfig(undefined, { min: 0, max: 2, idleTimeoutMillis: 60_000 }), acquireConnectionTimeout: 3_000 });
  return globalForDb.taulineHealthDb;
}

export async function closeDb(): Promise<void> {
  const pools = [globalForDb.taulineDb, globalForDb.taulineHealthDb];
  globalForDb.taulineDb = undefined;
  globalForDb.taulineHealthDb = undefined;
  for (const pool of pools) await pool?.destroy();
}

export type Db = Knex | Knex.Transaction;
