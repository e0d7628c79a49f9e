import type { ReactNode } from "react";

/** A titled surface for one widget; `actions` sit at the right of the title row. */
export function Panel({ title, subtitle, actions, children, className = "" }: { title?: ReactNode; subtitle?: ReactNode; actions?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section className={`rounded-lg border border-ink/10 bg-paper-raised p-4 shadow-sm dark:border-white/10 dark:bg-white/5 ${className}`}>
      {(title || actions) && (
        <header className="mb-3 flex flex-wrap items-baseline gap-x-3 gap-y-1">
          {title && <h2 className="text-sm font-semibold tracking-tight">{title}</h2>}
          {subtitle && <p className="text-xs text-ink-faint">{subtitle}</p>}
          {actions && <div className="ml-auto flex items-center gap-2">{actions}</div>}
        </header>
      )}
      {children}
    </section>
  );
}

export function PageTitle({ title, lead, children }: { title: ReactNode; lead?: ReactNode; children?: ReactNode }) {
  return (
    <div className="mb-5 flex flex-wrap items-end gap-x-4 gap-y-2">
      <div>
        <h1 className="text-xl font-semibold tracking-tight">{title}</h1>
        {lead && <p className="mt-1 text-sm text-ink-soft dark:text-white/60">{lead}</p>}
      </div>
      {children && <div className="ml-auto flex flex-wrap items-center gap-2">{children}</div>}
    </div>
  );
}
