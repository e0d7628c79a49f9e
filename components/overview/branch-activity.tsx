"use client";

import { useQuery } from "@apollo/client/react";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { MORNING_BRANCHES } from "@/graphql/operations/overview";
import { BuildName, formatReceived, GateWord, RunCounts } from "./build-bits";

const PER_BRANCH = 5;

export function BranchActivity() {
  const { data, loading, error } = useQuery(MORNING_BRANCHES, { variables: { perBranch: PER_BRANCH } });
  return (
    <Panel title="Newest builds per branch" subtitle={`The last ${PER_BRANCH} builds of each branch, most recently active branch first; runs counted by verdict.`}>
      {loading && !data ? (
        <LoadingBlock label="Loading the newest builds" rows={8} />
      ) : error ? (
        <ErrorNotice title="Could not load the newest builds" error={error} />
      ) : !data || data.morningView.branches.length === 0 ? (
        <EmptyState title="No builds yet">Post results with the curl line in the README.</EmptyState>
      ) : (
        <div className="grid gap-5 xl:grid-cols-2">
          {data.morningView.branches.map((b) => (
            <section key={b.branch} aria-label={`Branch ${b.branch}`}>
              <h3 className="flex flex-wrap items-baseline gap-x-2 text-sm">
                <span className="font-mono font-semibold">{b.branch}</span>
                <span className="text-xs text-ink-faint">
                  baseline: {b.baseline ? <BuildName build={b.baseline} /> : "none approved yet"}
                </span>
              </h3>
              <table className="mt-1 w-full text-sm">
                <tbody>
                  {b.builds.map((build) => (
                    <tr key={build.id} className="border-t border-ink/5 align-top dark:border-white/10" data-build-id={build.id}>
                      <td className="py-1.5 pr-2">
                        <BuildName build={build} />
                        <span className="block text-xs text-ink-faint">
                          {build.solver} · {build.branch} · {formatReceived(build.receivedAt)}
                        </span>
                      </td>
                      <td className="py-1.5 pr-2">
                        <VerdictBadge verdict={build.verdict} />
                      </td>
                      <td className="py-1.5 pr-2">
                        <RunCounts counts={build.runCounts} />
                      </td>
                      <td className="py-1.5 text-right">
                        <GateWord gate={build.gate} />
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </section>
          ))}
        </div>
      )}
    </Panel>
  );
}
