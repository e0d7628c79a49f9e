"use client";

import { useQuery } from "@apollo/client/react";
import type { ReactNode } from "react";
import { ErrorNotice, Skeleton } from "@/components/ui/states";
import { UPLOAD_CASES_QUERY, type UploadCasesData } from "@/graphql/operations/upload";
import type { FieldIssue } from "@/lib/errors";
import { SERIES_COLUMNS, UPLOAD_SERIES_KEYS, type UploadSeriesKey } from "@/lib/validation/upload";
import type { RunFields } from "./check-upload";

const STATUSES = ["COMPLETED", "DIVERGED", "CRASHED", "TIMEOUT"] as const;
const INPUT = "mt-1 w-full rounded border border-ink/20 bg-paper-raised px-2 py-1.5 text-sm dark:border-white/20 dark:bg-white/5";

interface Props {
  fields: RunFields;
  issues: FieldIssue[];
  onField: (patch: Partial<RunFields>) => void;
}

/** The build and the one run a CSV series belongs to; each field shows the schema's complaint about it. */
export function CsvRunForm({ fields, issues, onField }: Props) {
  const { data, loading, error } = useQuery<UploadCasesData>(UPLOAD_CASES_QUERY);
  const issueAt = (path: string) => issues.find((i) => i.path === path)?.message;
  const models = data?.cases.find((c) => c.key === fields.case)?.models ?? [];
  const text = (key: keyof RunFields, label: string, placeholder: string, path: string, hint?: string, wide = false) => (
    <Field label={label} error={issueAt(path)} hint={hint} wide={wide}>
      <input className={`${INPUT} ${key === "solver" ? "" : "font-mono"}`} value={fields[key]} placeholder={placeholder} onChange={(e) => onField({ [key]: e.target.value })} spellCheck={false} />
    </Field>
  );

  return (
    <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
      {text("solver", "Solver", "Cormorant", "input.build.solver")}
      {text("version", "Version", "4.3.0-dev.42", "input.build.version")}
      {text("commit", "Commit", "7 to 64 hex digits", "input.build.commit", "Re-posting a commit replaces runs with the same case, model and grid.")}
      {text("branch", "Branch", "manual/your-name", "input.build.branch")}
      <Field label="Case" error={issueAt("input.runs[0].case")} wide>
        {loading ? (
          <Skeleton className="mt-1 h-8 w-full" />
        ) : error ? (
          <ErrorNotice title="Could not load the case library" error={error} />
        ) : (
          <select className={INPUT} value={fields.case} onChange={(e) => onField({ case: e.target.value, model: "" })}>
            <option value="">Choose a case…</option>
            {data?.cases.map((c) => (
              <option key={c.key} value={c.key}>
                {c.key} — {c.title}
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field label="Turbulence model" error={issueAt("input.runs[0].model")}>
        <select className={INPUT} value={fields.model} onChange={(e) => onField({ model: e.target.value })} disabled={!fields.case}>
          <option value="">{fields.case ? "Choose a model…" : "Choose a case first"}</option>
          {models.map((m) => (
            <option key={m} value={m}>
              {m}
            </option>
          ))}
        </select>
      </Field>
      {text("grid", "Grid level", "default", "input.runs[0].grid", "Left empty, the grid is \u201cdefault\u201d.")}
      <Field label="Run status" error={issueAt("input.runs[0].status")}>
        <select className={INPUT} value={fields.status} onChange={(e) => onField({ status: e.target.value })}>
          {STATUSES.map((s) => (
            <option key={s} value={s}>
              {s.toLowerCase()}
            </option>
          ))}
        </select>
      </Field>
      {text("pipelineUrl", "Pipeline or notebook link (optional)", "https://…", "input.build.pipelineUrl", undefined, true)}
    </div>
  );
}

/** What the CSV's two columns hold; decides the derivation the server runs on them. */
export function SeriesKeyPicker({ value, error, onChange }: { value: UploadSeriesKey | null; error?: string; onChange: (key: UploadSeriesKey) => void }) {
  return (
    <Field label="What the two columns hold" error={error} hint={value ? `Derives ${DERIVES[value]}.` : undefined}>
      <select className={INPUT} value={value ?? ""} onChange={(e) => onChange(e.target.value as UploadSeriesKey)}>
        <option value="">Choose a series…</option>
        {UPLOAD_SERIES_KEYS.map((k) => (
          <option key={k} value={k}>
            {k}: {SERIES_COLUMNS[k].title} (x = {SERIES_COLUMNS[k].x}, y = {SERIES_COLUMNS[k].y})
          </option>
        ))}
      </select>
    </Field>
  );
}

// DESIGN.md, series table: what the server derives from each series key.
const DERIVES: Record<UploadSeriesKey, string> = {
  u_plus: "κ and B of the log law (least squares over the case's log-region window)",
  k_decay: "the decay exponent n of k ∝ (t − t₀)⁻ⁿ, with the virtual origin t₀ fitted",
  cf: "c_f at the case's station and the reattachment length x_r/h from the sign change",
  residual: "the residual drop in orders of magnitude",
};

function Field({ label, error, hint, wide, children }: { label: string; error?: string; hint?: string; wide?: boolean; children: ReactNode }) {
  return (
    <label className={`block text-sm ${wide ? "sm:col-span-2" : ""}`}>
      <span className="text-xs font-medium text-ink-soft dark:text-white/70">{label}</span>
      {children}
      {error ? <span className="mt-0.5 block text-xs text-verdict-outside">{error}</span> : hint ? <span className="mt-0.5 block text-xs text-ink-faint">{hint}</span> : null}
    </label>
  );
}
