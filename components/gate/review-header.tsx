import Link from "next/link";
import { BuildOriginFields, HeaderField as Field } from "@/components/builds/build-origin-fields";
import { GateStateTag } from "@/components/builds/gate-state-tag";
import { RunCounts } from "@/components/builds/run-counts";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { GateReviewData } from "@/graphql/operations/gate";

const VERDICTS = ["within", "marginal", "outside", "unbanded", "missing"] as const;

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
        <BuildOriginFields
          branch={build.branch}
          branchNote={review.isCandidate ? "release candidate" : "not a release branch"}
          commit={build.commit}
          receivedAt={build.receivedAt}
          pipelineUrl={build.pipelineUrl}
        />
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
