"use client";

import { useMutation } from "@apollo/client/react";
import { useState, type FormEvent } from "react";
import { MY_ALERTS, SAVE_ALERT_SUBSCRIPTION, type AlertMode } from "@/graphql/operations/alerts";
import { inputClass, labelClass, primaryButton } from "./form-styles";
import { serverMessage } from "./server-message";

/** Adds a scope (or changes the delivery of the same scope): a case or every case, a branch or every branch. */
export function SubscriptionForm({ cases, branches }: { cases: { key: string; title: string }[]; branches: string[] }) {
  const [caseKey, setCaseKey] = useState("");
  const [branch, setBranch] = useState("");
  const [mode, setMode] = useState<AlertMode>("immediate");
  const [problem, setProblem] = useState<{ message: string; fields: Record<string, string> } | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [save, { loading }] = useMutation(SAVE_ALERT_SUBSCRIPTION, { refetchQueries: [MY_ALERTS], awaitRefetchQueries: true });

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setProblem(null);
    setDone(null);
    try {
      await save({ variables: { input: { caseKey: caseKey || null, branch: branch.trim() || null, mode } } });
      setDone(`Saved: ${caseKey || "every case"} on ${branch.trim() || "every branch"}, ${mode === "immediate" ? "at once" : "in the hourly digest"}.`);
    } catch (error) {
      setProblem(serverMessage(error));
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add an alert subscription" className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className={labelClass}>
          Case
          <select className={`${inputClass} min-w-56`} value={caseKey} onChange={(e) => setCaseKey(e.target.value)} aria-invalid={Boolean(problem?.fields.caseKey)}>
            <option value="">Every case</option>
            {cases.map((c) => (
              <option key={c.key} value={c.key}>
                {c.title} ({c.key})
              </option>
            ))}
          </select>
        </label>
        <label className={labelClass}>
          Branch (empty: every branch)
          <input
            className={`${inputClass} w-56 font-mono`}
            list="alert-branches"
            value={branch}
            onChange={(e) => setBranch(e.target.value)}
            placeholder="every branch"
            maxLength={200}
            aria-invalid={Boolean(problem?.fields.branch)}
          />
          <datalist id="alert-branches">
            {branches.map((b) => (
              <option key={b} value={b} />
            ))}
          </datalist>
        </label>
        <fieldset className="flex flex-col gap-0.5">
          <legend className="text-xs text-ink-soft dark:text-white/60">Delivery</legend>
          <div className="flex gap-3 py-1 text-sm">
            <label className="flex items-center gap-1.5">
              <input type="radio" name="mode" checked={mode === "immediate"} onChange={() => setMode("immediate")} /> at once
            </label>
            <label className="flex items-center gap-1.5">
              <input type="radio" name="mode" checked={mode === "digest"} onChange={() => setMode("digest")} /> hourly digest
            </label>
          </div>
        </fieldset>
        <button type="submit" className={primaryButton} disabled={loading}>
          {loading ? "Saving…" : "Subscribe"}
        </button>
      </div>
      {problem && (
        <p role="alert" className="text-sm text-verdict-outside">
          {problem.message}
        </p>
      )}
      {done && (
        <p role="status" className="text-sm text-tide-700 dark:text-tide-300">
          {done}
        </p>
      )}
    </form>
  );
}
