"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { Panel } from "@/components/ui/panel";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { MORNING_BAND_EXITS, type BandExitRow } from "@/graphql/operations/overview";
import { formatDelta, formatSig, withUnit } from "@/lib/format/numbers";
import { BuildName, FindingTable, RunQuantity } from "./build-bits";
import { runHref, trendHref } from "./links";
import { groupByBranch } from "./group-by-branch";
import { formatLimits, relativeChange } from "./quantity-text";

export function BandExits() {
  const { data, loading, error } = useQuery(MORNING_BAND_EXITS);
  return (
    <Panel title="Left their band since the baseline" subtitle="Newest build of each branch against its baseline (last approved build): was within or marginal, now outside or missing.">
      {loading && !data ? (
        <LoadingBlock label="Loading band exits" rows={5} />
      ) : error ? (
        <ErrorNotice title="Could not load the band exits" error={error} />
      ) : !data || data.morningView.bandExits.length === 0 ? (
        <EmptyState title="Nothing left its band">Every quantity that was within its band in a branch baseline still is in the branch's newest build.</EmptyState>
      ) : (
        <div className="space-y-4">
          {groupByBranch(data.morningView.bandExits).map(([branch, rows]) => (
            <BranchExits key={branch} branch={branch} rows={rows} />
          ))}
        </div>
      )}
    </Panel>
  );
}

function BranchExits({ branch, rows }: { branch: string; rows: BandExitRow[] }) {
  const { build, baseline } = rows[0];
  return (
    <div>
      <p className="mb-1 text-sm">
        <span className="font-mono text-xs">{branch}</span> · <BuildName build={build} /> <span className="text-ink-faint">against baseline</span> <BuildName build={baseline} />
      </p>
      <FindingTable
        columns={[
          { label: "Run · quantity" },
          { label: "Now", numeric: true },
          { label: "Band in force" },
          { label: "Baseline", numeric: true },
          { label: "Change vs baseline", numeric: true },
        ]}
      >
        {rows.map((r) => (
          <ExitRow key={`${r.case}|${r.model}|${r.grid}|${r.quantity}`} row={r} />
        ))}
      </FindingTable>
    </div>
  );
}

function ExitRow({ row: r }: { row: BandExitRow }) {
  const absent = r.runId === null ? "no run in this build" : r.runStatus && r.runStatus !== "COMPLETED" ? `run ${r.runStatus.toLowerCase()}` : null;
  const delta = r.value !== null && r.baselineValue !== null ? r.value - r.baselineValue : null;
  return (
    <tr className="border-t border-ink/5 align-top dark:border-white/10" data-exit={`${r.case}/${r.model}/${r.quantity}`}>
      <td className="py-1.5 pr-3">
        <RunQuantity caseKey={r.case} model={r.model} grid={r.grid} quantity={r.quantity} label={r.label} />
      </td>
      <td className="py-1.5 pr-3 text-right whitespace-nowrap">
        <span className="mr-2 font-mono tabular-nums">{withUnit(formatSig(r.value, 4), r.unit)}</span>
        <VerdictBadge verdict={r.verdict} />
        {absent && <p className="text-xs text-verdict-outside">{absent}</p>}
      </td>
      <td className="py-1.5 pr-3 whitespace-nowrap font-mono text-xs tabular-nums">
        {formatLimits(r.lower, r.upper, r.unit)}
        {r.bandVersion !== null && <span className="ml-1 font-sans text-ink-faint" title={`band version ${r.bandVersion}`}>v{r.bandVersion}</span>}
        {r.reference !== null && <span className="block font-sans text-ink-faint">reference {withUnit(formatSig(r.reference, 4), r.unit)}</span>}
      </td>
      <td className="py-1.5 pr-3 text-right whitespace-nowrap">
        <span className="font-mono tabular-nums">{withUnit(formatSig(r.baselineValue, 4), r.unit)}</span> <span className="text-xs text-ink-faint">{r.baselineVerdict}</span>
      </td>
      <td className="py-1.5 pr-3 text-right whitespace-nowrap font-mono tabular-nums">
        {formatDelta(delta, 3)}
        <span className="block text-xs text-ink-faint">{relativeChange(delta, r.baselineValue)}</span>
      </td>
      <td className="py-1.5 whitespace-nowrap text-xs">
        {r.runId && (
          <Link className="text-tide-700 underline dark:text-tide-300" href={runHref(r.build.id, r.runId)}>
            run
          </Link>
        )}{" "}
        <Link className="text-tide-700 underline dark:text-tide-300" href={trendHref({ caseKey: r.case, quantity: r.quantity, models: [r.model], branch: r.branch, grid: r.grid })}>
          trend
        </Link>
      </td>
    </tr>
  );
}
