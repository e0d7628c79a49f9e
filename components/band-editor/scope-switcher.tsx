import Link from "next/link";

/**
 * The scopes a quantity's band can have on this case: the case-wide band and one
 * per model. A model with its own band overrides the case-wide one for that model;
 * choosing a model without one starts its first own version.
 */
export function ScopeSwitcher({
  caseKey,
  quantityKey,
  model,
  models,
  modelName,
  ownBands,
}: {
  caseKey: string;
  quantityKey: string;
  model: string | null;
  models: string[];
  modelName: (key: string) => string;
  ownBands: ReadonlySet<string>;
}) {
  const href = (m: string | null) => `/cases/${caseKey}/edit/bands/${quantityKey}${m ? `?model=${encodeURIComponent(m)}` : ""}`;
  const item = (m: string | null, label: string, note: string) => {
    const active = m === model;
    return (
      <li key={m ?? ""}>
        <Link
          href={href(m)}
          aria-current={active ? "page" : undefined}
          className={`block rounded border px-2.5 py-1 text-sm ${active ? "border-tide-700 bg-tide-700 text-white" : "border-ink/15 hover:bg-ink/5 dark:border-white/15 dark:hover:bg-white/10"}`}
        >
          {label}
          <span className={`block text-[11px] ${active ? "text-white/80" : "text-ink-faint"}`}>{note}</span>
        </Link>
      </li>
    );
  };
  return (
    <nav aria-label="Band scope">
      <ul className="flex flex-wrap gap-2">
        {item(null, "All models", "case-wide band")}
        {models.map((m) => item(m, modelName(m), ownBands.has(m) ? "own band" : "uses the case-wide band"))}
      </ul>
    </nav>
  );
}
