// Complementary error function and standard normal CDF to ~1e-15 relative,
// for Mann–Kendall p-values. Two regimes, both free of cancellation:
// - |x| < 2: erf by its all-positive series erf(x) = (2/sqrt(pi)) e^(-x^2)
//   sum 2^n x^(2n+1)/(1*3*...*(2n+1)); erfc = 1 - erf stays >= 0.0047 there, so the
//   subtraction costs at most two digits.
// - x >= 2: the continued fraction erfc(x) = e^(-x^2)/sqrt(pi) * 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + ...))))
//   evaluated by the modified Lentz method.

const TWO_OVER_SQRT_PI = 2 / Math.sqrt(Math.PI);

function erfSeries(x: number): number {
  const x2 = x * x;
  let term = x;
  let sum = x;
  for (let n = 1; n < 200; n++) {
    term *= (2 * x2) / (2 * n + 1);
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return TWO_OVER_SQRT_PI * Math.exp(-x2) * sum;
}

function erfcContinuedFraction(x: number): number {
  // f = x + a1/(x + a2/(x + ...)), a_k = k/2.
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let k = 1; k < 500; k++) {
    const a = k / 2;
    d = x + a * d;
    d = d === 0 ? 1 / tiny : 1 / d;
    c = x + a / c;
    if (c === 0) c = tiny;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(-x * x) / (Math.sqrt(Math.PI) * f);
}

export function erfc(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x < 0) return 2 - erfc(-x);
  if (x < 2) return 1 - erfSeries(x);
  if (x > 27) return 0; // below the smallest double
  return erfcContinuedFraction(x);
}

/** Standard normal cumulative distribution Phi(z) = erfc(-z/sqrt 2)/2. */
export function normalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}
