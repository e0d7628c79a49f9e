import type { OutboxEntry } from "@/graphql/operations/alerts";

const stamp = new Intl.DateTimeFormat("en-GB", { dateStyle: "short", timeStyle: "medium", timeZone: "UTC" });

const STATUS_TEXT: Record<OutboxEntry["status"], string> = {
  queued: "waiting for a sender",
  sending: "being sent",
  sent: "sent",
  failed: "last try failed, will try again",
};

/** Mail the outbox still owes: waiting, being sent, or failed and due for another try. */
export function OutboxTable({ rows }: { rows: OutboxEntry[] }) {
  if (rows.length === 0) return <p className="text-sm text-ink-soft dark:text-white/60">Nothing waiting: every queued message has been handed to the SMTP server.</p>;
  return (
    <table className="w-full text-sm" aria-label="Unsent mail">
      <thead>
        <tr className="border-b border-ink/10 text-left text-xs text-ink-faint dark:border-white/10">
          <th className="py-1 pr-3 font-medium">Queued (UTC)</th>
          <th className="py-1 pr-3 font-medium">Subject</th>
          <th className="py-1 pr-3 font-medium">State</th>
          <th className="py-1 pr-3 text-right font-medium">Tries</th>
          <th className="py-1 font-medium">Next try by · last error</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.id} className="border-b border-ink/5 align-top last:border-0 dark:border-white/5" data-outbox={r.status}>
            <td className="py-1 pr-3 whitespace-nowrap tabular-nums">{stamp.format(new Date(r.createdAt))}</td>
            <td className="py-1 pr-3">
              {r.subject}
              <span className="block text-xs text-ink-faint">{r.recipients.length} recipient{r.recipients.length === 1 ? "" : "s"} · {r.kind}</span>
            </td>
            <td className={`py-1 pr-3 ${r.status === "failed" ? "text-verdict-outside" : ""}`}>{STATUS_TEXT[r.status]}</td>
            <td className="py-1 pr-3 text-right tabular-nums">{r.attempts}</td>
            <td className="py-1 text-xs">
              <span className="tabular-nums">{stamp.format(new Date(r.nextAttemptAt))}</span>
              {r.lastError && <span className="block font-mono text-ink-soft dark:text-white/60">{r.lastError}</span>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
