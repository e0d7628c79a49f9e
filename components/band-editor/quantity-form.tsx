"use client";

import { useMutation } from "@apollo/client/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { describeOrigin } from "@/components/cases/case-text";
import { DEFINE_QUANTITY, REVISE_QUANTITY, type QuantityDefinitionInfo } from "@/graphql/operations/library-edit";
import { fieldErrorsOf, quantityCreateSchema, quantityRevisionSchema } from "@/lib/validation/case";
import { ReasonField, SubmitRow, TextField } from "./form-controls";
import { errorsFromServer } from "./server-errors";

/**
 * Defines a new reported quantity (no `initial`) or edits a definition's label,
 * unit and meaning. The origin is shown, not edited: what the server derives is
 * fixed by its analysis code, so a new key is always reported by the run.
 */
export function QuantityForm({ caseKey, initial, onSaved }: { caseKey: string; initial: QuantityDefinitionInfo | null; onSaved?: () => void }) {
  const router = useRouter();
  const [values, setValues] = useState({ key: initial?.key ?? "", label: initial?.label ?? "", unit: initial?.unit ?? "1", meaning: initial?.meaning ?? "", reason: "" });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [define, defined] = useMutation(DEFINE_QUANTITY);
  const [revise, revised] = useMutation(REVISE_QUANTITY);
  const set = (patch: Partial<typeof values>) => (setValues((v) => ({ ...v, ...patch })), setSaved(false));

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const { key, ...fields } = values;
    const candidate = initial ? fields : values;
    const parsed = (initial ? quantityRevisionSchema : quantityCreateSchema).safeParse(candidate);
    if (!parsed.success) {
      setErrors(fieldErrorsOf(parsed.error.issues));
      return setFormError("Correct the marked fields; nothing was saved.");
    }
    setErrors({});
    try {
      if (initial) {
        await revise({ variables: { key: initial.key, input: fields } });
        set({ reason: "" });
        setSaved(true);
        onSaved?.();
      } else {
        await define({ variables: { input: values } });
        router.push(`/cases/${caseKey}/edit/bands/${key.trim()}`);
      }
    } catch (error) {
      const server = errorsFromServer(error);
      setErrors(server.fields);
      setFormError(server.message);
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label={initial ? "Edit the quantity definition" : "New quantity definition"}>
      <div className="grid gap-4 sm:grid-cols-[16rem_1fr]">
        {initial ? (
          <div className="text-sm">
            <span className="font-medium">Key</span>
            <p className="mt-1 font-mono">{initial.key}</p>
            <p className="text-xs text-ink-faint">Fixed: CI reports and bands refer to it.</p>
          </div>
        ) : (
          <TextField label="Key" name="key" mono value={values.key} onChange={(v) => set({ key: v })} error={errors.key} hint="snake_case, as CI reports it in the run's quantities." />
        )}
        <TextField label="Label" name="label" value={values.label} onChange={(v) => set({ label: v })} error={errors.label} hint="As a CFD engineer reads it, with its symbol, e.g. Strouhal number St." />
      </div>
      <TextField label="Unit" name="unit" mono value={values.unit} onChange={(v) => set({ unit: v })} error={errors.unit} hint="As written on plots (m/s, %, orders of magnitude); 1 for a dimensionless quantity." />
      <TextField label="Meaning" name="meaning" rows={3} value={values.meaning} onChange={(v) => set({ meaning: v })} error={errors.meaning} hint="The definition, precise enough to recompute the value (normalisation, station, averaging)." />
      <div className="text-sm">
        <span className="font-medium">Origin</span>
        <p className="mt-1">{initial ? describeOrigin(initial.derivedFrom) : "reported by the run"}</p>
        <p className="text-xs text-ink-faint">Fixed by the analysis code: the server derives only the quantities it knows how to compute; any new quantity is reported by CI.</p>
      </div>
      <ReasonField value={values.reason} onChange={(v) => set({ reason: v })} error={errors.reason} />
      <SubmitRow label={initial ? "Save the definition" : "Define the quantity"} pending={defined.loading || revised.loading} pendingLabel="Saving…" formError={formError}>
        {saved && <span role="status" className="text-sm text-tide-700 dark:text-tide-300">Saved; the case&apos;s change record lists it.</span>}
      </SubmitRow>
    </form>
  );
}
