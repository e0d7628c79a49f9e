import knexFactory, { type Knex } from "knex";
import { requireEnv } from "./env";

let db: Knex | undefined;

/** A direct connection to the test database, for count queries that prove what was (not) stored. */
export function testDb(): Knex {
  db ??= knexFactory({ client: "pg", connection: requireEnv("DATABASE_URL"), pool: { min: 0, max: 2 } });
  return db;
}

export async function closeTestDb() {
  await db?.destroy();
  db = undefined;
}

export async function countRows(table: string, where: Record<string, unknown> = {}): Promise<number> {
  const [{ count }] = await testDb()(table).where(where).count<{ count: string }[]>({ count: "*" });
  return Number(count);
}
