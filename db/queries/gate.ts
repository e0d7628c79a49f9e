import "server-only";
import type { Db } from "../index";
import type { BuildRow } from "./builds";

export interface GateDecisionRow {
  id: number;
  build_id: number;
  state: "approved" | "held" | "rejected";
  comment: string;
  decided_by: number;
  decided_at: Date;
  decided_by_name: string;
  decided_by_email: string;
}

/** The newest decision of each build (a build without one is pending). */
export async function getLatestDecisionsByBuildIds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<GateDecisionRow[]> {
  if (buildIds.length === 0) return [];
  return db("gate_decisions as d")
    .join("users as u", "u.id", "d.decided_by")
    .whereIn("d.build_id", buildIds as number[])
    .distinctOn("d.build_id")
    .orderBy([{ column: "d.build_id" }, { column: "d.decided_at", order: "desc" }, { column: "d.id", order: "desc" }])
    .select("d.*", "u.name as decided_by_name", "u.email as decided_by_email");
}

export async function insertGateDecision({
  db,
  buildId,
  state,
  comment,
  userId,
  decidedAt,
}: {
  db: Db;
  buildId: number;
  state: GateDecisionRow["state"];
  comment: string;
  userId: number;
  decidedAt?: Date;
}): Promise<number> {
  const [{ id }] = await db("gate_decisions")
    .insert({ build_id: buildId, state, comment, decided_by: userId, ...(decidedAt ? { decided_at: decidedAt } : {}) })
    .returning("id");
  return id;
}

/** Every decision of a build, newest first: the gate's history. */
export async function getDecisionHistory({ db, buildId }: { db: Db; buildId: number }): Promise<GateDecisionRow[]> {
  return db("gate_decisions as d")
    .join("users as u", "u.id", "d.decided_by")
    .where("d.build_id", buildId)
    .orderBy([{ column: "d.decided_at", order: "desc" }, { column: "d.id", order: "desc" }])
    .select("d.*", "u.name as decided_by_name", "u.email as decided_by_email");
}

/** Locks the build row: decisions on one build are made one after the other, each seeing the last. */
export async function lockBuildForDecision({ db, buildId }: { db: Db; buildId: number }): Promise<{ id: number; branch: string; commit: string; version: string } | undefined> {
  return db("builds").where({ id: buildId }).forUpdate().first("id", "branch", "commit", "version");
}

export interface GateFindingRow {
  id: number;
  build_id: number;
  run_id: number;
  run_status: "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";
  case_key: string;
  model_key: string;
  grid: string;
  quantity_key: string;
  value: number | null;
  origin: "reported" | "derived" | "expected";
  verdict: "within" | "marginal" | "outside" | "unbanded" | "missing";
  baseline_build_id: number | null;
  baseline_value: number | null;
  baseline_delta: number | null;
  drift: boolean;
  drift_reason: "baseline" | "trend" | null;
  drift_p_value: number | null;
  drift_slope: number | null;
  band_id: number | null;
  band_version: number | null;
  band_kind: "verification" | "validation" | null;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  marginal_margin: number | null;
  noise_floor: number | null;
  source: string | null;
  label: string | null;
  unit: string | null;
}

/**
 * The quantities of these builds a release manager must look at: outside,
 * marginal, missing or drifting, and every quantity of a run that did not
 * complete. Band and definition come along so limits and units need no second trip.
 */
export async function getGateFindings({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<GateFindingRow[]> {
  if (buildIds.length === 0) return [];
  return db("quantity_values as q")
    .join("runs as r", "r.id", "q.run_id")
    .leftJoin("bands as b", "b.id", "q.band_id")
    .leftJoin("quantity_definitions as qd", "qd.key", "q.quantity_key")
    .whereIn("q.build_id", buildIds as number[])
    .where((w) => w.whereIn("q.verdict", ["outside", "marginal", "missing"]).orWhere("q.drift", true).orWhereNot("r.status", "COMPLETED"))
    .orderBy(["q.build_id", "q.case_key", "q.model_key", "q.grid", "q.quantity_key"])
    .select(
      "q.id", "q.build_id", "q.run_id", "r.status as run_status", "q.case_key", "q.model_key", "q.grid", "q.quantity_key",
      "q.value", "q.origin", "q.verdict", "q.baseline_build_id", "q.baseline_value", "q.baseline_delta",
      "q.drift", "q.drift_reason", "q.drift_p_value", "q.drift_slope", "q.band_id",
      "b.version as band_version", "b.kind as band_kind", "b.reference", "b.lower", "b.upper", "b.marginal_margin", "b.noise_floor", "b.source",
      "qd.label", "qd.unit",
    );
}

export interface BareRunRow {
  id: number;
  build_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  status: "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";
}

/** Runs that did not complete and left no quantity at all (nothing a waiver could name). */
export async function getIncompleteRunsWithoutValues({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<BareRunRow[]> {
  if (buildIds.length === 0) return [];
  return db("runs as r")
    .whereIn("r.build_id", buildIds as number[])
    .whereNot("r.status", "COMPLETED")
    .whereNotExists((q) => q.select(db.raw("1")).from("quantity_values as q").whereRaw("q.run_id = r.id"))
    .orderBy(["r.build_id", "r.case_key", "r.model_key", "r.grid"])
    .select("r.id", "r.build_id", "r.case_key", "r.model_key", "r.grid", "r.status");
}

/** Builds whose commit starts with `prefix` (CI may pass a short hash); at most `limit`. */
export async function getBuildsByCommitPrefix({ db, prefix, limit }: { db: Db; prefix: string; limit: number }): Promise<BuildRow[]> {
  const p = prefix.toLowerCase();
  // The caller passes hex digits only (validated), so the prefix holds no LIKE wildcards.
  return db("builds").where("commit", "like", `${p}%`).orderBy("id").limit(limit);
}
