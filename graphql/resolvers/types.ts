import type { BuildRow } from "@/db/queries/builds";
import type { GateDecisionRow } from "@/db/queries/gate";
import type { TrendPointRow } from "@/db/queries/quantity-values";
import type { RunQuantityRow } from "@/db/queries/run-quantities";
import type { RunRow } from "@/db/queries/runs";
import { deviationFromReference, type Verdict } from "@/lib/analysis";
import type { BandInForce } from "@/lib/evaluation/types";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;

function countVerdicts(verdicts: Verdict[]) {
  const counts = { within: 0, marginal: 0, outside: 0, unbanded: 0, missing: 0 };
  for (const v of verdicts) counts[v] += 1;
  return counts;
}

export const Build = {
  pipelineUrl: (b: BuildRow) => b.pipeline_url,
  receivedAt: (b: BuildRow) => b.received_at,
  runCounts: async (b: BuildRow, _: unknown, ctx: Ctx) => countVerdicts((await ctx.loaders.runsByBuild.load(b.id)).map((r) => r.verdict)),
  runs: (b: BuildRow, _: unknown, ctx: Ctx) => ctx.loaders.runsByBuild.load(b.id),
  decision: async (b: BuildRow, _: unknown, ctx: Ctx) => (await ctx.loaders.decisionByBuild.load(b.id))[0] ?? null,
  gate: async (b: BuildRow, _: unknown, ctx: Ctx) => (await ctx.loaders.decisionByBuild.load(b.id))[0]?.state ?? "pending",
};

export const GateDecision = {
  decidedBy: (d: GateDecisionRow) => d.decided_by_name,
  decidedByEmail: (d: GateDecisionRow) => d.decided_by_email,
  decidedAt: (d: GateDecisionRow) => d.decided_at,
};

export const Run = {
  buildId: (r: RunRow) => r.build_id,
  case: (r: RunRow) => r.case_key,
  model: (r: RunRow) => r.model_key,
  wallSeconds: (r: RunRow) => r.wall_seconds,
  quantities: (r: RunRow, _: unknown, ctx: Ctx) => ctx.loaders.quantitiesByRun.load(r.id),
  series: (r: RunRow, _: unknown, ctx: Ctx) => ctx.loaders.seriesByRun.load(r.id),
  stresses: (r: RunRow, _: unknown, ctx: Ctx) => ctx.loaders.stressesByRun.load(r.id),
  gridStudy: async (r: RunRow, _: unknown, ctx: Ctx) => (await ctx.loaders.gridStudyByRun.load(r.id))[0] ?? null,
  coefficients: (r: RunRow, _: unknown, ctx: Ctx) => ctx.loaders.coefficientsByRun.load(r.id),
};

// Rows come shaped as the type (db/queries/run-quantities.ts): every field but
// these is a property read by the default resolver, with no promise per field.
export const QuantityValue = {
  band: (q: RunQuantityRow, _: unknown, ctx: Ctx) => (q.bandId === null ? null : ctx.loaders.band.load(q.bandId)),
  deviation: (q: RunQuantityRow) => deviationFromReference(q.value, q.reference)?.absolute ?? null,
  deviationPct: (q: RunQuantityRow) => deviationFromReference(q.value, q.reference)?.relativePct ?? null,
  details: (q: RunQuantityRow): unknown => JSON.parse(q.detailsJson),
};

export const Band = {
  case: (b: BandInForce) => b.caseKey,
  quantity: (b: BandInForce) => b.quantityKey,
  model: (b: BandInForce) => b.modelKey,
};

export const Case = {
  models: (c: { modelKeys: string[] }) => c.modelKeys,
};

export const StressSample = {
  lumleyF: (s: { lumley_f: number | null }) => s.lumley_f,
  barycentricX: (s: { bary_x: number | null }) => s.bary_x,
  barycentricY: (s: { bary_y: number | null }) => s.bary_y,
};

export const GridStudy = {
  observedOrder: (g: { observed_order: number | null }) => g.observed_order,
  extrapolatedValue: (g: { extrapolated_value: number | null }) => g.extrapolated_value,
  gciFinePct: (g: { gci_fine_pct: number | null }) => g.gci_fine_pct,
  eaPct: (g: { ea_pct: number | null }) => g.ea_pct,
  eextPct: (g: { eext_pct: number | null }) => g.eext_pct,
};

export const TrendPoint = {
  buildId: (p: TrendPointRow) => p.build_id,
  receivedAt: (p: TrendPointRow) => p.build_received_at,
  driftReason: (p: TrendPointRow) => p.drift_reason,
  bandVersion: (p: TrendPointRow) => p.band_version,
  marginalMargin: (p: TrendPointRow) => p.marginal_margin,
};
