"use client";

import { useQuery } from "@apollo/client/react";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { MORNING_CANDIDATES } from "@/graphql/operations/overview";
import { BuildName, formatReceived, RunCounts } from "./build-bits";

export function AwaitingDecision() {
  const { data, loading, error } = useQuery(MORNING_CANDIDATES);
  const result = data?.morningView.releaseCandidates;
  const seen = new Set<string>();
  return (
    <Panel title="Awaiting a release decision" subtitle="Builds on release/* branches without a gate decision, newest first.">
      {loading && !data ? (
        <LoadingBlock label="Loading release candidates" rows={4} />
      ) : error ? (
        <ErrorNotice title="Could not load the release candidates" error={error} />
      ) : !result || result.awaiting.length === 0 ? (
        <EmptyState title="No candidate is waiting">Every release-branch build has a decision or was settled by a later one.</EmptyState>
      ) : (
        <ul className="divide-y divide-ink/5 dark:divide-white/10">
          {result.awaiting.map((b) => {
            // The first (newest) undecided build of a branch is the one to decide; older ones are usually superseded by it.
            const newest = !seen.has(b.branch);
            seen.add(b.branch);
            return (
              <li key={b.id} className="flex flex-wrap items-start gap-x-3 gap-y-1 py-2" data-build-id={b.id}>
                <div className="min-w-44">
                  <BuildName build={b} />
                  <p className="text-xs text-ink-faint">
                    <span className="font-mono">{b.branch}</span> · {formatReceived(b.receivedAt)}
                  </p>
                  <p className="text-xs">{newest ? <span className="font-medium text-tide-700 dark:text-tide-300">newest candidate of its branch</span> : <span className="text-ink-faint">a newer candidate exists</span>}</p>
                </div>
                <VerdictBadge verdict={b.verdict} />
                <div className="ml-auto">
                  <RunCounts counts={b.runCounts} />
                </div>
              </li>
            );
          })}
        </ul>
      )}
      {result && result.settledUndecided > 0 && (
        <p className="mt-2 text-xs text-ink-faint">
          Not listed: {result.settledUndecided} older undecided release-branch build{result.settledUndecided === 1 ? "" : "s"} received before a later decision on the same branch.
        </p>
      )}
    </Panel>
  );
}
