import { logExtent } from "@/components/charts/axis-ticks";
import type { NoteLine, XY } from "@/components/charts/plot-types";
import { logSpace, sampleCurve } from "@/components/charts/sampling";
import { formatSig } from "@/lib/format/numbers";
import { describeBand, formatR2, valueWithVerdict } from "./note-format";
import { readNumber, whyMissing, type QuantityView } from "./run-data";

// The decay plot: k against (t − t0) on log–log axes, where k = A (t − t0)^−n
// is a straight line of slope −n. Without the fitted virtual origin t0 the data
// bend on such a plot (reference sheet §2.2), so it is only used when the fit
// succeeded; otherwise k is drawn against t and the failure is written on it.

export interface AnalyticExponent {
  /** Formula and coefficient values, e.g. "1/(C_ε2 − 1) with C_ε2 = 1.92". */
  formula: string;
  n: number;
}

/**
 * The exponent a closure's own equations give for free decay, from the
 * coefficients this run reported (reference sheet §2.2–2.3):
 * ε-equation models n = 1/(C_ε2 − 1); Wilcox k–ω n = β* over β0; SST (outer
 * set, F1 = 0 away from walls) n = β* over β2. Null when the needed coefficients
 * are absent.
 */
export function analyticDecayExponent(coefficients: { name: string; value: number }[]): AnalyticExponent | null {
  const c = (name: string) => coefficients.find((k) => k.name === name)?.value ?? null;
  const cEps2 = c("C_eps2");
  if (cEps2 !== null && cEps2 > 1) return { formula: `1/(C_ε2 − 1) with C_ε2 = ${formatSig(cEps2, 5)}`, n: 1 / (cEps2 - 1) };
  const betaStar = c("beta_star");
  const beta0 = c("beta_0");
  if (betaStar !== null && beta0 !== null && beta0 > 0) return { formula: `β*/β₀ with β* = ${formatSig(betaStar, 4)}, β₀ = ${formatSig(beta0, 4)}`, n: betaStar / beta0 };
  const beta2 = c("beta_2");
  if (betaStar !== null && beta2 !== null && beta2 > 0) return { formula: `β*/β₂ (outer set) with β* = ${formatSig(betaStar, 4)}, β₂ = ${formatSig(beta2, 4)}`, n: betaStar / beta2 };
  return null;
}

export interface DecayPlot {
  /** True when x is t − t0 (fit succeeded), false when it is plain t. */
  shifted: boolean;
  xRange: [number, number];
  yRange: [number, number];
  data: XY[];
  hidden: number;
  fitted: XY[];
  reference: { n: number; points: XY[] } | null;
  notes: NoteLine[];
}

export function buildDecayPlot(t: number[], k: number[], q: QuantityView | null, analytic: AnalyticExponent | null): DecayPlot {
  const n = q?.value ?? null;
  const t0 = readNumber(q?.details, "t0");
  const a = readNumber(q?.details, "a");
  const shifted = n !== null && t0 !== null && a !== null;
  const shift = shifted ? t0 : 0;
  const data: XY[] = [];
  let hidden = 0;
  t.forEach((ti, i) => {
    const x = ti - shift;
    if (x > 0 && k[i] > 0 && Number.isFinite(x) && Number.isFinite(k[i])) data.push({ x, y: k[i] });
    else hidden += 1;
  });
  const xRange = logExtent(data.map((p) => p.x));
  const yRange = logExtent(data.map((p) => p.y));
  const sFrom = Math.min(...data.map((p) => p.x));
  const sTo = Math.max(...data.map((p) => p.x));
  const fitted = shifted && data.length > 1 ? sampleCurve(logSpace(sFrom, sTo, 50), (s) => a * s ** -n) : [];
  // The band's reference slope, drawn through the fitted line at mid-range so
  // that only the slopes are compared.
  const nRef = q?.reference ?? null;
  let reference: DecayPlot["reference"] = null;
  if (shifted && nRef !== null && data.length > 1) {
    const sMid = Math.sqrt(sFrom * sTo);
    const aRef = a * sMid ** (nRef - n);
    reference = { n: nRef, points: sampleCurve(logSpace(sFrom, sTo, 50), (s) => aRef * s ** -nRef) };
  }
  return { shifted, xRange, yRange, data, hidden, fitted, reference, notes: decayNotes(q, analytic, hidden, shifted) };
}

function decayNotes(q: QuantityView | null, analytic: AnalyticExponent | null, hidden: number, shifted: boolean): NoteLine[] {
  const notes: NoteLine[] = [];
  const failure = whyMissing(q);
  if (failure || !shifted) {
    notes.push({ text: `decay fit failed: ${failure ?? "no fit details stored"}`, tone: "bad" });
    notes.push({ text: "k is drawn against t (no virtual origin)", tone: "faint" });
  } else {
    notes.push({ text: "fit k = A (t − t₀)⁻ⁿ with virtual origin t₀", tone: "faint" });
    notes.push({ text: `n = ${valueWithVerdict(q, 6)}`, tone: "strong" });
    notes.push({ text: `t₀ = ${formatSig(readNumber(q?.details, "t0"), 4)}   A = ${formatSig(readNumber(q?.details, "a"), 4)}   r² = ${formatR2(readNumber(q?.details, "r2"))}` });
  }
  const band = describeBand(q, 5);
  if (band) notes.push({ text: `n ${band}` });
  if (analytic) {
    const off = q?.value !== null && q?.value !== undefined ? ` (fit ${formatPct(q.value, analytic.n)})` : "";
    notes.push({ text: `closure's own n = ${analytic.formula} → ${formatSig(analytic.n, 5)}${off}`, tone: "faint" });
  }
  if (hidden > 0) notes.push({ text: `${hidden} sample${hidden > 1 ? "s" : ""} not shown (${shifted ? "t − t₀" : "t"} ≤ 0 or k ≤ 0 on log axes)`, tone: "faint" });
  return notes;
}

function formatPct(value: number, reference: number): string {
  const pct = (100 * (value - reference)) / Math.abs(reference);
  if (Math.abs(pct) < 0.005) return "agrees to < 0.005 %";
  return `${pct > 0 ? "+" : "−"}${formatSig(Math.abs(pct), 2)} %`;
}
