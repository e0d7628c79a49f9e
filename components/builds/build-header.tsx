import Link from "next/link";
import type { BuildRow } from "@/db/queries/builds";
import type { GateDecisionRow } from "@/db/queries/gate";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { VerdictCounts } from "@/graphql/operations/builds";
import { BuildOriginFields, HeaderField as Field } from "./build-origin-fields";
import { formatUtc } from "./format-time";
import { GateStateTag } from "./gate-state-tag";
import { ReevaluationNote } from "./reevaluation-note";
import { RunCounts } from "./run-counts";

/** What the build is, where it came from, how it fared and what was decided (server-rendered). */
export function BuildHeader({
  build,
  decision,
  runCounts,
  baseline,
}: {
  build: BuildRow;
  decision: GateDecisionRow | null;
  runCounts: VerdictCounts;
  baseline: BuildRow | null;
}) {
  const total = Object.values(runCounts).reduce((a, b) => a + b, 0);
  return (
    <header className="mb-5 rounded-lg border border-ink/10 bg-paper-raised p-4 dark:border-white/10 dark:bg-white/5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-xl font-semibold tracking-tight">
          {build.solver} {build.version}
        </h1>
        <VerdictBadge verdict={build.verdict} />
        <span className="rounded border border-ink/10 px-2 py-0.5 dark:border-white/15">
          <span className="mr-1 text-xs text-ink-faint">gate</span>
          <GateStateTag state={decision?.state ?? "pending"} />
        </span>
        <Link href="/builds" className="ml-auto text-sm text-tide-700 hover:underline dark:text-tide-300">
          ← all builds
        </Link>
      </div>
      <dl className="mt-3 grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-6">
        <BuildOriginFields branch={build.branch} commit={build.commit} receivedAt={build.received_at} pipelineUrl={build.pipeline_url} />
        <Field label={`Runs (${total})`}>
          <RunCounts counts={runCounts} />
        </Field>
        <Field label="Baseline (last approved on the branch)">
          {baseline ? (
            <Link href={`/builds/${baseline.id}`} className="text-tide-700 hover:underline dark:text-tide-300">
              {baseline.version} <span className="font-mono text-xs">{baseline.commit.slice(0, 8)}</span>
            </Link>
          ) : (
            <span className="text-ink-faint">none before this build</span>
          )}
        </Field>
      </dl>
      {decision && (
        <p className="mt-3 border-t border-ink/10 pt-2 text-sm dark:border-white/10">
          <GateStateTag state={decision.state} /> by {decision.decided_by_name} on {formatUtc(decision.decided_at)}
          {decision.comment && <span className="text-ink-soft dark:text-white/70"> — “{decision.comment}”</span>}
        </p>
      )}
      <ReevaluationNote buildId={String(build.id)} />
    </header>
  );
}
