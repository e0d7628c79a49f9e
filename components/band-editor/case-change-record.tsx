"use client";

import { useQuery } from "@apollo/client/react";
import { formatUtc } from "@/components/builds/format-time";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { CASE_CHANGE_RECORD } from "@/graphql/operations/library-edit";
import { ChangeLines } from "./change-lines";

const ACTION_MARK: Record<string, string> = {
  "case.created": "new",
  "case.revised": "case",
  "quantity.defined": "new",
  "quantity.revised": "quantity",
  "band.created": "new",
  "band.revised": "band",
  "build.reevaluated": "re-judged",
};

/** Who changed what in a case, when and why: the case, its quantity definitions, its bands and the re-judgements that followed. */
export function CaseChangeRecord({ caseKey }: { caseKey: string }) {
  const { data, loading, error } = useQuery(CASE_CHANGE_RECORD, { variables: { caseKey, last: 60 } });
  if (error) return <ErrorNotice title="Could not load the change record" error={error} />;
  if (loading && !data) return <LoadingBlock label="Loading the change record" rows={5} />;
  const entries = data?.caseChangeRecord ?? [];
  if (entries.length === 0) return <EmptyState title="No recorded change yet">The seeded case library predates the change record; edits from now on are listed here.</EmptyState>;
  return (
    <ol className="divide-y divide-ink/10 dark:divide-white/10" aria-label="Change record">
      {entries.map((e) => (
        <li key={e.id} className="py-2.5" data-change={e.action}>
          <div className="flex flex-wrap items-baseline gap-x-2 gap-y-1 text-sm">
            <span className="rounded bg-ink/5 px-1.5 py-0.5 text-[11px] uppercase tracking-wide text-ink-soft dark:bg-white/10 dark:text-white/70">{ACTION_MARK[e.action] ?? e.action}</span>
            <span className="font-medium">{e.subject}</span>
            <span className="text-xs text-ink-faint">
              {formatUtc(e.at)} · {e.by}
            </span>
          </div>
          {e.reason && <p className="mt-0.5 text-sm text-ink-soft dark:text-white/70">“{e.reason}”</p>}
          <div className="mt-1">
            <ChangeLines changes={e.changes} />
          </div>
        </li>
      ))}
    </ol>
  );
}
