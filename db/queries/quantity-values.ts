import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";
import type { Verdict } from "@/lib/analysis";

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

const RECENT_VALUES = `select k.case_key, k.model_key, k.grid, k.quantity_key, h.values
       from unnest(?::text[], ?::text[], ?::text[], ?::text[]) as k(case_key, model_key, grid, quantity_key)
       cross join lateral (
         select array_agg(p.value order by p.build_received_at, p.build_id) as values
           from (select v.value, v.build_received_at, v.build_id
                   from quantity_values v
                  where v.case_key = k.case_key and v.quantity_key = k.quantity_key and v.model_key = k.model_key
                    and v.branch = ? and v.grid = k.grid and v.build_received_at < ? and v.value is not null
                  order by v.build_received_at desc, v.build_id desc
                  limit ?) as p
       ) as h
      where h.values is not null`;

/**
 * The last `perKey` non-null values on a branch before a time for each
 * (case, model, grid, quantity) of a submission, oldest first — the history drift
 * is judged on. One LATERAL probe per key walks the trend index
 * (quantity_values_trend_idx) from the newest point down and stops after
 * `perKey` rows, so the cost follows the keys posted, not the history stored.
 */
export async function getRecentValues({
  db,
  branch,
  before,
  keys,
  perKey,
}: {
  db: Db;
  branch: string;
  before: Date;
  keys: readonly { caseKey: string; modelKey: string; grid: string; quantityKey: string }[];
  perKey: number;
}): Promise<Map<string, number[]>> {
  const out = new Map<string, number[]>();
  if (keys.length === 0) return out;
  const bindings = [
    keys.map((k) => k.caseKey),
    keys.map((k) => k.modelKey),
    keys.map((k) => k.grid),
    keys.map((k) => k.quantityKey),
    branch,
    before,
    perKey,
  ];
  const result: { rows: { case_key: string; model_key: string; grid: string; quantity_key: string; values: number[] }[] } = await db
    .raw(RECENT_VALUES, bindings)
    .options(prepared(RECENT_VALUES));
  for (const r of result.rows) out.set(seriesKey(r.case_key, r.model_key, r.grid, r.quantity_key), r.values.map(Number));
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
