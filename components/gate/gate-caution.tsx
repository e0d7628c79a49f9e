// The limit of what this gate says (DESIGN.md, Cautions). Shown at the top of
// every gate page, before anything a reader could take as a clearance.
export function GateCaution({ compact = false }: { compact?: boolean }) {
  return (
    <aside
      role="note"
      aria-label="What this gate does not establish"
      className="flex gap-3 rounded-lg border-l-4 border-verdict-marginal bg-verdict-marginal/10 px-4 py-3 text-sm text-ink dark:bg-verdict-marginal/15 dark:text-white/90"
    >
      <span aria-hidden className="mt-0.5 text-lg leading-none text-verdict-marginal">
        ⚠
      </span>
      <div>
        <p className="font-semibold">Passing canonical cases does not validate the solver for a particular design.</p>
        {!compact && (
          <p className="mt-1 text-ink-soft dark:text-white/75">
            This gate checks that a build still reproduces published verification and validation results. Wherever results are used where safety is at stake,
            the applicable codes, standards and licensed engineering practice govern — not an approval here.
          </p>
        )}
      </div>
    </aside>
  );
}
