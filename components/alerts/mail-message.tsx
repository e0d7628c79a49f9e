"use client";

import { useQuery } from "@apollo/client/react";
import { useState } from "react";
import { ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { MAILBOX_MESSAGE } from "@/graphql/operations/alerts";
import { MailFrame } from "./mail-frame";

const stamp = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "medium", timeZone: "UTC" });

/** One stored message: its headers, the envelope (Bcc included), and the text or the sandboxed HTML part. */
export function MailMessage({ name }: { name: string }) {
  const { data, loading, error } = useQuery(MAILBOX_MESSAGE, { variables: { name } });
  const [part, setPart] = useState<"text" | "html">("text");
  if (loading && !data) return <LoadingBlock label="Loading the message" rows={8} />;
  if (error) return <ErrorNotice title="Could not open this message" error={error} />;
  if (!data) return null;
  const m = data.storedMailMessage;
  const hidden = m.envelopeTo.filter((a) => !m.to.includes(a) && !m.cc.includes(a));
  const shown = part === "html" && m.html !== null ? "html" : "text";
  return (
    <article aria-label="Message" className="space-y-3">
      <h3 className="text-base font-semibold">{m.subject}</h3>
      <dl className="grid grid-cols-[7rem_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-ink-faint">Date</dt>
        <dd>{m.date ? `${stamp.format(new Date(m.date))} UTC` : "—"}</dd>
        <dt className="text-ink-faint">From</dt>
        <dd className="font-mono text-xs leading-5">{m.from}</dd>
        <dt className="text-ink-faint">To</dt>
        <dd className="font-mono text-xs leading-5">{m.to.join(", ") || "undisclosed recipients"}</dd>
        {m.cc.length > 0 && (
          <>
            <dt className="text-ink-faint">Cc</dt>
            <dd className="font-mono text-xs leading-5">{m.cc.join(", ")}</dd>
          </>
        )}
        <dt className="text-ink-faint">Bcc (envelope)</dt>
        <dd className="font-mono text-xs leading-5">{hidden.join(", ") || "none"}</dd>
        {m.eventKey && (
          <>
            <dt className="text-ink-faint">Event</dt>
            <dd className="font-mono text-xs leading-5">{m.eventKey}</dd>
          </>
        )}
      </dl>
      <div role="tablist" aria-label="Message part" className="flex gap-1 text-sm">
        {(["text", "html"] as const).map((p) => (
          <button
            key={p}
            type="button"
            role="tab"
            aria-selected={shown === p}
            disabled={p === "html" && m.html === null}
            onClick={() => setPart(p)}
            className={`rounded px-2.5 py-1 ${shown === p ? "bg-tide-700 text-white" : "text-ink-soft hover:bg-ink/5 disabled:opacity-40 dark:text-white/70 dark:hover:bg-white/10"}`}
          >
            {p === "text" ? "Plain text" : "HTML (sandboxed)"}
          </button>
        ))}
      </div>
      {shown === "html" && m.html !== null ? (
        <MailFrame html={m.html} title={`HTML part of “${m.subject}”`} />
      ) : (
        <pre className="max-h-[32rem] overflow-auto whitespace-pre-wrap rounded border border-ink/10 bg-paper-sunk p-3 font-mono text-xs leading-5 dark:border-white/10 dark:bg-black/30">
          {m.text ?? "(no plain-text part)"}
        </pre>
      )}
    </article>
  );
}
