import "server-only";
import type { Db } from "../index";
import type { BandInForce, FitSettings } from "@/lib/evaluation/types";

export interface CaseRow {
  key: string;
  title: string;
  description: string;
  modelKeys: string[];
  parameters: FitSettings;
}

export async function getCases({ db, keys }: { db: Db; keys?: string[] }): Promise<CaseRow[]> {
  const q = db("cases").select("key", "title", "description", "model_keys", "parameters").orderBy("key");
  if (keys) q.whereIn("key", keys);
  const rows = await q;
  return rows.map((r) => ({ key: r.key, title: r.title, description: r.description, modelKeys: r.model_keys, parameters: r.parameters }));
}

export async function getModelKeys({ db }: { db: Db }): Promise<Set<string>> {
  const rows: { key: string }[] = await db("models").select("key");
  return new Set(rows.map((r) => r.key));
}

export async function getModels({ db }: { db: Db }) {
  return db("models").select("key", "name", "family", "reference").orderBy("key");
}

export async function getQuantityDefinitions({ db }: { db: Db }) {
  const rows = await db("quantity_definitions").select("key", "label", "unit", "meaning", "derived_from").orderBy("key");
  return rows.map((r) => ({ key: r.key as string, label: r.label as string, unit: r.unit as string, meaning: r.meaning as string, derivedFrom: r.derived_from as string | null }));
}

/** The band versions in force at `at` for the given cases (all models). */
export async function getBandsInForce({ db, caseKeys, at }: { db: Db; caseKeys: string[]; at?: Date }): Promise<BandInForce[]> {
  const when = at ?? new Date();
  const rows = await db("bands")
    .whereIn("case_key", caseKeys)
    .where("valid_from", "<=", when)
    .andWhere((w) => w.whereNull("superseded_at").orWhere("superseded_at", ">", when))
    .select("*");
  return rows.map(toBand);
}

export async function getBandsByIds({ db, ids }: { db: Db; ids: readonly number[] }): Promise<BandInForce[]> {
  if (ids.length === 0) return [];
  const rows = await db("bands").whereIn("id", ids as number[]).select("*");
  return rows.map(toBand);
}

export interface BandRow {
  id: number;
  case_key: string;
  quantity_key: string;
  model_key: string | null;
  version: number;
  kind: "verification" | "validation";
  reference: number | null;
  source: string;
  lower: number | null;
  upper: number | null;
  marginal_margin: number;
  noise_floor: number;
  fit_settings: FitSettings | null;
}

export function toBand(r: BandRow): BandInForce {
  return {
    id: r.id,
    caseKey: r.case_key,
    quantityKey: r.quantity_key,
    modelKey: r.model_key,
    version: r.version,
    kind: r.kind,
    reference: r.reference,
    source: r.source,
    lower: r.lower,
    upper: r.upper,
    marginalMargin: r.marginal_margin,
    noiseFloor: r.noise_floor,
    fitSettings: r.fit_settings ?? {},
  };
}
