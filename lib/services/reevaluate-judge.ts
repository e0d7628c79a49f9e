import { judgeValue, worstVerdict, type Verdict } from "@/lib/analysis";
import type { BandInForce } from "@/lib/evaluation/types";

// The pure step of a re-judgement: a build's STORED values against the bands in
// force now. Nothing is derived again: a changed fit window only reaches a value
// when the build is posted again, because the raw series would have to be refitted.

export interface RejudgeRun {
  id: number;
  caseKey: string;
  modelKey: string;
  status: "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";
}

export interface RejudgeValue {
  id: number;
  runId: number;
  quantityKey: string;
  value: number | null;
}

export interface RejudgedValue {
  runId: number;
  quantityKey: string;
  /** Null for a quantity a band now expects that the run never produced. */
  quantityValueId: number | null;
  band: BandInForce | null;
  verdict: Verdict;
}

/** The model's own band for each quantity of a case, else the case-wide one (as at ingest). */
export function bandsForModel(caseKey: string, modelKey: string, bands: readonly BandInForce[]): Map<string, BandInForce> {
  const out = new Map<string, BandInForce>();
  for (const b of bands) {
    if (b.caseKey !== caseKey) continue;
    if (b.modelKey === null && !out.has(b.quantityKey)) out.set(b.quantityKey, b);
    if (b.modelKey === modelKey) out.set(b.quantityKey, b);
  }
  return out;
}

/**
 * Judges every stored value of one build again with judgeValue, adds `missing`
 * for quantities a band in force expects and the run lacks, and rolls the
 * verdicts up the way ingest does (lib/evaluation/judge.ts judgeRun): a run that
 * did not complete is `outside` whatever its values say; a run is its worst
 * quantity, a build its worst run.
 */
export function rejudgeBuild({ runs, values, bands }: { runs: readonly RejudgeRun[]; values: readonly RejudgeValue[]; bands: readonly BandInForce[] }) {
  const byRun = new Map<number, RejudgeValue[]>();
  for (const v of values) byRun.set(v.runId, [...(byRun.get(v.runId) ?? []), v]);

  const judged: RejudgedValue[] = [];
  const runVerdicts: { runId: number; verdict: Verdict }[] = [];
  for (const run of runs) {
    const own = bandsForModel(run.caseKey, run.modelKey, bands);
    const stored = byRun.get(run.id) ?? [];
    const present = new Set(stored.map((v) => v.quantityKey));
    const rows: RejudgedValue[] = stored.map((v) => {
      const band = own.get(v.quantityKey) ?? null;
      return { runId: run.id, quantityKey: v.quantityKey, quantityValueId: v.id, band, verdict: judgeValue(v.value, band) };
    });
    for (const [key, band] of own) {
      if (!present.has(key)) rows.push({ runId: run.id, quantityKey: key, quantityValueId: null, band, verdict: judgeValue(null, band) });
    }
    const worst = worstVerdict(rows.map((r) => r.verdict));
    runVerdicts.push({ runId: run.id, verdict: run.status === "COMPLETED" ? worst : "outside" });
    judged.push(...rows);
  }
  return { verdict: worstVerdict(runVerdicts.map((r) => r.verdict)), runs: runVerdicts, values: judged };
}
