import "server-only";
import { getDb } from "@/db";
import { attachDigestItems, claimPendingDigestItems, listUsersWithPendingDigest } from "@/db/queries/digest-items";
import { insertOutboxMessage } from "@/db/queries/outbox";
import { getEnv } from "@/lib/env";
import type { AlertFacts } from "@/lib/mail/alert-facts";
import { composeDigest } from "@/lib/mail/compose-digest";
import { nudgeMailDelivery } from "./nudge";

/**
 * The digest job (hourly, and on demand): for each person with pending digest
 * items, one outbox message carrying all of them. Items are locked and tied to
 * their message in one transaction per person, so two instances running the
 * job at once, or a run that dies half-way, never mail an item twice or lose it.
 */
export async function sendPendingDigests(): Promise<number[]> {
  const db = getDb();
  const appUrl = getEnv().APP_URL;
  const outboxIds: number[] = [];
  for (const person of await listUsersWithPendingDigest({ db })) {
    const id = await db.transaction(async (trx) => {
      const items = await claimPendingDigestItems({ db: trx, userId: person.id });
      if (items.length === 0) return null;
      const mail = composeDigest({
        entries: items.map((i) => ({ facts: i.facts as AlertFacts, raisedAt: new Date(i.created_at) })),
        recipientName: person.name,
        appUrl,
      });
      const { id: outboxId } = await insertOutboxMessage({
        db: trx,
        message: { eventKey: `digest:user:${person.id}:items:${items[0].id}-${items[items.length - 1].id}`, kind: "digest", recipients: [person.email], ...mail },
      });
      if (outboxId === null) throw new Error(`digest for user ${person.id} was already queued with the same items`);
      await attachDigestItems({ db: trx, ids: items.map((i) => i.id), outboxId });
      return outboxId;
    });
    if (id !== null) outboxIds.push(id);
  }
  await nudgeMailDelivery(outboxIds);
  return outboxIds;
}
