import "server-only";
import { getLogger, runWithRequestId } from "@/lib/log";
import { getBoss } from "./boss";
import { deliverOutboxMessage, recoverQueuedMail, sweepOutbox } from "./deliver";
import { sendPendingDigests } from "./digest";
import { DELIVER_QUEUE, DIGEST_CRON, DIGEST_QUEUE, SWEEP_CRON, SWEEP_QUEUE } from "./queues";

// The mail worker every app instance runs (started from instrumentation.ts).
// Instances share the queues in PostgreSQL; pg-boss hands each job to one of
// them, and the outbox claim makes a row's send happen once even if two jobs
// for it meet.

/** Whether this process's mail worker is running, for /api/health. */
export interface MailWorkerState {
  state: "starting" | "running" | "retrying";
  since: string;
  lastError: string | null;
}

const globalForWorker = globalThis as unknown as { taulineMailWorker?: Promise<void>; taulineMailWorkerState?: MailWorkerState; taulineMailWorkerFailures?: number };

function setWorkerState(state: MailWorkerState["state"], lastError: string | null = null): void {
  globalForWorker.taulineMailWorkerState = { state, since: new Date().toISOString(), lastError };
}

/** null when this process never started a worker (a script, or the Edge runtime). */
export function getMailWorkerState(): MailWorkerState | null {
  return globalForWorker.taulineMailWorkerState ?? null;
}

async function registerWorkers(): Promise<void> {
  const boss = await getBoss();
  // One job per fetch: a thrown error fails (and retries) exactly that job.
  await boss.work<{ outboxId: number; requestId?: string }>(DELIVER_QUEUE, { batchSize: 1, pollingIntervalSeconds: 1, includeMetadata: true }, async ([job]) => {
    const deliver = () => deliverOutboxMessage({ outboxId: job.data.outboxId, retryCount: job.retryCount });
    await (job.data.requestId ? runWithRequestId(job.data.requestId, deliver) : deliver());
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
  // Mail queued while no instance was running, or whose nudge died with the
  // process that committed it, goes out now, not at the first sweep tick.
  await recoverQueuedMail();
}

/** Starts the worker once per process; a failed start (database not up yet) is logged and tried again with backoff up to 30 s. */
export function startMailWorker(): Promise<void> {
  if (!globalForWorker.taulineMailWorker) {
    if (globalForWorker.taulineMailWorkerState?.state !== "retrying") setWorkerState("starting");
    globalForWorker.taulineMailWorker = registerWorkers().then(
      () => {
        globalForWorker.taulineMailWorkerFailures = 0;
        setWorkerState("running");
        getLogger().info({ component: "mail-worker" }, "mail worker running");
      },
      (error: unknown) => {
        globalForWorker.taulineMailWorker = undefined;
        const message = error instanceof Error ? error.message : String(error);
        // 2 s, 4 s, 8 s … 30 s: a database that is still starting is usually there within seconds.
        const attempt = (globalForWorker.taulineMailWorkerFailures ?? 0) + 1;
        globalForWorker.taulineMailWorkerFailures = attempt;
        const delayMs = Math.min(30_000, 1000 * 2 ** attempt);
        setWorkerState("retrying", message);
        getLogger().error({ component: "mail-worker", err: message, attempt, retryInMs: delayMs }, "the mail worker did not start; trying again");
        setTimeout(() => void startMailWorker(), delayMs).unref();
      },
    );
  }
  return globalForWorker.taulineMailWorker;
}
