import "server-only";
import { getDb } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import { deleteSubscription, listSubscriptionsOfUser, upsertSubscription } from "@/db/queries/subscriptions";
import { AppError, formatPath } from "@/lib/errors";
import { subscriptionIdSchema, subscriptionInputSchema } from "@/lib/validation/subscriptions";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";

// "My alerts": every signed-in person manages their OWN subscriptions, and only
// those. The person is always the caller; no input names a user.

function ownerOf(actor: Actor | null): Extract<Actor, { kind: "user" }> {
  requirePerson(actor);
  if (actor.kind !== "user") throw new AppError("forbidden", "Only a signed-in person has alert subscriptions.");
  return actor;
}

export async function listMySubscriptions({ actor }: { actor: Actor | null }) {
  const me = ownerOf(actor);
  return { releaseManager: me.role === "release", subscriptions: await listSubscriptionsOfUser({ db: getDb(), userId: me.userId }) };
}

/** Adds a subscription, or changes the mode of the one with the same case and branch. */
export async function saveMySubscription({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  const me = ownerOf(actor);
  const parsed = subscriptionInputSchema.safeParse(unsafeInput);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => ({ path: formatPath(i.path, "input"), message: i.message }));
    throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
  }
  const input = parsed.data;
  return getDb().transaction(async (trx) => {
    if (input.caseKey && !(await trx("cases").where({ key: input.caseKey }).first("key"))) {
      throw new AppError("invalid_input", `input.caseKey is not a known case: "${input.caseKey}"`, [{ path: "input.caseKey", message: `is not a known case: "${input.caseKey}"` }]);
    }
    const { id, inserted } = await upsertSubscription({ db: trx, userId: me.userId, caseKey: input.caseKey, branch: input.branch, mode: input.mode });
    await insertAuditEntry({
      db: trx,
      entry: { actorUserId: me.userId, actorLabel: me.label, action: inserted ? "subscription.added" : "subscription.changed", entity: "subscription", entityId: id, details: input },
    });
    const rows = await listSubscriptionsOfUser({ db: trx, userId: me.userId });
    return rows.find((r) => r.id === id)!;
  });
}

export async function removeMySubscription({ actor, unsafeId }: { actor: Actor | null; unsafeId: unknown }): Promise<number> {
  const me = ownerOf(actor);
  const id = subscriptionIdSchema.safeParse(unsafeId);
  if (!id.success) throw new AppError("invalid_input", "id must be a subscription id", [{ path: "id", message: "must be a subscription id" }]);
  return getDb().transaction(async (trx) => {
    // Someone else's subscription reads as absent: its id tells nothing.
    if ((await deleteSubscription({ db: trx, id: id.data, userId: me.userId })) === 0) throw new AppError("not_found", "You have no subscription with this id.");
    await insertAuditEntry({ db: trx, entry: { actorUserId: me.userId, actorLabel: me.label, action: "subscription.removed", entity: "subscription", entityId: id.data } });
    return id.data;
  });
}
