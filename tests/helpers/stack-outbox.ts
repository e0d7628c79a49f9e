import type { Knex } from "knex";
import { countMailByEvent } from "./stack-mail";
import { waitUntil } from "./stack-process";

// Outbox and queue facts of a private stack, for the "sent exactly once" checks:
// a message counts as settled when the SMTP fake holds exactly one copy, its
// outbox row is `sent` (no sender can claim it again) and no delivery job for
// it waits or runs in pg-boss (nothing is left that could send it twice).

export interface OutboxFact {
  id: number;
  event_key: string;
  status: string;
  attempts: number;
  build_id: number | null;
}

export async function outboxOfBuilds(db: Knex, buildIds: number[]): Promise<OutboxFact[]> {
  return db("mail_outbox").whereIn("build_id", buildIds).orderBy("id").select("id", "event_key", "status", "attempts", "build_id");
}

export async function outboxByIds(db: Knex, ids: number[]): Promise<OutboxFact[]> {
  return db("mail_outbox").whereIn("id", ids).orderBy("id").select("id", "event_key", "status", "attempts", "build_id");
}

/** Delivery jobs of these outbox rows that are waiting, retrying or running. */
export async function openDeliveryJobs(db: Knex, outboxIds: number[]): Promise<{ state: string; outbox_id: number }[]> {
  if (outboxIds.length === 0) return [];
  const { rows } = await db.raw(
    `select state::text as state, (data->>'outboxId')::bigint as outbox_id from pgboss.job
      where name = 'mail-deliver' and state in ('created','retry','active') and (data->>'outboxId')::bigint = any(?)`,
    [outboxIds],
  );
  return rows.map((r: { state: string; outbox_id: string | number }) => ({ state: r.state, outbox_id: Number(r.outbox_id) }));
}

/** Waits until every event key has been stored by the SMTP fake at least once. */
export async function waitForEvents(mailDir: string, eventKeys: string[], timeoutMs = 40_000): Promise<void> {
  await waitUntil(`mail for ${eventKeys.length} event(s)`, async () => {
    const counts = await countMailByEvent(mailDir);
    return eventKeys.every((k) => (counts.get(k) ?? 0) >= 1);
  }, { timeoutMs, everyMs: 250 });
}

/** How many stored copies each event key has, in the order given. */
export async function copiesPerEvent(mailDir: string, eventKeys: string[]): Promise<number[]> {
  const counts = await countMailByEvent(mailDir);
  return eventKeys.map((k) => counts.get(k) ?? 0);
}
