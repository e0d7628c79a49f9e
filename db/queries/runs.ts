import "server-only";
import type { Db } from "../index";
import type { Verdict } from "@/lib/analysis";
import type { GridStudyAnalysis, StressAnalysis } from "@/lib/evaluation/derive";
import type { RunSubmission } from "@/lib/validation/submission";

export interface RunRow {
  id: number;
  build_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  status: RunSubmission["status"];
  iterations: number | null;
  wall_seconds: number | null;
  verdict: Verdict;
  received_at: Date;
}

/** Removes an earlier post of the same case × model × grid in this build (its data cascades). */
export async function deleteRunByKey({ db, buildId, run }: { db: Db; buildId: number; run: Pick<RunSubmission, "case" | "model" | "grid"> }) {
  await db("runs").where({ build_id: buildId, case_key: run.case, model_key: run.model, grid: run.grid }).delete();
}

export async function insertRun({ db, buildId, run, verdict }: { db: Db; buildId: number; run: RunSubmission; verdict: Verdict }): Promise<number> {
  const [{ id }] = await db("runs")
    .insert({
      build_id: buildId,
      case_key: run.case,
      model_key: run.model,
      grid: run.grid,
      status: run.status,
      iterations: run.iterations ?? null,
      wall_seconds: run.wallSeconds ?? null,
      verdict,
    })
    .returning("id");
  return id;
}

export async function insertRunData({
  db,
  runId,
  run,
  stresses,
  gridStudy,
}: {
  db: Db;
  runId: number;
  run: RunSubmission;
  stresses: StressAnalysis[];
  gridStudy: GridStudyAnalysis | null;
}) {
  if (run.series?.length) {
    await db("run_series").insert(run.series.map((s) => ({ run_id: runId, key: s.key, x: s.x, y: s.y })));
  }
  if (run.stresses?.length) {
    const rows = run.stresses.map((s, idx) => {
      const a = stresses[idx];
      return {
        run_id: runId,
        idx,
        at: s.at,
        uu: s.uu,
        vv: s.vv,
        ww: s.ww,
        uv: s.uv,
        uw: s.uw,
        vw: s.vw,
        k: a.k,
        ii: finite(a.ii),
        iii: finite(a.iii),
        eta: finite(a.eta),
        xi: finite(a.xi),
        lumley_f: finite(a.f),
        bary_x: finite(a.barycentric?.x),
        bary_y: finite(a.barycentric?.y),
        realizable: a.realizable,
        violations: a.violations,
      };
    });
    for (let i = 0; i < rows.length; i += 2000) await db("stress_samples").insert(rows.slice(i, i + 2000));
  }
  if (run.gridStudy && gridStudy) {
    await db("grid_studies").insert({
      run_id: runId,
      quantity: run.gridStudy.quantity,
      cells: run.gridStudy.cells,
      values: run.gridStudy.values,
      dimension: run.gridStudy.dimension,
      convergence: gridStudy.convergence,
      observed_order: finite(gridStudy.p),
      extrapolated_value: finite(gridStudy.extrapolated),
      gci_fine_pct: finite(gridStudy.gciFinePct),
      ea_pct: finite(gridStudy.eaPct),
      eext_pct: finite(gridStudy.eextPct),
    });
  }
  if (run.coefficients?.length) {
    await db("run_coefficients").insert(run.coefficients.map((c) => ({ run_id: runId, name: c.name, value: c.value })));
  }
}

export async function getRunsByIds({ db, ids }: { db: Db; ids: readonly number[] }): Promise<RunRow[]> {
  if (ids.length === 0) return [];
  return db("runs").whereIn("id", ids as number[]).select("*");
}

export async function getRunsByBuildIds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<RunRow[]> {
  if (buildIds.length === 0) return [];
  return db("runs")
    .whereIn("build_id", buildIds as number[])
    .orderBy([{ column: "case_key" }, { column: "model_key" }, { column: "grid" }])
    .select("*");
}

export async function getSeriesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("run_series").whereIn("run_id", runIds as number[]).orderBy(["run_id", "key"]).select("run_id", "key", "x", "y");
}

export async function getStressesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("stress_samples").whereIn("run_id", runIds as number[]).orderBy(["run_id", "idx"]).select("*");
}

export async function getGridStudiesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("grid_studies").whereIn("run_id", runIds as number[]).select("*");
}

export async function getCoefficientsByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("run_coefficients").whereIn("run_id", runIds as number[]).orderBy(["run_id", "name"]).select("*");
}

function finite(v: number | null | undefined): number | null {
  return typeof v === "number" && Number.isFinite(v) ? v : null;
}
