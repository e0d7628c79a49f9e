import Link from "next/link";
import { Panel } from "@/components/ui/panel";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { UploadReceipt } from "./receipt-types";
import { ReceiptRun } from "./receipt-run";

/** What the server stored and how it judged it: the build, then every run with its quantities. */
export function UploadReceiptView({ receipt, plotsFirst, onAgain }: { receipt: UploadReceipt; plotsFirst: boolean; onAgain: () => void }) {
  const { build, runs } = receipt;
  const c = build.runCounts;
  return (
    <Panel
      title="Receipt"
      subtitle={receipt.created ? "A new build was stored." : "The build existed; runs with the same case, model and grid were replaced."}
      actions={
        <button type="button" onClick={onAgain} className="rounded border border-ink/20 px-3 py-1 text-sm hover:bg-ink/5 dark:border-white/20 dark:hover:bg-white/10">
          Upload another file
        </button>
      }
      className="mt-5"
    >
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm" data-testid="upload-receipt">
        <VerdictBadge verdict={build.verdict} />
        <Link href={`/builds/${build.id}`} className="font-medium text-tide-700 underline-offset-2 hover:underline dark:text-tide-300">
          {build.solver} {build.version} · {build.commit.slice(0, 12)}
        </Link>
        <span className="font-mono text-xs text-ink-soft dark:text-white/60">{build.branch}</span>
        <span className="text-xs text-ink-soft dark:text-white/60">
          runs: {c.within} within · {c.marginal} marginal · {c.outside} outside · {c.unbanded + c.missing} unbanded or missing
        </span>
      </div>
      <div className="mt-4 space-y-5">
        {runs.map((run) => (
          <ReceiptRun key={run.id} buildId={build.id} run={run} plotsFirst={plotsFirst} />
        ))}
      </div>
    </Panel>
  );
}
