import "server-only";
import type { Db } from "../index";

// Read-only facts about the mail path for /api/health (lib/jobs/health.ts):
// the outbox backlog and the pg-boss jobs of our queues. Both are small
// aggregates; the caller caches them for a few seconds.

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
