import { VERDICT_ORDER, type Verdict } from "@/lib/analysis";
import type { ComparedRunRow } from "@/graphql/operations/build-comparison";

// Condenses a comparison into what a reviewer reads first. Pure.

export interface CoefficientChange {
  name: string;
  model: string;
  value: number | null;
  otherValue: number | null;
  cases: string[];
}

/** Changed closure coefficients, one line per model × coefficient × (old, new), listing the cases. */
export function summariseCoefficientChanges(runs: ComparedRunRow[]): CoefficientChange[] {
  const map = new Map<string, CoefficientChange>();
  for (const r of runs)
    for (const c of r.coefficients) {
      if (!c.changed) continue;
      const key = `${r.model}|${c.name}|${c.otherValue}|${c.value}`;
      const entry = map.get(key) ?? { name: c.name, model: r.model, value: c.value, otherValue: c.otherValue, cases: [] };
      entry.cases.push(r.case);
      map.set(key, entry);
    }
  return [...map.values()].sort((a, b) => a.model.localeCompare(b.model) || a.name.localeCompare(b.name));
}

/** +1 when `to` is worse than `from` by the severity order, −1 when better, 0 otherwise. */
export function verdictDirection(from: Verdict | null, to: Verdict | null): -1 | 0 | 1 {
  if (!from || !to || from === to) return 0;
  return VERDICT_ORDER.indexOf(to) > VERDICT_ORDER.indexOf(from) ? 1 : -1;
}

export function hasChange(r: ComparedRunRow): boolean {
  return r.verdictChanged || r.changedCoefficientCount > 0 || r.quantities.some((q) => q.verdictChanged) || !r.runId || !r.otherRunId;
}
