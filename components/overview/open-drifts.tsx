"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { MORNING_OPEN_DRIFTS, type OpenDriftRow } from "@/graphql/operations/overview";
import { DRIFT_ALPHA, DRIFT_WINDOW } from "@/lib/evaluation/judge";
import { formatDelta, formatSig, withUnit } from "@/lib/format/numbers";
import { BuildName, FindingTable, RunQuantity } from "./build-bits";
import { groupByBranch } from "./group-by-branch";
import { runHref, trendHref } from "./links";
import { relativeChange } from "./quantity-text";

export function OpenDrifts() {
  const { data, loading, error } = useQuery(MORNING_OPEN_DRIFTS);
  return (
    <Panel
      title="Open drifts"
      subtitle={`Newest build of each branch: a step against the baseline larger than the noise floor, or a monotone trend over the last ${DRIFT_WINDOW} builds (Mann–Kendall test at α = ${DRIFT_ALPHA}, Theil–Sen slope).`}
    >
      {loading && !data ? (
        <LoadingBlock label="Loading open drifts" rows={5} />
      ) : error ? (
        <ErrorNotice title="Could not load the open drifts" error={error} />
      ) : !data || data.morningView.openDrifts.length === 0 ? (
        <EmptyState title="No drift">No quantity of a branch's newest build moved beyond its noise floor or trends monotonically.</EmptyState>
      ) : (
        <div className="space-y-4">
          {groupByBranch(data.morningView.openDrifts).map(([branch, rows]) => (
            <div key={branch}>
              <p className="mb-1 text-sm">
                <span className="font-mono text-xs">{branch}</span> · <BuildName build={rows[0].build} />
              </p>
              <FindingTable
                columns={[
                  { label: "Run · quantity" },
                  { label: "Value", numeric: true },
                  { label: "Why" },
                  { label: "Change vs baseline", numeric: true },
                  { label: `Trend of the last ${DRIFT_WINDOW} builds`, numeric: true },
                ]}
              >
                {rows.map((r) => (
                  <DriftRow key={`${r.case}|${r.model}|${r.grid}|${r.quantity}`} row={r} />
                ))}
              </FindingTable>
            </div>
          ))}
        </div>
      )}
    </Panel>
  );
}

function DriftRow({ row: r }: { row: OpenDriftRow }) {
  const multiple = r.baselineDelta !== null && r.noiseFloor ? Math.abs(r.baselineDelta) / r.noiseFloor : null;
  return (
    <tr className="border-t border-ink/5 align-top dark:border-white/10" data-drift={`${r.case}/${r.model}/${r.quantity}`}>
      <td className="py-1.5 pr-3">
        <RunQuantity caseKey={r.case} model={r.model} grid={r.grid} quantity={r.quantity} label={r.label} />
      </td>
      <td className="py-1.5 pr-3 text-right whitespace-nowrap">
        <span className="mr-2 font-mono tabular-nums">{withUnit(formatSig(r.value, 4), r.unit)}</span>
        <VerdictBadge verdict={r.verdict} />
      </td>
      <td className="py-1.5 pr-3 text-xs whitespace-nowrap">{r.reason === "trend" ? "monotone trend" : r.reason === "baseline" ? "step vs baseline" : "—"}</td>
      <td className="py-1.5 pr-3 text-right whitespace-nowrap font-mono tabular-nums">
        {formatDelta(r.baselineDelta, 3)} <span className="text-xs text-ink-faint">{relativeChange(r.baselineDelta, r.baselineValue)}</span>
        {multiple !== null && (
          <span className="block font-sans text-xs text-ink-faint">
            {formatSig(multiple, 2)}× noise floor {formatSig(r.noiseFloor, 2)}
          </span>
        )}
      </td>
      <td className="py-1.5 pr-3 text-right whitespace-nowrap font-mono tabular-nums">
        {formatDelta(r.slopePerBuild, 3)}
        <span className="font-sans text-xs text-ink-faint"> /build</span>
        <span className={`block font-sans text-xs ${r.pValue !== null && r.pValue < DRIFT_ALPHA ? "font-semibold" : "text-ink-faint"}`}>
          Mann–Kendall p = {formatSig(r.pValue, 2)}
        </span>
      </td>
      <td className="py-1.5 whitespace-nowrap text-xs">
        <Link className="text-tide-700 underline dark:text-tide-300" href={trendHref({ caseKey: r.case, quantity: r.quantity, models: [r.model], branch: r.branch, grid: r.grid })}>
          trend
        </Link>{" "}
        <Link className="text-tide-700 underline dark:text-tide-300" href={runHref(r.build.id, r.runId)}>
          run
        </Link>
      </td>
    </tr>
  );
}
