import { AnalysisError } from "./errors";
import { LineAccumulator } from "./linear-fit";
import { assertPositiveNumber } from "./validate";

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
  assertSameLength(yPlus, uPlus);
  assertPositiveNumber(window.yPlusMin, "window.yPlusMin");
  assertPositiveNumber(window.yPlusMax, "window.yPlusMax");
  if (!(window.yPlusMax > window.yPlusMin)) {
    throw new AnalysisError("window", `yPlusMax (${window.yPlusMax}) must exceed yPlusMin (${window.yPlusMin})`);
  }
  const acc = new LineAccumulator();
  const lo = window.yPlusMin;
  const hi = window.yPlusMax;
  // Validation is fused into the fitting pass: one loop over the data.
  for (let i = 0; i < yPlus.length; i++) {
    const y = yPlus[i];
    const u = uPlus[i];
    if (!Number.isFinite(y)) throw new AnalysisError("yPlus", `element ${i} is not a finite number (${String(y)})`);
    if (!Number.isFinite(u)) throw new AnalysisError("uPlus", `element ${i} is not a finite number (${String(u)})`);
    if (y < 0) throw new AnalysisError("yPlus", `element ${i} is negative (${y})`);
    if (y >= lo && y <= hi) acc.add(Math.log(y), u);
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

function assertSameLength(yPlus: ArrayLike<number>, uPlus: ArrayLike<number>): void {
  if (yPlus == null || typeof yPlus.length !== "number") throw new AnalysisError("yPlus", "must be an array of numbers");
  if (uPlus == null || typeof uPlus.length !== "number") throw new AnalysisError("uPlus", "must be an array of numbers");
  if (uPlus.length !== yPlus.length) {
    throw new AnalysisError("uPlus", `length ${uPlus.length} differs from yPlus length ${yPlus.length}`);
  }
  if (yPlus.length === 0) throw new AnalysisError("yPlus", "is empty");
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
  assertSameLength(yPlus, uPlus);
  const n = yPlus.length;
  if (n < 3) throw new AnalysisError("yPlus", `needs at least 3 samples, got ${n}`);
  let sorted = true;
  for (let i = 0; i < n; i++) {
    const y = yPlus[i];
    if (!Number.isFinite(uPlus[i])) throw new AnalysisError("uPlus", `element ${i} is not a finite number (${String(uPlus[i])})`);
    if (!(y > 0) || y === Infinity) throw new AnalysisError("yPlus", `element ${i} must be finite and > 0 (${String(y)})`);
    if (i > 0 && y < yPlus[i - 1]) sorted = false;
  }
  const ys = new Float64Array(n);
  const u = new Float64Array(n);
  if (sorted) {
    for (let i = 0; i < n; i++) {
      ys[i] = yPlus[i];
      u[i] = uPlus[i];
    }
  } else {
    const order = new Uint32Array(n);
    for (let i = 0; i < n; i++) order[i] = i;
    order.sort((a, b) => yPlus[a] - yPlus[b]);
    for (let i = 0; i < n; i++) {
      ys[i] = yPlus[order[i]];
      u[i] = uPlus[order[i]];
    }
  }
  const s = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    s[i] = Math.log(ys[i]);
    if (i > 0 && !(s[i] > s[i - 1])) throw new AnalysisError("yPlus", `contains a repeated value (${ys[i]})`);
  }
  const xi = new Float64Array(n);
  // Interior: central three-point formula on a non-uniform grid, h1 = s_i - s_(i-1),
  // h2 = s_(i+1) - s_i: f' = [-h2^2 f_(i-1) + (h2^2 - h1^2) f_i + h1^2 f_(i+1)] / [h1 h2 (h1 + h2)].
  for (let i = 1; i < n - 1; i++) {
    const h1 = s[i] - s[i - 1];
    const h2 = s[i + 1] - s[i];
    const a = h1 * h1;
    const b = h2 * h2;
    xi[i] = (-b * u[i - 1] + (b - a) * u[i] + a * u[i + 1]) / (h1 * h2 * (h1 + h2));
  }
  // Ends: derivative of the quadratic through the three end samples, taken at the end point.
  xi[0] = endDerivative(s[0], s[1], s[2], u[0], u[1], u[2]);
  xi[n - 1] = endDerivative(s[n - 1], s[n - 2], s[n - 3], u[n - 1], u[n - 2], u[n - 3]);
  return { yPlus: ys, xi };
}

/** Derivative at x0 of the quadratic through (x0,f0), (x1,f1), (x2,f2): exact for quadratics. */
function endDerivative(x0: number, x1: number, x2: number, f0: number, f1: number, f2: number): number {
  const d0 = 1 / (x0 - x1) + 1 / (x0 - x2);
  const d1 = (x0 - x2) / ((x1 - x0) * (x1 - x2));
  const d2 = (x0 - x1) / ((x2 - x0) * (x2 - x1));
  return f0 * d0 + f1 * d1 + f2 * d2;
}
