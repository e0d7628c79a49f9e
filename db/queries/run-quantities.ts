import "server-only";
import type { Db } from "../index";
import type { JudgedQuantity } from "@/lib/evaluation/types";

// The quantities of runs as the GraphQL QuantityValue type shows them: each
// value with the band it was judged against and its definition's label and
// unit, in one statement. The columns are named as the type's fields, so the
// rows go to the client through default resolvers: a build of 200 runs × 35
// quantities is 7,000 objects, and a resolver function (worse, a promise) per
// field of each was most of build(id)'s time (issue 5, build_ratio). The fit
// details stay text until asked for: pg would otherwise parse 7,000 JSON
// documents that the build page never shows.

/** A stored judged quantity (the judge's facts, by the same names) with its definition and band. */
export interface RunQuantityRow
  extends Pick<
    JudgedQuantity,
    "key" | "value" | "origin" | "verdict" | "baselineBuildId" | "baselineValue" | "baselineDelta" | "drift" | "driftReason" | "driftPValue" | "driftSlope"
  > {
  id: number;
  runId: number;
  label: string | null;
  unit: string | null;
  bandId: number | null;
  bandKind: "verification" | "validation" | null;
  bandModel: string | null;
  reference: number | null;
  source: string | null;
  lower: number | null;
  upper: number | null;
  marginalMargin: number | null;
  /** The fit details as JSON text: parsed only when a client asks for them (resolvers/types.ts). */
  detailsJson: string;
}

/** Every quantity of the given runs, by run then quantity key. */
export async function getRunQuantitiesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }): Promise<RunQuantityRow[]> {
  if (runIds.length === 0) return [];
  const result: { rows: RunQuantityRow[] } = await db.raw(
    `select v.id, v.run_id as "runId", v.quantity_key as key, q.label, q.unit, v.value, v.origin, v.verdict,
            v.band_id as "bandId", d.kind as "bandKind", d.model_key as "bandModel", d.reference, d.source, d.lower, d.upper,
            d.marginal_margin as "marginalMargin", v.baseline_build_id as "baselineBuildId", v.baseline_value as "baselineValue",
            v.baseline_delta as "baselineDelta", v.drift, v.drift_reason as "driftReason", v.drift_p_value as "driftPValue",
            v.drift_slope as "driftSlope", v.details::text as "detailsJson"
       from quantity_values as v
       left join bands as d on d.id = v.band_id
       left join quantity_definitions as q on q.key = v.quantity_key
      where v.run_id = any(?::bigint[])
      order by v.run_id, v.quantity_key`,
    // One array parameter (not one placeholder per id): the statement text stays the same whatever the run count.
    [`{${runIds.join(",")}}`],
  );
  return result.rows;
}
