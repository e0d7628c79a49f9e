"use client";

import Link from "next/link";
import { useState } from "react";
import { QuantityTable } from "@/components/quantities/quantity-table";
import { RunPlots } from "@/components/run/run-plots";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { UploadReceipt } from "./receipt-types";

type ReceiptRun = UploadReceipt["runs"][number];

/**
 * One stored run: its quantities, or (on request, and at once for a CSV upload)
 * the run page's plots, where every derived quantity is drawn on the data it
 * came from, followed by the same table.
 */
export function ReceiptRun({ buildId, run, plotsFirst }: { buildId: string; run: ReceiptRun; plotsFirst: boolean }) {
  const [plots, setPlots] = useState(plotsFirst);
  return (
    <section className="border-t border-ink/10 pt-3 dark:border-white/10" data-run-id={run.id}>
      <header className="mb-2 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <VerdictBadge verdict={run.verdict} />
        <Link href={`/builds/${buildId}/runs/${run.id}`} className="font-mono text-tide-700 underline-offset-2 hover:underline dark:text-tide-300">
          {run.case} · {run.model} · {run.grid}
        </Link>
        <span className="text-xs text-ink-soft dark:text-white/60">{run.status.toLowerCase()}</span>
        <button
          type="button"
          onClick={() => setPlots((p) => !p)}
          aria-expanded={plots}
          className="ml-auto rounded border border-ink/20 px-2 py-0.5 text-xs hover:bg-ink/5 dark:border-white/20 dark:hover:bg-white/10"
        >
          {plots ? "Quantities only" : "Show the plots"}
        </button>
      </header>
      {plots ? <RunPlots runId={run.id} caseKey={run.case} /> : <QuantityTable quantities={run.quantities} sortByVerdict />}
    </section>
  );
}
