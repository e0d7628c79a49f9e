import PgBoss from "pg-boss";
import { requireEnv } from "./env";

/**
 * Asks the app's workers to run the digest job now instead of on the hour:
 * a job on the app's own `mail-digest` queue, sent from a pg-boss client that
 * runs no workers, schedules or maintenance of its own.
 */
export async function runDigestJobNow(): Promise<void> {
  const boss = new PgBoss({ connectionString: requireEnv("DATABASE_URL"), schema: "pgboss", supervise: false, schedule: false, migrate: false, max: 1 });
  await boss.start();
  try {
    await boss.send("mail-digest", {});
  } finally {
    await boss.stop({ graceful: false, wait: true });
  }
}
