import { AnalysisError } from "./errors";
import { decaySse, refineDecayFit } from "./decay-refine";
import { profileFit, searchOrigin } from "./decay-origin-search";
import { assertFiniteNumber, assertSeries } from "./validate";

export interface DecayFit {
  /** Decay exponent in k = A (t - t0)^-n. */
  n: number;
  /** Virtual origin, always below the first fitted time. */
  t0: number;
  /** Prefactor A. */
  a: number;
  /** Coefficient of determination of ln k against ln(t - t0). */
  r2: number;
  points: number;
}

/**
 * Fits k = A (t - t0)^-n with the virtual origin t0 found by the fit, so data may
 * start at t = 0. A fit of ln k on ln t without an origin is biased (sheet §2.2:
 * 1.049 instead of 1.087 on [10, 100]). Method: profile least squares — for a
 * fixed t0 the best (ln A, n) is a linear fit of ln k on ln(t - t0); the SSE is
 * scanned on a wide grid of s, the best cell is narrowed by golden-section
 * search, and the three parameters are then polished by Levenberg–Marquardt.
 * An optimum at the edge of the scan means the data have no power-law origin
 * (e.g. exponential decay) and is reported as an error, not as a number.
 */
export function fitDecayExponent(
  t: ArrayLike<number>,
  k: ArrayLike<number>,
  opts: { tMin?: number; tMax?: number } = {},
): DecayFit {
  assertSeries(t, k, "t", "k", { increasing: true });
  for (let i = 0; i < k.length; i++) {
    if (!(k[i] > 0)) throw new AnalysisError("k", `element ${i} must be > 0 (${k[i]})`);
  }
  const tMin = opts.tMin ?? -Infinity;
  const tMax = opts.tMax ?? Infinity;
  if (opts.tMin !== undefined) assertFiniteNumber(opts.tMin, "tMin");
  if (opts.tMax !== undefined) assertFiniteNumber(opts.tMax, "tMax");
  let from = 0;
  while (from < t.length && t[from] < tMin) from++;
  let to = t.length;
  while (to > from && t[to - 1] > tMax) to--;
  const points = to - from;
  if (points < 4) {
    throw new AnalysisError("t", `needs at least 4 samples in the fitted range, found ${points}`);
  }
  // ln k once: every origin tried below reuses it.
  const logK = new Float64Array(t.length);
  for (let i = from; i < to; i++) logK[i] = Math.log(k[i]);
  const s = searchOrigin(t, logK, from, to);
  const line = profileFit(t, logK, from, to, s);
  const tFirst = t[from];
  const p = refineDecayFit(t, logK, from, to, { c: line.intercept, n: -line.slope, logD0: s });
  const sse = decaySse(t, logK, from, to, p);
  // Back from (c', ln d0) to k = A (t - t0)^-n: ln A = c' + n ln d0.
  const t0 = tFirst - Math.exp(p.logD0);
  return { n: p.n, t0, a: Math.exp(p.c + p.n * p.logD0), r2: rSquaredOfLog(logK, from, to, sse), points };
}

function rSquaredOfLog(logK: Float64Array, from: number, to: number, sse: number): number {
  let mean = 0;
  for (let i = from; i < to; i++) mean += logK[i];
  mean /= to - from;
  let sst = 0;
  for (let i = from; i < to; i++) {
    const d = logK[i] - mean;
    sst += d * d;
  }
  return sst === 0 ? 1 : 1 - sse / sst;
}
