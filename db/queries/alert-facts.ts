import "server-only";
import type { Db } from "../index";

// What an alert says about a build, read inside the submission's transaction
// after its verdicts are stored: every quantity outside its band or drifting,
// with the band version it was judged against and the quantity's unit, and
// every run that did not complete.

export interface AlertBuildRow {
  id: number;
  solver: string;
  version: string;
  commit: string;
  branch: string;
  verdict: string;
  pipeline_url: string | null;
}

export interface AlertQuantityRow {
  run_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  quantity_key: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  verdict: string;
  lower: number | null;
  upper: number | null;
  reference: number | null;
  band_kind: string | null;
  band_version: number | null;
  noise_floor: number | null;
  drift: boolean;
  drift_reason: "baseline" | "trend" | null;
  baseline_value: number | null;
  baseline_delta: number | null;
  drift_p_value: number | null;
  drift_slope: number | null;
}

export interface AlertRunRow {
  run_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  status: string;
  iterations: number | null;
}

export async function getAlertBuild({ db, buildId }: { db: Db; buildId: number }): Promise<AlertBuildRow | undefined> {
  return db("builds").where({ id: buildId }).first("id", "solver", "version", "commit", "branch", "verdict", "pipeline_url");
}

export async function getAlertQuantities({ db, buildId }: { db: Db; buildId: number }): Promise<AlertQuantityRow[]> {
  return db("quantity_values as q")
    .leftJoin("bands as b", "b.id", "q.band_id")
    .leftJoin("quantity_definitions as d", "d.key", "q.quantity_key")
    .where("q.build_id", buildId)
    .andWhere((w) => w.where("q.verdict", "outside").orWhere("q.drift", true))
    .orderBy(["q.case_key", "q.model_key", "q.grid", "q.quantity_key"])
    .select(
      "q.run_id",
      "q.case_key",
      "q.model_key",
      "q.grid",
      "q.quantity_key",
      "d.label",
      "d.unit",
      "q.value",
      "q.verdict",
      "b.lower",
      "b.upper",
      "b.reference",
      "b.kind as band_kind",
      "b.version as band_version",
      "b.noise_floor",
      "q.drift",
      "q.drift_reason",
      "q.baseline_value",
      "q.baseline_delta",
      "q.drift_p_value",
      "q.drift_slope",
    );
}

export async function getIncompleteRuns({ db, buildId }: { db: Db; buildId: number }): Promise<AlertRunRow[]> {
  return db("runs")
    .where({ build_id: buildId })
    .whereNot("status", "COMPLETED")
    .orderBy(["case_key", "model_key", "grid"])
    .select("id as run_id", "case_key", "model_key", "grid", "status", "iterations");
}
