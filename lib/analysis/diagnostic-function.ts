import { AnalysisError } from "./errors";
import { assertSameLength } from "./validate";

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
  assertSameLength(yPlus, uPlus, "yPlus", "uPlus");
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
