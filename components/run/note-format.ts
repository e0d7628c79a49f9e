import { formatSig } from "@/lib/format/numbers";
import type { QuantityView } from "./run-data";

// Short texts written on the plots: a value with its verdict, the band it was
// judged against, a fit quality. Pure, so the wording is tested.

/** Acceptance limits as an interval; one-sided bands read "≥ 3" or "≤ 1". */
export function formatLimits(lower: number | null, upper: number | null, digits = 4): string {
  if (lower !== null && upper !== null) return `[${formatSig(lower, digits)}, ${formatSig(upper, digits)}]`;
  if (lower !== null) return `≥ ${formatSig(lower, digits)}`;
  if (upper !== null) return `≤ ${formatSig(upper, digits)}`;
  return "no limits";
}

/** "band (validation): 0.342, accepted [0.302, 0.372]"; null when the quantity has no band. */
export function describeBand(q: QuantityView | null, digits = 4): string | null {
  if (!q || (!q.bandKind && q.reference === null && q.lower === null && q.upper === null)) return null;
  const kind = q.bandKind ? ` (${q.bandKind}${q.bandModel ? `, ${q.bandModel}` : ""})` : "";
  const ref = q.reference === null ? "" : `${formatSig(q.reference, digits)}, `;
  return `band${kind}: ${ref}accepted ${formatLimits(q.lower, q.upper, digits)}`;
}

/** A value with its verdict, e.g. "0.3521 (within)", or "— (missing)". */
export function valueWithVerdict(q: QuantityView | null, digits = 4): string {
  if (!q) return "—";
  return `${formatSig(q.value, digits)} (${q.verdict})`;
}

/** r² near 1 is read by its distance from 1: "1 − 3.7×10⁻¹³" rather than a rounded "1". */
export function formatR2(r2: number | null): string {
  if (r2 === null || !Number.isFinite(r2)) return "—";
  if (r2 > 0.99999 && r2 < 1) return `1 − ${formatSig(1 - r2, 2)}`;
  return formatSig(r2, 5);
}
