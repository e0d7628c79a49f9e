"use client";

import { useQuery } from "@apollo/client/react";
import { formatUtc } from "@/components/builds/format-time";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { ACCOUNT_CHANGES } from "@/graphql/operations/admin";
import { describeChange } from "./change-words";

const SHOWN = 25;

/** The newest audit entries about people and CI tokens: who changed what, when. */
export function ChangeRecord() {
  const { data, loading, error } = useQuery(ACCOUNT_CHANGES, { variables: { last: SHOWN } });
  return (
    <Panel title="Change record" subtitle={`The last ${SHOWN} changes to people and CI tokens, from the audit log.`}>
      {loading && !data ? (
        <LoadingBlock label="Loading the change record" rows={4} />
      ) : error ? (
        <ErrorNotice title="Could not load the change record" error={error} />
      ) : !data || data.accountChanges.length === 0 ? (
        <EmptyState title="No changes yet">Every change to an account or a token will be listed here.</EmptyState>
      ) : (
        <ol className="space-y-1.5 text-sm">
          {data.accountChanges.map((c) => (
            <li key={c.id} className="grid gap-x-3 sm:grid-cols-[11rem_1fr]">
              <time dateTime={c.at} className="text-xs tabular-nums text-ink-faint sm:pt-0.5">
                {formatUtc(c.at)}
              </time>
              <span>
                <span className="font-mono text-xs text-ink-soft dark:text-white/60">{c.actor}</span> {describeChange(c)}
              </span>
            </li>
          ))}
        </ol>
      )}
    </Panel>
  );
}
