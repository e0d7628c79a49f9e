"use client";

import type { MatrixRun } from "@/graphql/operations/builds";
import type { Verdict } from "@/lib/analysis";
import { VERDICT_MARKS } from "./run-counts";

const CELL: Record<Verdict, string> = {
  within: "bg-verdict-within/15 text-verdict-within ring-verdict-within/40",
  marginal: "bg-verdict-marginal/20 text-verdict-marginal ring-verdict-marginal/50",
  outside: "bg-verdict-outside/20 text-verdict-outside ring-verdict-outside/60",
  unbanded: "bg-verdict-unbanded/15 text-verdict-unbanded ring-verdict-unbanded/40",
  missing: "bg-verdict-missing/15 text-verdict-missing ring-verdict-missing/50",
};

/** One run as a button: verdict by colour and glyph, a failed solve by its status word. */
export function VerdictCell({ run, selected, showGrid, onSelect }: { run: MatrixRun; selected: boolean; showGrid: boolean; onSelect: () => void }) {
  const failed = run.status !== "COMPLETED";
  return (
    <button
      type="button"
      onClick={onSelect}
      aria-pressed={selected}
      title={`${run.case} · ${run.model} · grid ${run.grid}: ${run.verdict}${failed ? `, run ${run.status.toLowerCase()}` : ""}`}
      data-run-id={run.id}
      className={`flex min-h-10 w-full min-w-0 flex-col items-center justify-center rounded px-1 py-1 text-xs ring-1 ring-inset transition ${CELL[run.verdict]} ${
        selected ? "outline-2 outline-offset-1 outline-ink dark:outline-white" : "hover:brightness-95 dark:hover:brightness-125"
      }`}
    >
      <span className="flex items-center gap-1 font-medium">
        <span aria-hidden className="text-sm leading-none">
          {VERDICT_MARKS[run.verdict]}
        </span>
        {run.verdict}
      </span>
      {(showGrid || failed) && (
        <span className="text-[10px] leading-tight opacity-80">
          {showGrid && run.grid}
          {showGrid && failed && " · "}
          {failed && <strong className="uppercase">{run.status.toLowerCase()}</strong>}
        </span>
      )}
    </button>
  );
}
