import { baselineDelta, detectDrift, judgeValue, worstVerdict, type Verdict } from "@/lib/analysis";
import type { BandInForce, DerivedQuantity, JudgedQuantity } from "./types";

export const DRIFT_WINDOW = 8;
export const DRIFT_ALPHA = 0.05;

export interface JudgeInput {
  status: "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";
  quantities: DerivedQuantity[];
  /** Bands in force for this case and model: the model's own, else the case-wide one. */
  bandFor: (quantityKey: string) => BandInForce | null;
  /** Every quantity key some band in force expects from this case and model. */
  expectedKeys: string[];
  baseline: { buildId: number; values: Map<string, number | null> } | null;
  /** Earlier values on the branch (oldest first), excluding this build. */
  history: (quantityKey: string) => number[];
}

/**
 * Judges one run's quantities (pure): verdict against the band in force, change
 * against the branch baseline, and drift (baseline change beyond the noise floor,
 * or a Mann–Kendall trend over the last builds). A run that did not complete is
 * judged `outside` whatever its quantities say: a diverged or crashed case is a
 * failure of the build, not an absence of data.
 */
export function judgeRun(input: JudgeInput): { quantities: JudgedQuantity[]; verdict: Verdict } {
  const judged: JudgedQuantity[] = [];
  const present = new Set<string>();
  for (const q of input.quantities) {
    present.add(q.key);
    judged.push(judgeQuantity(q.key, q.value, q.origin, q.details, input));
  }
  for (const key of input.expectedKeys) {
    if (!present.has(key)) judged.push(judgeQuantity(key, null, "expected", { reason: "not reported and not derivable from the run's data" }, input));
  }
  const worst = worstVerdict(judged.map((j) => j.verdict));
  const verdict: Verdict = input.status === "COMPLETED" ? worst : "outside";
  return { quantities: judged, verdict };
}

function judgeQuantity(
  key: string,
  value: number | null,
  origin: JudgedQuantity["origin"],
  details: Record<string, unknown>,
  input: JudgeInput,
): JudgedQuantity {
  const band = input.bandFor(key);
  const verdict = judgeValue(value, band);
  const baselineValue = input.baseline?.values.get(key) ?? null;
  const noiseFloor = band?.noiseFloor ?? 0;
  const delta = value === null || baselineValue === null ? null : baselineDelta(value, baselineValue, noiseFloor).delta;

  let drift = false;
  let driftReason: JudgedQuantity["driftReason"] = null;
  let driftPValue: number | null = null;
  let driftSlope: number | null = null;
  // Drift needs a noise floor to tell signal from scatter, which only a band gives.
  if (band && value !== null) {
    const values = [...input.history(key), value];
    const d = detectDrift({ values, baseline: baselineValue, noiseFloor, window: DRIFT_WINDOW, alpha: DRIFT_ALPHA });
    drift = d.drifting;
    driftReason = d.reason;
    driftPValue = d.mk?.pValue ?? null;
    driftSlope = d.slopePerBuild;
  }

  return {
    key,
    value,
    origin,
    band,
    verdict,
    baselineBuildId: baselineValue === null ? null : input.baseline?.buildId ?? null,
    baselineValue,
    baselineDelta: delta,
    drift,
    driftReason,
    driftPValue,
    driftSlope,
    details,
  };
}
