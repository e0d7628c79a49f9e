import "server-only";
import { getBoss } from "./boss";
import { deliverOutboxMessage, sweepOutbox } from "./deliver";
import { sendPendingDigests } from "./digest";
import { DELIVER_QUEUE, DIGEST_CRON, DIGEST_QUEUE, SWEEP_CRON, SWEEP_QUEUE } from "./queues";

// The mail worker every app instance runs (started from instrumentation.ts).
// Instances share the queues in PostgreSQL; pg-boss hands each job to one of
// them, and the outbox claim makes a row's send happen once even if two jobs
// for it meet.

const globalForWorker = globalThis as unknown as { taulineMailWorker?: Promise<void> };

async function registerWorkers(): Promise<void> {
  const boss = await getBoss();
  // One job per fetch: a thrown error fails (and retries) exactly that job.
  await boss.work<{ outboxId: number }>(DELIVER_QUEUE, { batchSize: 1, pollingIntervalSeconds: 1, includeMetadata: true }, async ([job]) => {
    await deliverOutboxMessage({ outboxId: job.data.outboxId, retryCount: job.retryCount });
  });
  await boss.work(SWEEP_QUEUE, { batchSize: 1, pollingIntervalSeconds: 5 }, async () => {
    await sweepOutbox();
  });
  await boss.work(DIGEST_QUEUE, { batchSize: 1, pollingIntervalSeconds: 5 }, async () => {
    await sendPendingDigests();
  });
  // Schedules live in the database: every instance may declare them, pg-boss
  // sends each cron tick once.
  await boss.schedule(SWEEP_QUEUE, SWEEP_CRON, {}, { tz: "UTC" });
  await boss.schedule(DIGEST_QUEUE, DIGEST_CRON, {}, { tz: "UTC" });
  // Mail queued while no instance was running goes out now, not at the first tick.
  await sweepOutbox();
}

/** Starts the worker once per process; a failed start (database not up yet) is logged and tried again in 30 s. */
export function startMailWorker(): Promise<void> {
  if (!globalForWorker.taulineMailWorker) {
    globalForWorker.taulineMailWorker = registerWorkers().catch((error: unknown) => {
      globalForWorker.taulineMailWorker = undefined;
      console.error(`[mail] the mail worker did not start, trying again in 30 s: ${error instanceof Error ? error.message : String(error)}`);
      setTimeout(() => void startMailWorker(), 30_000).unref();
    });
  }
  return globalForWorker.taulineMailWorker;
}
