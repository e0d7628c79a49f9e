import { AnalysisError } from "./errors";
import { LineAccumulator } from "./linear-fit";
import { assertPairedSeries, assertPositiveNumber } from "./validate";

export interface LogLawWindow {
  yPlusMin: number;
  yPlusMax: number;
}

export interface LogLawFit {
  kappa: number;
  b: number;
  r2: number;
  /** Samples inside the window that entered the fit. */
  points: number;
  /** The window that was applied (inclusive bounds). */
  yPlusMin: number;
  yPlusMax: number;
}

/**
 * Ordinary least squares of u+ on ln y+ over the samples with
 * yPlusMin <= y+ <= yPlusMax: slope = 1/kappa, intercept = B. Samples need not be
 * sorted. Samples outside the window (including a wall point at y+ = 0) are
 * ignored, but a negative y+ is rejected as corrupt input. Note (sheet §1.4) that
 * composite laws such as Spalding's approach the log law slowly, so the fitted
 * constants depend on the window; compare against a band for that window.
 */
export function fitLogLaw(
  yPlus: ArrayLike<number>,
  uPlus: ArrayLike<number>,
  window: LogLawWindow,
): LogLawFit {
  assertPairedSeries(yPlus, uPlus, "yPlus", "uPlus");
  assertPositiveNumber(window.yPlusMin, "window.yPlusMin");
  assertPositiveNumber(window.yPlusMax, "window.yPlusMax");
  if (!(window.yPlusMax > window.yPlusMin)) {
    throw new AnalysisError("window", `yPlusMax (${window.yPlusMax}) must exceed yPlusMin (${window.yPlusMin})`);
  }
  const acc = new LineAccumulator();
  for (let i = 0; i < yPlus.length; i++) {
    const y = yPlus[i];
    if (y < 0) throw new AnalysisError("yPlus", `element ${i} is negative (${y})`);
    if (y >= window.yPlusMin && y <= window.yPlusMax) acc.add(Math.log(y), uPlus[i]);
  }
  if (acc.count < 3) {
    throw new AnalysisError(
      "window",
      `needs at least 3 samples in ${window.yPlusMin} <= y+ <= ${window.yPlusMax}, found ${acc.count}`,
    );
  }
  const line = acc.finish("yPlus");
  if (line.slope === 0) throw new AnalysisError("uPlus", "is flat in the window; kappa is undefined");
  return {
    kappa: 1 / line.slope,
    b: line.intercept,
    r2: line.r2,
    points: line.points,
    yPlusMin: window.yPlusMin,
    yPlusMax: window.yPlusMax,
  };
}

/**
 * Default fitting window. With Re_tau known: 30 <= y+ <= 0.15 Re_tau, the outer
 * limit used for the log region by Marusic et al. 2013 (sheet §1.1; y/delta < 0.15
 * keeps the wake out), provided that window still spans a factor of 1.5 above
 * y+ = 30. Otherwise — Re_tau unknown or so low that there is hardly a log layer
 * (0.15 Re_tau <= 45, i.e. Re_tau <= 300) — fall back to the conventional RANS
 * practice 30 <= y+ <= 300 (sheet §1.1, common practice).
 */
export function defaultLogLawWindow(reTau: number | null): LogLawWindow {
  if (reTau === null || reTau === undefined) return { yPlusMin: 30, yPlusMax: 300 };
  assertPositiveNumber(reTau, "reTau");
  const outer = 0.15 * reTau;
  return outer > 30 * 1.5 ? { yPlusMin: 30, yPlusMax: outer } : { yPlusMin: 30, yPlusMax: 300 };
}

/**
 * Indicator function Xi = y+ du+/dy+ = du+/d(ln y+), whose plateau is 1/kappa in a
 * log layer. Samples are sorted by y+ (which must be positive and distinct) and
 * differentiated in s = ln y+ with second-order three-point formulas for a
 * non-uniform grid (one-sided at the two ends).
 */
export function diagnosticFunction(
  yPlus: ArrayLike<number>,
  uPlus: ArrayLike<number>,
): { yPlus: Float64Array; xi: Float64Array } {
  assertPairedSeries(yPlus, uPlus, "yPlus", "uPlus");
  const n = yPlus.length;
  if (n < 3) throw new AnalysisError("yPlus", `needs at least 3 samples, got ${n}`);
  const order = new Uint32Array(n);
  let sorted = true;
  for (let i = 0; i < n; i++) {
    if (!(yPlus[i] > 0)) throw new AnalysisError("yPlus", `element ${i} must be > 0 (${yPlus[i]})`);
    order[i] = i;
    if (i > 0 && yPlus[i] < yPlus[i - 1]) sorted = false;
  }
  if (!sorted) order.sort((a, b) => yPlus[a] - yPlus[b]);
  const ys = new Float64Array(n);
  const s = new Float64Array(n);
  const u = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    ys[i] = yPlus[order[i]];
    s[i] = Math.log(ys[i]);
    u[i] = uPlus[order[i]];
    if (i > 0 && !(s[i] > s[i - 1])) {
      throw new AnalysisError("yPlus", `contains a repeated value (${ys[i]})`);
    }
  }
  const xi = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    // Stencil centre: the point itself inside, its neighbour at either end.
    const c = i === 0 ? 1 : i === n - 1 ? n - 2 : i;
    xi[i] = threePointDerivative(s[c - 1], s[c], s[c + 1], u[c - 1], u[c], u[c + 1], s[i]);
  }
  return { yPlus: ys, xi };
}

/** Derivative at x of the quadratic through (x0,f0), (x1,f1), (x2,f2): exact for quadratics. */
function threePointDerivative(
  x0: number, x1: number, x2: number, f0: number, f1: number, f2: number, x: number,
): number {
  const d0 = ((x - x1) + (x - x2)) / ((x0 - x1) * (x0 - x2));
  const d1 = ((x - x0) + (x - x2)) / ((x1 - x0) * (x1 - x2));
  const d2 = ((x - x0) + (x - x1)) / ((x2 - x0) * (x2 - x1));
  return f0 * d0 + f1 * d1 + f2 * d2;
}

