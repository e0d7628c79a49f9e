import "server-only";
import type { Db } from "../index";

// Read-only facts about the mail path for lib/jobs: the outbox backlog and the
// pg-boss jobs of our queues for /api/health (small aggregates, cached by the
// caller for a few seconds), and the queued rows a starting worker picks up.

export interface OutboxBacklog {
  unsent: number;
  failedAttempts: number;
  oldestUnsentSeconds: number | null;
}

/** Rows not yet sent, how many of them failed their last attempt, and the age of the oldest. */
export async function getOutboxBacklog({ db }: { db: Db }): Promise<OutboxBacklog> {
  const { rows } = await db.raw(
    `select count(*)::int as unsent, count(*) filter (where status = 'failed')::int as failed,
            extract(epoch from now() - min(created_at))::float8 as oldest
       from mail_outbox where status in ('queued', 'sending', 'failed')`,
  );
  const r = rows[0] as { unsent: number; failed: number; oldest: number | null };
  return { unsent: r.unsent, failedAttempts: r.failed, oldestUnsentSeconds: r.oldest === null ? null : Math.round(r.oldest) };
}

/** Open and given-up jobs per queue and state, from pg-boss's job table in `schema`. */
export async function countQueueJobs({ db, schema, queues }: { db: Db; schema: string; queues: string[] }): Promise<{ name: string; state: string; n: number }[]> {
  if (!/^[a-z_][a-z0-9_]*$/.test(schema)) throw new Error(`not a plain schema name: ${schema}`);
  const { rows } = await db.raw(
    `select name, state::text as state, count(*)::int as n from ${schema}.job
      where name = any(?) and state in ('created', 'retry', 'active', 'failed') group by 1, 2`,
    [queues],
  );
  return rows;
}

/**
 * Rows still waiting for their first attempt, whatever their due time. A row is
 * due a minute after it was queued (the nudge after commit normally sends it at
 * once); when the process died between commit and nudge, nobody would look at
 * it before that minute and the next sweep tick.
 */
export async function listQueuedOutboxIds({ db, limit }: { db: Db; limit: number }): Promise<number[]> {
  const rows: { id: number }[] = await db("mail_outbox").where({ status: "queued" }).orderBy("id").limit(limit).select("id");
  return rows.map((r) => Number(r.id));
}
