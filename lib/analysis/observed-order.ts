// Apparent (observed) order of a three-grid study by Celik et al. 2008, step 3:
//   p = |ln|eps32/eps21| + q(p)| / ln r21,   q(p) = ln[(r21^p - s)/(r32^p - s)],
// solved by fixed-point iteration from the q = 0 value. With r21 = r32 the
// first iterate is already exact.

export interface OrderSolution {
  p: number;
  iterations: number;
  converged: boolean;
}

export function solveObservedOrder(ratio: number, r21: number, r32: number, s: 1 | -1): OrderSolution {
  const lnR21 = Math.log(r21);
  const base = Math.log(ratio); // ln|eps32/eps21|
  const q = (p: number) => Math.log((r21 ** p - s) / (r32 ** p - s));
  let p = Math.abs(base) / lnR21;
  for (let iter = 1; iter <= 500; iter++) {
    const next = Math.abs(base + q(p)) / lnR21;
    if (!Number.isFinite(next)) return { p: next, iterations: iter, converged: false };
    if (Math.abs(next - p) <= 1e-14 * Math.max(1, next)) return { p: next, iterations: iter, converged: true };
    p = next;
  }
  // The map failed to contract (it can when r21 and r32 differ strongly):
  // fall back to bisection on g(p) = p ln r21 - |ln ratio + q(p)| over a wide range.
  return bisectOrder(base, lnR21, q);
}

function bisectOrder(base: number, lnR21: number, q: (p: number) => number): OrderSolution {
  const g = (p: number) => p * lnR21 - Math.abs(base + q(p));
  let lo = 1e-9;
  let hi = 50;
  let glo = g(lo);
  if (!(glo * g(hi) < 0)) return { p: Number.NaN, iterations: 500, converged: false };
  let iterations = 500;
  for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
    iterations++;
    const mid = 0.5 * (lo + hi);
    const gm = g(mid);
    if (gm === 0) return { p: mid, iterations, converged: true };
    if (gm * glo < 0) hi = mid;
    else {
      lo = mid;
      glo = gm;
    }
  }
  return { p: 0.5 * (lo + hi), iterations, converged: true };
}
