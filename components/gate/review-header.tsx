import Link from "next/link";
import type { ReactNode } from "react";
import { GateStateTag } from "@/components/builds/gate-state-tag";
import { RunCounts } from "@/components/builds/run-counts";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { GateReviewData } from "@/graphql/operations/gate";
import { formatDayTime } from "./gate-format";

const VERDICTS = ["within", "marginal", "outside", "unbanded", "missing"] as const;

function Field({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-ink-faint dark:text-white/50">{label}</dt>
      <dd className="mt-0.5 text-sm">{children}</dd>
    </div>
  );
}

/** Which build this is, where it came from, its verdict and its gate state now. */
export function ReviewHeader({ review }: { review: GateReviewData }) {
  const { build, baseline } = review;
  // Sum the verdict counts only (the cached object also carries __typename).
  const runTotal = VERDICTS.reduce((sum, v) => sum + build.runCounts[v], 0);
  return (
    <header className="rounded-lg border border-ink/10 bg-paper-raised p-4 dark:border-white/10 dark:bg-white/5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-xl font-semibold tracking-tight">
          {build.solver} {build.version}
        </h1>
        <VerdictBadge verdict={build.verdict} />
        <span className="rounded border border-ink/10 px-2 py-0.5 dark:border-white/15" data-testid="gate-state">
          <span className="mr-1 text-xs text-ink-faint">gate</span>
          <GateStateTag state={review.state} />
        </span>
        <nav className="ml-auto flex gap-4 text-sm">
          <Link href="/gate" className="text-tide-700 hover:underline dark:text-tide-300">
            ← release candidates
          </Link>
          <Link href={`/builds/${build.id}`} className="text-tide-700 hover:underline dark:text-tide-300">
            all runs of this build →
          </Link>
        </nav>
      </div>
      <dl className="mt-3 grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-6">
        <Field label="Branch">
          <span className="font-mono text-xs">{build.branch}</span>
          <span className="block text-xs text-ink-faint dark:text-white/50">{review.isCandidate ? "release candidate" : "not a release branch"}</span>
        </Field>
        <Field label="Commit">
          <span className="font-mono text-xs break-all select-all">{build.commit}</span>
        </Field>
        <Field label="Received">{formatDayTime(build.receivedAt)}</Field>
        <Field label="CI pipeline">
          {build.pipelineUrl ? (
            <a href={build.pipelineUrl} target="_blank" rel="noreferrer" className="text-tide-700 hover:underline dark:text-tide-300">
              open pipeline ↗
            </a>
          ) : (
            <span className="text-ink-faint">not given (manual upload)</span>
          )}
        </Field>
        <Field label={`Runs (${runTotal})`}>
          <RunCounts counts={build.runCounts} />
        </Field>
        <Field label="Baseline (last approved before it)">
          {baseline ? (
            <Link href={`/builds/${baseline.id}`} className="text-tide-700 hover:underline dark:text-tide-300">
              {baseline.version} <span className="font-mono text-xs">{baseline.commit.slice(0, 8)}</span>
            </Link>
          ) : (
            <span className="text-ink-faint">none on this branch</span>
          )}
        </Field>
      </dl>
    </header>
  );
}
