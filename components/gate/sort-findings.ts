import type { Verdict } from "@/lib/analysis";
import type { GateFindingItem } from "@/graphql/operations/gate";

// Worst first: what blocks approval, then what a waiver lets through, then by
// verdict severity, drifting quantities last among equals; ties by run and key.
const SEVERITY: Record<Verdict, number> = { outside: 0, missing: 1, marginal: 2, unbanded: 3, within: 4 };

function rank(f: GateFindingItem): number[] {
  const gate = f.blockReason === null ? 2 : f.waiver ? 1 : 0;
  return [gate, f.verdict === null ? -1 : SEVERITY[f.verdict], f.drift ? 0 : 1];
}

export function sortFindings(findings: readonly GateFindingItem[]): GateFindingItem[] {
  return [...findings].sort((a, b) => {
    const ra = rank(a);
    const rb = rank(b);
    for (let i = 0; i < ra.length; i++) if (ra[i] !== rb[i]) return ra[i] - rb[i];
    return `${a.case}/${a.model}/${a.grid}/${a.quantity ?? ""}`.localeCompare(`${b.case}/${b.model}/${b.grid}/${b.quantity ?? ""}`);
  });
}
