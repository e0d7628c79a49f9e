import type { QuantityRow } from "@/components/quantities/quantity-table";

// Shapes of the RunPlots query (graphql/operations/run.ts) and small readers
// for the loosely typed `details` JSON the derivations store beside a value.

export interface QuantityView extends QuantityRow {
  details: Record<string, unknown>;
  bandKind: "verification" | "validation" | null;
  bandModel: string | null;
}

export interface SeriesView {
  key: string;
  x: number[];
  y: number[];
  totalPoints: number;
}

export interface StressView {
  at: number;
  uu: number;
  vv: number;
  ww: number;
  uv: number;
  uw: number;
  vw: number;
  k: number | null;
  eta: number | null;
  xi: number | null;
  lumleyF: number | null;
  barycentricX: number | null;
  barycentricY: number | null;
  realizable: boolean;
  violations: string[];
}

export interface GridStudyView {
  quantity: string;
  cells: number[];
  values: number[];
  dimension: number;
  convergence: string;
  observedOrder: number | null;
  extrapolatedValue: number | null;
  gciFinePct: number | null;
  eaPct: number | null;
  eextPct: number | null;
}

export interface RunPlotsData {
  run: {
    id: string;
    case: string;
    model: string;
    status: string;
    plotSeries: SeriesView[];
    stresses: StressView[];
    gridStudy: GridStudyView | null;
    coefficients: { name: string; value: number }[];
    quantities: QuantityView[];
  } | null;
  case: { key: string; title: string; parameters: Record<string, unknown> } | null;
  quantities: { key: string; label: string; unit: string }[];
}

export type RunView = NonNullable<RunPlotsData["run"]>;

export function findQuantity(run: RunView, key: string): QuantityView | null {
  return run.quantities.find((q) => q.key === key) ?? null;
}

export function findSeries(run: RunView, key: string): SeriesView | null {
  return run.plotSeries.find((s) => s.key === key) ?? null;
}

export function readNumber(obj: unknown, key: string): number | null {
  if (!obj || typeof obj !== "object") return null;
  const v = (obj as Record<string, unknown>)[key];
  return typeof v === "number" && Number.isFinite(v) ? v : null;
}

export function readString(obj: unknown, key: string): string | null {
  if (!obj || typeof obj !== "object") return null;
  const v = (obj as Record<string, unknown>)[key];
  return typeof v === "string" ? v : null;
}

export function readNumbers(obj: unknown, key: string): number[] {
  if (!obj || typeof obj !== "object") return [];
  const v = (obj as Record<string, unknown>)[key];
  return Array.isArray(v) ? v.filter((n): n is number => typeof n === "number" && Number.isFinite(n)) : [];
}

/** A y+ window { yPlusMin, yPlusMax } from a quantity's details or the case's fit settings. */
export function readWindow(obj: unknown): { yPlusMin: number; yPlusMax: number } | null {
  if (!obj || typeof obj !== "object") return null;
  const w = (obj as Record<string, unknown>).window ?? (obj as Record<string, unknown>).logLawWindow;
  const min = readNumber(w, "yPlusMin");
  const max = readNumber(w, "yPlusMax");
  return min !== null && max !== null && max > min ? { yPlusMin: min, yPlusMax: max } : null;
}

/** Why a quantity has no value: the derivation's error, or the judge's reason for "missing". */
export function whyMissing(q: QuantityView | null): string | null {
  if (!q || q.value !== null) return null;
  return readString(q.details, "error") ?? readString(q.details, "reason") ?? "no value";
}

export function coefficient(run: RunView, name: string): number | null {
  const c = run.coefficients.find((k) => k.name === name);
  return c && Number.isFinite(c.value) ? c.value : null;
}
