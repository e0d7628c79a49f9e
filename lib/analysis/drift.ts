import { AnalysisError } from "./errors";
import { mannKendall, type MannKendallResult } from "./mann-kendall";
import { theilSen } from "./theil-sen";
import { assertFiniteArray, assertFiniteNumber } from "./validate";

export { mannKendall, type MannKendallResult } from "./mann-kendall";
export { theilSen } from "./theil-sen";

/** Change of a value against its baseline, and whether it exceeds the noise floor. */
export function baselineDelta(
  value: number,
  baseline: number | null,
  noiseFloor: number,
): { delta: number | null; exceedsNoise: boolean } {
  assertFiniteNumber(value, "value");
  assertNoiseFloor(noiseFloor);
  if (baseline === null || baseline === undefined) return { delta: null, exceedsNoise: false };
  assertFiniteNumber(baseline, "baseline");
  const delta = value - baseline;
  return { delta, exceedsNoise: Math.abs(delta) > noiseFloor };
}

export interface DriftInput {
  /** Values of one quantity, chronological, newest last. */
  values: ArrayLike<number>;
  /** Value in the baseline (last approved) build, if any. */
  baseline: number | null;
  /** Smallest change that counts as real for this quantity (>= 0). */
  noiseFloor: number;
  /** Trend window N: the last N values (fewer if the history is shorter); >= 4. */
  window?: number;
  alpha?: number;
}

export interface DriftResult {
  drifting: boolean;
  reason: "trend" | "baseline" | null;
  mk: MannKendallResult | null;
  /** Theil–Sen slope per build over the trend window. */
  slopePerBuild: number | null;
  baselineDelta: number | null;
}

const MIN_TREND_VALUES = 4;

/**
 * Drift of the newest value (DESIGN.md "drift"). Two triggers:
 * - baseline: |newest - baseline| > noiseFloor;
 * - trend: over the last N values (at least 4 needed) the Mann–Kendall test is
 *   significant at alpha AND the Theil–Sen change across the window,
 *   |slope| (N - 1), exceeds the noise floor. The second condition keeps a
 *   significant but physically negligible trend (e.g. monotone rounding in the
 *   last digit) from raising alarms; the first keeps white noise of any size
 *   from doing so.
 * When both fire, the reason is 'baseline' (the more direct statement).
 */
export function detectDrift(input: DriftInput): DriftResult {
  const { values, baseline, noiseFloor } = input;
  const window = input.window ?? 8;
  const alpha = input.alpha ?? 0.05;
  assertFiniteArray(values, "values");
  assertNoiseFloor(noiseFloor);
  if (!Number.isInteger(window) || window < MIN_TREND_VALUES) {
    throw new AnalysisError("window", `must be an integer >= ${MIN_TREND_VALUES}, got ${window}`);
  }
  const n = values.length;
  if (n === 0) return { drifting: false, reason: null, mk: null, slopePerBuild: null, baselineDelta: null };

  const base = baselineDelta(values[n - 1], baseline, noiseFloor);
  let mk: MannKendallResult | null = null;
  let slopePerBuild: number | null = null;
  let trendFires = false;
  const m = Math.min(window, n);
  if (m >= MIN_TREND_VALUES) {
    const recent = new Float64Array(m);
    const index = new Float64Array(m);
    for (let i = 0; i < m; i++) {
      recent[i] = values[n - m + i];
      index[i] = i;
    }
    mk = mannKendall(recent, alpha);
    slopePerBuild = theilSen(index, recent).slope;
    trendFires = mk.trend !== "none" && Math.abs(slopePerBuild) * (m - 1) > noiseFloor;
  }
  const reason = base.exceedsNoise ? "baseline" : trendFires ? "trend" : null;
  return { drifting: reason !== null, reason, mk, slopePerBuild, baselineDelta: base.delta };
}

function assertNoiseFloor(noiseFloor: number): void {
  assertFiniteNumber(noiseFloor, "noiseFloor");
  if (noiseFloor < 0) throw new AnalysisError("noiseFloor", `must be >= 0, got ${noiseFloor}`);
}
