import { closeDb, getDb } from "./index";

// Brings the database at DATABASE_URL to the newest migration.
async function main() {
  const db = getDb();
  const [batch, applied] = await db.migrate.latest({ directory: "./db/migrations", loadExtensions: [".ts"] });
  console.log(applied.length ? `migrations: batch ${batch} applied ${applied.join(", ")}` : "migrations: up to date");
}

main()
  .then(() => closeDb())
  .catch(async (error) => {
    console.error(error instanceof Error ? error.message : error);
    await closeDb();
    process.exit(1);
  });
