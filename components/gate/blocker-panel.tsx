"use client";

import Link from "next/link";
import { useState } from "react";
import { Panel } from "@/components/ui/panel";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { GateBuild, GateFindingItem } from "@/graphql/operations/gate";
import { formatSig, withUnit } from "@/lib/format/numbers";
import { formatBand, formatUntil, runHref, runLabel, STATUS_WORD } from "./gate-format";
import { WaiverForm } from "./waiver-form";

/**
 * What stands in the way of approval (no waiver in force names it) and what a
 * waiver lets through. The release manager can grant a waiver from each item.
 */
export function BlockerPanel({ build, blockers, waived, mayDecide }: { build: GateBuild; blockers: GateFindingItem[]; waived: GateFindingItem[]; mayDecide: boolean }) {
  const [open, setOpen] = useState<string | null>(null);
  return (
    <Panel
      title="In the way of approval"
      subtitle="Quantities outside their band and every quantity of a run that did not complete. Each needs a waiver in force before the build can be approved."
    >
      {blockers.length === 0 ? (
        <p className="flex items-center gap-2 rounded border border-verdict-within/30 bg-verdict-within/5 px-3 py-2 text-sm" data-testid="no-blockers">
          <span aria-hidden className="text-verdict-within">
            ✓
          </span>
          Nothing blocks approval{waived.length > 0 ? ` (${waived.length} let through by a waiver, below)` : ""}.
        </p>
      ) : (
        <ul className="divide-y divide-ink/5 dark:divide-white/10" data-testid="blockers">
          {blockers.map((f) => (
            <li key={f.id} className="py-2.5" data-blocker={`${f.case}/${f.model}/${f.quantity ?? "run"}`}>
              <ItemLine buildId={build.id} f={f} />
              {/* Value and band are on the line above; the reason adds to them only for a run that did not complete. */}
              {f.runStatus !== "COMPLETED" && <p className="mt-1 text-sm text-verdict-outside">{f.blockReason}</p>}
              {mayDecide && f.quantity !== null && (
                <div className="mt-1.5">
                  {open === f.id ? (
                    <WaiverForm finding={f} branch={build.branch} onDone={() => setOpen(null)} />
                  ) : (
                    <button type="button" onClick={() => setOpen(f.id)} className="text-sm text-tide-700 hover:underline dark:text-tide-300">
                      Grant a waiver for {f.quantity}…
                    </button>
                  )}
                </div>
              )}
              {f.quantity === null && <p className="mt-1 text-xs text-ink-faint">A waiver names a quantity; re-post the run, or hold or reject the build.</p>}
            </li>
          ))}
        </ul>
      )}
      {waived.length > 0 && (
        <>
          <h3 className="mt-4 mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase dark:text-white/60">Let through by a waiver</h3>
          <ul className="divide-y divide-ink/5 dark:divide-white/10" data-testid="waived">
            {waived.map((f) => (
              <li key={f.id} className="py-2">
                <ItemLine buildId={build.id} f={f} />
                <p className="mt-1 text-xs text-ink-soft dark:text-white/70">
                  {f.runStatus !== "COMPLETED" && `${f.blockReason}. `}Waiver #{f.waiver?.id} by {f.waiver?.grantedBy}, counts through {f.waiver ? formatUntil(f.waiver.expiresAt) : "—"}: “{f.waiver?.reason}”
                </p>
              </li>
            ))}
          </ul>
        </>
      )}
    </Panel>
  );
}

function ItemLine({ buildId, f }: { buildId: string; f: GateFindingItem }) {
  return (
    <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
      <Link href={runHref(buildId, f.runId)} className="font-medium hover:underline" title="Open the run's plots">
        {runLabel(f)}
      </Link>
      {f.runStatus !== "COMPLETED" && <span className="rounded bg-verdict-outside/10 px-1.5 text-xs text-verdict-outside">run {STATUS_WORD[f.runStatus]}</span>}
      {f.quantity && (
        <span>
          {f.label ?? f.quantity} <span className="font-mono text-xs text-ink-faint">{f.quantity}</span>
        </span>
      )}
      {f.verdict && <VerdictBadge verdict={f.verdict} />}
      {f.quantity && (
        <span className="font-mono text-xs tabular-nums">
          {f.value === null ? "no value" : withUnit(formatSig(f.value), f.unit)} <span className="text-ink-faint">band {formatBand(f)}</span>
        </span>
      )}
      <Link href={runHref(buildId, f.runId)} className="ml-auto text-xs text-tide-700 hover:underline dark:text-tide-300">
        run plots →
      </Link>
    </div>
  );
}
