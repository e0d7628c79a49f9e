import { getDb } from "./index";
import { runDbScript } from "./run-script";

// Drops every table by rolling all migrations back, then migrates again.
// Run `npm run db:seed` afterwards for the case library and the demo.
async function main() {
  const db = getDb();
  const config = { directory: "./db/migrations", loadExtensions: [".ts"] };
  await db.migrate.rollback(config, true);
  const [, applied] = await db.migrate.latest(config);
  console.log(`reset: ${applied.length} migrations applied to an empty schema`);
}

runDbScript(main);
