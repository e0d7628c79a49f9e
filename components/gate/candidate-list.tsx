"use client";

import { useQuery } from "@apollo/client/react";
import { Fragment } from "react";
import { DataTablePager } from "@/components/data-table/data-table-pager";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { GATE_CANDIDATES } from "@/graphql/operations/gate";
import { CandidateRow } from "./candidate-row";

const PAGE_SIZES = [20, 50, 100] as const;

/** Release candidates: the ones waiting for a decision first, then the rest newest first (?branch=&page=&size=). */
export function CandidateList({ mayDecide }: { mayDecide: boolean }) {
  const { params, update } = useQueryParams();
  const branch = params.get("branch") || null;
  const size = PAGE_SIZES.find((s) => String(s) === params.get("size")) ?? PAGE_SIZES[0];
  const page = Math.max(0, Number.parseInt(params.get("page") ?? "1", 10) - 1 || 0);
  const { data, previousData, loading, error } = useQuery(GATE_CANDIDATES, { variables: { branch, first: size, offset: page * size }, fetchPolicy: "cache-and-network" });
  const result = (data ?? previousData)?.gateCandidates;

  return (
    <Panel
      title="Release candidates"
      subtitle="Builds on release/* branches. Waiting ones first: undecided, with no later decision on their branch."
      actions={
        <label className="flex items-center gap-1.5 text-sm">
          Branch
          <select
            value={branch ?? ""}
            onChange={(e) => update({ branch: e.target.value, page: null })}
            className="rounded border border-ink/15 bg-paper-raised px-1.5 py-0.5 dark:border-white/20 dark:bg-[#0f171e]"
          >
            <option value="">all release branches</option>
            {(result?.branches ?? []).map((b) => (
              <option key={b} value={b}>
                {b}
              </option>
            ))}
          </select>
        </label>
      }
    >
      {loading && !result ? (
        <LoadingBlock label="Loading release candidates" rows={8} />
      ) : error && !result ? (
        <ErrorNotice title="Could not load the release candidates" error={error} />
      ) : !result || result.items.length === 0 ? (
        <EmptyState title="No release candidate yet">A build posted on a release/* branch shows up here for a decision.</EmptyState>
      ) : (
        <>
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="text-left text-xs text-ink-faint dark:text-white/50">
                <tr className="border-b border-ink/10 dark:border-white/10">
                  <th className="py-1.5 pr-3 font-medium">Build</th>
                  <th className="py-1.5 pr-3 font-medium">Received</th>
                  <th className="py-1.5 pr-3 font-medium">Runs</th>
                  <th className="py-1.5 pr-3 font-medium">Needs a look</th>
                  <th className="py-1.5 pr-3 font-medium">Approval</th>
                  <th className="py-1.5 pr-3 font-medium">Gate</th>
                  <th className="py-1.5 font-medium">
                    <span className="sr-only">Open</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {result.items.map((c, i) => (
                  <Fragment key={c.build.id}>
                    {(i === 0 || result.items[i - 1].awaiting !== c.awaiting) && (
                      <GroupRow text={c.awaiting ? "Waiting for a decision" : "Decided, or settled by a later decision on their branch"} />
                    )}
                    <CandidateRow candidate={c} mayDecide={mayDecide} />
                  </Fragment>
                ))}
              </tbody>
            </table>
          </div>
          <DataTablePager
            pageIndex={page}
            pageSize={size}
            total={result.totalCount}
            pageSizes={PAGE_SIZES}
            onPageChange={(p) => update({ page: p === 0 ? null : p + 1 })}
            onPageSizeChange={(s) => update({ size: s === PAGE_SIZES[0] ? null : s, page: null })}
          />
        </>
      )}
    </Panel>
  );
}

function GroupRow({ text }: { text: string }) {
  return (
    <tr>
      <th colSpan={7} scope="colgroup" className="bg-paper-sunk/60 px-2 py-1 text-left text-xs font-semibold tracking-wide text-ink-soft uppercase dark:bg-white/5 dark:text-white/60">
        {text}
      </th>
    </tr>
  );
}
