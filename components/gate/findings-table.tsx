import Link from "next/link";
import { trendHref } from "@/components/overview/links";
import { formatDifference, formatDifferencePct, formatValue } from "@/components/quantities/format-value";
import { Panel } from "@/components/ui/panel";
import { EmptyState } from "@/components/ui/states";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { GateFindingItem } from "@/graphql/operations/gate";
import { formatSig, withUnit } from "@/lib/format/numbers";
import { formatBand, runHref, runLabel, STATUS_WORD } from "./gate-format";
import { sortFindings } from "./sort-findings";

/**
 * Every quantity of the build that needs a look — outside, missing, marginal,
 * drifting, or from a run that did not complete — with its value, its band and
 * the source of the band, the baseline, the drift test, and its run's plots.
 */
export function FindingsTable({ buildId, branch, findings }: { buildId: string; branch: string; findings: GateFindingItem[] }) {
  const rows = sortFindings(findings);
  return (
    <Panel title="Everything that needs a look" subtitle="Worst first. Each run opens its plots, where the value was derived.">
      {rows.length === 0 ? (
        <EmptyState title="Every quantity is within its band and steady">No quantity of this build is outside, marginal, missing or drifting, and every run completed.</EmptyState>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-sm" data-testid="findings">
            <thead className="text-left text-xs text-ink-faint dark:text-white/50">
              <tr className="border-b border-ink/10 dark:border-white/10">
                <th className="py-1.5 pr-3 font-medium">Run</th>
                <th className="py-1.5 pr-3 font-medium">Quantity</th>
                <th className="py-1.5 pr-3 text-right font-medium">Value</th>
                <th className="py-1.5 pr-3 font-medium">Band</th>
                <th className="py-1.5 pr-3 font-medium">Against the baseline</th>
                <th className="py-1.5 font-medium">Gate</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((f) => (
                <tr key={f.id} className="border-b border-ink/5 align-top dark:border-white/10">
                  <td className="py-2 pr-3">
                    <Link href={runHref(buildId, f.runId)} className="font-medium whitespace-nowrap text-tide-700 hover:underline dark:text-tide-300" title="Open the run's plots">
                      {runLabel(f)}
                    </Link>
                    {f.runStatus !== "COMPLETED" && <div className="text-xs text-verdict-outside">run {STATUS_WORD[f.runStatus]}</div>}
                  </td>
                  <td className="py-2 pr-3">
                    {f.quantity ? (
                      <>
                        <div>{f.label ?? f.quantity}</div>
                        <div className="font-mono text-xs text-ink-faint dark:text-white/50">{f.quantity}</div>
                      </>
                    ) : (
                      <span className="text-ink-faint">no quantity reported</span>
                    )}
                  </td>
                  <td className="py-2 pr-3 text-right">
                    <div className="font-mono whitespace-nowrap tabular-nums">{f.quantity ? withUnit(formatValue(f.value), f.unit) : "—"}</div>
                    {f.verdict && (
                      <div className="mt-0.5">
                        <VerdictBadge verdict={f.verdict} />
                      </div>
                    )}
                  </td>
                  <td className="py-2 pr-3 text-xs">
                    <BandCell f={f} />
                  </td>
                  <td className="py-2 pr-3 text-xs">
                    <BaselineCell f={f} branch={branch} />
                  </td>
                  <td className="py-2 text-xs">
                    {f.waiver ? (
                      <span className="text-ink-soft dark:text-white/70">waived (#{f.waiver.id})</span>
                    ) : f.blockReason ? (
                      <span className="font-medium text-verdict-outside">blocks approval</span>
                    ) : (
                      <span className="text-ink-faint dark:text-white/50">does not block</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </Panel>
  );
}

function BandCell({ f }: { f: GateFindingItem }) {
  if (f.bandVersion === null) return <span className="text-ink-faint">no band</span>;
  return (
    <>
      <div className="font-mono whitespace-nowrap tabular-nums">{formatBand(f)}</div>
      {f.reference !== null && <div className="text-ink-soft dark:text-white/70">reference {formatSig(f.reference)}</div>}
      <div className="text-ink-faint dark:text-white/50" title={f.source ?? undefined}>
        {f.bandKind} · v{f.bandVersion}
        {f.source && <span className="block max-w-80 truncate">{f.source}</span>}
      </div>
    </>
  );
}

function BaselineCell({ f, branch }: { f: GateFindingItem; branch: string }) {
  const trend = f.quantity ? trendHref({ caseKey: f.case, quantity: f.quantity, models: [f.model], branch, grid: f.grid }) : null;
  return (
    <>
      {f.baselineValue === null ? (
        <div className="text-ink-faint">no baseline value</div>
      ) : (
        <div className="font-mono tabular-nums">
          {formatValue(f.baselineValue)}
          {f.baselineDelta !== null && (
            <span className="text-ink-soft dark:text-white/70">
              {" "}
              (Δ {formatDifference(f.baselineDelta, f.baselineValue)}
              {f.baselineValue !== 0 && `, ${formatDifferencePct((100 * f.baselineDelta) / Math.abs(f.baselineValue))}`})
            </span>
          )}
        </div>
      )}
      {f.drift && (
        <div className="text-tide-700 dark:text-tide-300">
          {f.driftReason === "trend" ? (
            <>
              monotone trend, Mann–Kendall p = {formatSig(f.driftPValue, 2)}
              {f.driftSlope !== null && <>, Theil–Sen {formatDifference(f.driftSlope, f.value)} per build</>}
            </>
          ) : (
            <>step vs baseline beyond the noise floor {f.noiseFloor !== null ? `(${formatSig(f.noiseFloor, 2)})` : ""}</>
          )}
        </div>
      )}
      {trend && (
        <Link href={trend} className="text-tide-700 hover:underline dark:text-tide-300">
          trend →
        </Link>
      )}
    </>
  );
}
