import type { Verdict } from "@/lib/analysis";

// Pure pairing of two builds' runs by case × model × grid (no I/O), so the
// comparison rules can be read and tested on their own.

export interface RunSide {
  id: number;
  case_key: string;
  model_key: string;
  grid: string;
  status: string;
  verdict: Verdict;
}
export interface ValueSide {
  run_id: number;
  quantity_key: string;
  value: number | null;
  verdict: Verdict;
}
export interface CoefficientSide {
  run_id: number;
  name: string;
  value: number;
}

export interface ComparedQuantity {
  key: string;
  value: number | null;
  otherValue: number | null;
  /** value − otherValue; null when either side has no value. */
  difference: number | null;
  /** difference in percent of |otherValue|; null when otherValue is 0 or missing. */
  differencePct: number | null;
  verdict: Verdict | null;
  otherVerdict: Verdict | null;
  verdictChanged: boolean;
}

export interface ComparedCoefficient {
  name: string;
  value: number | null;
  otherValue: number | null;
  changed: boolean;
}

export interface ComparedRun {
  case: string;
  model: string;
  grid: string;
  run: RunSide | null;
  otherRun: RunSide | null;
  verdictChanged: boolean;
  quantities: ComparedQuantity[];
  coefficients: ComparedCoefficient[];
  changedCoefficientCount: number;
}

// Coefficients are posted as the solver's doubles; a relative change below this is
// round-off of the same constant (e.g. 2/3 printed with fewer digits), not a change.
const COEFFICIENT_RTOL = 1e-9;

export function coefficientChanged(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a !== b;
  return Math.abs(a - b) > COEFFICIENT_RTOL * Math.max(Math.abs(a), Math.abs(b));
}

const runKey = (r: { case_key: string; model_key: string; grid: string }) => `${r.case_key}|${r.model_key}|${r.grid}`;

function groupByRun<T extends { run_id: number }>(rows: T[]): Map<number, T[]> {
  const m = new Map<number, T[]>();
  for (const r of rows) m.set(r.run_id, [...(m.get(r.run_id) ?? []), r]);
  return m;
}

/** Pairs the runs of `runs` with those of `otherRuns` and compares values and coefficients. */
export function pairRuns({
  runs,
  otherRuns,
  values,
  coefficients,
}: {
  runs: RunSide[];
  otherRuns: RunSide[];
  values: ValueSide[];
  coefficients: CoefficientSide[];
}): ComparedRun[] {
  const valuesByRun = groupByRun(values);
  const coefsByRun = groupByRun(coefficients);
  const pairs = new Map<string, { run: RunSide | null; otherRun: RunSide | null }>();
  for (const r of runs) pairs.set(runKey(r), { run: r, otherRun: null });
  for (const r of otherRuns) {
    const p = pairs.get(runKey(r));
    if (p) p.otherRun = r;
    else pairs.set(runKey(r), { run: null, otherRun: r });
  }
  const out: ComparedRun[] = [];
  for (const { run, otherRun } of pairs.values()) {
    const ref = (run ?? otherRun)!;
    const quantities = pairByName(valuesByRun.get(run?.id ?? -1) ?? [], valuesByRun.get(otherRun?.id ?? -1) ?? [], (v) => v.quantity_key).map(([key, a, b]) => {
      const difference = a?.value != null && b?.value != null ? a.value - b.value : null;
      return {
        key,
        value: a?.value ?? null,
        otherValue: b?.value ?? null,
        difference,
        differencePct: difference !== null && b!.value !== 0 ? (100 * difference) / Math.abs(b!.value!) : null,
        verdict: a?.verdict ?? null,
        otherVerdict: b?.verdict ?? null,
        verdictChanged: (a?.verdict ?? null) !== (b?.verdict ?? null),
      };
    });
    const coefs = pairByName(coefsByRun.get(run?.id ?? -1) ?? [], coefsByRun.get(otherRun?.id ?? -1) ?? [], (c) => c.name).map(([name, a, b]) => ({
      name,
      value: a?.value ?? null,
      otherValue: b?.value ?? null,
      // With a run missing from one build there is nothing to compare against:
      // that absence is its own finding, shown as such, not as changed coefficients.
      changed: run !== null && otherRun !== null && coefficientChanged(a?.value ?? null, b?.value ?? null),
    }));
    out.push({
      case: ref.case_key,
      model: ref.model_key,
      grid: ref.grid,
      run,
      otherRun,
      verdictChanged: (run?.verdict ?? null) !== (otherRun?.verdict ?? null),
      quantities,
      coefficients: coefs,
      changedCoefficientCount: coefs.filter((c) => c.changed).length,
    });
  }
  return out.sort((a, b) => a.case.localeCompare(b.case) || a.model.localeCompare(b.model) || a.grid.localeCompare(b.grid));
}

function pairByName<T>(a: T[], b: T[], name: (t: T) => string): [string, T | undefined, T | undefined][] {
  const names = [...new Set([...a.map(name), ...b.map(name)])].sort();
  const ma = new Map(a.map((t) => [name(t), t]));
  const mb = new Map(b.map((t) => [name(t), t]));
  return names.map((n) => [n, ma.get(n), mb.get(n)]);
}
