"use client";

import { useMutation } from "@apollo/client/react";
import { useState, type FormEvent } from "react";
import { relativeLimits } from "@/components/cases/case-text";
import { REVISE_BAND, type BandVersionInfo } from "@/graphql/operations/library-edit";
import { bandInputFromDraft, draftFromBand, fitTextFrom, type BandDraft, type FitKey } from "./band-draft";
import { BandPreview, type PreviewBand } from "./band-preview";
import { FIT_LABELS, FIT_SETTINGS_ELSEWHERE, fitFieldsFor } from "./fit-fields";
import { NumberField, ReasonField, SubmitRow, TextField } from "./form-controls";
import { errorsFromServer } from "./server-errors";
import { parseNumberText } from "./number-text";

interface Props {
  scope: { caseKey: string; quantityKey: string; model: string | null };
  unit: string;
  current: BandVersionInfo | null;
  /** The case-wide band a new model band starts from, when the model has none yet. */
  startFrom: BandVersionInfo | null;
  /** The case's fit settings, shown in the empty override fields as what applies. */
  caseSettings: Record<string, unknown>;
  onSaved: (saved: { version: number }) => void;
}

const KINDS = [
  { value: "verification", text: "verification — the closure's own analytic answer; tight, per model" },
  { value: "validation", text: "validation — experiment or DNS with its published spread" },
] as const;

/** The QA lead's form for a new version of one band scope. */
export function BandForm({ scope, unit, current, startFrom, caseSettings, onSaved }: Props) {
  const [draft, setDraft] = useState<BandDraft>(() => draftFromBand(current ?? startFrom));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [revise, { loading }] = useMutation(REVISE_BAND);
  const set = (patch: Partial<BandDraft>) => setDraft((d) => ({ ...d, ...patch }));
  const setFit = (key: FitKey, v: string) => setDraft((d) => ({ ...d, fit: { ...d.fit, [key]: v } }));

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const { input, errors: found } = bandInputFromDraft(draft, scope);
    setErrors(found);
    if (!input) return setFormError("Correct the marked fields; nothing was saved.");
    try {
      const { data } = await revise({ variables: { input } });
      if (data) {
        setDraft((d) => ({ ...d, reason: "" }));
        onSaved({ version: data.reviseBand.version });
      }
    } catch (error) {
      const server = errorsFromServer(error);
      setErrors(server.fields);
      setFormError(server.message);
    }
  }

  const num = (text: string) => {
    const p = parseNumberText(text);
    return p.ok ? p.value : null;
  };
  const preview: PreviewBand[] = [
    ...(current ? [{ label: `v${current.version} now`, reference: current.reference, lower: current.lower, upper: current.upper, marginalMargin: current.marginalMargin }] : []),
    ...(!current && startFrom ? [{ label: "case-wide", reference: startFrom.reference, lower: startFrom.lower, upper: startFrom.upper, marginalMargin: startFrom.marginalMargin }] : []),
    { label: "draft", reference: num(draft.reference), lower: num(draft.lower), upper: num(draft.upper), marginalMargin: num(draft.marginalMargin) ?? 0 },
  ];
  const rel = relativeLimits(num(draft.reference), num(draft.lower), num(draft.upper));
  const fitKeys = fitFieldsFor(scope.quantityKey, draft.fit);
  const caseText = fitTextFrom(caseSettings);
  const placeholder = (key: FitKey) => (caseText[key] ? `case: ${caseText[key]}` : "not set");

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="New band version">
      <fieldset>
        <legend className="text-sm font-medium">Kind</legend>
        <div className="mt-1 flex flex-col gap-1 text-sm">
          {KINDS.map((k) => (
            <label key={k.value} className="flex items-baseline gap-2">
              <input type="radio" name="kind" value={k.value} checked={draft.kind === k.value} onChange={() => set({ kind: k.value })} />
              <span>{k.text}</span>
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberField label="Reference value" name="reference" value={draft.reference} onChange={(v) => set({ reference: v })} error={errors.reference} unit={unit} hint="Empty for a one-sided limit with no reference." />
        <NumberField label="Lower limit" name="lower" value={draft.lower} onChange={(v) => set({ lower: v })} error={errors.lower} unit={unit} hint="Empty: open below." />
        <NumberField label="Upper limit" name="upper" value={draft.upper} onChange={(v) => set({ upper: v })} error={errors.upper} unit={unit} hint="Empty: open above." />
      </div>
      <div className="rounded border border-ink/10 p-3 dark:border-white/10">
        <BandPreview bands={preview} unit={unit} />
        {rel && <p className="mt-1 text-xs text-ink-faint">Draft limits: {rel}</p>}
      </div>
      <TextField label="Published source of the reference and limits" name="source" rows={2} value={draft.source} onChange={(v) => set({ source: v })} error={errors.source} hint="Author, year, equation or table; say “from memory” for a recalled value." />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField label="Marginal margin" name="marginalMargin" value={draft.marginalMargin} onChange={(v) => set({ marginalMargin: v })} error={errors.marginalMargin} unit={unit} hint="A value inside the band this close to a limit is marginal; 0 for no strip." />
        <NumberField label="Noise floor" name="noiseFloor" value={draft.noiseFloor} onChange={(v) => set({ noiseFloor: v })} error={errors.noiseFloor} unit={unit} hint="Smaller changes against the baseline are not drift." />
      </div>
      {fitKeys.length > 0 ? (
        <fieldset className="rounded border border-ink/10 p-3 dark:border-white/10">
          <legend className="px-1 text-sm font-medium">Fit settings of this band</legend>
          <p className="text-xs text-ink-faint">An empty field uses the case&apos;s setting (shown greyed). Settings apply to builds posted from now on; stored values are not refitted.</p>
          <div className="mt-2 grid gap-4 sm:grid-cols-2">
            {fitKeys.map((key) =>
              key === "cfStationLabel" ? (
                <TextField key={key} label={FIT_LABELS[key].label} value={draft.fit[key]} onChange={(v) => setFit(key, v)} error={errors["fitSettings.cfStationLabel"]} hint={FIT_LABELS[key].hint} placeholder={placeholder(key)} />
              ) : (
                <NumberField
                  key={key}
                  label={FIT_LABELS[key].label}
                  value={draft.fit[key]}
                  onChange={(v) => setFit(key, v)}
                  error={errors[key === "yPlusMin" || key === "yPlusMax" ? `fitSettings.logLawWindow.${key}` : `fitSettings.${key}`]}
                  hint={FIT_LABELS[key].hint}
                  unit={FIT_LABELS[key].unit}
                  placeholder={placeholder(key)}
                />
              ),
            )}
          </div>
        </fieldset>
      ) : (
        FIT_SETTINGS_ELSEWHERE[scope.quantityKey] && <p className="text-xs text-ink-faint">{FIT_SETTINGS_ELSEWHERE[scope.quantityKey]}</p>
      )}
      <ReasonField value={draft.reason} onChange={(v) => set({ reason: v })} error={errors.reason} />
      <SubmitRow label={current ? `Save as version ${current.version + 1}` : "Save as version 1"} pending={loading} pendingLabel="Saving…" formError={formError ?? errors.form}>
        <button type="button" className="text-sm text-ink-soft underline dark:text-white/60" onClick={() => (setDraft(draftFromBand(current ?? startFrom)), setErrors({}), setFormError(null))}>
          Start again from {current ? `version ${current.version}` : "the case-wide band"}
        </button>
      </SubmitRow>
    </form>
  );
}
