"use client";

import { useQuery } from "@apollo/client/react";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { formatSig } from "@/lib/format/numbers";
import { BUILD_COMPARISON } from "@/graphql/operations/build-comparison";
import { ComparePicker } from "./compare-picker";
import { hasChange, summariseCoefficientChanges } from "./compare-summary";
import { CompareTable } from "./compare-table";

/** This build against the branch baseline or a chosen build (?compare=ID); ?all=1 lists unchanged runs too. */
export function BuildCompare({ buildId }: { buildId: string }) {
  const { params, update } = useQueryParams();
  const raw = params.get("compare");
  const againstId = raw && /^[1-9][0-9]{0,15}$/.test(raw) ? raw : null;
  const showAll = params.get("all") === "1";
  const { data, previousData, loading, error } = useQuery(BUILD_COMPARISON, { variables: { buildId, againstId } });
  const cmp = (data ?? previousData)?.buildComparison;

  let body;
  if (error)
    body = (
      <ErrorNotice
        title="Could not compare the builds"
        error={error}
        action={
          <button type="button" className="underline" onClick={() => update({ compare: null })}>
            Compare with the branch baseline instead
          </button>
        }
      />
    );
  else if (!cmp) body = <LoadingBlock label="Comparing builds" rows={6} />;
  else if (!cmp.against)
    body = <EmptyState title="Nothing to compare with yet">No build on {cmp.build.branch} was approved before this one. Choose any build above to compare with it.</EmptyState>;
  else {
    const coefficientChanges = summariseCoefficientChanges(cmp.runs);
    const changedRuns = cmp.runs.filter(hasChange);
    const verdictChanges = cmp.runs.filter((r) => r.verdictChanged && r.runId && r.otherRunId).length;
    const shown = showAll ? cmp.runs : changedRuns;
    body = (
      <div className={loading ? "opacity-60" : undefined}>
        {coefficientChanges.length > 0 && (
          <div role="note" className="mb-3 rounded border border-verdict-marginal/50 bg-verdict-marginal/10 p-3 text-sm">
            <p className="font-semibold text-verdict-marginal">⚠ Closure coefficients differ between the two builds</p>
            <ul className="mt-1 space-y-0.5">
              {coefficientChanges.map((c) => (
                <li key={`${c.model}|${c.name}|${c.otherValue}|${c.value}`}>
                  <span className="font-mono font-semibold">{c.name}</span> of <span className="font-mono">{c.model}</span>:{" "}
                  <span className="font-mono">{formatSig(c.otherValue, 6)} → {formatSig(c.value, 6)}</span>{" "}
                  <span className="text-ink-soft dark:text-white/60">in {c.cases.join(", ")}</span>
                </li>
              ))}
            </ul>
          </div>
        )}
        <div className="mb-2 flex flex-wrap items-center gap-3 text-sm">
          <span>
            <strong className="tabular-nums">{verdictChanges}</strong> run verdict{verdictChanges === 1 ? "" : "s"} changed ·{" "}
            <strong className="tabular-nums">{changedRuns.length}</strong> of {cmp.runs.length} runs with a change (verdict, coefficient, or run missing)
          </span>
          <label className="ml-auto flex items-center gap-1.5 text-ink-soft dark:text-white/70">
            <input type="checkbox" checked={showAll} onChange={(e) => update({ all: e.target.checked ? "1" : null })} />
            show unchanged runs too
          </label>
        </div>
        {shown.length === 0 ? (
          <EmptyState title="No run changed its verdict or coefficients">Tick “show unchanged runs too” to see every value side by side.</EmptyState>
        ) : (
          <CompareTable
            runs={shown}
            buildId={buildId}
            otherBuildId={cmp.against.id}
            thisLabel={`This build ${cmp.build.version}`}
            otherLabel={`${cmp.againstIsBaseline ? "Baseline" : "Other"} ${cmp.against.version}`}
          />
        )}
      </div>
    );
  }
  return (
    <Panel
      title="Against another build"
      subtitle="Same case, model and grid side by side; difference = this build − other."
      actions={cmp && <ComparePicker build={cmp.build} baseline={cmp.baseline} againstId={againstId} onChange={(id) => update({ compare: id })} />}
    >
      {body}
    </Panel>
  );
}
