import "server-only";
import { currentRequestId, getLogger } from "@/lib/log";
import { getBoss } from "./boss";
import { DELIVER_QUEUE } from "./queues";

/**
 * Asks the workers to send these outbox rows now. Called after the transaction
 * that queued them has committed (a job for an uncommitted row would find
 * nothing). It never throws: if pg-boss cannot be reached the rows stay queued
 * in the outbox and the minute sweep hands them to a worker later.
 */
export async function nudgeMailDelivery(outboxIds: number[]): Promise<void> {
  if (outboxIds.length === 0) return;
  try {
    const boss = await getBoss();
    // The request that queued the mail travels with the job, so the worker's log
    // lines about this delivery carry the same requestId as the submission's.
    const requestId = currentRequestId();
    for (const id of outboxIds) await boss.send(DELIVER_QUEUE, { outboxId: id, ...(requestId ? { requestId } : {}) }, { singletonKey: `outbox:${id}` });
  } catch (error) {
    getLogger().error({ component: "mail", outboxIds, err: String(error) }, "could not queue delivery; the outbox sweep will");
  }
}
