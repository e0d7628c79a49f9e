import { AnalysisError } from "./errors";
import { decaySse, refineDecayFit } from "./decay-refine";
import { LineAccumulator } from "./linear-fit";
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

// The virtual origin is searched as t0 = tFirst - exp(s): every s gives a valid
// origin, and a uniform grid in s covers origin distances from e^-50 (1e-22) to
// e^30 (1e13) times the fitted time span evenly in ratio.
const S_BELOW = 50;
const S_ABOVE = 30;
const S_STEP = 1;
// Long series are searched on an evenly thinned copy (first and last sample
// kept); the full series then only enters the few Levenberg–Marquardt passes.
const SEARCH_SAMPLES = 2048;

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

/** ln(tFirst - t0) of the profile-SSE minimum: grid scan, then golden section. */
function searchOrigin(t: ArrayLike<number>, logK: Float64Array, from: number, to: number): number {
  let ts: ArrayLike<number> = t;
  let ls = logK;
  let a = from;
  let b = to;
  if (to - from > SEARCH_SAMPLES) {
    const tThin = new Float64Array(SEARCH_SAMPLES);
    const lThin = new Float64Array(SEARCH_SAMPLES);
    const stride = (to - 1 - from) / (SEARCH_SAMPLES - 1);
    for (let j = 0; j < SEARCH_SAMPLES; j++) {
      const i = from + Math.round(j * stride);
      tThin[j] = t[i];
      lThin[j] = logK[i];
    }
    ts = tThin;
    ls = lThin;
    a = 0;
    b = SEARCH_SAMPLES;
  }
  const profile = (s: number): number => profileFit(ts, ls, a, b, s).sse;
  const sStart = Math.log(ts[b - 1] - ts[a]) - S_BELOW;
  const cells = Math.round((S_BELOW + S_ABOVE) / S_STEP);
  let best = 0;
  let bestSse = Infinity;
  for (let j = 0; j <= cells; j++) {
    const sse = profile(sStart + j * S_STEP);
    if (sse < bestSse) {
      bestSse = sse;
      best = j;
    }
  }
  if (best === 0 || best === cells) {
    throw new AnalysisError("k", "no virtual origin fits: the decay is not a power law in (t - t0)");
  }
  const sLo = sStart + (best - 1) * S_STEP;
  return goldenMinimum(profile, sLo, sLo + 2 * S_STEP);
}

/**
 * Linear fit of ln k on x = log1p((t - tFirst)/d0) for d0 = exp(logD0), with the
 * SSE summed from explicit residuals: the shortcut Syy - Sxy^2/Sxx cancels to
 * noise for near-perfect fits and would make every origin look equally good.
 */
function profileFit(t: ArrayLike<number>, logK: Float64Array, from: number, to: number, logD0: number) {
  const d0 = Math.exp(logD0);
  const tFirst = t[from];
  const acc = new LineAccumulator();
  for (let i = from; i < to; i++) acc.add(Math.log1p((t[i] - tFirst) / d0), logK[i]);
  const line = acc.finish("t");
  let sse = 0;
  for (let i = from; i < to; i++) {
    const r = logK[i] - line.intercept - line.slope * Math.log1p((t[i] - tFirst) / d0);
    sse += r * r;
  }
  return { slope: line.slope, intercept: line.intercept, sse };
}

/** Golden-section search for the minimum of f on [lo, hi]. */
function goldenMinimum(f: (s: number) => number, lo: number, hi: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let a = lo;
  let b = hi;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let iter = 0; iter < 200 && b - a > 1e-7; iter++) {
    if (f1 <= f2) {
      b = x2; x2 = x1; f2 = f1;
      x1 = b - g * (b - a); f1 = f(x1);
    } else {
      a = x1; x1 = x2; f1 = f2;
      x2 = a + g * (b - a); f2 = f(x2);
    }
  }
  return f1 <= f2 ? x1 : x2;
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
