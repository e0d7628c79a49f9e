import "server-only";
import { getDb } from "@/db";
import { listQueuedOutboxIds } from "@/db/queries/mail-health";
import { claimOutboxMessage, listOverdueOutboxIds, markOutboxFailed, markOutboxSent } from "@/db/queries/outbox";
import { getLogger } from "@/lib/log";
import { sendOutboxRow } from "@/lib/mail/transport";
import { nudgeMailDelivery } from "./nudge";
import { SEND_LEASE_SECONDS, sweepAfterSeconds } from "./queues";

export type DeliveryOutcome = "sent" | "not-claimable";

/**
 * Sends one outbox row. Only the sender that claimed the row sends it, so two
 * workers (or two app instances) given the same row send it once. A failed send
 * records the error and the time of the next try, then throws so that pg-boss
 * retries the job with backoff.
 */
export async function deliverOutboxMessage({ outboxId, retryCount = 0 }: { outboxId: number; retryCount?: number }): Promise<DeliveryOutcome> {
  const db = getDb();
  const row = await claimOutboxMessage({ db, id: outboxId, leaseSeconds: SEND_LEASE_SECONDS });
  if (!row) return "not-claimable";
  try {
    await sendOutboxRow(row);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    await markOutboxFailed({ db, id: row.id, attempt: row.attempts, error: message, retryInSeconds: sweepAfterSeconds(retryCount) });
    getLogger().warn({ component: "mail", outboxId: row.id, eventKey: row.event_key, attempt: row.attempts, err: message }, "mail not delivered; will retry");
    throw new Error(`outbox row ${row.id}, attempt ${row.attempts}: ${message}`);
  }
  const recorded = await markOutboxSent({ db, id: row.id, attempt: row.attempts });
  getLogger().info({ component: "mail", outboxId: row.id, eventKey: row.event_key, attempt: row.attempts, recorded }, "mail delivered");
  return "sent";
}

/** Hands every overdue outbox row to the delivery queue again (lost nudge, exhausted retries, dead sender). */
export async function sweepOutbox(): Promise<number> {
  const ids = await listOverdueOutboxIds({ db: getDb(), limit: 500 });
  await nudgeMailDelivery(ids);
  return ids.length;
}

/**
 * At worker start: every row not yet tried is handed to the queue now, besides
 * the overdue ones, so mail committed just before a crash (its nudge lost) goes
 * out when an instance is back, not a minute or two later. A row that already
 * has a job gets at most a second one, and the claim lets only one of them send.
 */
export async function recoverQueuedMail(): Promise<number> {
  const ids = [...new Set([...(await listQueuedOutboxIds({ db: getDb(), limit: 500 })), ...(await listOverdueOutboxIds({ db: getDb(), limit: 500 }))])];
  await nudgeMailDelivery(ids);
  return ids.length;
}
