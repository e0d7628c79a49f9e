import { AnalysisError } from "./errors";
import { assertFiniteNumber, assertPositiveNumber } from "./validate";

// Closed-form decay of homogeneous isotropic turbulence with no mean strain
// (reference sheet §2.2 and §2.3): production and diffusion vanish, so each
// two-equation model reduces to a pair of ODEs with an exact solution.

function assertTime(t: number): void {
  assertFiniteNumber(t, "t");
  if (t < 0) throw new AnalysisError("t", `must be >= 0, got ${t}`);
}

/**
 * Standard k–eps decay: dk/dt = -eps, deps/dt = -C_eps2 eps^2/k, so k/eps grows
 * linearly with slope (C_eps2 - 1) and
 *   k = k0 [1 + (C_eps2 - 1) eps0 t/k0]^(-n),  eps = eps0 [...]^(-(n+1)),  n = 1/(C_eps2 - 1).
 * C_eps2 = 1 is the exponential limit k = k0 exp(-eps0 t/k0). For C_eps2 < 1 the
 * turbulence dies in finite time; after that k = eps = 0.
 */
export function kEpsilonDecay(
  t: number,
  p: { k0: number; eps0: number; cEps2: number },
): { k: number; eps: number } {
  assertTime(t);
  assertPositiveNumber(p.k0, "k0");
  assertFiniteNumber(p.eps0, "eps0");
  if (p.eps0 < 0) throw new AnalysisError("eps0", `must be >= 0, got ${p.eps0}`);
  assertPositiveNumber(p.cEps2, "cEps2");
  const c1 = p.cEps2 - 1;
  if (c1 === 0) {
    const decay = Math.exp((-p.eps0 * t) / p.k0);
    return { k: p.k0 * decay, eps: p.eps0 * decay };
  }
  const base = 1 + (c1 * p.eps0 * t) / p.k0;
  if (base <= 0) return { k: 0, eps: 0 };
  const n = 1 / c1;
  return { k: p.k0 * Math.pow(base, -n), eps: p.eps0 * Math.pow(base, -(n + 1)) };
}

/**
 * Wilcox-type k–omega decay: dk/dt = -beta* k omega, domega/dt = -beta omega^2, so
 *   omega = omega0/(1 + beta omega0 t),  k = k0 (1 + beta omega0 t)^(-beta* / beta).
 * beta = 0 (no omega destruction) is the exponential limit k = k0 exp(-beta* omega0 t).
 */
export function kOmegaDecay(
  t: number,
  p: { k0: number; omega0: number; beta: number; betaStar: number },
): { k: number; omega: number } {
  assertTime(t);
  assertPositiveNumber(p.k0, "k0");
  assertFiniteNumber(p.omega0, "omega0");
  if (p.omega0 < 0) throw new AnalysisError("omega0", `must be >= 0, got ${p.omega0}`);
  assertFiniteNumber(p.beta, "beta");
  if (p.beta < 0) throw new AnalysisError("beta", `must be >= 0, got ${p.beta}`);
  assertFiniteNumber(p.betaStar, "betaStar");
  if (p.betaStar < 0) throw new AnalysisError("betaStar", `must be >= 0, got ${p.betaStar}`);
  if (p.beta === 0) {
    return { k: p.k0 * Math.exp(-p.betaStar * p.omega0 * t), omega: p.omega0 };
  }
  const base = 1 + p.beta * p.omega0 * t;
  return { k: p.k0 * Math.pow(base, -p.betaStar / p.beta), omega: p.omega0 / base };
}

/** k–eps decay exponent n = 1/(C_eps2 - 1); a power law needs C_eps2 > 1. */
export function kEpsilonDecayExponent(cEps2: number): number {
  assertFiniteNumber(cEps2, "cEps2");
  if (cEps2 <= 1) {
    throw new AnalysisError("cEps2", `must be > 1 for power-law decay, got ${cEps2}`);
  }
  return 1 / (cEps2 - 1);
}

/** k–omega decay exponent n = beta* / beta (sheet §2.3). */
export function kOmegaDecayExponent(beta: number, betaStar: number): number {
  assertPositiveNumber(beta, "beta");
  assertPositiveNumber(betaStar, "betaStar");
  return betaStar / beta;
}
