import "server-only";
import { getDb } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import { getCurrentBandForUpdate, getLatestBandVersion, insertBandVersion, supersedeBand } from "@/db/queries/bands";
import { toBand } from "@/db/queries/library";
import { AppError, formatPath } from "@/lib/errors";
import { bandRevisionSchema } from "@/lib/validation/band";
import { actorUserId, type Actor } from "./actor";
import { requirePerson } from "./authorize";

/**
 * Writes a new version of a band (QA lead). The version in force is closed at the
 * same instant the new one starts, so every build stays judged against the
 * version that was in force when it was evaluated; the audit log keeps the diff.
 */
export async function reviseBand({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "qa");
  const parsed = bandRevisionSchema.safeParse(unsafeInput);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => ({ path: formatPath(i.path, "input"), message: i.message }));
    throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
  }
  const band = parsed.data;
  const db = getDb();
  return db.transaction(async (trx) => {
    const [caseRow, quantity, model] = await Promise.all([
      trx("cases").where({ key: band.caseKey }).first("key"),
      trx("quantity_definitions").where({ key: band.quantityKey }).first("key"),
      band.model ? trx("models").where({ key: band.model }).first("key") : Promise.resolve({ key: null }),
    ]);
    const issues = [
      !caseRow && { path: "input.caseKey", message: `is not a known case: "${band.caseKey}"` },
      !quantity && { path: "input.quantityKey", message: `has no quantity definition yet: "${band.quantityKey}"` },
      !model && { path: "input.model", message: `is not a known turbulence model: "${band.model}"` },
    ].filter((x): x is { path: string; message: string } => Boolean(x));
    if (issues.length) throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);

    const scope = { db: trx, caseKey: band.caseKey, quantityKey: band.quantityKey, model: band.model };
    const current = await getCurrentBandForUpdate(scope);
    const version = (await getLatestBandVersion(scope)) + 1;
    const at = new Date();
    if (current) await supersedeBand({ db: trx, id: current.id, at });
    const row = await insertBandVersion({ db: trx, band, version, authorId: actorUserId(actor), authorLabel: actor.label, at });
    await insertAuditEntry({
      db: trx,
      entry: {
        actorUserId: actorUserId(actor),
        actorLabel: actor.label,
        action: current ? "band.revised" : "band.created",
        entity: "band",
        entityId: row.id,
        details: { scope: { case: band.caseKey, quantity: band.quantityKey, model: band.model }, version, reason: band.reason, before: current ? toBand(current) : null, after: toBand(row) },
        at,
      },
    });
    return toBand(row);
  });
}
