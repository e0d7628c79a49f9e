import "server-only";
import type { Db } from "../index";

// The mail outbox: the durable record of every message Tauline owes someone.
// A row moves queued → sending → sent; a failed attempt leaves it `failed`
// with the error and the time by which the next attempt is due. A row is never
// deleted by the sender, so a message is not lost while SMTP is down.

export type OutboxKind = "alert" | "digest" | "invite" | "notice";
export type OutboxStatus = "queued" | "sending" | "sent" | "failed";

export interface OutboxRow {
  id: number;
  event_key: string;
  kind: OutboxKind;
  recipients: string[];
  bcc: string[];
  subject: string;
  text_body: string;
  html_body: string;
  status: OutboxStatus;
  attempts: number;
  last_error: string | null;
  created_at: Date;
  next_attempt_at: Date;
  sent_at: Date | null;
  build_id: number | null;
}

export interface NewOutboxMessage {
  eventKey: string;
  kind: OutboxKind;
  /** Every envelope recipient; those also in `bcc` are left out of the To line. */
  recipients: string[];
  bcc?: string[];
  subject: string;
  text: string;
  html: string;
  buildId?: number | null;
}

/** Queues a message once per event key; `id` is null when that event was already queued. */
export async function insertOutboxMessage({ db, message }: { db: Db; message: NewOutboxMessage }): Promise<{ id: number | null }> {
  const rows: { id: number }[] = await db("mail_outbox")
    .insert({
      event_key: message.eventKey,
      kind: message.kind,
      recipients: message.recipients,
      bcc: message.bcc ?? [],
      subject: message.subject,
      text_body: message.text,
      html_body: message.html,
      build_id: message.buildId ?? null,
      // The nudge after commit sends it at once; the sweep steps in only if that did not happen within a minute.
      next_attempt_at: db.raw("now() + interval '1 minute'"),
    })
    .onConflict("event_key")
    .ignore()
    .returning("id");
  return { id: rows[0]?.id ?? null };
}

// A row may be taken when it waits (queued/failed) or when a sender took it and
// its lease ran out (that process died mid-send).
const CLAIMABLE = "(status in ('queued','failed') or (status = 'sending' and next_attempt_at <= now()))";

/**
 * Takes one row for sending: at most one sender holds a row at a time, across
 * every app instance (row lock with SKIP LOCKED, then the `sending` lease).
 * Returns undefined when the row is sent, or held by another sender.
 */
export async function claimOutboxMessage({ db, id, leaseSeconds }: { db: Db; id: number; leaseSeconds: number }): Promise<OutboxRow | undefined> {
  const result = await db.raw(
    `update mail_outbox set status = 'sending', attempts = attempts + 1, next_attempt_at = now() + make_interval(secs => ?)
      where id = (select id from mail_outbox where id = ? and ${CLAIMABLE} for update skip locked)
      returning *`,
    [leaseSeconds, id],
  );
  return (result.rows as OutboxRow[])[0];
}

/** Marks the attempt `attempt` as delivered; false when the lease had passed to another sender. */
export async function markOutboxSent({ db, id, attempt }: { db: Db; id: number; attempt: number }): Promise<boolean> {
  const n = await db("mail_outbox")
    .where({ id, status: "sending", attempts: attempt })
    .update({ status: "sent", sent_at: db.fn.now(), last_error: null });
  return n > 0;
}

export async function markOutboxFailed({ db, id, attempt, error, retryInSeconds }: { db: Db; id: number; attempt: number; error: string; retryInSeconds: number }) {
  await db("mail_outbox")
    .where({ id, status: "sending", attempts: attempt })
    .update({ status: "failed", last_error: error.slice(0, 2000), next_attempt_at: db.raw("now() + make_interval(secs => ?)", [retryInSeconds]) });
}

/** Rows whose next attempt is overdue: their queue job is gone or late, so the sweep queues them again. */
export async function listOverdueOutboxIds({ db, limit }: { db: Db; limit: number }): Promise<number[]> {
  const rows: { id: number }[] = await db("mail_outbox").whereRaw(CLAIMABLE).andWhere("next_attempt_at", "<=", db.fn.now()).orderBy("id").limit(limit).select("id");
  return rows.map((r) => r.id);
}

export async function listOutboxMessages({ db, limit, unsentOnly }: { db: Db; limit: number; unsentOnly: boolean }): Promise<OutboxRow[]> {
  const q = db("mail_outbox").orderBy("id", "desc").limit(limit).select("*");
  if (unsentOnly) q.whereNot("status", "sent");
  return q;
}

export async function getOutboxMessageByEventKey({ db, eventKey }: { db: Db; eventKey: string }): Promise<OutboxRow | undefined> {
  return db("mail_outbox").where({ event_key: eventKey }).first();
}
