import { DRIFT_WINDOW } from "@/lib/evaluation/judge";
import { formatDelta, formatSig, withUnit } from "@/lib/format/numbers";
import type { AlertFacts, AlertWhere, BandExit, DriftNote, IncompleteRun } from "./alert-facts";
import { shortCommit } from "./alert-facts";

// The sentences of an alert, shared by the plain-text and the HTML body so the
// two always say the same thing. Numbers keep four significant figures, as on
// the run pages; changes three.

export function describeWhere(w: AlertWhere): string {
  return `${w.caseKey} · ${w.model} · grid ${w.grid}`;
}

export function quantityName(q: { quantity: string; label: string | null }): string {
  return q.label ? `${q.label} (${q.quantity})` : q.quantity;
}

export function runUrl(appUrl: string, buildId: number, runId: number): string {
  return `${appUrl}/builds/${buildId}/runs/${runId}`;
}

export function buildUrl(appUrl: string, buildId: number): string {
  return `${appUrl}/builds/${buildId}`;
}

function limitsText(e: { lower: number | null; upper: number | null }): string {
  if (e.lower !== null && e.upper !== null) return `${formatSig(e.lower)} – ${formatSig(e.upper)}`;
  if (e.lower !== null) return `≥ ${formatSig(e.lower)}`;
  if (e.upper !== null) return `≤ ${formatSig(e.upper)}`;
  return "no limits";
}

/** "= 1.149, 0.051 above the upper limit; accepted 1.076 – 1.098 (reference 1.087; verification band v2)" */
export function describeExit(e: BandExit): string {
  if (e.value === null) return `no value; accepted ${withUnit(limitsText(e), e.unit)}`;
  let side = "";
  if (e.upper !== null && e.value > e.upper) side = `, ${withUnit(formatSig(e.value - e.upper, 3), e.unit)} above the upper limit`;
  else if (e.lower !== null && e.value < e.lower) side = `, ${withUnit(formatSig(e.lower - e.value, 3), e.unit)} below the lower limit`;
  const band = [e.reference !== null ? `reference ${withUnit(formatSig(e.reference), e.unit)}` : null, e.bandKind ? `${e.bandKind} band${e.bandVersion ? ` v${e.bandVersion}` : ""}` : null]
    .filter(Boolean)
    .join("; ");
  return `= ${withUnit(formatSig(e.value), e.unit)}${side}; accepted ${withUnit(limitsText(e), e.unit)}${band ? ` (${band})` : ""}`;
}

/** Why a value drifts, in the words of the method that found it. */
export function describeDrift(d: DriftNote): string {
  const now = d.value === null ? "no value" : withUnit(formatSig(d.value), d.unit);
  const state = d.verdict === "outside" ? "outside its band" : d.verdict === "marginal" ? "marginal" : d.verdict === "within" ? "still within its band" : d.verdict;
  if (d.reason === "baseline") {
    const pct = d.baselineDelta !== null && d.baselineValue ? ` (${formatDelta((100 * d.baselineDelta) / Math.abs(d.baselineValue), 3)} %)` : "";
    const floor = d.noiseFloor !== null ? `; noise floor ${withUnit(formatSig(d.noiseFloor, 3), d.unit)}` : "";
    return `= ${now}, ${state}: changed by ${withUnit(formatDelta(d.baselineDelta), d.unit)}${pct} against the baseline ${withUnit(formatSig(d.baselineValue), d.unit)}${floor}`;
  }
  const slope = d.slopePerBuild !== null ? `Theil–Sen slope ${withUnit(formatDelta(d.slopePerBuild), d.unit)} per build` : "Theil–Sen slope not available";
  const p = d.pValue !== null ? `, Mann–Kendall p = ${formatSig(d.pValue, 2)}` : "";
  return `= ${now}, ${state}: monotone trend over the last ${DRIFT_WINDOW} builds, ${slope}${p}`;
}

const STATUS_TEXT: Record<string, string> = { DIVERGED: "diverged", CRASHED: "crashed", TIMEOUT: "timed out" };

export function describeIncomplete(r: IncompleteRun): string {
  const what = STATUS_TEXT[r.status] ?? r.status.toLowerCase();
  return r.iterations !== null ? `${what} after ${r.iterations} iterations` : what;
}

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** "2 band exits, 1 run diverged or crashed, 5 drifts" */
export function countFindings(f: AlertFacts): string {
  return [
    f.exits.length ? plural(f.exits.length, "band exit", "band exits") : null,
    f.incompleteRuns.length ? plural(f.incompleteRuns.length, "run not completed", "runs not completed") : null,
    f.drifts.length ? plural(f.drifts.length, "drift", "drifts") : null,
  ]
    .filter(Boolean)
    .join(", ");
}

export function describeBuild(f: AlertFacts): string {
  return `${f.build.solver} ${f.build.version} (${shortCommit(f.build.commit)}) on ${f.build.branch}`;
}

export function alertSubject(f: AlertFacts): string {
  return `Tauline: ${describeBuild(f)} — ${countFindings(f)}`;
}
