import type { ReactNode } from "react";

// Form pieces shared by the gate's forms (decision, waiver, withdrawal).

export const inputClass =
  "w-full rounded border border-ink/20 bg-paper-raised px-2 py-1 text-sm focus:border-tide-500 focus:outline-none dark:border-white/20 dark:bg-[#0f171e] aria-[invalid=true]:border-verdict-outside";

export const primaryButton =
  "rounded bg-tide-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-tide-900 disabled:cursor-not-allowed disabled:opacity-40 dark:bg-tide-500 dark:hover:bg-tide-300 dark:hover:text-ink";

export const quietButton =
  "rounded border border-ink/15 px-3 py-1.5 text-sm hover:bg-ink/5 disabled:cursor-not-allowed disabled:opacity-40 dark:border-white/20 dark:hover:bg-white/10";

export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="mt-0.5 text-xs text-verdict-outside">
      {message}
    </p>
  );
}

export function FormMessage({ children, tone = "error" }: { children: ReactNode; tone?: "error" | "ok" }) {
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded px-2 py-1.5 text-sm ${tone === "error" ? "bg-verdict-outside/10 text-verdict-outside" : "bg-verdict-within/10 text-verdict-within"}`}>
      {children}
    </div>
  );
}
