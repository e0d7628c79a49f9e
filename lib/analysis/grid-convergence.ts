import { AnalysisError } from "./errors";
import { solveObservedOrder } from "./observed-order";
import { assertFiniteNumber, assertPositiveNumber } from "./validate";

export type GridConvergence = "monotonic" | "oscillatory" | "divergent" | "converged";

export interface GridStudyInput {
  /** Cell counts, finest first: [N1, N2, N3] with N1 > N2 > N3 > 0. */
  cells: [number, number, number];
  /** The studied quantity on each grid, same order. */
  values: [number, number, number];
  dimension: 1 | 2 | 3;
  /** Factor of safety; 1.25 for a three-grid study with observed order (Roache; sheet §8.1). */
  safetyFactor?: number;
}

export interface GridStudyResult {
  r21: number;
  r32: number;
  eps21: number;
  eps32: number;
  /** sign(eps32/eps21); 0 when either difference is zero. */
  s: number;
  /** Observed order; null when there is none to observe (divergent, converged). */
  p: number | null;
  /** Richardson extrapolation phi_ext^21. */
  extrapolated: number | null;
  /** 100 |(phi1 - phi2)/phi1|; null when phi1 = 0 (no relative error). */
  eaPct: number | null;
  /** 100 |(phi_ext - phi1)/phi_ext|. */
  eextPct: number | null;
  /** Fine-grid GCI_21 in percent. */
  gciFinePct: number | null;
  /** Coarse-pair GCI_32 in percent. */
  gci32Pct: number | null;
  /** GCI_32/(r21^p GCI_21); about 1 in the asymptotic range. */
  asymptoticRatio: number | null;
  convergence: GridConvergence;
  /** Fixed-point iterations spent on p (0 when p was not solved for). */
  iterations: number;
  safetyFactor: number;
}

/**
 * Discretisation uncertainty of a three-grid study by the procedure of Celik,
 * Ghia, Roache, Freitas, Coleman & Raad 2008 (J. Fluids Eng. 130, 078001; sheet
 * §8.2), with representative size h = N^(-1/dimension).
 *
 * Classification (ours, documented because the published formula hides it:
 * its |...| returns a positive p even when the error grows):
 * - converged: phi1 = phi2 (eps21 = 0). The fine pair agree exactly; the error
 *   estimate is zero, p is undefined (null), phi_ext = phi1.
 * - divergent: |eps32| <= |eps21| with eps21 != 0 (the change does not shrink
 *   under refinement; includes phi2 = phi3), or no positive finite p solves the
 *   order equation. p, phi_ext, e_ext and GCI are null; e_a is still reported.
 * - oscillatory: eps32/eps21 < 0 and |eps32| > |eps21|.
 * - monotonic: eps32/eps21 > 0 and |eps32| > |eps21|.
 */
export function analyseGridStudy(input: GridStudyInput): GridStudyResult {
  const { cells, values, dimension } = input;
  if (!Array.isArray(cells) || cells.length !== 3) throw new AnalysisError("cells", "needs exactly 3 grids");
  if (!Array.isArray(values) || values.length !== 3) throw new AnalysisError("values", "needs exactly 3 values");
  if (dimension !== 1 && dimension !== 2 && dimension !== 3) {
    throw new AnalysisError("dimension", `must be 1, 2 or 3, got ${String(dimension)}`);
  }
  cells.forEach((n, i) => assertPositiveNumber(n, `cells[${i}]`));
  values.forEach((v, i) => assertFiniteNumber(v, `values[${i}]`));
  if (!(cells[0] > cells[1] && cells[1] > cells[2])) {
    throw new AnalysisError("cells", "must strictly decrease from fine to coarse (N1 > N2 > N3)");
  }
  const fs = input.safetyFactor ?? 1.25;
  assertPositiveNumber(fs, "safetyFactor");

  const [phi1, phi2, phi3] = values;
  const r21 = (cells[0] / cells[1]) ** (1 / dimension);
  const r32 = (cells[1] / cells[2]) ** (1 / dimension);
  const eps21 = phi2 - phi1;
  const eps32 = phi3 - phi2;
  const s = Math.sign(eps21) * Math.sign(eps32);
  const eaPct = phi1 === 0 ? null : 100 * Math.abs(eps21 / phi1);
  const base = { r21, r32, eps21, eps32, s, eaPct, safetyFactor: fs };
  const none = { p: null, extrapolated: null, eextPct: null, gciFinePct: null, gci32Pct: null, asymptoticRatio: null };

  if (eps21 === 0) {
    // GCI_32 is left null: with p undefined it has no value, and the fine pair already agree.
    return { ...base, ...none, extrapolated: phi1, eextPct: 0, gciFinePct: 0, convergence: "converged", iterations: 0 };
  }
  if (Math.abs(eps32) <= Math.abs(eps21)) {
    return { ...base, ...none, convergence: "divergent", iterations: 0 };
  }
  const order = solveObservedOrder(Math.abs(eps32 / eps21), r21, r32, s > 0 ? 1 : -1);
  if (!order.converged || !(order.p > 0) || !Number.isFinite(order.p)) {
    return { ...base, ...none, convergence: "divergent", iterations: order.iterations };
  }
  const p = order.p;
  const r21p = r21 ** p;
  const extrapolated = (r21p * phi1 - phi2) / (r21p - 1);
  const eextPct = extrapolated === 0 ? null : 100 * Math.abs((extrapolated - phi1) / extrapolated);
  const gciFinePct = eaPct === null ? null : (fs * eaPct) / (r21p - 1);
  const ea32Pct = phi2 === 0 ? null : 100 * Math.abs(eps32 / phi2);
  const gci32Pct = ea32Pct === null ? null : (fs * ea32Pct) / (r32 ** p - 1);
  const asymptoticRatio =
    gci32Pct === null || gciFinePct === null || gciFinePct === 0 ? null : gci32Pct / (r21p * gciFinePct);
  return {
    ...base,
    p,
    extrapolated,
    eextPct,
    gciFinePct,
    gci32Pct,
    asymptoticRatio,
    convergence: s > 0 ? "monotonic" : "oscillatory",
    iterations: order.iterations,
  };
}
