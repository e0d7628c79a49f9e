import { linearExtent, logExtent } from "@/components/charts/axis-ticks";
import type { NoteLine, XY } from "@/components/charts/plot-types";
import { logSpace, sampleCurve } from "@/components/charts/sampling";
import { AnalysisError, diagnosticFunction, logLawUPlus, spaldingUPlus } from "@/lib/analysis";
import { formatSig } from "@/lib/format/numbers";
import { describeBand, formatR2, valueWithVerdict } from "./note-format";
import { readNumber, readWindow, whyMissing, type QuantityView } from "./run-data";

// Curves of the law-of-the-wall plot (u+ against y+) and of the diagnostic
// function Ξ = y+ du+/dy+, built from the run's u_plus series and the kappa,
// log_b and log_fit_r2 quantities derived from it.

/** Spalding's composite law is drawn with Coles & Hirst's constants (reference sheet §1.2–1.3). */
export const SPALDING = { kappa: 0.41, b: 5.0 } as const;
/** u+ = y+ is drawn up to here, where it meets the log law (0.41, 5.0) at y+ ≈ 11. */
export const SUBLAYER_TOP = 12;

export interface WallLawInput {
  yPlus: number[];
  uPlus: number[];
  kappa: QuantityView | null;
  logB: QuantityView | null;
  r2: QuantityView | null;
  /** The case's log-law window, used when the fit stored none (e.g. it failed). */
  caseWindow: { yPlusMin: number; yPlusMax: number } | null;
}

export interface LogLine {
  kappa: number;
  b: number;
  points: XY[];
}

export interface WallLawPlot {
  xRange: [number, number];
  yRange: [number, number];
  data: XY[];
  /** Samples at y+ <= 0, which a log axis cannot show. */
  hiddenAtWall: number;
  window: { yPlusMin: number; yPlusMax: number } | null;
  fitted: LogLine | null;
  reference: LogLine | null;
  spalding: XY[];
  sublayer: XY[];
  notes: NoteLine[];
}

export function buildWallLawPlot(input: WallLawInput): WallLawPlot {
  const data: XY[] = [];
  let hiddenAtWall = 0;
  input.yPlus.forEach((x, i) => {
    const y = input.uPlus[i];
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    if (x > 0) data.push({ x, y });
    else hiddenAtWall += 1;
  });
  const window = readWindow(input.kappa?.details) ?? input.caseWindow;
  // The window is always in view: a fit that failed for want of samples in it
  // shows the gap between the profile and the window.
  const xRange = logExtent([...data.map((p) => p.x), ...(window ? [window.yPlusMin, window.yPlusMax] : [])]);

  const kFit = input.kappa?.value ?? null;
  const bFit = input.logB?.value ?? null;
  const fitted = kFit !== null && bFit !== null && kFit > 0 && window
    ? { kappa: kFit, b: bFit, points: sampleCurve(logSpace(window.yPlusMin, window.yPlusMax, 40), (y) => logLawUPlus(y, kFit, bFit)) }
    : null;

  const kRef = input.kappa?.reference ?? null;
  const bRef = input.logB?.reference ?? null;
  // The reference log law is drawn over the log region and beyond (y+ >= 10):
  // where data and line part is part of the picture.
  const refFrom = Math.max(xRange[0], 10);
  const reference = kRef !== null && bRef !== null && kRef > 0 && refFrom < xRange[1]
    ? { kappa: kRef, b: bRef, points: sampleCurve(logSpace(refFrom, xRange[1], 60), (y) => logLawUPlus(y, kRef, bRef)) }
    : null;

  const spalding = sampleCurve(logSpace(xRange[0], xRange[1], 160), (y) => spaldingUPlus(y, SPALDING.kappa, SPALDING.b));
  const sublayer = xRange[0] < SUBLAYER_TOP ? sampleCurve(logSpace(xRange[0], SUBLAYER_TOP, 30), (y) => y) : [];
  const uMax = Math.max(...data.map((p) => p.y), 1);
  // Headroom above the profile keeps the top-left corner (small y+, large u+,
  // never reached by a wall profile) free for the notes.
  const yRange: [number, number] = [Math.min(0, linearExtent(data.map((p) => p.y))[0]), uMax * 1.25];

  return { xRange, yRange, data, hiddenAtWall, window, fitted, reference, spalding, sublayer, notes: wallLawNotes(input, window, hiddenAtWall) };
}

function wallLawNotes(input: WallLawInput, window: WallLawPlot["window"], hiddenAtWall: number): NoteLine[] {
  const notes: NoteLine[] = [];
  const points = readNumber(input.kappa?.details, "points");
  const r2 = input.r2?.value ?? readNumber(input.kappa?.details, "r2");
  const failure = whyMissing(input.kappa);
  if (window) {
    const count = points !== null ? ` (${points} points)` : "";
    const fit = failure ? "" : `, r² = ${formatR2(r2)}${input.r2 ? ` (${input.r2.verdict})` : ""}`;
    notes.push({ text: `fit over ${formatSig(window.yPlusMin, 3)} ≤ y⁺ ≤ ${formatSig(window.yPlusMax, 3)}${count}${fit}`, tone: "faint" });
  }
  if (failure) notes.push({ text: `log-law fit failed: ${failure}`, tone: "bad" });
  else notes.push({ text: `κ = ${valueWithVerdict(input.kappa)}   B = ${valueWithVerdict(input.logB)}`, tone: "strong" });
  const kBand = describeBand(input.kappa, 3);
  const bBand = describeBand(input.logB, 3);
  if (kBand) notes.push({ text: `κ ${kBand}`, tone: "faint" });
  if (bBand) notes.push({ text: `B ${bBand}`, tone: "faint" });
  if (hiddenAtWall > 0) notes.push({ text: `${hiddenAtWall} sample${hiddenAtWall > 1 ? "s" : ""} at y⁺ = 0 not shown (log axis)`, tone: "faint" });
  return notes;
}

/** Ξ of Spalding's law in closed form: y+ / (dy+/du+), with dy+/du+ from reference sheet §1.3. */
export function spaldingDiagnostic(yPlus: number, kappa: number = SPALDING.kappa, b: number = SPALDING.b): number {
  const u = spaldingUPlus(yPlus, kappa, b);
  const ku = kappa * u;
  const dYdU = 1 + kappa * Math.exp(-kappa * b) * (Math.expm1(ku) - ku - (ku * ku) / 2);
  return yPlus / dYdU;
}

export interface DiagnosticPlot {
  xRange: [number, number];
  yRange: [number, number];
  data: XY[];
  spalding: XY[];
  error: string | null;
}

/** Ξ of the posted profile (lib/analysis diagnosticFunction), with Spalding's Ξ beside it. */
export function buildDiagnosticPlot(yPlus: number[], uPlus: number[], plateaus: number[]): DiagnosticPlot {
  const pairs = yPlus.map((x, i) => ({ x, y: uPlus[i] })).filter((p) => p.x > 0 && Number.isFinite(p.x) && Number.isFinite(p.y));
  pairs.sort((a, b) => a.x - b.x);
  const unique = pairs.filter((p, i) => i === 0 || p.x > pairs[i - 1].x);
  const xRange = logExtent(unique.map((p) => p.x));
  let data: XY[] = [];
  let error: string | null = null;
  try {
    const xi = diagnosticFunction(unique.map((p) => p.x), unique.map((p) => p.y));
    data = Array.from(xi.yPlus, (x, i) => ({ x, y: xi.xi[i] }));
  } catch (e) {
    if (!(e instanceof AnalysisError)) throw e;
    error = e.message;
  }
  const plateau = Math.max(...plateaus.filter((p) => Number.isFinite(p) && p > 0), 2.5);
  const peak = Math.max(0, ...data.map((p) => p.y));
  const top = Math.max(1.35 * plateau, Math.min(peak, 2.6 * plateau)) * 1.06;
  const spalding = sampleCurve(logSpace(xRange[0], xRange[1], 160), (y) => spaldingDiagnostic(y));
  return { xRange, yRange: [0, top], data, spalding, error };
}
