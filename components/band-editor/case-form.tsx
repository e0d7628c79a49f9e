"use client";

import { useMutation } from "@apollo/client/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import type { ModelInfo } from "@/graphql/operations/cases";
import { CREATE_CASE, REVISE_CASE } from "@/graphql/operations/library-edit";
import { caseCreateSchema, caseRevisionSchema, fieldErrorsOf } from "@/lib/validation/case";
import { FIT_KEYS, fitSettingsFromText, fitTextFrom, type FitKey } from "./band-draft";
import { FIT_LABELS } from "./fit-fields";
import { NumberField, ReasonField, SubmitRow, TextField } from "./form-controls";
import { errorsFromServer } from "./server-errors";

export interface CaseValues {
  key: string;
  title: string;
  description: string;
  models: string[];
  parameters: Record<string, unknown>;
}

const EMPTY: CaseValues = { key: "", title: "", description: "", models: [], parameters: {} };

/** Creating a case (no `initial`) or editing one; the key is fixed once created because builds refer to it. */
export function CaseForm({ initial, models, onSaved }: { initial?: CaseValues; models: ModelInfo[]; onSaved?: () => void }) {
  const router = useRouter();
  const start = initial ?? EMPTY;
  const [values, setValues] = useState(start);
  const [fit, setFit] = useState(() => fitTextFrom(start.parameters));
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [create, created] = useMutation(CREATE_CASE);
  const [revise, revised] = useMutation(REVISE_CASE);
  const set = (patch: Partial<CaseValues>) => (setValues((v) => ({ ...v, ...patch })), setSaved(false));
  const toggleModel = (key: string) => set({ models: values.models.includes(key) ? values.models.filter((m) => m !== key) : [...values.models, key] });

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const textErrors: Record<string, string> = {};
    const parameters = fitSettingsFromText(fit, textErrors, "parameters");
    const candidate = { ...(initial ? {} : { key: values.key }), title: values.title, description: values.description, models: values.models, parameters, reason };
    const parsed = (initial ? caseRevisionSchema : caseCreateSchema).safeParse(candidate);
    const found = { ...(parsed.success ? {} : fieldErrorsOf(parsed.error.issues)), ...textErrors };
    setErrors(found);
    if (!parsed.success || Object.keys(found).length) return setFormError("Correct the marked fields; nothing was saved.");
    try {
      if (initial) {
        await revise({ variables: { key: initial.key, input: candidate } });
        setReason("");
        setSaved(true);
        onSaved?.();
      } else {
        await create({ variables: { input: candidate } });
        router.push(`/cases/${values.key}/edit?created=1`);
      }
    } catch (error) {
      const server = errorsFromServer(error);
      setErrors(server.fields);
      setFormError(server.message);
    }
  }

  const modelError = errors.models ?? Object.entries(errors).find(([k]) => k.startsWith("models."))?.[1];
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label={initial ? "Edit the case" : "New case"}>
      <div className="grid gap-4 sm:grid-cols-[16rem_1fr]">
        {initial ? (
          <div className="text-sm">
            <span className="font-medium">Key</span>
            <p className="mt-1 font-mono">{initial.key}</p>
            <p className="text-xs text-ink-faint">Fixed: builds refer to it.</p>
          </div>
        ) : (
          <TextField label="Key" name="key" mono value={values.key} onChange={(v) => set({ key: v })} error={errors.key} hint="What CI posts as the run's case, e.g. pipe-re5300." />
        )}
        <TextField label="Title" name="title" value={values.title} onChange={(v) => set({ title: v })} error={errors.title} />
      </div>
      <TextField label="Description" name="description" rows={4} value={values.description} onChange={(v) => set({ description: v })} error={errors.description} hint="Flow, Reynolds number, grid, what the case checks and which series CI posts." />
      <fieldset>
        <legend className="text-sm font-medium">Turbulence models run on this case</legend>
        <div className="mt-1 grid gap-1 sm:grid-cols-2">
          {models.map((m) => (
            <label key={m.key} className="flex items-baseline gap-2 text-sm">
              <input type="checkbox" checked={values.models.includes(m.key)} onChange={() => toggleModel(m.key)} />
              <span>
                {m.name} <span className="font-mono text-xs text-ink-faint">{m.key}</span>
              </span>
            </label>
          ))}
        </div>
        {modelError && <p role="alert" className="mt-0.5 text-xs font-medium text-verdict-outside">{modelError}</p>}
      </fieldset>
      <fieldset className="rounded border border-ink/10 p-3 dark:border-white/10">
        <legend className="px-1 text-sm font-medium">Fit settings of the case</legend>
        <p className="text-xs text-ink-faint">Defaults the derivations use unless a band overrides them; empty fields are not set. They apply to builds posted from now on.</p>
        <div className="mt-2 grid gap-4 sm:grid-cols-2">
          {FIT_KEYS.map((key: FitKey) => {
            const path = key === "yPlusMin" || key === "yPlusMax" ? `parameters.logLawWindow.${key}` : `parameters.${key}`;
            const common = { label: FIT_LABELS[key].label, value: fit[key], onChange: (v: string) => (setFit((f) => ({ ...f, [key]: v })), setSaved(false)), error: errors[path], hint: FIT_LABELS[key].hint };
            return key === "cfStationLabel" ? <TextField key={key} {...common} /> : <NumberField key={key} {...common} unit={FIT_LABELS[key].unit} />;
          })}
        </div>
      </fieldset>
      <ReasonField value={reason} onChange={setReason} error={errors.reason} />
      <SubmitRow label={initial ? "Save the case" : "Create the case"} pending={created.loading || revised.loading} pendingLabel="Saving…" formError={formError}>
        {saved && <span role="status" className="text-sm text-tide-700 dark:text-tide-300">Saved; the change record below lists it.</span>}
      </SubmitRow>
    </form>
  );
}
