import { AnalysisError } from "./errors";

/** Verdict of one quantity against its tolerance band (DESIGN.md, "verdict"). */
export type Verdict = "within" | "marginal" | "outside" | "unbanded" | "missing";

export interface BandLimits {
  /** Lower acceptance limit; null = open below (one-sided band). */
  lower: number | null;
  /** Upper acceptance limit; null = open above. */
  upper: number | null;
  /** Width of the inner "marginal" strip just inside each finite limit (>= 0). */
  marginalMargin: number;
}

/**
 * Severity order, best first: within < unbanded < marginal < missing < outside.
 * unbanded sits just above within (nothing says it is wrong, but nothing checked
 * it); missing sits below outside because a quantity that was expected and not
 * produced cannot be trusted, yet is not proven out of band.
 */
export const VERDICT_ORDER: readonly Verdict[] = ["within", "unbanded", "marginal", "missing", "outside"];

/**
 * Judges a value against a band. Rules, in order: no band -> unbanded; no value
 * (null, undefined, NaN, ±Infinity) -> missing; strictly below lower or above
 * upper -> outside; otherwise, with a positive marginalMargin, at most that far
 * from a finite limit -> marginal; else within. A value exactly on a limit is
 * inside (acceptance limits are inclusive), so it is marginal when the margin is
 * positive and within when the margin is 0 (no marginal strip).
 */
export function judgeValue(value: number | null | undefined, band: BandLimits | null): Verdict {
  if (band === null || band === undefined) return "unbanded";
  if (value === null || value === undefined || !Number.isFinite(value)) return "missing";
  const { lower, upper } = band;
  const margin = band.marginalMargin ?? 0;
  if (lower !== null && !Number.isFinite(lower)) throw new AnalysisError("band.lower", `must be finite or null, got ${lower}`);
  if (upper !== null && !Number.isFinite(upper)) throw new AnalysisError("band.upper", `must be finite or null, got ${upper}`);
  if (!Number.isFinite(margin) || margin < 0) throw new AnalysisError("band.marginalMargin", `must be a finite number >= 0, got ${margin}`);
  if (lower !== null && upper !== null && lower > upper) {
    throw new AnalysisError("band", `lower limit ${lower} exceeds upper limit ${upper}`);
  }
  if ((lower !== null && value < lower) || (upper !== null && value > upper)) return "outside";
  if (margin > 0 && ((lower !== null && value - lower <= margin) || (upper !== null && upper - value <= margin))) {
    return "marginal";
  }
  return "within";
}

/** Worst verdict of a collection by VERDICT_ORDER; an empty collection is 'missing'. */
export function worstVerdict(verdicts: Iterable<Verdict>): Verdict {
  let worst = -1;
  for (const v of verdicts) {
    const rank = VERDICT_ORDER.indexOf(v);
    if (rank < 0) throw new AnalysisError("verdict", `unknown verdict ${String(v)}`);
    if (rank > worst) worst = rank;
  }
  return worst < 0 ? "missing" : VERDICT_ORDER[worst];
}

/**
 * Deviation of a value from the band's reference value: absolute = value -
 * reference, relativePct = 100 (value - reference)/|reference| (null when the
 * reference is 0, where a relative deviation has no meaning). Null when there is
 * no reference or no usable value.
 */
export function deviationFromReference(
  value: number | null | undefined,
  reference: number | null | undefined,
): { absolute: number; relativePct: number | null } | null {
  if (reference === null || reference === undefined || !Number.isFinite(reference)) return null;
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  const absolute = value - reference;
  return { absolute, relativePct: reference === 0 ? null : (100 * absolute) / Math.abs(reference) };
}
