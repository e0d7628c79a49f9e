import { formatSig } from "@/lib/format/numbers";

/**
 * A value in a table column with a fixed number of significant figures, trailing
 * zeros kept ("1.0870", not "1.087") so that values in one column show the same
 * precision and line up. Whole numbers (counts of samples, zero anisotropy of a
 * linear eddy-viscosity model) stay whole; tiny or huge magnitudes use formatSig's
 * exponent form.
 */
export function formatValue(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return formatSig(value, digits);
  const abs = Math.abs(value);
  if (Number.isInteger(value) && abs < 1e6) return String(value).replace(/^-/, "−");
  if (abs < 1e-3 || abs >= 1e6) return formatSig(value, digits);
  return value.toPrecision(digits).replace(/^-/, "−");
}
