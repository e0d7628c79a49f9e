"use client";

import { cloneElement, useId, useState, type ReactElement, type ReactNode } from "react";

// Small controls shared by the administration forms and tables.

export const INPUT = "mt-1 w-full rounded border border-ink/20 bg-paper-raised px-2.5 py-1.5 text-sm dark:border-white/20 dark:bg-[#0f171e]";
export const BUTTON = "rounded bg-tide-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-tide-900 disabled:opacity-60";
export const QUIET_BUTTON = "rounded px-2 py-1 text-xs font-medium text-tide-700 ring-1 ring-inset ring-tide-700/30 hover:bg-tide-50 disabled:opacity-50 dark:text-tide-300 dark:ring-tide-300/40 dark:hover:bg-white/10";
export const DANGER_BUTTON = "rounded px-2 py-1 text-xs font-medium text-verdict-outside ring-1 ring-inset ring-verdict-outside/40 hover:bg-verdict-outside/10 disabled:opacity-50";

/**
 * A labelled control with its hint or error below. The label names only the
 * control; the hint and error are tied to it with aria-describedby.
 */
export function Field({ label, error, hint, children }: { label: string; error?: string; hint?: ReactNode; children: ReactElement<{ id?: string; "aria-describedby"?: string; "aria-invalid"?: boolean }> }) {
  const id = useId();
  const note = error || hint ? `${id}-note` : undefined;
  return (
    <div className="text-sm">
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      {cloneElement(children, { id, "aria-describedby": note, "aria-invalid": error ? true : undefined })}
      {error ? (
        <span id={note} className="mt-0.5 block text-xs text-verdict-outside">
          {error}
        </span>
      ) : hint ? (
        <span id={note} className="mt-0.5 block text-xs text-ink-faint">
          {hint}
        </span>
      ) : null}
    </div>
  );
}

/**
 * A button that asks once more before an action that locks someone out
 * (deactivate, revoke): the first click turns it into "confirm / keep".
 */
export function ConfirmButton({ label, confirmLabel, onConfirm, disabled, className = DANGER_BUTTON }: { label: string; confirmLabel: string; onConfirm: () => void; disabled?: boolean; className?: string }) {
  const [asking, setAsking] = useState(false);
  if (!asking)
    return (
      <button type="button" className={className} disabled={disabled} onClick={() => setAsking(true)}>
        {label}
      </button>
    );
  return (
    <span className="inline-flex items-center gap-1">
      <button
        type="button"
        className={DANGER_BUTTON}
        disabled={disabled}
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
      >
        {confirmLabel}
      </button>
      <button type="button" className="px-1.5 py-1 text-xs text-ink-soft underline dark:text-white/70" onClick={() => setAsking(false)}>
        keep
      </button>
    </span>
  );
}
