"use client";

import { useMutation } from "@apollo/client/react";
import { useId, useState } from "react";
import { GateStateTag } from "@/components/builds/gate-state-tag";
import { Panel } from "@/components/ui/panel";
import { DECIDE_GATE, type GateReviewData } from "@/graphql/operations/gate";
import { gateDecisionSchema, type DecisionState } from "@/lib/validation/gate";
import { FieldError, FormMessage, inputClass, primaryButton, quietButton } from "./form-bits";
import { formatDayTime } from "./gate-format";
import { readServerError, type GateIssue } from "./server-errors";

// Other screens cache what a decision changes (gate column, awaiting lists); drop
// those reads so they load afresh. The review itself is updated by the answer.
const STALE_FIELDS = ["gateCandidates", "morningView", "buildTable", "builds", "build", "releaseGate"];

/** Approve, hold or reject with a comment; approval stays disabled while anything blocks it. */
export function DecisionPanel({ review, blockerCount, mayDecide }: { review: GateReviewData; blockerCount: number; mayDecide: boolean }) {
  const uid = useId();
  const [comment, setComment] = useState("");
  const [error, setError] = useState<{ message: string; issues: GateIssue[]; field?: string } | null>(null);
  const [done, setDone] = useState<DecisionState | null>(null);
  const [decide, { loading }] = useMutation(DECIDE_GATE, {
    update(cache) {
      for (const fieldName of STALE_FIELDS) cache.evict({ id: "ROOT_QUERY", fieldName });
      cache.gc();
    },
  });
  const last = review.history[0];

  async function submit(state: DecisionState) {
    setDone(null);
    const checked = gateDecisionSchema.safeParse({ buildId: review.build.id, state, comment });
    if (!checked.success) {
      setError({ message: "", issues: [], field: checked.error.issues.find((i) => i.path[0] === "comment")?.message ?? checked.error.issues[0].message });
      return;
    }
    setError(null);
    try {
      await decide({ variables: { input: { buildId: review.build.id, state, comment } } });
      setComment("");
      setDone(state);
    } catch (e) {
      const r = readServerError(e);
      setError({ message: r.message, issues: r.code === "CONFLICT" ? r.issues : [], field: r.issues.find((i) => i.path === "comment")?.message });
    }
  }

  return (
    <Panel title="Decision" subtitle={review.isCandidate ? undefined : "This build is not on a release branch; a decision still sets the baseline of its branch."}>
      <p className="text-sm" data-testid="current-decision">
        Now: <GateStateTag state={review.state} />
        {last && (
          <span className="text-ink-soft dark:text-white/70">
            {" "}
            by {last.decidedBy}, {formatDayTime(last.decidedAt)}
          </span>
        )}
      </p>
      {!mayDecide ? (
        <p className="mt-3 text-sm text-ink-soft dark:text-white/70">Only the release manager or an administrator records decisions; everything here stays readable.</p>
      ) : (
        <form className="mt-3 space-y-2" onSubmit={(e) => e.preventDefault()} noValidate>
          <label htmlFor={`${uid}-comment`} className="block text-xs text-ink-soft dark:text-white/70">
            Comment (required; kept with the decision)
          </label>
          <textarea
            id={`${uid}-comment`}
            rows={3}
            value={comment}
            onChange={(e) => setComment(e.target.value)}
            aria-invalid={Boolean(error?.field)}
            aria-describedby={`${uid}-comment-error`}
            className={inputClass}
          />
          <FieldError id={`${uid}-comment-error`} message={error?.field} />
          <div className="flex flex-wrap gap-2">
            <button type="button" disabled={loading || blockerCount > 0} onClick={() => submit("approved")} className={primaryButton}>
              Approve
            </button>
            <button type="button" disabled={loading} onClick={() => submit("held")} className={quietButton}>
              Hold
            </button>
            <button type="button" disabled={loading} onClick={() => submit("rejected")} className={`${quietButton} text-verdict-outside`}>
              Reject
            </button>
          </div>
          {blockerCount > 0 ? (
            <p className="text-xs text-verdict-outside">
              Approval needs a waiver in force for each of the {blockerCount} item{blockerCount === 1 ? "" : "s"} in the way; hold or reject stay open.
            </p>
          ) : (
            <p className="text-xs text-ink-faint dark:text-white/50">Approving makes this build the baseline of {review.build.branch} for the builds received after it.</p>
          )}
          {error?.message && (
            <FormMessage>
              {error.issues.length > 0 ? `The server refused the approval: ${error.issues.length} item${error.issues.length === 1 ? " has" : "s have"} no waiver in force.` : error.message}
              {error.issues.length > 0 && (
                <ul className="mt-1 list-disc pl-4 text-xs">
                  {error.issues.map((i) => (
                    <li key={i.path}>
                      <span className="font-mono">{i.path}</span>: {i.message}
                    </li>
                  ))}
                </ul>
              )}
            </FormMessage>
          )}
          {done && <FormMessage tone="ok">Recorded: {done}.</FormMessage>}
        </form>
      )}
    </Panel>
  );
}
