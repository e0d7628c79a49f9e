import Link from "next/link";
import type { BuildRow } from "@/db/queries/builds";
import type { GateDecisionRow } from "@/db/queries/gate";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { VerdictCounts } from "@/graphql/operations/builds";
import { formatUtc } from "./format-time";
import { GateStateTag } from "./gate-state-tag";
import { ReevaluationNote } from "./reevaluation-note";
import { RunCounts } from "./run-counts";

function Field({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-ink-faint dark:text-white/50">{label}</dt>
      <dd className="mt-0.5 text-sm">{children}</dd>
    </div>
  );
}

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
        <Field label="Branch">
          <span className="font-mono text-xs">{build.branch}</span>
        </Field>
        <Field label="Commit">
          <span className="font-mono text-xs break-all select-all">{build.commit}</span>
        </Field>
        <Field label="Received">{formatUtc(build.received_at)}</Field>
        <Field label="CI pipeline">
          {build.pipeline_url ? (
            <a href={build.pipeline_url} target="_blank" rel="noreferrer" className="text-tide-700 hover:underline dark:text-tide-300">
              open pipeline ↗
            </a>
          ) : (
            <span className="text-ink-faint">not given (manual upload)</span>
          )}
        </Field>
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
