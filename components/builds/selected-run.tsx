"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { QuantityTable } from "@/components/quantities/quantity-table";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { RUN_QUANTITIES } from "@/graphql/operations/builds";

/** The quantities of the run selected in the matrix (?run=ID), with a way to its plots. */
export function SelectedRun({ buildId }: { buildId: string }) {
  const { params, update } = useQueryParams();
  const raw = params.get("run");
  const runId = raw && /^[1-9][0-9]{0,15}$/.test(raw) ? raw : null;
  const { data, loading, error } = useQuery(RUN_QUANTITIES, { variables: { id: runId ?? "" }, skip: !runId });

  if (!runId)
    return (
      <Panel title="Quantities of a run">
        <EmptyState title="No run selected">Select a cell of the matrix above to see the run&apos;s quantities against their bands and the baseline.</EmptyState>
      </Panel>
    );
  const run = data?.run;
  const close = (
    <button type="button" onClick={() => update({ run: null })} className="text-xs text-ink-soft underline dark:text-white/60">
      close
    </button>
  );
  if (error) return <ErrorNotice title="Could not load the run's quantities" error={error} />;
  if (loading && !run) return <Panel title="Quantities of a run"><LoadingBlock label="Loading the run's quantities" rows={5} /></Panel>;
  if (!run || run.buildId !== buildId)
    return (
      <Panel title="Quantities of a run" actions={close}>
        <EmptyState title={`Run ${runId} is not part of this build`}>The link may be from another build; select a cell of the matrix.</EmptyState>
      </Panel>
    );
  const failed = run.status !== "COMPLETED";
  return (
    <Panel
      title={
        <span className="flex flex-wrap items-center gap-2">
          <span className="font-mono">{run.case}</span>
          <span className="text-ink-faint">·</span>
          <span className="font-mono">{run.model}</span>
          {run.grid !== "default" && <span className="font-mono text-ink-faint">grid {run.grid}</span>}
          <VerdictBadge verdict={run.verdict} />
          {failed && <span className="rounded bg-verdict-outside/15 px-1.5 py-0.5 text-xs font-semibold text-verdict-outside">run {run.status.toLowerCase()}</span>}
        </span>
      }
      subtitle={run.iterations !== null ? `${run.iterations.toLocaleString("en-GB")} iterations` : undefined}
      actions={
        <>
          <Link href={`/builds/${buildId}/runs/${run.id}`} className="rounded bg-tide-700 px-2.5 py-1 text-xs font-medium text-white hover:bg-tide-900">
            Open the run with its plots →
          </Link>
          {close}
        </>
      }
    >
      <QuantityTable quantities={run.quantities} sortByVerdict />
    </Panel>
  );
}
