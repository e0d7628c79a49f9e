import { formatDelta, formatPct, formatSig } from "@/lib/format/numbers";

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

// A difference below one part per million of the quantity's own size is round-off
// of the solver or of the fit, far below the figures shown, so it reads "≈ 0"
// instead of a misleading "+1.26×10⁻¹¹".
const NOISE_RTOL = 1e-6;

/** A signed difference, or "≈ 0" when it is round-off relative to `scale` (the value it is a difference of). */
export function formatDifference(delta: number | null | undefined, scale: number | null | undefined, digits = 3): string {
  if (delta === null || delta === undefined || !Number.isFinite(delta)) return formatDelta(delta, digits);
  if (delta !== 0 && scale !== null && scale !== undefined && Math.abs(delta) <= NOISE_RTOL * Math.abs(scale)) return "≈ 0";
  return formatDelta(delta, digits);
}

/** A signed percentage, "≈ 0 %" below one part per million (see formatDifference). */
export function formatDifferencePct(pct: number | null | undefined, digits = 3): string {
  if (pct === null || pct === undefined || !Number.isFinite(pct)) return formatPct(pct, digits);
  if (pct !== 0 && Math.abs(pct) <= NOISE_RTOL * 100) return "≈ 0 %";
  return formatPct(pct, digits);
}
