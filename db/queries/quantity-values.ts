import "server-only";
import type { Db } from "../index";
import type { Verdict } from "@/lib/analysis";
import type { JudgedQuantity } from "@/lib/evaluation/types";

export interface QuantityValueRow {
  id: number;
  run_id: number;
  build_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  branch: string;
  build_received_at: Date;
  quantity_key: string;
  value: number | null;
  origin: "reported" | "derived" | "expected";
  band_id: number | null;
  verdict: Verdict;
  baseline_build_id: number | null;
  baseline_value: number | null;
  baseline_delta: number | null;
  drift: boolean;
  drift_reason: "baseline" | "trend" | null;
  drift_p_value: number | null;
  drift_slope: number | null;
  details: Record<string, unknown>;
}

export async function insertQuantityValues({
  db,
  run,
  quantities,
}: {
  db: Db;
  run: { id: number; buildId: number; caseKey: string; modelKey: string; grid: string; branch: string; buildReceivedAt: Date };
  quantities: JudgedQuantity[];
}) {
  if (quantities.length === 0) return;
  await db("quantity_values").insert(
    quantities.map((q) => ({
      run_id: run.id,
      build_id: run.buildId,
      case_key: run.caseKey,
      model_key: run.modelKey,
      grid: run.grid,
      branch: run.branch,
      build_received_at: run.buildReceivedAt,
      quantity_key: q.key,
      value: q.value,
      origin: q.origin,
      band_id: q.band?.id ?? null,
      verdict: q.verdict,
      baseline_build_id: q.baselineBuildId,
      baseline_value: q.baselineValue,
      baseline_delta: q.baselineDelta,
      drift: q.drift,
      drift_reason: q.driftReason,
      drift_p_value: q.driftPValue,
      drift_slope: q.driftSlope,
      details: JSON.stringify(q.details),
    })),
  );
}

export async function getQuantityValuesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }): Promise<QuantityValueRow[]> {
  if (runIds.length === 0) return [];
  return db("quantity_values").whereIn("run_id", runIds as number[]).orderBy(["run_id", "quantity_key"]).select("*");
}

/** Values of one build, keyed by case|model|grid|quantity (the baseline of a new build). */
export async function getValuesOfBuild({ db, buildId }: { db: Db; buildId: number }): Promise<Map<string, number | null>> {
  const rows: Pick<QuantityValueRow, "case_key" | "model_key" | "grid" | "quantity_key" | "value">[] = await db("quantity_values")
    .where({ build_id: buildId })
    .select("case_key", "model_key", "grid", "quantity_key", "value");
  return new Map(rows.map((r) => [seriesKey(r.case_key, r.model_key, r.grid, r.quantity_key), r.value]));
}

/**
 * The last `perKey` non-null values on a branch before a time for each run key
 * (case, model, grid) of a submission, oldest first — the history drift is judged on.
 */
export async function getRecentValues({
  db,
  branch,
  before,
  runKeys,
  perKey,
}: {
  db: Db;
  branch: string;
  before: Date;
  runKeys: { caseKey: string; modelKey: string; grid: string }[];
  perKey: number;
}): Promise<Map<string, number[]>> {
  const out = new Map<string, number[]>();
  if (runKeys.length === 0) return out;
  const rows: { case_key: string; model_key: string; grid: string; quantity_key: string; value: number }[] = await db
    .select("case_key", "model_key", "grid", "quantity_key", "value")
    .from(
      db("quantity_values as v")
        .join(
          db.raw(
            `(select * from unnest(?::text[], ?::text[], ?::text[]) as k(case_key, model_key, grid)) as k`,
            [runKeys.map((r) => r.caseKey), runKeys.map((r) => r.modelKey), runKeys.map((r) => r.grid)],
          ),
          (j) => j.on("k.case_key", "v.case_key").andOn("k.model_key", "v.model_key").andOn("k.grid", "v.grid"),
        )
        .where("v.branch", branch)
        .where("v.build_received_at", "<", before)
        .whereNotNull("v.value")
        .select(
          "v.case_key",
          "v.model_key",
          "v.grid",
          "v.quantity_key",
          "v.value",
          "v.build_received_at",
          db.raw(
            "row_number() over (partition by v.case_key, v.model_key, v.grid, v.quantity_key order by v.build_received_at desc, v.build_id desc) as rn",
          ),
        )
        .as("h"),
    )
    .where("rn", "<=", perKey)
    .orderBy([{ column: "build_received_at", order: "asc" }]);
  for (const r of rows) {
    const key = seriesKey(r.case_key, r.model_key, r.grid, r.quantity_key);
    const list = out.get(key) ?? [];
    list.push(r.value);
    out.set(key, list);
  }
  return out;
}

export function seriesKey(caseKey: string, modelKey: string, grid: string, quantityKey: string): string {
  return `${caseKey}|${modelKey}|${grid}|${quantityKey}`;
}

export interface TrendPointRow {
  build_id: number;
  commit: string;
  version: string;
  build_received_at: Date;
  value: number | null;
  verdict: Verdict;
  drift: boolean;
  drift_reason: "baseline" | "trend" | null;
  band_id: number | null;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  marginal_margin: number | null;
  band_version: number | null;
}

/**
 * The newest `last` points of one quantity on a branch, oldest first, with the
 * band each was judged against. The limit sits inside the subquery so the
 * planner reads exactly `last` entries of quantity_values_trend_idx (its
 * columns are the five equalities, then the order); builds and bands are
 * joined per point through LATERAL ... LIMIT 1, which the planner cannot
 * flatten into a hash join over the whole builds table. The cost follows the
 * points returned, not the history stored (issue 5, trend_growth).
 */
export async function getTrendPoints({
  db,
  caseKey,
  quantityKey,
  modelKey,
  branch,
  grid,
  last,
}: {
  db: Db;
  caseKey: string;
  quantityKey: string;
  modelKey: string;
  branch: string;
  grid: string;
  last: number;
}): Promise<TrendPointRow[]> {
  const result: { rows: TrendPointRow[] } = await db.raw(
    `select v.build_id, b.commit, b.version, v.build_received_at, v.value, v.verdict, v.drift, v.drift_reason, v.band_id,
            d.reference, d.lower, d.upper, d.marginal_margin, d.version as band_version
       from (select build_id, build_received_at, value, verdict, drift, drift_reason, band_id
               from quantity_values
              where case_key = ? and quantity_key = ? and model_key = ? and branch = ? and grid = ?
              order by build_received_at desc, build_id desc
              limit ?) as v
      cross join lateral (select commit, version from builds where builds.id = v.build_id limit 1) as b
       left join lateral (select reference, lower, upper, marginal_margin, version from bands where bands.id = v.band_id limit 1) as d on true
      order by v.build_received_at, v.build_id`,
    [caseKey, quantityKey, modelKey, branch, grid, last],
  );
  return result.rows;
}
