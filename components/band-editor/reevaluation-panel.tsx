"use client";

import { useMutation, useQuery } from "@apollo/client/react";
import { useState, type FormEvent } from "react";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { REEVALUATE_BUILDS, REEVALUATION_CANDIDATES, type BandScopeVars, type ReevaluationInfo } from "@/graphql/operations/library-edit";
import { reevaluationRequestSchema, fieldErrorsOf } from "@/lib/validation/case";
import { CandidateTable } from "./candidate-table";
import { INPUT, ReasonField, SubmitRow } from "./form-controls";
import { ReevaluationOutcome } from "./reevaluation-outcome";
import { errorsFromServer } from "./server-errors";

interface Props {
  scope: BandScopeVars;
  /** Suggested reason (the band change that prompts it). */
  suggestedReason: string;
  /** The newest version changed fit settings, which re-judging cannot apply. */
  fitChanged: boolean;
  unit: string;
}

/**
 * Offers to re-judge recent builds of the case against the bands in force now.
 * Preselected: builds judged under a version that is no longer in force and not
 * re-judged since. The branch filter lives in the URL (?branch=).
 */
export function ReevaluationPanel({ scope, suggestedReason, fitChanged, unit }: Props) {
  const { params, update } = useQueryParams();
  const branch = params.get("branch") || null;
  // Always asked again: a band saved a moment ago changes which builds are stale.
  const { data, loading, error, refetch } = useQuery(REEVALUATION_CANDIDATES, { variables: { ...scope, branch, last: 40 }, fetchPolicy: "cache-and-network" });
  const [picked, setPicked] = useState<Set<string> | null>(null);
  const [reason, setReason] = useState(suggestedReason);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<ReevaluationInfo[]>([]);
  const [reevaluate, { loading: sending }] = useMutation(REEVALUATE_BUILDS);

  const candidates = data?.reevaluationCandidates ?? [];
  const stale = candidates.filter((c) => c.stale).map((c) => c.build.id);
  const selected = picked ?? new Set(stale);
  const toggle = (id: string) => setPicked(() => {
    const next = new Set(selected);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    return next;
  });

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const input = { buildIds: [...selected], caseKey: scope.caseKey, reason };
    const checked = reevaluationRequestSchema.safeParse(input);
    if (!checked.success) return setErrors(fieldErrorsOf(checked.error.issues));
    setErrors({});
    try {
      const { data: done } = await reevaluate({ variables: { input } });
      setOutcome(done?.reevaluateBuilds ?? []);
      setPicked(new Set());
      await refetch();
    } catch (e) {
      const server = errorsFromServer(e);
      setErrors(server.fields);
      setFormError(server.message);
    }
  }

  return (
    <Panel title="Re-judge stored builds" subtitle="Their stored values against the bands in force now; the verdicts they were judged with stay as they were.">
      {fitChanged && (
        <p className="mb-3 rounded border border-verdict-marginal/40 bg-verdict-marginal/10 p-2 text-xs">
          The newest version changes fit settings. Re-judging compares the values as they were fitted; the new settings apply to builds posted from now on (post a build again to refit it).
        </p>
      )}
      <div className="mb-3 flex flex-wrap items-end gap-3 text-sm">
        <label>
          <span className="text-xs text-ink-faint">Branch</span>
          <select className={`${INPUT} w-auto`} value={branch ?? ""} onChange={(e) => (update({ branch: e.target.value || null }), setPicked(null))}>
            <option value="">all branches</option>
            {data?.branches.map((b) => (
              <option key={b} value={b}>
                {b}
              </option>
            ))}
          </select>
        </label>
        <button type="button" className="text-xs underline" onClick={() => setPicked(new Set(stale))}>
          choose the {stale.length} judged under an earlier version
        </button>
        <button type="button" className="text-xs underline" onClick={() => setPicked(new Set())}>
          choose none
        </button>
      </div>
      {error ? (
        <ErrorNotice title="Could not load the builds of this case" error={error} />
      ) : loading && !data ? (
        <LoadingBlock label="Loading recent builds" rows={6} />
      ) : candidates.length === 0 ? (
        <EmptyState title="No builds to re-judge">No build{branch ? ` on ${branch}` : ""} has a run of this case yet.</EmptyState>
      ) : (
        <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Re-judge builds">
          <CandidateTable candidates={candidates} selected={selected} onToggle={toggle} unit={unit} />
          {errors.buildIds && <p role="alert" className="text-xs font-medium text-verdict-outside">{errors.buildIds}</p>}
          <ReasonField value={reason} onChange={setReason} error={errors.reason} hint="Kept with each re-judgement and shown on the build page." />
          <SubmitRow label={`Re-judge ${selected.size} build${selected.size === 1 ? "" : "s"}`} pending={sending} pendingLabel="Re-judging…" formError={formError} disabled={selected.size === 0} />
        </form>
      )}
      {outcome.length > 0 && (
        <section className="mt-4 space-y-3 border-t border-ink/10 pt-3 dark:border-white/10" aria-label="Re-judged just now">
          <h3 className="text-sm font-semibold">Re-judged just now</h3>
          {outcome.map((r) => (
            <ReevaluationOutcome key={r.id} r={r} title={<span className="font-medium">build {candidates.find((c) => c.build.id === r.buildId)?.build.version ?? r.buildId}</span>} />
          ))}
        </section>
      )}
    </Panel>
  );
}
