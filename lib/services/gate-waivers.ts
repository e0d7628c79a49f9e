import "server-only";
import { getDb } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import { getCases, getQuantityDefinitions } from "@/db/queries/library";
import { getWaiverById, insertWaiver, listWaivers, markWaiverRevoked } from "@/db/queries/waivers";
import { AppError, type FieldIssue } from "@/lib/errors";
import { waiverGrantSchema, waiverListSchema, waiverRevokeSchema, type WaiverGrant } from "@/lib/validation/gate";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";
import { toWaiverView } from "./gate-assess";
import { parseGateInput } from "./gate-input";

// Waivers: a release manager lets a named quantity of a case through until a
// date, for a stated reason; withdrawing one ends it at once. Both are audited.

export async function findWaivers({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const f = parseGateInput(waiverListSchema, unsafeInput ?? {});
  const at = new Date();
  const rows = await listWaivers({ db: getDb(), caseKey: f.case, branch: f.branch, includeEnded: f.includeEnded, at, limit: 200 });
  return rows.map((w) => toWaiverView(w, at));
}

export async function grantWaiver({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "release");
  if (actor.kind !== "user") throw new AppError("forbidden", "A waiver is granted by a person.");
  const waiver = parseGateInput(waiverGrantSchema, unsafeInput, "input");
  const db = getDb();
  await checkScope(db, waiver);
  const id = await db.transaction(async (trx) => {
    const at = new Date();
    const newId = await insertWaiver({ db: trx, waiver: { caseKey: waiver.case, quantityKey: waiver.quantity, modelKey: waiver.model, branch: waiver.branch, reason: waiver.reason, expiresAt: waiver.expiresAt }, userId: actor.userId, at });
    await insertAuditEntry({
      db: trx,
      entry: {
        actorUserId: actor.userId,
        actorLabel: actor.label,
        action: "waiver.granted",
        entity: "waiver",
        entityId: newId,
        at,
        details: { scope: { case: waiver.case, quantity: waiver.quantity, model: waiver.model, branch: waiver.branch }, reason: waiver.reason, expiresAt: waiver.expiresAt.toISOString() },
      },
    });
    return newId;
  });
  return toWaiverView((await getWaiverById({ db, id }))!, new Date());
}

/** The case, quantity and model must be known, and the model one the case runs. */
async function checkScope(db: ReturnType<typeof getDb>, w: WaiverGrant) {
  const [[caseRow], definitions] = await Promise.all([getCases({ db, keys: [w.case] }), getQuantityDefinitions({ db })]);
  const issues: FieldIssue[] = [];
  if (!caseRow) issues.push({ path: "input.case", message: `is not a known case: "${w.case}"` });
  if (!definitions.some((d) => d.key === w.quantity)) issues.push({ path: "input.quantity", message: `is not a known quantity: "${w.quantity}"` });
  if (caseRow && w.model !== null && !caseRow.modelKeys.includes(w.model)) issues.push({ path: "input.model", message: `is not a model of ${w.case}: "${w.model}"` });
  if (issues.length) throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}

export async function revokeWaiver({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "release");
  if (actor.kind !== "user") throw new AppError("forbidden", "A waiver is withdrawn by a person.");
  const input = parseGateInput(waiverRevokeSchema, unsafeInput);
  const db = getDb();
  await db.transaction(async (trx) => {
    const current = await getWaiverById({ db: trx, id: input.id, lock: true });
    if (!current) throw new AppError("not_found", `There is no waiver ${input.id}.`, [{ path: "id", message: "is not a known waiver" }]);
    const at = new Date();
    if (current.revoked_at) throw new AppError("conflict", `Waiver ${input.id} was already withdrawn by ${current.revoked_by_name ?? "someone"}.`);
    if (current.expires_at <= at) throw new AppError("conflict", `Waiver ${input.id} has already expired; there is nothing to withdraw.`);
    await markWaiverRevoked({ db: trx, id: input.id, userId: actor.userId, reason: input.reason, at });
    await insertAuditEntry({
      db: trx,
      entry: {
        actorUserId: actor.userId,
        actorLabel: actor.label,
        action: "waiver.revoked",
        entity: "waiver",
        entityId: input.id,
        at,
        details: { scope: { case: current.case_key, quantity: current.quantity_key, model: current.model_key, branch: current.branch }, reason: input.reason, wasValidUntil: current.expires_at.toISOString() },
      },
    });
  });
  return toWaiverView((await getWaiverById({ db, id: input.id }))!, new Date());
}
