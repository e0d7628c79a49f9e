import Link from "next/link";
import { formatSig } from "@/lib/format/numbers";
import type { ComparedRunRow } from "@/graphql/operations/build-comparison";
import { displayUnit } from "@/components/quantities/quantity-cells";
import { formatDifference, formatDifferencePct, formatValue } from "@/components/quantities/format-value";
import { verdictDirection } from "./compare-summary";
import { VerdictChange } from "./verdict-change";

function RunHeading({ run, buildId, otherBuildId }: { run: ComparedRunRow; buildId: string; otherBuildId: string }) {
  const failed = (s: string | null) => s !== null && s !== "COMPLETED";
  return (
    <tr className="border-t-2 border-ink/15 bg-paper-sunk/50 dark:border-white/15 dark:bg-white/5">
      <th colSpan={7} scope="rowgroup" className="px-2 py-1.5 text-left font-normal">
        <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <span className="font-mono text-xs font-semibold">
            {run.case} · {run.model}
            {run.grid !== "default" && ` · grid ${run.grid}`}
          </span>
          <span className="text-xs text-ink-faint">run verdict</span>
          <VerdictChange from={run.otherVerdict} to={run.verdict} />
          {(failed(run.status) || failed(run.otherStatus)) && (
            <span className="text-xs font-semibold text-verdict-outside">
              status {run.otherStatus?.toLowerCase() ?? "—"} → {run.status?.toLowerCase() ?? "—"}
            </span>
          )}
          {!run.runId && <span className="text-xs font-semibold text-verdict-missing">not run in this build</span>}
          {!run.otherRunId && <span className="text-xs font-semibold text-verdict-missing">not run in the other build</span>}
          <span className="ml-auto flex gap-3 text-xs">
            {run.otherRunId && (
              <Link className="text-tide-700 hover:underline dark:text-tide-300" href={`/builds/${otherBuildId}/runs/${run.otherRunId}`}>
                other run
              </Link>
            )}
            {run.runId && (
              <Link className="text-tide-700 hover:underline dark:text-tide-300" href={`/builds/${buildId}/runs/${run.runId}`}>
                this run →
              </Link>
            )}
          </span>
        </span>
      </th>
    </tr>
  );
}

function CoefficientRow({ run }: { run: ComparedRunRow }) {
  if (run.coefficients.length === 0) return null;
  const changed = run.coefficients.filter((c) => c.changed);
  return (
    <tr className={changed.length ? "bg-verdict-marginal/10" : undefined}>
      <td className="px-2 py-1 text-xs text-ink-soft dark:text-white/60">Closure coefficients</td>
      <td colSpan={6} className="px-2 py-1 text-xs">
        {changed.map((c) => (
          <span key={c.name} className="mr-3 inline-flex items-center gap-1 rounded bg-verdict-marginal/20 px-1.5 py-0.5 font-mono font-semibold text-verdict-marginal ring-1 ring-inset ring-verdict-marginal/50">
            <span aria-hidden>⚠</span> {c.name} {formatSig(c.otherValue, 6)} → {formatSig(c.value, 6)}
          </span>
        ))}
        <span className="text-ink-faint" title={run.coefficients.filter((c) => !c.changed).map((c) => `${c.name} = ${formatSig(c.value ?? c.otherValue, 6)}`).join(", ")}>
          {changed.length === 0 ? `all ${run.coefficients.length} unchanged` : `${run.coefficients.length - changed.length} unchanged`}
        </span>
      </td>
    </tr>
  );
}

/** Side-by-side values per case × model: the other build, this build, the difference, the verdicts. */
export function CompareTable({ runs, buildId, otherBuildId, thisLabel, otherLabel }: { runs: ComparedRunRow[]; buildId: string; otherBuildId: string; thisLabel: string; otherLabel: string }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="compare-table">
        <thead className="text-xs text-ink-faint">
          <tr>
            <th className="px-2 py-1.5 text-left font-medium uppercase tracking-wide">Quantity</th>
            <th className="px-2 py-1.5 text-left font-medium uppercase tracking-wide">Unit</th>
            <th className="px-2 py-1.5 text-right font-medium">{otherLabel}</th>
            <th className="px-2 py-1.5 text-right font-medium">{thisLabel}</th>
            <th className="px-2 py-1.5 text-right font-medium uppercase tracking-wide" title="this build − other build">Difference</th>
            <th className="px-2 py-1.5 text-right font-medium uppercase tracking-wide" title="difference in % of |other value|">%</th>
            <th className="px-2 py-1.5 text-left font-medium uppercase tracking-wide">Verdict</th>
          </tr>
        </thead>
        {runs.map((run) => (
          <tbody key={`${run.case}|${run.model}|${run.grid}`}>
            <RunHeading run={run} buildId={buildId} otherBuildId={otherBuildId} />
            {run.quantities.map((q) => {
              const dir = verdictDirection(q.otherVerdict, q.verdict);
              return (
                <tr key={q.key} className={`border-t border-ink/5 dark:border-white/5 ${dir > 0 ? "bg-verdict-outside/10" : dir < 0 ? "bg-verdict-within/10" : q.verdictChanged ? "bg-verdict-marginal/10" : ""}`}>
                  <td className="px-2 py-1">
                    {q.label ?? q.key} <span className="font-mono text-[11px] text-ink-faint">{q.key}</span>
                  </td>
                  <td className="px-2 py-1 text-xs text-ink-soft dark:text-white/60">{displayUnit(q.unit)}</td>
                  <td className="px-2 py-1 text-right font-mono tabular-nums">{formatValue(q.otherValue, 5)}</td>
                  <td className="px-2 py-1 text-right font-mono tabular-nums">{formatValue(q.value, 5)}</td>
                  <td className="px-2 py-1 text-right font-mono text-xs tabular-nums">{formatDifference(q.difference, q.otherValue)}</td>
                  <td className="px-2 py-1 text-right font-mono text-xs tabular-nums">{formatDifferencePct(q.differencePct)}</td>
                  <td className="px-2 py-1">
                    <VerdictChange from={q.otherVerdict} to={q.verdict} />
                  </td>
                </tr>
              );
            })}
            <CoefficientRow run={run} />
          </tbody>
        ))}
      </table>
    </div>
  );
}
