import { closeDb, getDb } from "./index";

// Drops every table by rolling all migrations back, then migrates again.
// Run `npm run db:seed` afterwards for the case library and the demo.
async function main() {
  const db = getDb();
  const config = { directory: "./db/migrations", loadExtensions: [".ts"] };
  await db.migrate.rollback(config, true);
  const [, applied] = await db.migrate.latest(config);
  console.log(`reset: ${applied.length} migrations applied to an empty schema`);
}

main()
  .then(() => closeDb())
  .catch(async (error) => {
    console.error(error instanceof Error ? error.message : error);
    await closeDb();
    process.exit(1);
  });
