import { AnalysisError } from "./errors";
import { assertFiniteNumber, assertSeries } from "./validate";

// Quantities read off a wall skin-friction distribution c_f(x): the value at a
// monitoring station (e.g. TMR flat plate x = 0.97, sheet §7.2) and the
// reattachment point of a separated flow (backward-facing step, sheet §7.1,
// where the experiment defines x_r as the zero-c_f location).

/**
 * c_f at xStation by linear interpolation between the two bracketing samples
 * (exact at a sample). x must be strictly increasing; a station outside
 * [x_first, x_last] is an error because extrapolating c_f is not a measurement.
 */
export function cfAtX(x: ArrayLike<number>, cf: ArrayLike<number>, xStation: number): number {
  assertSeries(x, cf, "x", "cf", { increasing: true });
  assertFiniteNumber(xStation, "xStation");
  const n = x.length;
  if (xStation < x[0] || xStation > x[n - 1]) {
    throw new AnalysisError("xStation", `${xStation} lies outside the series range [${x[0]}, ${x[n - 1]}]`);
  }
  // Binary search for the last sample with x <= xStation.
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (x[mid] <= xStation) lo = mid;
    else hi = mid;
  }
  if (x[lo] === xStation) return cf[lo];
  if (x[hi] === xStation) return cf[hi];
  const w = (xStation - x[lo]) / (x[hi] - x[lo]);
  return cf[lo] + w * (cf[hi] - cf[lo]);
}

/**
 * Reattachment: every place where c_f changes from negative (reversed flow) to
 * positive (attached) going downstream, located by linear interpolation between
 * the last negative sample and the next sample. Exact zeros: when the next
 * sample is exactly 0, the crossing is at that sample; a run of zeros counts as
 * a crossing only if the flow then turns positive (c_f touching 0 and going
 * negative again is not a reattachment, nor are zeros running to the end).
 * xr is the downstream-most crossing — the primary bubble's reattachment when a
 * secondary corner bubble sits near the step; null when there is none.
 */
export function findReattachment(
  x: ArrayLike<number>,
  cf: ArrayLike<number>,
): { xr: number | null; crossings: number[] } {
  assertSeries(x, cf, "x", "cf", { increasing: true });
  const crossings: number[] = [];
  const n = x.length;
  let i = 0;
  while (i < n - 1) {
    if (!(cf[i] < 0)) {
      i++;
      continue;
    }
    const j = i + 1;
    if (cf[j] < 0) {
      i = j;
      continue;
    }
    // cf[i] < 0 <= cf[j]: find the first non-zero sample at or after j.
    let k = j;
    while (k < n && cf[k] === 0) k++;
    if (k < n && cf[k] > 0) {
      const xr = cf[j] === 0 ? x[j] : x[i] + ((0 - cf[i]) * (x[j] - x[i])) / (cf[j] - cf[i]);
      crossings.push(xr);
    }
    i = k;
  }
  return { xr: crossings.length > 0 ? crossings[crossings.length - 1] : null, crossings };
}
