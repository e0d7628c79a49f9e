import "server-only";
import type { Knex } from "knex";
import type { GridStudyAnalysis, StressAnalysis } from "@/lib/evaluation/derive";
import type { RunSubmission } from "@/lib/validation/submission";
import { copySeriesRows } from "./series-copy";

// The raw data of a submission's runs (series, stress samples with their
// invariants, grid studies), written for all runs at once: a handful of
// statements per submission whatever its run count. (Coefficients go with the
// runs themselves, db/queries/run-insert.ts.)

export interface RunDataRow {
  runId: number;
  run: Pick<RunSubmission, "series" | "stresses" | "gridStudy">;
  stresses: StressAnalysis[];
  gridStudy: GridStudyAnalysis | null;
}

// PostgreSQL takes at most 65,535 bind parameters per statement.
const MAX_PARAMS = 60_000;

export async function insertRunData({ trx, rows }: { trx: Knex.Transaction; rows: readonly RunDataRow[] }): Promise<void> {
  await copySeriesRows({ trx, rows: rows.flatMap(({ runId, run }) => (run.series ?? []).map((s) => ({ runId, key: s.key, x: s.x, y: s.y }))) });
  await insertChunked(trx, "stress_samples", rows.flatMap(stressRows));
  await insertChunked(trx, "grid_studies", rows.flatMap(gridStudyRows));
}

async function insertChunked(trx: Knex.Transaction, table: string, rows: Record<string, unknown>[]) {
  if (rows.length === 0) return;
  const perStatement = Math.max(1, Math.floor(MAX_PARAMS / Object.keys(rows[0]).length));
  for (let i = 0; i < rows.length; i += perStatement) await trx(table).insert(rows.slice(i, i + perStatement));
}

function stressRows({ runId, run, stresses }: RunDataRow) {
  return (run.stresses ?? []).map((s, idx) => {
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
}

function gridStudyRows({ runId, run, gridStudy }: RunDataRow) {
  if (!run.gridStudy || !gridStudy) return [];
  return [
    {
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
    },
  ];
}

function finite(v: number | null | undefined): number | null {
  return typeof v === "number" && Number.isFinite(v) ? v : null;
}
