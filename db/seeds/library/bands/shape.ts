// Small helpers that turn "reference ± tolerance" into band limits, so each
// band file states its tolerance once and the limits cannot drift from it.

/** Drops binary round-off (0.37207999999999997 → 0.37208) so stored limits read as written. */
export function tidy(value: number): number {
  return Number(value.toPrecision(12));
}

export interface BandLimitsShape {
  reference: number;
  lower: number;
  upper: number;
  marginalMargin: number;
}

/**
 * Symmetric band of ±relativeTolerance around a (possibly negative) reference.
 * The marginal zone is the outer `marginShare` of each half-width.
 */
export function aroundReference(reference: number, relativeTolerance: number, marginShare = 0.2): BandLimitsShape {
  const halfWidth = Math.abs(reference) * relativeTolerance;
  return {
    reference: tidy(reference),
    lower: tidy(reference - halfWidth),
    upper: tidy(reference + halfWidth),
    marginalMargin: tidy(marginShare * halfWidth),
  };
}

/** Band of ±halfWidth (absolute) around a reference, e.g. b_ii = 0 ± 0.002. */
export function aroundReferenceAbsolute(reference: number, halfWidth: number, marginShare = 0.2): BandLimitsShape {
  return {
    reference: tidy(reference),
    lower: tidy(reference - halfWidth),
    upper: tidy(reference + halfWidth),
    marginalMargin: tidy(marginShare * halfWidth),
  };
}
