// Shared looks of the alert forms (light and dark).
export const inputClass =
  "rounded border border-ink/15 bg-paper-raised px-2 py-1 text-sm dark:border-white/20 dark:bg-[#0f171e] aria-[invalid=true]:border-verdict-outside";
export const labelClass = "flex flex-col gap-0.5 text-xs text-ink-soft dark:text-white/60";
export const primaryButton =
  "rounded bg-tide-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-tide-900 disabled:opacity-50 dark:bg-tide-500 dark:hover:bg-tide-700";
export const quietButton = "rounded px-2 py-1 text-sm text-tide-700 underline-offset-2 hover:underline disabled:opacity-50 dark:text-tide-300";
