import { VerdictBadge } from "@/components/ui/verdict-badge";
import { formatSig } from "@/lib/format/numbers";
import { formatDifference, formatValue } from "./format-value";
import { DeviationCell, DriftCell, OriginTag, displayUnit, formatLimits } from "./quantity-cells";
import type { QuantityRow } from "./types";

export type { QuantityRow } from "./types";

// Verdict order puts what needs attention first; within a verdict the library order is kept.
const VERDICT_RANK = { outside: 0, missing: 1, marginal: 2, unbanded: 3, within: 4 } as const;

/**
 * Every quantity of one run against its band and its baseline. A plain table (no
 * client state), so server and client parents can both render it.
 */
export function QuantityTable({ quantities, sortByVerdict = false }: { quantities: QuantityRow[]; sortByVerdict?: boolean }) {
  const rows = sortByVerdict ? [...quantities].sort((a, b) => VERDICT_RANK[a.verdict] - VERDICT_RANK[b.verdict]) : quantities;
  if (rows.length === 0) return <p className="text-sm text-ink-soft dark:text-white/60">This run has no quantities.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="quantity-table">
        <thead className="text-left text-xs whitespace-nowrap uppercase tracking-wide text-ink-faint">
          <tr className="border-b border-ink/10 dark:border-white/10">
            <th className="py-1.5 pr-3">Quantity</th>
            <th className="py-1.5 pr-3 text-right">Value</th>
            <th className="py-1.5 pr-3">Unit</th>
            <th className="py-1.5 pr-3">Origin</th>
            <th className="py-1.5 pr-3 text-right">Reference</th>
            <th className="py-1.5 pr-3 text-right">Limits</th>
            <th className="py-1.5 pr-3 text-right" title="value − reference (in % of |reference|)">Deviation</th>
            <th className="py-1.5 pr-3 text-right" title="value − value in the baseline build (last approved on the branch)">Δ baseline</th>
            <th className="py-1.5 pr-3">Drift</th>
            <th className="py-1.5">Verdict</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((q) => (
            <tr key={q.key} className="border-b border-ink/5 align-top last:border-0 dark:border-white/5" data-quantity={q.key}>
              <td className="py-1.5 pr-3">
                <div>{q.label ?? q.key}</div>
                <div className="font-mono text-[11px] text-ink-faint">{q.key}</div>
              </td>
              <td className="py-1.5 pr-3 text-right font-mono tabular-nums">{formatValue(q.value)}</td>
              <td className="py-1.5 pr-3 text-xs text-ink-soft dark:text-white/60">{displayUnit(q.unit)}</td>
              <td className="py-1.5 pr-3">
                <OriginTag origin={q.origin} />
              </td>
              <td className="py-1.5 pr-3 text-right">
                <div className="font-mono tabular-nums">{formatSig(q.reference)}</div>
                {q.source && <div className="ml-auto max-w-[16rem] text-[11px] leading-tight text-ink-faint">{q.source}</div>}
              </td>
              <td className="py-1.5 pr-3 text-right font-mono text-xs whitespace-nowrap tabular-nums">{formatLimits(q.lower, q.upper)}</td>
              <td className="py-1.5 pr-3 text-right font-mono text-xs tabular-nums">
                <DeviationCell deviation={q.deviation} deviationPct={q.deviationPct} reference={q.reference} />
              </td>
              <td className="py-1.5 pr-3 text-right font-mono text-xs tabular-nums" title={q.baselineValue !== null ? `baseline value ${formatSig(q.baselineValue)}` : "no baseline value"}>
                {formatDifference(q.baselineDelta, q.baselineValue)}
              </td>
              <td className="py-1.5 pr-3">
                <DriftCell drift={q.drift} reason={q.driftReason} />
              </td>
              <td className="py-1.5">
                <VerdictBadge verdict={q.verdict} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
