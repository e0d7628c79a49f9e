import "server-only";
import type { Db } from "../index";
import type { Verdict } from "@/lib/analysis";

// A quantity of one case across the builds of a branch, for several models at
// once. Both reads run on the denormalised trend index of quantity_values
// (case_key, quantity_key, model_key, branch, grid, build_received_at desc).

export interface TrendScope {
  caseKey: string;
  quantityKey: string;
  modelKeys: string[];
  branch: string;
  grid: string;
}

/**
 * Ids of the newest `last` builds of the branch holding a value of the scope,
 * oldest first. The index orders one model's values; several models at once
 * (model_key in (...)) would make PostgreSQL read and sort the whole history.
 * So each model reads its own newest `last` entries (LATERAL ... LIMIT over the
 * index) and only those, at most models × last rows, are merged.
 */
export async function getTrendBuildIds({ db, scope, last }: { db: Db; scope: TrendScope; last: number }): Promise<number[]> {
  const result: { rows: { build_id: number }[] } = await db.raw(
    `select x.build_id
       from unnest(?::text[]) as m(model_key)
      cross join lateral (
            select build_id, build_received_at
              from quantity_values
             where case_key = ? and quantity_key = ? and model_key = m.model_key and branch = ? and grid = ?
             order by build_received_at desc, build_id desc
             limit ?) as x
      group by x.build_id, x.build_received_at
      order by x.build_received_at desc, x.build_id desc
      limit ?`,
    [`{${scope.modelKeys.map(quoteArrayItem).join(",")}}`, scope.caseKey, scope.quantityKey, scope.branch, scope.grid, last, last],
  );
  return result.rows.map((r) => r.build_id).reverse();
}

/** One element of a PostgreSQL array literal, quoted so that commas, quotes and braces in a key stay inside it. */
function quoteArrayItem(value: string): string {
  return `"${value.replaceAll("\\", "\\\\").replaceAll('"', '\\"')}"`;
}

export interface TrendChartPointRow {
  build_id: number;
  run_id: number;
  model_key: string;
  value: number | null;
  verdict: Verdict;
  drift: boolean;
  drift_reason: "baseline" | "trend" | null;
  drift_p_value: number | null;
  drift_slope: number | null;
  baseline_value: number | null;
  baseline_delta: number | null;
  band_id: number | null;
  band_version: number | null;
  band_kind: "verification" | "validation" | null;
  band_model_key: string | null;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  marginal_margin: number | null;
  noise_floor: number | null;
}

/** Every value of the scope in those builds, with the band version each was judged against. */
export async function getTrendChartPoints({ db, scope, buildIds }: { db: Db; scope: TrendScope; buildIds: number[] }): Promise<TrendChartPointRow[]> {
  if (buildIds.length === 0) return [];
  return db("quantity_values as v")
    .leftJoin("bands as d", "d.id", "v.band_id")
    .where({ "v.case_key": scope.caseKey, "v.quantity_key": scope.quantityKey, "v.branch": scope.branch, "v.grid": scope.grid })
    .whereIn("v.model_key", scope.modelKeys)
    .whereIn("v.build_id", buildIds)
    .orderBy([{ column: "v.model_key" }, { column: "v.build_received_at" }, { column: "v.build_id" }])
    .select(
      "v.build_id",
      "v.run_id",
      "v.model_key",
      "v.value",
      "v.verdict",
      "v.drift",
      "v.drift_reason",
      "v.drift_p_value",
      "v.drift_slope",
      "v.baseline_value",
      "v.baseline_delta",
      "v.band_id",
      "d.version as band_version",
      "d.kind as band_kind",
      "d.model_key as band_model_key",
      "d.reference",
      "d.lower",
      "d.upper",
      "d.marginal_margin",
      "d.noise_floor",
    );
}
