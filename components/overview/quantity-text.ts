import { formatSig, withUnit } from "@/lib/format/numbers";

// How limits and changes of a quantity are written in the morning view.

/** "1.076 – 1.098", "≥ 0.99" or "≤ 2" for a one-sided band; "no band" when neither limit exists. */
export function formatLimits(lower: number | null, upper: number | null, unit: string | null): string {
  if (lower !== null && upper !== null) return withUnit(`${formatSig(lower, 4)} – ${formatSig(upper, 4)}`, unit);
  if (lower !== null) return withUnit(`≥ ${formatSig(lower, 4)}`, unit);
  if (upper !== null) return withUnit(`≤ ${formatSig(upper, 4)}`, unit);
  return "no band";
}

/** A change in percent of |baseline|, or "" when the baseline is absent or zero. */
export function relativeChange(delta: number | null, baseline: number | null): string {
  if (delta === null || baseline === null || baseline === 0) return "";
  const pct = (100 * delta) / Math.abs(baseline);
  return `${pct > 0 ? "+" : pct < 0 ? "−" : "±"}${formatSig(Math.abs(pct), 3)} %`;
}

