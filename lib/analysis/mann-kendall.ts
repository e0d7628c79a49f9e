import { AnalysisError } from "./errors";
import { normalCdf } from "./normal-distribution";
import { assertFiniteArray } from "./validate";

export interface MannKendallResult {
  n: number;
  /** S = sum over i < j of sign(x_j - x_i). */
  s: number;
  /** Variance of S under H0, tie-corrected. */
  varS: number;
  /** Continuity-corrected normal score. */
  z: number;
  /** Two-sided p-value from the normal approximation. */
  pValue: number;
  /** Kendall's tau-a = S/(n(n-1)/2). */
  tau: number;
  trend: "increasing" | "decreasing" | "none";
}

/**
 * Mann–Kendall trend test (Mann 1945; Kendall 1975; as in Gilbert 1987 ch. 16):
 *   var(S) = [n(n-1)(2n+5) - sum_g t_g(t_g-1)(2t_g+5)]/18  (t_g = size of tie group g),
 *   z = (S - 1)/sqrt(var S) for S > 0, (S + 1)/sqrt(var S) for S < 0, 0 for S = 0,
 *   p = 2 (1 - Phi(|z|)). A trend is reported when p < alpha.
 * Values are in chronological order. O(n^2), meant for short build windows.
 */
export function mannKendall(values: ArrayLike<number>, alpha = 0.05): MannKendallResult {
  assertFiniteArray(values, "values");
  if (!(alpha > 0 && alpha < 1)) throw new AnalysisError("alpha", `must be in (0, 1), got ${alpha}`);
  const n = values.length;
  if (n < 3) throw new AnalysisError("values", `needs at least 3 values, got ${n}`);
  let s = 0;
  for (let i = 0; i < n - 1; i++) {
    for (let j = i + 1; j < n; j++) s += Math.sign(values[j] - values[i]);
  }
  const varS = (n * (n - 1) * (2 * n + 5) - tieCorrection(values)) / 18;
  let z = 0;
  if (varS > 0) {
    if (s > 0) z = (s - 1) / Math.sqrt(varS);
    else if (s < 0) z = (s + 1) / Math.sqrt(varS);
  }
  // 2 (1 - Phi(|z|)) = 2 Phi(-|z|): the second form keeps precision for large |z|.
  const pValue = Math.min(1, 2 * normalCdf(-Math.abs(z)));
  const tau = s / ((n * (n - 1)) / 2);
  const trend = pValue < alpha ? (z > 0 ? "increasing" : "decreasing") : "none";
  return { n, s, varS, z, pValue, tau, trend };
}

/** sum over tie groups of t(t-1)(2t+5). */
function tieCorrection(values: ArrayLike<number>): number {
  const sorted = Float64Array.from(values).sort();
  let sum = 0;
  let run = 1;
  for (let i = 1; i <= sorted.length; i++) {
    if (i < sorted.length && sorted[i] === sorted[i - 1]) {
      run++;
      continue;
    }
    if (run > 1) sum += run * (run - 1) * (2 * run + 5);
    run = 1;
  }
  return sum;
}
