import { formatSig, withUnit } from "@/lib/format/numbers";

// How limits and changes of a quantity are written in the morning view.

/** "1.076 – 1.098", "≥ 0.99" or "≤ 2" for a one-sided band; "no band" when neither limit exists. */
export function formatLimits(lower: number | null, upper: number | null, unit: string | null): string {
  if (lower !== null && upper !== null) return withUnit(`${formatKeep(lower)} – ${formatKeep(upper)}`, unit);
  if (lower !== null) return withUnit(`≥ ${formatKeep(lower)}`, unit);
  if (upper !== null) return withUnit(`≤ ${formatKeep(upper)}`, unit);
  return "no band";
}

/** A change in percent of |baseline|, or "" when the baseline is absent or zero. */
export function relativeChange(delta: number | null, baseline: number | null): string {
  if (delta === null || baseline === null || baseline === 0) return "";
  const pct = (100 * delta) / Math.abs(baseline);
  return `${pct > 0 ? "+" : pct < 0 ? "−" : "±"}${formatSig(Math.abs(pct), 3)} %`;
}

/**
 * A limit or reference with `digits` significant figures, keeping trailing zeros
 * (1.100, not 1.1: the zeros state the precision of the limit).
 */
export function formatKeep(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return formatSig(value, digits);
  const abs = Math.abs(value);
  if (value === 0 || abs < 1e-3 || abs >= 1e6) return formatSig(value, digits);
  return value.toPrecision(digits).replace(/^-/, "−");
}
