import "server-only";
import { z } from "zod";
import { getDb } from "@/db";
import { getBaselineBuild } from "@/db/queries/builds";
import { getTrendBuildIds, getTrendChartPoints, type TrendChartPointRow } from "@/db/queries/trend-chart";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./overview-input";

// One quantity of one case across the builds of a branch, for up to six models
// on one chart (six distinguishable series colours, chart-theme.ts).

const slug = z.string().trim().min(1).max(64);
export const trendChartSchema = z.object({
  case: slug,
  quantity: slug,
  models: z
    .array(slug)
    .min(1)
    .max(6)
    .transform((m) => [...new Set(m)]),
  branch: z.string().trim().min(1).max(200),
  grid: slug.default("default"),
  last: z.number().int().min(2).max(500).default(50),
});

export type TrendChartPoint = ReturnType<typeof toPoint>;

export async function findTrendChart({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const t = parseInput(trendChartSchema, unsafeInput);
  const db = getDb();
  const scope = { caseKey: t.case, quantityKey: t.quantity, modelKeys: t.models, branch: t.branch, grid: t.grid };
  const [buildIds, baseline] = await Promise.all([getTrendBuildIds({ db, scope, last: t.last }), getBaselineBuild({ db, branch: t.branch })]);
  const rows = await getTrendChartPoints({ db, scope, buildIds });
  const series = t.models.map((model) => ({ model, points: rows.filter((r) => r.model_key === model).map(toPoint) }));
  return { ...t, buildIds, baselineBuildId: baseline?.id ?? null, series };
}

function toPoint(r: TrendChartPointRow) {
  return {
    buildId: r.build_id,
    runId: r.run_id,
    value: r.value,
    verdict: r.verdict,
    drift: r.drift,
    driftReason: r.drift_reason,
    driftPValue: r.drift_p_value,
    driftSlope: r.drift_slope,
    baselineValue: r.baseline_value,
    baselineDelta: r.baseline_delta,
    bandId: r.band_id,
    bandVersion: r.band_version,
    bandKind: r.band_kind,
    bandModel: r.band_model_key,
    reference: r.reference,
    lower: r.lower,
    upper: r.upper,
    marginalMargin: r.marginal_margin,
    noiseFloor: r.noise_floor,
  };
}
