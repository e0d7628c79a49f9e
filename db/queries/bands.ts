import "server-only";
import type { Db } from "../index";
import type { BandRevision } from "@/lib/validation/band";
import type { BandRow } from "./library";

/** The band in force for a scope, locked until the transaction ends (one revision at a time). */
export async function getCurrentBandForUpdate({ db, caseKey, quantityKey, model }: { db: Db; caseKey: string; quantityKey: string; model: string | null }): Promise<BandRow | undefined> {
  const q = db("bands").where({ case_key: caseKey, quantity_key: quantityKey }).whereNull("superseded_at").forUpdate().first();
  if (model === null) q.whereNull("model_key");
  else q.where("model_key", model);
  return q;
}

export async function getLatestBandVersion({ db, caseKey, quantityKey, model }: { db: Db; caseKey: string; quantityKey: string; model: string | null }): Promise<number> {
  const q = db("bands").where({ case_key: caseKey, quantity_key: quantityKey }).max<{ max: number | null }[]>({ max: "version" });
  if (model === null) q.whereNull("model_key");
  else q.where("model_key", model);
  const [{ max }] = await q;
  return max ?? 0;
}

export async function supersedeBand({ db, id, at }: { db: Db; id: number; at: Date }) {
  await db("bands").where({ id }).update({ superseded_at: at });
}

export async function insertBandVersion({ db, band, version, authorId, authorLabel, at }: { db: Db; band: BandRevision; version: number; authorId: number | null; authorLabel: string; at: Date }): Promise<BandRow> {
  const [row] = await db("bands")
    .insert({
      case_key: band.caseKey,
      quantity_key: band.quantityKey,
      model_key: band.model,
      version,
      kind: band.kind,
      reference: band.reference,
      source: band.source,
      lower: band.lower,
      upper: band.upper,
      marginal_margin: band.marginalMargin,
      noise_floor: band.noiseFloor,
      fit_settings: JSON.stringify(band.fitSettings),
      author_id: authorId,
      author_label: authorLabel,
      reason: band.reason,
      valid_from: at,
    })
    .returning("*");
  return row;
}
