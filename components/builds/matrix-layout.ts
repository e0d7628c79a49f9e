import type { Verdict } from "@/lib/analysis";
import type { MatrixRun } from "@/graphql/operations/builds";

// Arranges a build's runs as cases × models. Pure, so the component only draws.

export type MatrixCell =
  | { kind: "runs"; runs: MatrixRun[] }
  /** The case lists this model but the build has no run for it. */
  | { kind: "no-run" }
  /** The model is not part of this case. */
  | { kind: "not-applicable" };

export interface MatrixLayout {
  cases: { key: string; title: string; cells: MatrixCell[] }[];
  models: { key: string; name: string }[];
  counts: Record<Verdict | "noRun", number>;
}

// Columns go from the simplest closure to the most complete one.
const FAMILY_ORDER = ["one-equation", "two-equation", "reynolds-stress"];

export function layoutMatrix({
  runs,
  cases,
  models,
}: {
  runs: MatrixRun[];
  cases: { key: string; title: string; models: string[] }[];
  models: { key: string; name: string; family: string }[];
}): MatrixLayout {
  // Every canonical case gets a row: a case CI left out entirely must show as empty
  // cells, not vanish from the matrix.
  const usedCases = cases;
  const modelKeys = new Set([...runs.map((r) => r.model), ...usedCases.flatMap((c) => c.models)]);
  const rank = (family: string) => (FAMILY_ORDER.indexOf(family) + FAMILY_ORDER.length + 1) % (FAMILY_ORDER.length + 1);
  const columns = models.filter((m) => modelKeys.has(m.key)).sort((a, b) => rank(a.family) - rank(b.family));
  const counts = { within: 0, marginal: 0, outside: 0, unbanded: 0, missing: 0, noRun: 0 };
  for (const r of runs) counts[r.verdict] += 1;
  const rows = usedCases.map((c) => ({
    key: c.key,
    title: c.title,
    cells: columns.map((m): MatrixCell => {
      const here = runs.filter((r) => r.case === c.key && r.model === m.key).sort((a, b) => gridRank(a.grid) - gridRank(b.grid) || a.grid.localeCompare(b.grid));
      if (here.length > 0) return { kind: "runs", runs: here };
      if (c.models.includes(m.key)) {
        counts.noRun += 1;
        return { kind: "no-run" };
      }
      return { kind: "not-applicable" };
    }),
  }));
  return { cases: rows, models: columns.map((m) => ({ key: m.key, name: m.name })), counts };
}

// Grid names are free text; the usual fine/medium/coarse words sort fine to coarse.
function gridRank(grid: string): number {
  const i = ["default", "fine", "medium", "coarse"].indexOf(grid);
  return i < 0 ? 99 : i;
}
