import type { ReactNode } from "react";

/** Placeholder of the size of what is loading, so the page does not jump. */
export function Skeleton({ className = "h-4 w-full" }: { className?: string }) {
  return <div aria-hidden className={`animate-pulse rounded bg-ink/10 dark:bg-white/10 ${className}`} />;
}

export function LoadingBlock({ label = "Loading", rows = 4 }: { label?: string; rows?: number }) {
  return (
    <div role="status" aria-label={label} className="space-y-2">
      {Array.from({ length: rows }, (_, i) => (
        <Skeleton key={i} className={`h-4 ${i % 3 === 2 ? "w-2/3" : "w-full"}`} />
      ))}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-ink/20 p-6 text-sm dark:border-white/20">
      <p className="font-medium">{title}</p>
      {children && <div className="mt-1 text-ink-soft dark:text-white/60">{children}</div>}
    </div>
  );
}

/** An error a person can act on: what failed, and what to do about it. */
export function ErrorNotice({ title = "Could not load this", error, action }: { title?: string; error: { message: string } | string; action?: ReactNode }) {
  const message = typeof error === "string" ? error : error.message;
  const signIn = /sign in|UNAUTHENTICATED/i.test(message);
  return (
    <div role="alert" className="rounded border border-verdict-outside/40 bg-verdict-outside/5 p-4 text-sm">
      <p className="font-medium text-verdict-outside">{title}</p>
      <p className="mt-1">{message}</p>
      <p className="mt-2 text-ink-soft dark:text-white/60">
        {signIn ? (
          <a className="underline" href="/sign-in">
            Sign in again
          </a>
        ) : (
          action ?? "Reload the page; if it persists the server log has the details."
        )}
      </p>
    </div>
  );
}
