import type { Verdict } from "@/lib/analysis";
import type { TrendBuild, TrendChartData, TrendPointData } from "@/graphql/operations/trends";

// Pure shaping of a trend chart: where each build sits on the x axis, the
// per-model series, the band regions (one per run of builds judged against the
// same band version) and the y range that shows values and limits together.

export type XMode = "order" | "time";

export interface PlotPoint {
  x: number;
  y: number | null;
  index: number;
  model: string;
  build: TrendBuild;
  point: TrendPointData;
}

export interface BandRegion {
  key: string;
  x0: number;
  x1: number;
  lower: number | null;
  upper: number | null;
  marginalMargin: number;
  reference: number | null;
  /** The model the band belongs to, or null for a band of every model of the case. */
  model: string | null;
  version: number | null;
  kind: "verification" | "validation" | null;
}

/** Position of each build: its index, or its received time in ms. */
export function xPositions(builds: readonly TrendBuild[], mode: XMode): number[] {
  return builds.map((b, i) => (mode === "order" ? i : Date.parse(b.receivedAt)));
}

/**
 * Cell edges around each position: midpoints between neighbours, the outer edges
 * half a neighbour gap beyond the ends (half a build for a single build).
 */
export function cellEdges(xs: readonly number[]): number[] {
  if (xs.length === 0) return [];
  if (xs.length === 1) return [xs[0] - 0.5, xs[0] + 0.5];
  const edges = [xs[0] - (xs[1] - xs[0]) / 2];
  for (let i = 0; i < xs.length - 1; i++) edges.push((xs[i] + xs[i + 1]) / 2);
  edges.push(xs[xs.length - 1] + (xs[xs.length - 1] - xs[xs.length - 2]) / 2);
  return edges;
}

/** One series per model, a point for every build of the axis (null y where the model has no value). */
export function toPlotSeries(chart: TrendChartData, xs: readonly number[]): { id: string; data: PlotPoint[] }[] {
  const indexOf = new Map(chart.builds.map((b, i) => [b.id, i]));
  return chart.series.map((s) => ({
    id: s.model,
    data: s.points
      .filter((p) => indexOf.has(p.buildId))
      .map((p) => {
        const index = indexOf.get(p.buildId)!;
        return { x: xs[index], y: p.value, index, model: s.model, build: chart.builds[index], point: p };
      }),
  }));
}

/**
 * Band regions: consecutive builds of a model judged against the same band id
 * make one region; a case-wide band shared by several models is drawn once.
 */
export function toBandRegions(series: readonly { id: string; data: readonly PlotPoint[] }[], edges: readonly number[]): BandRegion[] {
  const regions = new Map<string, BandRegion>();
  for (const s of series) {
    let run: PlotPoint[] = [];
    const flush = () => {
      if (run.length === 0) return;
      const p = run[0].point;
      const first = run[0].index;
      const last = run[run.length - 1].index;
      const key = `${p.bandId}:${first}-${last}`;
      if (!regions.has(key) && p.bandId !== null) {
        regions.set(key, {
          key,
          x0: edges[first],
          x1: edges[last + 1],
          lower: p.lower,
          upper: p.upper,
          marginalMargin: p.marginalMargin ?? 0,
          reference: p.reference,
          model: p.bandModel,
          version: p.bandVersion,
          kind: p.bandKind,
        });
      }
      run = [];
    };
    for (const d of s.data) {
      const prev = run[run.length - 1];
      if (prev && (prev.point.bandId !== d.point.bandId || d.index !== prev.index + 1)) flush();
      run.push(d);
    }
    flush();
  }
  return [...regions.values()];
}

/**
 * y range covering every value, finite limit and reference, padded by 8 %. A
 * constant opens by 5 % of its magnitude (±1 at zero); a count (integer) range
 * opens by half a unit so that zero stays readable above the axis.
 */
export function yRange(series: readonly { data: readonly PlotPoint[] }[], bands: readonly BandRegion[], { integer = false } = {}): [number, number] | null {
  const ys: number[] = [];
  for (const s of series) for (const d of s.data) if (d.y !== null && Number.isFinite(d.y)) ys.push(d.y);
  for (const b of bands) for (const v of [b.lower, b.upper, b.reference]) if (v !== null && Number.isFinite(v)) ys.push(v);
  if (ys.length === 0) return null;
  const lo = Math.min(...ys);
  const hi = Math.max(...ys);
  if (integer) return [Math.floor(lo) - 0.5, Math.max(Math.ceil(hi), Math.floor(lo) + 1) + 0.5];
  const span = hi - lo;
  const pad = span > 0 ? 0.08 * span : lo !== 0 ? 0.05 * Math.abs(lo) : 1;
  return [lo - pad, hi + pad];
}

/** Round-number ticks (1, 2 or 5 × 10^k apart) inside [lo, hi], about `count` of them; whole numbers only when `integer`. */
export function niceTicks(lo: number, hi: number, count: number, { integer = false } = {}): { ticks: number[]; step: number } {
  const raw = (hi - lo) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  let step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  if (integer) step = Math.max(1, Math.round(step));
  const ticks: number[] = [];
  // Integer multiples of the step, so round-off does not print 0.30000000000000004.
  for (let k = Math.ceil(lo / step); k * step <= hi + step * 1e-9; k++) ticks.push(Number((k * step).toPrecision(12)));
  return { ticks, step };
}

/** Tick labels with the same number of decimals throughout (0.00265, 0.00270), exponent form outside 1e-3…1e6. */
export function tickLabel(value: number, step: number): string {
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs < 1e-3 || abs >= 1e6) {
    const digits = Math.max(1, Math.min(6, Math.floor(Math.log10(abs)) - Math.floor(Math.log10(step)) + 1));
    const [mantissa, exponent] = value.toExponential(digits - 1).split("e");
    return `${mantissa}×10${superscript(Number(exponent))}`.replace(/^-/, "−");
  }
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  return value.toFixed(decimals).replace(/^-/, "−");
}

const SUP: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
function superscript(n: number): string {
  return String(n).split("").map((c) => SUP[c] ?? c).join("");
}

/** Builds of the axis where a model has a run but no value (missing) — drawn as marks on the axis. */
export function missingPoints(series: readonly { data: readonly PlotPoint[] }[]): PlotPoint[] {
  return series.flatMap((s) => s.data.filter((d) => d.y === null));
}

export const VERDICT_SHAPE: Record<Verdict, "circle" | "diamond" | "square" | "ring" | "none"> = {
  within: "circle",
  marginal: "diamond",
  outside: "square",
  unbanded: "ring",
  missing: "none",
};

const DAY_MS = 86_400_000;
const DAY_STEPS = [1, 2, 3, 7, 14, 28, 56, 91, 182, 364];

/** Tick positions at UTC midnights, a whole number of days apart, at most `maxTicks` of them. */
export function dayTicks(min: number, max: number, maxTicks: number): number[] {
  if (!(max > min)) return [];
  const days = (max - min) / DAY_MS;
  const step = DAY_STEPS.find((s) => days / s <= maxTicks) ?? Math.ceil(days / maxTicks);
  const ticks: number[] = [];
  for (let t = Math.ceil(min / DAY_MS) * DAY_MS; t <= max; t += step * DAY_MS) ticks.push(t);
  return ticks;
}

/** Build-order ticks: every k-th build counted back from the newest, at most `maxTicks`. */
export function orderTicks(xs: readonly number[], maxTicks: number): number[] {
  const step = Math.max(1, Math.ceil(xs.length / maxTicks));
  return xs.filter((_, i) => (xs.length - 1 - i) % step === 0);
}
