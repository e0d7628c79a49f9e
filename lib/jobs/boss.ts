import "server-only";
import PgBoss from "pg-boss";
import { getDb } from "@/db";
import { getEnv } from "@/lib/env";
import { getLogger } from "@/lib/log";
import { DELIVER_QUEUE, DELIVER_RETRY, DIGEST_QUEUE, SWEEP_QUEUE } from "./queues";

// One pg-boss per process, on the application's own database in the schema
// `pgboss` (created and migrated by start(), under an advisory lock, so several
// app instances can start at once). Kept on globalThis like the Knex pool, so
// Next's dev reloads do not open a second one.

const globalForJobs = globalThis as unknown as { taulineBoss?: Promise<PgBoss> };

export const BOSS_SCHEMA = "pgboss";

// While PostgreSQL is away every poll of every queue fails, several times a
// second: the first error is logged, then one line per 30 s with the count.
const ERROR_LOG_EVERY_MS = 30_000;
let lastErrorLogAt = 0;
let suppressedErrors = 0;

function logBossError(error: Error): void {
  const now = Date.now();
  if (now - lastErrorLogAt < ERROR_LOG_EVERY_MS) {
    suppressedErrors++;
    return;
  }
  getLogger().error({ component: "jobs", err: error.message, similarErrorsSinceLastLine: suppressedErrors }, "pg-boss error");
  lastErrorLogAt = now;
  suppressedErrors = 0;
}

// pg-boss's start (schema check) and our createQueue/updateQueue calls create
// partitions and rows; two instances doing it at the same moment on a fresh
// database deadlocked ("deadlock detected", found by the two-instance fault
// test), leaving one instance without a worker for the 30 s retry. The set-up
// is therefore serialised across instances by a transaction-scoped advisory
// lock held on one of the app's connections while pg-boss does its work.
const SETUP_LOCK_SQL = "select pg_advisory_xact_lock(hashtext('tauline.jobs.setup'))";

async function setUpQueues(boss: PgBoss): Promise<void> {
  await boss.start();
  // 'short': at most one waiting job per outbox row (singleton key); a second
  // nudge for the same row while one waits is dropped by pg-boss.
  const deliver = { policy: "short" as const, ...DELIVER_RETRY, expireInSeconds: 180 };
  await boss.createQueue(DELIVER_QUEUE, { name: DELIVER_QUEUE, ...deliver });
  await boss.updateQueue(DELIVER_QUEUE, { name: DELIVER_QUEUE, ...deliver });
  // Sweep and digest: one waiting job at a time is enough.
  for (const name of [SWEEP_QUEUE, DIGEST_QUEUE]) {
    await boss.createQueue(name, { name, policy: "short", retryLimit: 2, retryDelay: 30, expireInSeconds: 300 });
  }
}

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: getEnv().DATABASE_URL, schema: BOSS_SCHEMA, max: 4, application_name: "tauline-jobs" });
  // An error here is a failed poll or maintenance run; pg-boss keeps going and
  // the outbox keeps the mail, so it is logged and not thrown.
  boss.on("error", logBossError);
  try {
    await getDb().transaction(async (trx) => {
      await trx.raw(SETUP_LOCK_SQL);
      await setUpQueues(boss);
    });
  } catch (error) {
    // A half-started pg-boss keeps timers and a pool: stop it before the next try makes another.
    await boss.stop({ graceful: false, wait: false }).catch(() => undefined);
    throw error;
  }
  return boss;
}

/** The process's started pg-boss; a failed start is forgotten so the next call tries again. */
export function getBoss(): Promise<PgBoss> {
  if (!globalForJobs.taulineBoss) {
    globalForJobs.taulineBoss = startBoss().catch((error: unknown) => {
      globalForJobs.taulineBoss = undefined;
      throw error;
    });
  }
  return globalForJobs.taulineBoss;
}

export async function stopBoss(): Promise<void> {
  const pending = globalForJobs.taulineBoss;
  globalForJobs.taulineBoss = undefined;
  if (pending) await (await pending).stop({ graceful: true, wait: true });
}
