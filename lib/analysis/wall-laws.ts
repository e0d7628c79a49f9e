import { AnalysisError } from "./errors";
import { assertFiniteNumber, assertPositiveNumber } from "./validate";

// Mean-velocity laws of the wall, u+ as a function of y+ (reference sheet §1.3).
// They generate reference profiles for tests and the demo, so they must be
// exact to round-off, not approximately right.

function assertWallDistance(yPlus: number): void {
  assertFiniteNumber(yPlus, "yPlus");
  if (yPlus < 0) throw new AnalysisError("yPlus", `must be >= 0, got ${yPlus}`);
}

/** exp(x) - 1 - x - x^2/2 - x^3/6 without the cancellation of the direct form at small x. */
function expTailFromFourth(x: number): number {
  if (Math.abs(x) > 0.5) return Math.exp(x) - 1 - x - (x * x) / 2 - (x * x * x) / 6;
  // Taylor series from x^4/4!; at |x| <= 0.5 twenty terms exceed double precision.
  let term = (x * x * x * x) / 24;
  let sum = term;
  for (let k = 5; k < 30 && Math.abs(term) > 1e-18 * Math.abs(sum); k++) {
    term *= x / k;
    sum += term;
  }
  return sum;
}

/**
 * Spalding (1961) single formula, inverted for u+:
 *   y+ = u+ + exp(-kappa B) [exp(kappa u+) - 1 - kappa u+ - (kappa u+)^2/2 - (kappa u+)^3/6].
 * The right-hand side is strictly increasing in u+ (derivative >= 1), so the
 * root is unique and lies in [0, y+]; Newton steps are kept inside that bracket
 * and replaced by bisection whenever they would leave it.
 */
export function spaldingUPlus(yPlus: number, kappa = 0.41, b = 5.0): number {
  assertWallDistance(yPlus);
  assertPositiveNumber(kappa, "kappa");
  assertFiniteNumber(b, "b");
  if (yPlus === 0) return 0;
  const e = Math.exp(-kappa * b);
  let lo = 0;
  // For kappa u+ >= 8 the bracket term exceeds exp(kappa u+)/2, so the root also
  // lies below ln(2 y+/E)/kappa (written to avoid overflow of 2 y+).
  let hi = Math.min(yPlus, Math.max(8 / kappa, (Math.LN2 + Math.log(yPlus) + kappa * b) / kappa));
  // Start from the viscous line below the buffer layer, the log law above it.
  let u = yPlus < 10 ? yPlus : Math.min(hi, Math.max(lo, Math.log(yPlus) / kappa + b));
  for (let iter = 0; iter < 200; iter++) {
    const ku = kappa * u;
    const f = u + e * expTailFromFourth(ku) - yPlus;
    if (f === 0) return u;
    if (f > 0) hi = u;
    else lo = u;
    const dfdu = 1 + kappa * e * (Math.exp(ku) - 1 - ku - (ku * ku) / 2);
    let next = u - f / dfdu;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - u) <= 4e-16 * Math.max(1, Math.abs(u)) || hi - lo <= 4e-16 * hi) {
      return next;
    }
    u = next;
  }
  return u;
}

export interface ReichardtOptions {
  kappa?: number;
  a?: number;
  c?: number;
  b1?: number;
  b2?: number;
}

/**
 * Reichardt (1951): u+ = (1/kappa) ln(1 + a y+) + C [1 - exp(-y+/B1) - (y+/B1) exp(-y+/B2)].
 * Default variant: kappa = 0.41, a = kappa (the libWallModelledLES form; when only
 * kappa is given, a follows it), C = 7.8, B1 = 11, B2 = 3. Its log-law asymptote
 * has B_eff = C + ln(a)/kappa = 5.6254, not 5.0 (sheet §1.3). The CFD-Wiki variant
 * is { kappa: 0.41, a: 0.4 }.
 */
export function reichardtUPlus(yPlus: number, opts: ReichardtOptions = {}): number {
  assertWallDistance(yPlus);
  const kappa = opts.kappa ?? 0.41;
  const a = opts.a ?? kappa;
  const c = opts.c ?? 7.8;
  const b1 = opts.b1 ?? 11;
  const b2 = opts.b2 ?? 3;
  assertPositiveNumber(kappa, "kappa");
  assertPositiveNumber(a, "a");
  assertFiniteNumber(c, "c");
  assertPositiveNumber(b1, "b1");
  assertPositiveNumber(b2, "b2");
  return (
    Math.log1p(a * yPlus) / kappa +
    c * (1 - Math.exp(-yPlus / b1) - (yPlus / b1) * Math.exp(-yPlus / b2))
  );
}

/**
 * Musker (1979) closed form with kappa = 0.41, s = 0.001093, as coded in ONERA
 * Fast (sheet §1.3):
 *   u+ = 5.424 atan((2y+ - 8.15)/16.7) + log10((y+ + 10.6)^9.6 / (y+^2 - 8.15y+ + 86)^2) - 3.52.
 * The logarithm is split so (y+ + 10.6)^9.6 cannot overflow at large y+.
 * Note u+(0) = -0.0083: the curve fit is not exactly u+ = y+ at the wall.
 */
export function muskerUPlus(yPlus: number): number {
  assertWallDistance(yPlus);
  const quad = yPlus * yPlus - 8.15 * yPlus + 86; // discriminant < 0: always positive
  return (
    5.424 * Math.atan((2 * yPlus - 8.15) / 16.7) +
    9.6 * Math.log10(yPlus + 10.6) -
    2 * Math.log10(quad) -
    3.52
  );
}

/** Log law u+ = (1/kappa) ln y+ + B; y+ must be > 0. */
export function logLawUPlus(yPlus: number, kappa = 0.41, b = 5.0): number {
  assertPositiveNumber(yPlus, "yPlus");
  assertPositiveNumber(kappa, "kappa");
  assertFiniteNumber(b, "b");
  return Math.log(yPlus) / kappa + b;
}

/**
 * Coles (1956) wake function (2 Pi/kappa) sin^2(pi y/(2 delta)), added to the
 * log law in the outer layer. Beyond the layer edge (y/delta > 1) the formula
 * would oscillate; the velocity there is the free stream, so the wake is held
 * at its edge value 2 Pi/kappa.
 */
export function colesWake(yOverDelta: number, pi: number, kappa = 0.41): number {
  assertFiniteNumber(yOverDelta, "yOverDelta");
  if (yOverDelta < 0) throw new AnalysisError("yOverDelta", `must be >= 0, got ${yOverDelta}`);
  assertFiniteNumber(pi, "pi");
  assertPositiveNumber(kappa, "kappa");
  const eta = Math.min(yOverDelta, 1);
  const s = Math.sin((Math.PI * eta) / 2);
  return ((2 * pi) / kappa) * s * s;
}
