import { AnalysisError } from "./errors";
import { LineAccumulator } from "./linear-fit";
import { assertPositiveNumber, assertSameLength } from "./validate";

const WINDOW_ROUND_OFF = 1e-9;

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
 * yPlusMin <= y+ <= yPlusMax (inclusive, to a relative 1e-9 for round-off):
 * slope = 1/kappa, intercept = B. Samples need not be
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
  assertSameLength(yPlus, uPlus, "yPlus", "uPlus");
  assertPositiveNumber(window.yPlusMin, "window.yPlusMin");
  assertPositiveNumber(window.yPlusMax, "window.yPlusMax");
  if (!(window.yPlusMax > window.yPlusMin)) {
    throw new AnalysisError("window", `yPlusMax (${window.yPlusMax}) must exceed yPlusMin (${window.yPlusMin})`);
  }
  const acc = new LineAccumulator();
  // Inclusive bounds, widened by round-off: a grid generated as exp(ln a + i h)
  // lands a few ulps off its end points, and dropping an end sample shifts the
  // fitted kappa by ~1e-4 (sheet §1.4 windows), far more than the grid noise.
  const lo = window.yPlusMin * (1 - WINDOW_ROUND_OFF);
  const hi = window.yPlusMax * (1 + WINDOW_ROUND_OFF);
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
