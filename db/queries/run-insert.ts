import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";
import type { JudgedQuantity } from "@/lib/evaluation/types";
import type { NewRun } from "./runs";

export interface RunWithValues {
  run: NewRun;
  coefficients: readonly { name: string; value: number }[];
  quantities: readonly JudgedQuantity[];
}

const INSERT_RUNS_WITH_VALUES = `with r as (
       insert into runs (build_id, case_key, model_key, grid, status, iterations, wall_seconds, verdict)
       select ?::bigint, x.c, x.m, x.g, x.s, x.i, x.w, x.vd
         from json_to_recordset(?::json) as x(c text, m text, g text, s text, i int, w float8, vd text)
       returning id, case_key, model_key, grid
     ), coefficients as (
       insert into run_coefficients (run_id, name, value)
       select r.id, x.n, x.v
         from json_to_recordset(?::json) as x(c text, m text, g text, n text, v float8)
         join r on r.case_key = x.c and r.model_key = x.m and r.grid = x.g
     ), "values" as (
       insert into quantity_values (build_id, branch, build_received_at, run_id, case_key, model_key, grid, quantity_key, value, origin,
         band_id, verdict, baseline_build_id, baseline_value, baseline_delta, drift, drift_reason, drift_p_value, drift_slope, details)
       select ?::bigint, ?::text, ?::timestamptz, r.id, r.case_key, r.model_key, r.grid, x.k, x.v, x.o,
              x.b, x.vd, x.bb, x.bv, x.bd, x.d, x.dr, x.dp, x.ds, coalesce(x.dt, '{}')
         from json_to_recordset(?::json) as x(c text, m text, g text, k text, v float8, o text, b bigint, vd text,
                                              bb bigint, bv float8, bd float8, d boolean, dr text, dp float8, ds float8, dt jsonb)
         join r on r.case_key = x.c and r.model_key = x.m and r.grid = x.g
     )
     select id, case_key, model_key, grid from r`;

/**
 * Inserts a submission's runs, their closure coefficients and their judged
 * quantities in ONE statement (data-modifying CTEs: the children join the run
 * rows the same statement inserts), so a submission pays one round trip for
 * all three whatever its size. Rows travel as JSON documents unpacked by
 * json_to_recordset: V8's native JSON.stringify writes thousands of rows far
 * faster than pg's per-element array serialiser, with no bind-parameter limit.
 * Returns the run ids in the order given.
 */
export async function insertRunsWithValues({
  db,
  build,
  runs,
}: {
  db: Db;
  build: { id: number; branch: string; receivedAt: Date };
  runs: readonly RunWithValues[];
}): Promise<number[]> {
  if (runs.length === 0) return [];
  const runRows = runs.map(({ run }) => ({ c: run.case, m: run.model, g: run.grid, s: run.status, i: run.iterations, w: run.wallSeconds, vd: run.verdict }));
  const coefficientRows = runs.flatMap(({ run, coefficients }) => coefficients.map((x) => ({ c: run.case, m: run.model, g: run.grid, n: x.name, v: x.value })));
  const valueRows = runs.flatMap(({ run, quantities }) =>
    quantities.map((q) => ({
      c: run.case,
      m: run.model,
      g: run.grid,
      k: q.key,
      v: q.value,
      o: q.origin,
      b: q.band?.id ?? null,
      vd: q.verdict,
      bb: q.baselineBuildId,
      bv: q.baselineValue,
      bd: q.baselineDelta,
      d: q.drift,
      dr: q.driftReason,
      dp: q.driftPValue,
      ds: q.driftSlope,
      dt: q.details,
    })),
  );
  const result: { rows: { id: number; case_key: string; model_key: string; grid: string }[] } = await db
    .raw(INSERT_RUNS_WITH_VALUES, [build.id, JSON.stringify(runRows), JSON.stringify(coefficientRows), build.id, build.branch, build.receivedAt, JSON.stringify(valueRows)])
    .options(prepared(INSERT_RUNS_WITH_VALUES));
  // RETURNING order is not promised by SQL: match rows to runs by their unique key.
  const ids = new Map(result.rows.map((r) => [`${r.case_key}|${r.model_key}|${r.grid}`, Number(r.id)]));
  return runs.map(({ run }) => ids.get(`${run.case}|${run.model}|${run.grid}`)!);
}
