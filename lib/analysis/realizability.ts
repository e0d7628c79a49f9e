import { AnalysisError } from "./errors";
import { symmetricEigenvalues3 } from "./symmetric-eigen";
import { assertFiniteNumber } from "./validate";

/** One Reynolds-stress sample <u_i u_j> (extra fields such as a position are ignored). */
export interface StressSample {
  uu: number;
  vv: number;
  ww: number;
  uv: number;
  uw: number;
  vw: number;
}

export interface StressAnalysis {
  /** Turbulent kinetic energy k = tr(R)/2. */
  k: number;
  /** Anisotropy b_ij = R_ij/(2k) - delta_ij/3 as [b11, b22, b33, b12, b13, b23]. */
  b: [number, number, number, number, number, number];
  /** Eigenvalues of R, descending. */
  stressEigenvalues: [number, number, number];
  /** Eigenvalues of b, descending. */
  anisotropyEigenvalues: [number, number, number];
  /** II = -b_ij b_ji / 2 (<= 0). */
  ii: number;
  /** III = b_ij b_jk b_ki / 3 = det(b). */
  iii: number;
  /** Pope's eta = sqrt(-II/3) and xi = cbrt(III/2). */
  eta: number;
  xi: number;
  /** F = 1 + 9 II + 27 III = 27 det(R/(2k)): 1 isotropic, 0 two-component, < 0 not realizable. */
  f: number;
  barycentric: { c1: number; c2: number; c3: number; x: number; y: number };
  violations: string[];
  realizable: boolean;
}

// Round-off allowance relative to the trace, so that e.g. an exactly
// two-component state (one zero eigenvalue) is not flagged by 1e-17 noise.
const REL_TOL = 1e-12;

/**
 * Anisotropy invariants and realizability of one stress sample (reference sheet
 * §9). Realizability (Schumann 1977; Lumley 1978): R must be positive
 * semi-definite. Checked are non-negative normal stresses, the Schwarz
 * inequality uv^2 <= uu vv for each pair, and — because a tensor can pass every
 * pairwise test and still be indefinite — non-negative eigenvalues of R.
 * Barycentric map: Banerjee et al. 2007 with vertices 1C = (1, 0), 2C = (0, 0),
 * 3C = (1/2, sqrt(3)/2), so x = C1 + C3/2, y = (sqrt(3)/2) C3.
 */
export function analyseStressSample(s: StressSample): StressAnalysis {
  for (const key of ["uu", "vv", "ww", "uv", "uw", "vw"] as const) assertFiniteNumber(s[key], key);
  const trace = s.uu + s.vv + s.ww;
  if (!(trace > 0)) {
    throw new AnalysisError("stress", `k = tr(R)/2 must be > 0 to normalise the anisotropy, got ${trace / 2}`);
  }
  const k = trace / 2;
  const b11 = s.uu / trace - 1 / 3;
  const b22 = s.vv / trace - 1 / 3;
  const b33 = s.ww / trace - 1 / 3;
  const b12 = s.uv / trace;
  const b13 = s.uw / trace;
  const b23 = s.vw / trace;

  const stressEigenvalues = symmetricEigenvalues3(s.uu, s.vv, s.ww, s.uv, s.uw, s.vw);
  // b = R/tr(R) - I/3 shares R's eigenvectors, so its eigenvalues follow directly.
  const l1 = stressEigenvalues[0] / trace - 1 / 3;
  const l2 = stressEigenvalues[1] / trace - 1 / 3;
  const l3 = stressEigenvalues[2] / trace - 1 / 3;

  const bb = b11 * b11 + b22 * b22 + b33 * b33 + 2 * (b12 * b12 + b13 * b13 + b23 * b23);
  const ii = -bb / 2;
  const iii =
    b11 * (b22 * b33 - b23 * b23) - b12 * (b12 * b33 - b23 * b13) + b13 * (b12 * b23 - b22 * b13);
  const eta = Math.sqrt(bb / 6);
  const xi = Math.cbrt(iii / 2);
  const f = 1 + 9 * ii + 27 * iii;

  const c1 = l1 - l2;
  const c2 = 2 * (l2 - l3);
  const c3 = 3 * l3 + 1;
  const barycentric = { c1, c2, c3, x: c1 + c3 / 2, y: (Math.sqrt(3) / 2) * c3 };

  const violations = findViolations(s, trace, stressEigenvalues[2]);
  return {
    k,
    b: [b11, b22, b33, b12, b13, b23],
    stressEigenvalues,
    anisotropyEigenvalues: [l1, l2, l3],
    ii,
    iii,
    eta,
    xi,
    f,
    barycentric,
    violations,
    realizable: violations.length === 0,
  };
}

function findViolations(s: StressSample, trace: number, minEigenvalue: number): string[] {
  const tol = REL_TOL * trace;
  const tol2 = REL_TOL * trace * trace;
  const out: string[] = [];
  if (s.uu < -tol) out.push("uu < 0");
  if (s.vv < -tol) out.push("vv < 0");
  if (s.ww < -tol) out.push("ww < 0");
  if (s.uv * s.uv - s.uu * s.vv > tol2) out.push("uv^2 > uu*vv");
  if (s.uw * s.uw - s.uu * s.ww > tol2) out.push("uw^2 > uu*ww");
  if (s.vw * s.vw - s.vv * s.ww > tol2) out.push("vw^2 > vv*ww");
  if (minEigenvalue < -tol) out.push("eigenvalue < 0");
  return out;
}

/**
 * Number of samples that are not realizable, by the same checks and tolerance
 * as analyseStressSample (and the same errors for unusable samples) but without
 * building the invariants, so long stress profiles stay cheap.
 */
export function countRealizabilityViolations(samples: Iterable<StressSample>): number {
  let count = 0;
  for (const s of samples) {
    for (const key of ["uu", "vv", "ww", "uv", "uw", "vw"] as const) assertFiniteNumber(s[key], key);
    const trace = s.uu + s.vv + s.ww;
    if (!(trace > 0)) {
      throw new AnalysisError("stress", `k = tr(R)/2 must be > 0 to normalise the anisotropy, got ${trace / 2}`);
    }
    const minEigenvalue = symmetricEigenvalues3(s.uu, s.vv, s.ww, s.uv, s.uw, s.vw)[2];
    if (findViolations(s, trace, minEigenvalue).length > 0) count++;
  }
  return count;
}
