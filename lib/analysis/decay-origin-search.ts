import { AnalysisError } from "./errors";
import { LineAccumulator } from "./linear-fit";

// The virtual origin is searched as t0 = tFirst - exp(s): every s gives a valid
// origin, and a uniform grid in s covers origin distances from e^-50 (1e-22) to
// e^30 (1e13) times the fitted time span evenly in ratio.
const S_BELOW = 50;
const S_ABOVE = 30;
const S_STEP = 1;
// Long series are searched on an evenly thinned copy (first and last sample
// kept); the full series then only enters the few Levenberg–Marquardt passes.
const SEARCH_SAMPLES = 2048;

/** ln(tFirst - t0) of the profile-SSE minimum: grid scan, then golden section. */
export function searchOrigin(t: ArrayLike<number>, logK: Float64Array, from: number, to: number): number {
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
export function profileFit(t: ArrayLike<number>, logK: Float64Array, from: number, to: number, logD0: number) {
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

