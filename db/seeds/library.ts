import "server-only";
import type { Knex } from "knex";
import { BANDS, CASES, MODELS, QUANTITIES } from "./library/index";

/** Inserts the canonical case library (models, quantities, cases, version-1 bands) when it is absent. */
export async function seedLibrary({ db, validFrom }: { db: Knex; validFrom: Date }): Promise<boolean> {
  const [{ count }] = await db("cases").count<{ count: number }[]>({ count: "*" });
  if (Number(count) > 0) return false;
  await db.transaction(async (trx) => {
    await trx("models").insert(MODELS.map((m) => ({ key: m.key, name: m.name, family: m.family, reference: m.reference })));
    await trx("quantity_definitions").insert(
      QUANTITIES.map((q) => ({ key: q.key, label: q.label, unit: q.unit, meaning: q.meaning, derived_from: q.derivedFrom })),
    );
    await trx("cases").insert(
      CASES.map((c) => ({
        key: c.key,
        title: c.title,
        description: c.description,
        model_keys: c.models,
        parameters: JSON.stringify(c.parameters),
      })),
    );
    await trx("bands").insert(
      BANDS.map((b) => ({
        case_key: b.caseKey,
        quantity_key: b.quantityKey,
        model_key: b.model,
        version: 1,
        kind: b.kind,
        reference: b.reference,
        source: b.source,
        lower: b.lower,
        upper: b.upper,
        marginal_margin: b.marginalMargin,
        noise_floor: b.noiseFloor,
        fit_settings: JSON.stringify(b.fitSettings ?? {}),
        author_label: "case library (seed)",
        reason: b.reason,
        valid_from: validFrom,
      })),
    );
  });
  return true;
}
