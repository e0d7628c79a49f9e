import { solve3 } from "./small-linear-solve";

// Model of the decay fit and its Levenberg–Marquardt polish.
//
// With d0 = tFirst - t0 > 0 (distance of the virtual origin below the first
// fitted time) the model ln k = c - n ln(t - t0) is written as
//   ln k = c' - n x,   x = ln((t - t0)/d0) = log1p((t - tFirst)/d0),
// which is exact in floating point even when d0 is 10^9 times the time span
// (ln(t - t0) itself would lose the spread of x to cancellation there).
// Parameters are (c', n, l = ln d0): all of order one, so the Marquardt steps are
// well scaled. The profile search pins l only to about sqrt(machine epsilon); a
// few Gauss–Newton steps take n to round-off for exact power-law data.

export interface DecayParams {
  c: number;
  n: number;
  logD0: number;
}

/** Sum of squared residuals of ln k (given as logK) over samples [from, to). */
export function decaySse(
  t: ArrayLike<number>, logK: Float64Array, from: number, to: number, p: DecayParams,
): number {
  const d0 = Math.exp(p.logD0);
  const tFirst = t[from];
  let sse = 0;
  for (let i = from; i < to; i++) {
    const r = logK[i] - p.c + p.n * Math.log1p((t[i] - tFirst) / d0);
    sse += r * r;
  }
  return sse;
}

export function refineDecayFit(
  t: ArrayLike<number>, logK: Float64Array, from: number, to: number, start: DecayParams,
): DecayParams {
  const tFirst = t[from];
  const jtj = new Float64Array(9);
  const jtr = new Float64Array(3);
  const lhs = new Float64Array(9);
  let p = start;
  let sse = decaySse(t, logK, from, to, p);
  let lambda = 1e-3;
  for (let iter = 0; iter < 100 && sse > 0; iter++) {
    const d0 = Math.exp(p.logD0);
    jtj.fill(0);
    jtr.fill(0);
    for (let i = from; i < to; i++) {
      const dt = t[i] - tFirst;
      const x = Math.log1p(dt / d0);
      const r = logK[i] - p.c + p.n * x;
      // Jacobian row of r with respect to (c', n, ln d0).
      const j0 = -1;
      const j1 = x;
      const j2 = (-p.n * dt) / (dt + d0);
      jtj[0] += j0 * j0; jtj[1] += j0 * j1; jtj[2] += j0 * j2;
      jtj[4] += j1 * j1; jtj[5] += j1 * j2; jtj[8] += j2 * j2;
      jtr[0] -= j0 * r; jtr[1] -= j1 * r; jtr[2] -= j2 * r;
    }
    jtj[3] = jtj[1]; jtj[6] = jtj[2]; jtj[7] = jtj[5];
    let accepted = false;
    while (!accepted && lambda < 1e12) {
      lhs.set(jtj);
      for (let d = 0; d < 3; d++) lhs[d * 4] *= 1 + lambda; // Marquardt's diagonal scaling
      const step = solve3(lhs, jtr);
      if (step) {
        const trial = { c: p.c + step[0], n: p.n + step[1], logD0: p.logD0 + step[2] };
        const trialSse = decaySse(t, logK, from, to, trial);
        if (trialSse <= sse) {
          const tiny =
            Math.abs(step[1]) <= 1e-14 * Math.abs(trial.n) && Math.abs(step[2]) <= 1e-14;
          const gain = sse - trialSse;
          p = trial;
          sse = trialSse;
          accepted = true;
          lambda = Math.max(lambda / 10, 1e-12);
          if (tiny || gain <= 1e-14 * sse) return p;
        }
      }
      if (!accepted) lambda *= 10;
    }
    if (!accepted) return p; // no descent direction left: at the optimum to round-off
  }
  return p;
}
