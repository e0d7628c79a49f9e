import { linearExtent, logExtent } from "@/components/charts/axis-ticks";
import type { NoteLine, XY } from "@/components/charts/plot-types";
import { formatSig } from "@/lib/format/numbers";
import { formatLimits } from "./note-format";
import { readNumber, whyMissing, type QuantityView } from "./run-data";

// The residual history on a log axis with what the stall rule of
// lib/analysis/residuals.ts looked at: the tail (last 20 % of the iteration
// span, at least 5 samples) and the least-squares trend of log10(residual)
// there. Those constants mirror that file so the shaded tail is the one judged.

const TAIL_FRACTION = 0.2;
const TAIL_MIN_SAMPLES = 5;

export interface ResidualPlot {
  xRange: [number, number];
  yRange: [number, number];
  data: XY[];
  /** First index of the tail and the trend drawn over it. */
  tail: { from: number; to: number; trend: XY[] } | null;
  /** The level `target` orders of magnitude below the first residual. */
  target: { orders: number; level: number } | null;
  notes: NoteLine[];
}

/** Index of the first tail sample, as in residualDropOrders. */
export function tailStartIndex(iterations: number[]): number {
  const n = iterations.length;
  const last = iterations[n - 1];
  const tailStart = last - TAIL_FRACTION * (last - iterations[0]);
  let first = n - 1;
  while (first > 0 && iterations[first - 1] >= tailStart) first--;
  return Math.min(first, Math.max(0, n - TAIL_MIN_SAMPLES));
}

/** Least-squares line of log10(r) on iteration over samples from..n-1, as points at both ends. */
export function tailTrend(iterations: number[], residuals: number[], from: number): XY[] {
  const n = iterations.length;
  if (n - from < 2) return [];
  let sx = 0, sy = 0, sxx = 0, sxy = 0;
  const m = n - from;
  for (let i = from; i < n; i++) {
    const y = Math.log10(residuals[i]);
    sx += iterations[i];
    sy += y;
    sxx += iterations[i] * iterations[i];
    sxy += iterations[i] * y;
  }
  const den = m * sxx - sx * sx;
  if (den === 0) return [];
  const slope = (m * sxy - sx * sy) / den;
  const intercept = (sy - slope * sx) / m;
  return [iterations[from], iterations[n - 1]].map((x) => ({ x, y: 10 ** (intercept + slope * x) }));
}

export function buildResidualPlot(iterations: number[], residuals: number[], q: QuantityView | null, targetOrders: number | null): ResidualPlot {
  const pairs = iterations.map((x, i) => ({ x, y: residuals[i] })).filter((p) => Number.isFinite(p.x) && p.y > 0 && Number.isFinite(p.y));
  const xs = pairs.map((p) => p.x);
  const ys = pairs.map((p) => p.y);
  const from = pairs.length >= 2 ? tailStartIndex(xs) : -1;
  const tail = from >= 0 ? { from, to: pairs.length - 1, trend: tailTrend(xs, ys, from) } : null;
  const target = targetOrders !== null && pairs.length > 0 ? { orders: targetOrders, level: ys[0] * 10 ** -targetOrders } : null;
  // One decade of headroom above the history keeps the notes off the data.
  const [yLo, yHi] = logExtent([...ys, ...(target ? [target.level] : [])]);
  const yRange: [number, number] = [yLo, yHi * 10];
  const [x0, x1] = linearExtent(xs, 0.01);
  return { xRange: [Math.max(x0, Math.min(0, xs[0] ?? 0)), x1], yRange, data: pairs, tail, target, notes: residualNotes(q, targetOrders, pairs.length) };
}

function residualNotes(q: QuantityView | null, targetOrders: number | null, samples: number): NoteLine[] {
  const notes: NoteLine[] = [];
  const failure = whyMissing(q);
  if (failure) return [{ text: `residual drop not derived: ${failure}`, tone: "bad" }];
  const drop = q?.value ?? null;
  const target = targetOrders !== null ? `, target ≥ ${formatSig(targetOrders, 3)}` : "";
  if (drop !== null) {
    notes.push(
      drop < 0
        ? { text: `residual ROSE by ${formatSig(-drop, 3)} orders of magnitude (${q?.verdict})`, tone: "bad" }
        : { text: `drop ${formatSig(drop, 3)} orders of magnitude (${q?.verdict})${target}`, tone: "strong" },
    );
  }
  const tailDrop = readNumber(q?.details, "tailDropOrders");
  if (tailDrop !== null) {
    const trend = tailDrop < 0 ? `rises ${formatSig(-tailDrop, 3)}` : `falls ${formatSig(tailDrop, 3)}`;
    notes.push({ text: `tail (last 20 % of iterations) ${trend} orders` });
  }
  if (q?.details.stalled === true) {
    notes.push({ text: tailDrop !== null && tailDrop < 0 ? "STALLED: the residual rises over the tail" : "STALLED: tail falls < 0.1 orders, target not reached", tone: "bad" });
  }
  if (drop !== null && drop < 0 && targetOrders !== null) notes.push({ text: `target ≥ ${formatSig(targetOrders, 3)} orders`, tone: "faint" });
  notes.push({ text: `${samples} samples; band: ${formatLimitsOf(q)}`, tone: "faint" });
  return notes;
}

function formatLimitsOf(q: QuantityView | null): string {
  return q && (q.lower !== null || q.upper !== null) ? `${formatLimits(q.lower, q.upper, 3)} orders` : "none";
}
