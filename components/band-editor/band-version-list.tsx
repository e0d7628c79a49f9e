import { formatUtc } from "@/components/builds/format-time";
import { formatLimit } from "@/components/cases/case-text";
import type { BandVersionInfo } from "@/graphql/operations/library-edit";
import { formatSig, withUnit } from "@/lib/format/numbers";
import { ChangeLines } from "./change-lines";

/** Every version of one band scope, newest first: who, when, why, and what changed from the version before. */
export function BandVersionList({ versions, unit, highlight }: { versions: BandVersionInfo[]; unit: string; highlight?: number | null }) {
  if (versions.length === 0) return <p className="text-sm text-ink-faint">No version yet: this scope has never had a band.</p>;
  return (
    <ol className="space-y-3" aria-label="Versions of this band">
      {versions.map((v) => (
        <li
          key={v.id}
          data-version={v.version}
          className={`rounded border p-3 ${v.version === highlight ? "border-tide-500 bg-tide-50/60 dark:bg-tide-900/30" : "border-ink/10 dark:border-white/10"}`}
        >
          <header className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
            <span className="font-semibold">version {v.version}</span>
            {v.supersededAt === null ? (
              <span className="rounded bg-tide-700 px-1.5 py-0.5 text-xs text-white">in force</span>
            ) : (
              <span className="text-xs text-ink-faint">superseded {formatUtc(v.supersededAt)}</span>
            )}
            <span className="text-xs text-ink-faint">from {formatUtc(v.validFrom)}</span>
            <span className="text-xs">{v.author}</span>
            <span className="ml-auto text-xs text-ink-faint">
              {v.judgedBuilds === 0 ? "no build judged against it" : `${v.judgedBuilds} build${v.judgedBuilds === 1 ? "" : "s"} judged against it`}
            </span>
          </header>
          <p className="mt-1 text-sm text-ink-soft dark:text-white/70">“{v.reason}”</p>
          <div className="mt-2">
            {v.changes.length > 0 ? (
              <ChangeLines changes={v.changes} unit={unit} />
            ) : (
              <p className="text-sm">
                <span className="text-ink-faint">{v.version === versions[versions.length - 1].version ? "first version:" : "no field changed:"}</span>{" "}
                <span className="font-mono tabular-nums">
                  {withUnit(`${formatLimit(v.lower, "lower")} … ${formatLimit(v.upper, "upper")}`, unit)}
                </span>
                {v.reference !== null && <span className="font-mono tabular-nums">, reference {withUnit(formatSig(v.reference, 5), unit)}</span>}
                <span className="text-ink-faint">, {v.kind}</span>
              </p>
            )}
          </div>
        </li>
      ))}
    </ol>
  );
}
