import "server-only";
import type { Db } from "../index";
import type { Verdict } from "@/lib/analysis";
import type { BuildRow } from "./builds";
import type { RunRow } from "./runs";

// Re-judgements of stored builds against the bands in force now. The original
// verdicts in quantity_values are never touched; these rows sit beside them.

/** The newest builds with at least one run of the case (on one branch, or all). */
export async function getRecentBuildsOfCase({ db, caseKey, branch, limit }: { db: Db; caseKey: string; branch: string | null; limit: number }): Promise<BuildRow[]> {
  const q = db("builds as b");
  if (branch !== null) q.where("b.branch", branch);
  return q
    .whereExists(db("runs as r").whereRaw("r.build_id = b.id").where("r.case_key", caseKey))
    .orderBy([{ column: "b.received_at", order: "desc" }, { column: "b.id", order: "desc" }])
    .limit(limit)
    .select("b.*");
}

export interface ScopeJudgementRow {
  build_id: number;
  model_key: string;
  value: number | null;
  verdict: Verdict;
  band_id: number | null;
  band_version: number | null;
  band_model: string | null;
}

/** Each build's stored values of one case and quantity, with the verdict and band version they were judged with. */
export async function getScopeJudgements({ db, caseKey, quantityKey, buildIds }: { db: Db; caseKey: string; quantityKey: string; buildIds: readonly number[] }): Promise<ScopeJudgementRow[]> {
  if (buildIds.length === 0) return [];
  return db("quantity_values as v")
    .leftJoin("bands as b", "b.id", "v.band_id")
    .where({ "v.case_key": caseKey, "v.quantity_key": quantityKey })
    .whereIn("v.build_id", buildIds as number[])
    .select("v.build_id", "v.model_key", "v.value", "v.verdict", "v.band_id", "b.version as band_version", "b.model_key as band_model");
}

export type RejudgeRunRow = Pick<RunRow, "id" | "build_id" | "case_key" | "model_key" | "grid" | "status">;

export async function getRunsOfBuilds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<RejudgeRunRow[]> {
  if (buildIds.length === 0) return [];
  return db("runs").whereIn("build_id", buildIds as number[]).orderBy("id").select("id", "build_id", "case_key", "model_key", "grid", "status");
}

export interface StoredValueRow {
  id: number;
  run_id: number;
  quantity_key: string;
  value: number | null;
  band_id: number | null;
  verdict: Verdict;
}

export async function getStoredValuesOfBuilds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<StoredValueRow[]> {
  if (buildIds.length === 0) return [];
  return db("quantity_values").whereIn("build_id", buildIds as number[]).orderBy("id").select("id", "run_id", "quantity_key", "value", "band_id", "verdict");
}

export async function insertReevaluation({ db, row }: { db: Db; row: { buildId: number; requestedBy: number | null; reason: string; verdict: Verdict; originalVerdict: Verdict; at: Date } }): Promise<number> {
  const [{ id }] = await db("reevaluations")
    .insert({ build_id: row.buildId, requested_by: row.requestedBy, reason: row.reason, verdict: row.verdict, original_verdict: row.originalVerdict, evaluated_at: row.at })
    .returning("id");
  return id;
}

export interface ReevaluatedValueInsert {
  reevaluationId: number;
  runId: number;
  quantityKey: string;
  quantityValueId: number | null;
  bandId: number | null;
  verdict: Verdict;
}

export async function insertReevaluatedValues({ db, rows }: { db: Db; rows: ReevaluatedValueInsert[] }) {
  if (rows.length === 0) return;
  const records = rows.map((r) => ({ reevaluation_id: r.reevaluationId, run_id: r.runId, quantity_key: r.quantityKey, quantity_value_id: r.quantityValueId, band_id: r.bandId, verdict: r.verdict }));
  // Chunks keep each statement well under PostgreSQL's 65535 bind parameters.
  for (let i = 0; i < records.length; i += 1000) await db("reevaluated_values").insert(records.slice(i, i + 1000));
}

export interface ReevaluationRow {
  id: number;
  build_id: number;
  reason: string;
  evaluated_at: Date;
  verdict: Verdict;
  original_verdict: Verdict | null;
  requested_by_name: string | null;
}

/** Every re-judgement of the builds, newest first within a build. */
export async function getReevaluationsByBuildIds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<ReevaluationRow[]> {
  if (buildIds.length === 0) return [];
  return db("reevaluations as e")
    .leftJoin("users as u", "u.id", "e.requested_by")
    .whereIn("e.build_id", buildIds as number[])
    .orderBy([{ column: "e.build_id" }, { column: "e.evaluated_at", order: "desc" }, { column: "e.id", order: "desc" }])
    .select("e.id", "e.build_id", "e.reason", "e.evaluated_at", "e.verdict", "e.original_verdict", "u.name as requested_by_name");
}

export interface ReevaluatedChangeRow {
  reevaluation_id: number;
  run_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  quantity_key: string;
  value: number | null;
  original_verdict: Verdict | null;
  verdict: Verdict;
  original_band_version: number | null;
  original_band_model: string | null;
  band_version: number | null;
  band_model: string | null;
}

/** The re-judged values whose verdict or band differs from the original judgement. */
export async function getReevaluatedChanges({ db, reevaluationIds }: { db: Db; reevaluationIds: readonly number[] }): Promise<ReevaluatedChangeRow[]> {
  if (reevaluationIds.length === 0) return [];
  return db("reevaluated_values as rv")
    .join("runs as r", "r.id", "rv.run_id")
    .leftJoin("quantity_values as v", "v.id", "rv.quantity_value_id")
    .leftJoin("bands as ob", "ob.id", "v.band_id")
    .leftJoin("bands as nb", "nb.id", "rv.band_id")
    .whereIn("rv.reevaluation_id", reevaluationIds as number[])
    .where((w) => w.whereNull("v.id").orWhereRaw("v.verdict <> rv.verdict").orWhereRaw("v.band_id is distinct from rv.band_id"))
    .orderBy(["rv.reevaluation_id", "r.case_key", "r.model_key", "r.grid", "rv.quantity_key"])
    .select(
      "rv.reevaluation_id", "rv.run_id", "r.case_key", "r.model_key", "r.grid", "rv.quantity_key", "v.value",
      "v.verdict as original_verdict", "rv.verdict", "ob.version as original_band_version", "ob.model_key as original_band_model",
      "nb.version as band_version", "nb.model_key as band_model",
    );
}
