import { getDb } from "./index";
import { runDbScript } from "./run-script";

// Brings the database at DATABASE_URL to the newest migration.
async function main() {
  const db = getDb();
  const [batch, applied] = await db.migrate.latest({ directory: "./db/migrations", loadExtensions: [".ts"] });
  console.log(applied.length ? `migrations: batch ${batch} applied ${applied.join(", ")}` : "migrations: up to date");
}

runDbScript(main);
