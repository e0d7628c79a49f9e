"use client";

/** The send button, and while sending a progress bar of the bytes the browser has handed over. */
export function SendBar({ ready, sending, progress, onSend, onCancel }: { ready: boolean; sending: boolean; progress: number; onSend: () => void; onCancel: () => void }) {
  const pct = Math.round(progress * 100);
  return (
    <div className="flex flex-wrap items-center gap-3">
      {sending ? (
        <>
          <div className="h-2 min-w-48 flex-1 overflow-hidden rounded bg-ink/10 dark:bg-white/10" role="progressbar" aria-label="Upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct}>
            <div className="h-full bg-tide-500 transition-[width]" style={{ width: `${pct}%` }} />
          </div>
          <span className="whitespace-nowrap text-xs tabular-nums text-ink-soft dark:text-white/70">{pct < 100 ? `${pct} % sent` : "judging on the server…"}</span>
          <button type="button" onClick={onCancel} className="rounded px-2 py-1 text-sm text-ink-soft underline dark:text-white/70">
            Cancel
          </button>
        </>
      ) : (
        <button
          type="button"
          onClick={onSend}
          disabled={!ready}
          className="rounded bg-tide-700 px-4 py-2 text-sm font-medium text-white hover:bg-tide-900 disabled:cursor-not-allowed disabled:bg-ink/20 disabled:text-ink-faint dark:disabled:bg-white/10 dark:disabled:text-white/40"
        >
          Send to Tauline
        </button>
      )}
    </div>
  );
}
