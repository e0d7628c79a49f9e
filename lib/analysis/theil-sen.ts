import { AnalysisError } from "./errors";
import { assertSeries } from "./validate";

/**
 * Theil–Sen line (Theil 1950; Sen 1968): slope = median of the pairwise slopes
 * (y_j - y_i)/(x_j - x_i) over pairs with x_i != x_j; intercept = median of
 * y - slope x. Robust to outliers; O(n^2) memory, meant for short build windows.
 */
export function theilSen(x: ArrayLike<number>, y: ArrayLike<number>): { slope: number; intercept: number } {
  assertSeries(x, y, "x", "y");
  const n = x.length;
  const slopes = new Float64Array((n * (n - 1)) / 2);
  let count = 0;
  for (let i = 0; i < n - 1; i++) {
    for (let j = i + 1; j < n; j++) {
      if (x[j] !== x[i]) slopes[count++] = (y[j] - y[i]) / (x[j] - x[i]);
    }
  }
  if (count === 0) throw new AnalysisError("x", "needs at least two distinct x values");
  const slope = median(slopes.subarray(0, count));
  const cuts = new Float64Array(n);
  for (let i = 0; i < n; i++) cuts[i] = y[i] - slope * x[i];
  return { slope, intercept: median(cuts) };
}

/** Median of a non-empty array (sorts it in place). */
function median(v: Float64Array): number {
  v.sort();
  const m = v.length >> 1;
  return v.length % 2 === 1 ? v[m] : 0.5 * (v[m - 1] + v[m]);
}
