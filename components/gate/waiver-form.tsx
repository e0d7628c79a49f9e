"use client";

import { useMutation } from "@apollo/client/react";
import { useId, useState } from "react";
import { GRANT_WAIVER, type GateFindingItem } from "@/graphql/operations/gate";
import { endOfUtcDay, MAX_WAIVER_DAYS, waiverGrantSchema } from "@/lib/validation/gate";
import { FieldError, FormMessage, inputClass, primaryButton, quietButton } from "./form-bits";
import { fieldErrors, readServerError } from "./server-errors";

const DAY_MS = 86_400_000;
const isoDay = (t: number) => new Date(t).toISOString().slice(0, 10);

/** Grants a waiver for one blocking quantity; scope defaults to this model on this branch, the narrowest. */
export function WaiverForm({ finding, branch, onDone }: { finding: GateFindingItem; branch: string; onDone: () => void }) {
  const uid = useId();
  const today = Date.now();
  const [allModels, setAllModels] = useState(false);
  const [allBranches, setAllBranches] = useState(false);
  const [until, setUntil] = useState(isoDay(today + 14 * DAY_MS));
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [grant, { loading }] = useMutation(GRANT_WAIVER, { refetchQueries: "active", awaitRefetchQueries: true });

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setMessage(null);
    const input = { case: finding.case, quantity: finding.quantity ?? "", model: allModels ? null : finding.model, branch: allBranches ? null : branch, reason, expiresAt: endOfUtcDay(until) };
    const checked = waiverGrantSchema.safeParse(input);
    if (!checked.success) {
      setErrors(fieldErrors(checked.error.issues.map((i) => ({ path: String(i.path[0] ?? "form"), message: i.message }))));
      return;
    }
    setErrors({});
    try {
      await grant({ variables: { input: { ...input, expiresAt: checked.data.expiresAt.toISOString() } } });
      onDone();
    } catch (error) {
      const r = readServerError(error);
      setErrors(fieldErrors(r.issues));
      setMessage(r.message);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="space-y-2 rounded border border-ink/10 bg-paper/60 p-3 text-sm dark:border-white/10 dark:bg-white/5" aria-label={`Waiver for ${finding.quantity}`}>
      <p className="font-medium">
        Let <span className="font-mono">{finding.quantity}</span> of <span className="font-mono">{finding.case}</span> through
      </p>
      <fieldset className="flex flex-wrap gap-x-4 gap-y-1">
        <legend className="sr-only">Models</legend>
        <label className="flex items-center gap-1.5">
          <input type="radio" name={`${uid}-model`} checked={!allModels} onChange={() => setAllModels(false)} /> only {finding.model}
        </label>
        <label className="flex items-center gap-1.5">
          <input type="radio" name={`${uid}-model`} checked={allModels} onChange={() => setAllModels(true)} /> every model of the case
        </label>
      </fieldset>
      <fieldset className="flex flex-wrap gap-x-4 gap-y-1">
        <legend className="sr-only">Branches</legend>
        <label className="flex items-center gap-1.5">
          <input type="radio" name={`${uid}-branch`} checked={!allBranches} onChange={() => setAllBranches(false)} /> only on <span className="font-mono text-xs">{branch}</span>
        </label>
        <label className="flex items-center gap-1.5">
          <input type="radio" name={`${uid}-branch`} checked={allBranches} onChange={() => setAllBranches(true)} /> on every branch
        </label>
      </fieldset>
      <div>
        <label htmlFor={`${uid}-until`} className="block text-xs text-ink-soft dark:text-white/70">
          Counts through the end of (UTC; at most {MAX_WAIVER_DAYS} days)
        </label>
        <input
          id={`${uid}-until`}
          type="date"
          value={until}
          min={isoDay(today)}
          max={isoDay(today + (MAX_WAIVER_DAYS - 1) * DAY_MS)}
          onChange={(e) => setUntil(e.target.value)}
          aria-invalid={Boolean(errors.expiresAt)}
          aria-describedby={`${uid}-until-error`}
          className={`${inputClass} max-w-44`}
        />
        <FieldError id={`${uid}-until-error`} message={errors.expiresAt} />
      </div>
      <div>
        <label htmlFor={`${uid}-reason`} className="block text-xs text-ink-soft dark:text-white/70">
          Why it may pass (kept with the waiver and in the audit log)
        </label>
        <textarea
          id={`${uid}-reason`}
          rows={2}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          aria-invalid={Boolean(errors.reason)}
          aria-describedby={`${uid}-reason-error`}
          className={inputClass}
        />
        <FieldError id={`${uid}-reason-error`} message={errors.reason ?? errors.case ?? errors.quantity ?? errors.model ?? errors.branch} />
      </div>
      {message && <FormMessage>{message}</FormMessage>}
      <div className="flex gap-2">
        <button type="submit" disabled={loading} className={primaryButton}>
          {loading ? "Granting…" : "Grant waiver"}
        </button>
        <button type="button" onClick={onDone} className={quietButton}>
          Cancel
        </button>
      </div>
    </form>
  );
}
