"use client";

import { useQuery } from "@apollo/client/react";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { MAILBOX } from "@/graphql/operations/alerts";
import { MailMessage } from "./mail-message";
import { OutboxTable } from "./outbox-table";

const PAGE = 40;
const stamp = new Intl.DateTimeFormat("en-GB", { dateStyle: "short", timeStyle: "medium", timeZone: "UTC" });

/** The administrator's mailbox: stored messages newest first, one opened beside the list (?message=), and the unsent outbox. */
export function MailboxView() {
  const { params, update } = useQueryParams();
  const selected = params.get("message");
  const page = Math.max(0, Number(params.get("page") ?? "0") || 0);
  const { data, loading, error, refetch } = useQuery(MAILBOX, { variables: { first: PAGE, offset: page * PAGE }, fetchPolicy: "cache-and-network" });
  if (loading && !data) return <LoadingBlock label="Loading the mailbox" rows={10} />;
  if (error && !data) return <ErrorNotice title="Could not read the mailbox" error={error} />;
  if (!data) return null;
  const { storedMail, mailOutbox } = data;
  const pages = Math.max(1, Math.ceil(storedMail.total / PAGE));
  return (
    <div className="space-y-5">
      <Panel title="Owed mail" subtitle="outbox rows not yet accepted by the SMTP server">
        <OutboxTable rows={mailOutbox} />
      </Panel>
      <div className="grid gap-5 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <Panel
          title="Received by the local SMTP server"
          subtitle={`${storedMail.total} message${storedMail.total === 1 ? "" : "s"} in ${storedMail.directory}`}
          actions={
            <button type="button" className="text-sm text-tide-700 underline dark:text-tide-300" onClick={() => refetch()}>
              Check again
            </button>
          }
        >
          {storedMail.entries.length === 0 ? (
            <EmptyState title="No stored messages">Mail appears here when the local SMTP server (npm run mail:fake) receives it.</EmptyState>
          ) : (
            <ol className="divide-y divide-ink/5 text-sm dark:divide-white/5" aria-label="Stored messages">
              {storedMail.entries.map((m) => (
                <li key={m.name}>
                  <button
                    type="button"
                    onClick={() => update({ message: m.name })}
                    aria-current={selected === m.name ? "true" : undefined}
                    className={`block w-full px-2 py-1.5 text-left hover:bg-ink/5 dark:hover:bg-white/10 ${selected === m.name ? "bg-tide-50 dark:bg-tide-900/40" : ""}`}
                  >
                    <span className="line-clamp-2 block font-medium">{m.subject}</span>
                    <span className="block truncate text-xs text-ink-faint">
                      <span className="tabular-nums">{stamp.format(new Date(m.date ?? m.storedAt))}</span> → {m.envelopeTo.join(", ") || m.to.join(", ")}
                    </span>
                  </button>
                </li>
              ))}
            </ol>
          )}
          {pages > 1 && (
            <div className="mt-3 flex items-center gap-3 text-sm">
              <button type="button" disabled={page === 0} onClick={() => update({ page: page - 1 || null })} className="text-tide-700 disabled:opacity-40 dark:text-tide-300">
                Newer
              </button>
              <span className="text-ink-faint">
                page {page + 1} of {pages}
              </span>
              <button type="button" disabled={page + 1 >= pages} onClick={() => update({ page: page + 1 })} className="text-tide-700 disabled:opacity-40 dark:text-tide-300">
                Older
              </button>
            </div>
          )}
        </Panel>
        <Panel title="Message">
          {selected ? <MailMessage key={selected} name={selected} /> : <EmptyState title="No message open">Pick a message on the left to read it.</EmptyState>}
        </Panel>
      </div>
    </div>
  );
}
