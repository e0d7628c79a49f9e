import "server-only";
import type { Db } from "../index";

// Alerts waiting for a person's periodic digest (migration 008).

export interface DigestItemRow {
  id: number;
  user_id: number;
  event_key: string;
  build_id: number | null;
  facts: unknown;
  created_at: Date;
}

export interface NewDigestItem {
  userId: number;
  eventKey: string;
  buildId: number;
  facts: unknown;
}

/** One item per person and event: a re-post that raises the same alert adds nothing. */
export async function insertDigestItems({ db, items }: { db: Db; items: NewDigestItem[] }): Promise<number> {
  if (items.length === 0) return 0;
  const rows = await db("alert_digest_items")
    .insert(items.map((i) => ({ user_id: i.userId, event_key: i.eventKey, build_id: i.buildId, facts: JSON.stringify(i.facts) })))
    .onConflict(["user_id", "event_key"])
    .ignore()
    .returning("id");
  return rows.length;
}

export async function listUsersWithPendingDigest({ db }: { db: Db }): Promise<{ id: number; email: string; name: string }[]> {
  return db("users as u")
    .whereExists(db("alert_digest_items as d").whereRaw("d.user_id = u.id").whereNull("d.outbox_id"))
    .where("u.active", true)
    .whereNull("u.deactivated_at")
    .orderBy("u.id")
    .select("u.id", "u.email", "u.name");
}

/**
 * A person's pending items, locked for this transaction; SKIP LOCKED lets two
 * instances running the digest at once split the work instead of both mailing it.
 */
export async function claimPendingDigestItems({ db, userId }: { db: Db; userId: number }): Promise<DigestItemRow[]> {
  return db("alert_digest_items").where({ user_id: userId }).whereNull("outbox_id").orderBy("id").forUpdate().skipLocked().select("*");
}

export async function attachDigestItems({ db, ids, outboxId }: { db: Db; ids: number[]; outboxId: number }) {
  await db("alert_digest_items").whereIn("id", ids).update({ outbox_id: outboxId });
}
