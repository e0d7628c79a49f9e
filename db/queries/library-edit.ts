import "server-only";
import type { Db } from "../index";
import type { CaseCreate, CaseRevision, QuantityCreate, QuantityRevision } from "@/lib/validation/case";
import type { BandRecordRow } from "./case-library";

// Writes and history reads of the case-library editor.

export interface CaseRecord {
  key: string;
  title: string;
  description: string;
  model_keys: string[];
  parameters: Record<string, unknown>;
}

const CASE_COLUMNS = ["key", "title", "description", "model_keys", "parameters"] as const;

/** The case row, locked until the transaction ends so two edits apply one after the other. */
export async function getCaseForUpdate({ db, key }: { db: Db; key: string }): Promise<CaseRecord | undefined> {
  return db("cases").where({ key }).forUpdate().first(...CASE_COLUMNS);
}

export async function insertCase({ db, input }: { db: Db; input: CaseCreate }): Promise<CaseRecord> {
  const [row] = await db("cases")
    .insert({ key: input.key, title: input.title, description: input.description, model_keys: input.models, parameters: JSON.stringify(input.parameters) })
    .returning([...CASE_COLUMNS]);
  return row;
}

export async function updateCase({ db, key, input, at }: { db: Db; key: string; input: CaseRevision; at: Date }): Promise<CaseRecord> {
  const [row] = await db("cases")
    .where({ key })
    .update({ title: input.title, description: input.description, model_keys: input.models, parameters: JSON.stringify(input.parameters), updated_at: at })
    .returning([...CASE_COLUMNS]);
  return row;
}

export interface QuantityRecord {
  key: string;
  label: string;
  unit: string;
  meaning: string;
  derived_from: string | null;
}

const QUANTITY_COLUMNS = ["key", "label", "unit", "meaning", "derived_from"] as const;

export async function getQuantityDefinitionForUpdate({ db, key }: { db: Db; key: string }): Promise<QuantityRecord | undefined> {
  return db("quantity_definitions").where({ key }).forUpdate().first(...QUANTITY_COLUMNS);
}

export async function insertQuantityDefinition({ db, input }: { db: Db; input: QuantityCreate }): Promise<QuantityRecord> {
  const [row] = await db("quantity_definitions")
    .insert({ key: input.key, label: input.label, unit: input.unit, meaning: input.meaning, derived_from: null })
    .returning([...QUANTITY_COLUMNS]);
  return row;
}

export async function updateQuantityDefinition({ db, key, input }: { db: Db; key: string; input: QuantityRevision }): Promise<QuantityRecord> {
  const [row] = await db("quantity_definitions").where({ key }).update({ label: input.label, unit: input.unit, meaning: input.meaning }).returning([...QUANTITY_COLUMNS]);
  return row;
}

/** Every version of one band scope (case, quantity, one model or all), oldest first. */
export async function getBandScopeVersions({ db, caseKey, quantityKey, model }: { db: Db; caseKey: string; quantityKey: string; model: string | null }): Promise<BandRecordRow[]> {
  const q = db("bands as b").leftJoin("users as u", "u.id", "b.author_id").where({ "b.case_key": caseKey, "b.quantity_key": quantityKey }).orderBy("b.version");
  if (model === null) q.whereNull("b.model_key");
  else q.where("b.model_key", model);
  return q.select(
    "b.id", "b.case_key", "b.quantity_key", "b.model_key", "b.version", "b.kind", "b.reference", "b.source", "b.lower", "b.upper",
    "b.marginal_margin", "b.noise_floor", "b.fit_settings", "b.reason", "b.valid_from", "b.superseded_at",
    // The person's name where the author is a user; the stored label otherwise (the seed, a deleted account).
    db.raw("coalesce(u.name, b.author_label) as author_label"),
  );
}

/** How many builds had a value judged against each band version (by the trend index: case and quantity first). */
export async function countJudgedBuildsByBand({ db, caseKey, quantityKey, bandIds }: { db: Db; caseKey: string; quantityKey: string; bandIds: readonly number[] }): Promise<Map<number, number>> {
  if (bandIds.length === 0) return new Map();
  const rows: { band_id: number; builds: number }[] = await db("quantity_values")
    .where({ case_key: caseKey, quantity_key: quantityKey })
    .whereIn("band_id", bandIds as number[])
    .groupBy("band_id")
    .select("band_id", db.raw("count(distinct build_id)::int as builds"));
  return new Map(rows.map((r) => [r.band_id, r.builds]));
}

export interface LibraryAuditRow {
  id: number;
  at: Date;
  actor_label: string;
  actor_name: string | null;
  action: string;
  entity: string;
  entity_id: string | null;
  details: Record<string, unknown>;
}

/**
 * The change record of a case: edits of the case itself, of the quantity
 * definitions it uses, of its bands, and the re-judgements asked for because of
 * them, newest first.
 */
export async function getCaseAuditEntries({ db, caseKey, quantityKeys, limit }: { db: Db; caseKey: string; quantityKeys: readonly string[]; limit: number }): Promise<LibraryAuditRow[]> {
  return db("audit_log as a")
    .leftJoin("users as u", "u.id", "a.actor_user_id")
    .where((w) =>
      w
        .where((x) => x.where("a.entity", "case").where("a.entity_id", caseKey))
        .orWhere((x) => x.where("a.entity", "quantity").whereIn("a.entity_id", quantityKeys as string[]))
        .orWhere((x) => x.where("a.entity", "band").whereRaw("a.details -> 'scope' ->> 'case' = ?", [caseKey]))
        .orWhere((x) => x.where("a.entity", "build").where("a.action", "build.reevaluated").whereRaw("a.details ->> 'case' = ?", [caseKey])),
    )
    .orderBy([{ column: "a.at", order: "desc" }, { column: "a.id", order: "desc" }])
    .limit(limit)
    .select("a.id", "a.at", "a.actor_label", "u.name as actor_name", "a.action", "a.entity", "a.entity_id", "a.details");
}
