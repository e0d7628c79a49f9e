"use client";

import { useState, type ReactNode } from "react";

/**
 * A secret the server returns once (a CI token, a set-password link). It lives
 * only in this component's state: dismissing it or leaving the page loses it for
 * good, which the box says plainly.
 */
export function OneTimeSecret({ title, secret, children, onDismiss }: { title: string; secret: string; children?: ReactNode; onDismiss: () => void }) {
  const [copied, setCopied] = useState<"yes" | "failed" | null>(null);
  async function copy() {
    try {
      await navigator.clipboard.writeText(secret);
      setCopied("yes");
    } catch {
      // Clipboard access needs a secure context or a permission; selecting by hand still works.
      setCopied("failed");
    }
  }
  return (
    <div role="status" className="rounded-lg border border-verdict-marginal/50 bg-verdict-marginal/10 p-3 text-sm">
      <p className="font-medium">{title}</p>
      <p className="mt-0.5 text-xs text-ink-soft dark:text-white/70">Shown this once: Tauline keeps only a hash of it. Copy it now.</p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <code className="min-w-0 flex-1 select-all break-all rounded bg-paper-raised px-2 py-1.5 font-mono text-xs ring-1 ring-ink/15 dark:bg-[#0f171e] dark:ring-white/20" data-testid="one-time-secret">
          {secret}
        </code>
        <button type="button" onClick={copy} className="rounded bg-tide-700 px-2.5 py-1 text-xs font-medium text-white hover:bg-tide-900">
          {copied === "yes" ? "Copied" : "Copy"}
        </button>
        <button type="button" onClick={onDismiss} className="rounded px-2.5 py-1 text-xs text-ink-soft ring-1 ring-inset ring-ink/20 hover:bg-ink/5 dark:text-white/70 dark:ring-white/20">
          Done, hide it
        </button>
      </div>
      {copied === "failed" && <p className="mt-1 text-xs text-verdict-outside">The browser refused the clipboard; select the text and copy it by hand.</p>}
      {children && <div className="mt-2 text-xs text-ink-soft dark:text-white/70">{children}</div>}
    </div>
  );
}
