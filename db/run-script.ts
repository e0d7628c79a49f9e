import { closeDb } from "./index";

/** Runs a database script, closes the pool, and exits non-zero with the reason on failure. */
export function runDbScript(main: () => Promise<void>): void {
  main()
    .then(() => closeDb())
    .catch(async (error) => {
      console.error(error instanceof Error ? error.stack ?? error.message : error);
      await closeDb();
      process.exit(1);
    });
}
