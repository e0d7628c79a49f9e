import type { Knex } from "knex";
import { getEnv } from "./lib/env";

// Used by db/migrate.ts, db/seed.ts and the app's connection pool alike.
export function createKnexConfig(databaseUrl = getEnv().DATABASE_URL): Knex.Config {
  return {
    client: "pg",
    connection: databaseUrl,
    pool: { min: 0, max: getEnv().DATABASE_POOL_MAX },
    migrations: {
      directory: "./db/migrations",
      extension: "ts",
      loadExtensions: [".ts"],
      tableName: "knex_migrations",
    },
  };
}

export default createKnexConfig();
