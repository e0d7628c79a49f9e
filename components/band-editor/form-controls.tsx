"use client";

import { useId, type ReactNode } from "react";

// Form parts of the library editor: a label, the control, a hint, and the
// schema's complaint about that field right under it (announced to screen readers).

export const INPUT =
  "mt-1 w-full rounded border border-ink/20 bg-paper-raised px-2 py-1.5 text-sm aria-[invalid=true]:border-verdict-outside dark:border-white/20 dark:bg-white/5 dark:aria-[invalid=true]:border-verdict-outside";

interface FieldProps {
  label: ReactNode;
  error?: string;
  hint?: ReactNode;
  className?: string;
  children: (control: { id: string; "aria-invalid": boolean; "aria-describedby"?: string }) => ReactNode;
}

export function Field({ label, error, hint, className = "", children }: FieldProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`text-sm ${className}`}>
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      {children({ id, "aria-invalid": Boolean(error), "aria-describedby": describedBy })}
      {hint && (
        <p id={`${id}-hint`} className="mt-0.5 text-xs text-ink-faint dark:text-white/50">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="mt-0.5 text-xs font-medium text-verdict-outside">
          {error}
        </p>
      )}
    </div>
  );
}

/** A number typed as text: "1.2e-3", "−0.5" and an empty box (no value) are all allowed while typing. */
export function NumberField({
  label,
  value,
  onChange,
  error,
  hint,
  unit,
  placeholder,
  name,
}: {
  label: ReactNode;
  value: string;
  onChange: (v: string) => void;
  error?: string;
  hint?: ReactNode;
  unit?: string;
  placeholder?: string;
  name?: string;
}) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) => (
        <div className="flex items-baseline gap-2">
          <input
            {...control}
            name={name}
            className={`${INPUT} font-mono tabular-nums`}
            inputMode="decimal"
            spellCheck={false}
            autoComplete="off"
            value={value}
            placeholder={placeholder}
            onChange={(e) => onChange(e.target.value)}
          />
          {unit && unit !== "1" && <span className="shrink-0 text-xs text-ink-faint">{unit}</span>}
        </div>
      )}
    </Field>
  );
}

export function TextField({ label, value, onChange, error, hint, rows, mono = false, name, placeholder }: { label: ReactNode; value: string; onChange: (v: string) => void; error?: string; hint?: ReactNode; rows?: number; mono?: boolean; name?: string; placeholder?: string }) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) =>
        rows ? (
          <textarea {...control} name={name} rows={rows} className={`${INPUT} ${mono ? "font-mono" : ""}`} value={value} placeholder={placeholder} onChange={(e) => onChange(e.target.value)} />
        ) : (
          <input {...control} name={name} className={`${INPUT} ${mono ? "font-mono" : ""}`} value={value} placeholder={placeholder} spellCheck={!mono} onChange={(e) => onChange(e.target.value)} />
        )
      }
    </Field>
  );
}

/** Why the change is made; every library change needs one, and it is kept in the change record. */
export function ReasonField({ value, onChange, error, hint }: { value: string; onChange: (v: string) => void; error?: string; hint?: ReactNode }) {
  return (
    <TextField
      label="Reason for this change"
      name="reason"
      rows={3}
      value={value}
      onChange={onChange}
      error={error}
      hint={hint ?? "Kept in the change record beside the diff: cite the review, paper or build that prompted it."}
    />
  );
}

export function SubmitRow({ label, pending, pendingLabel, formError, disabled = false, children }: { label: string; pending: boolean; pendingLabel: string; formError?: string | null; disabled?: boolean; children?: ReactNode }) {
  return (
    <div className="flex flex-wrap items-center gap-3 border-t border-ink/10 pt-3 dark:border-white/10">
      <button type="submit" disabled={pending || disabled} className="rounded bg-tide-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-tide-900 disabled:opacity-60">
        {pending ? pendingLabel : label}
      </button>
      {children}
      {formError && (
        <p role="alert" className="text-sm text-verdict-outside">
          {formError}
        </p>
      )}
    </div>
  );
}
