import type { BandRecord } from "@/graphql/operations/cases";
import { formatSig, withUnit } from "@/lib/format/numbers";
import { describeSettings, formatLimit, relativeLimits } from "./case-text";

const date = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });

export function formatDate(iso: string): string {
  return date.format(new Date(iso));
}

const KIND_STYLE = {
  verification: "text-tide-700 ring-tide-500/40 dark:text-tide-300",
  validation: "text-verdict-missing ring-verdict-missing/40",
} as const;

/** One band version as a CFD engineer reads it: what it applies to, the reference and its source, the limits, why. */
export function BandEntry({ band, unit, appliesTo }: { band: BandRecord; unit: string; appliesTo: string }) {
  const overrides = describeSettings(band.fitSettings);
  const rel = relativeLimits(band.reference, band.lower, band.upper);
  return (
    <article className="rounded border border-ink/10 p-3 dark:border-white/10" data-band={`${band.quantity}/${band.model ?? "all"}`}>
      <header className="flex flex-wrap items-baseline gap-x-2 gap-y-1 text-sm">
        <span className={`rounded px-1.5 py-0.5 text-xs ring-1 ring-inset ${KIND_STYLE[band.kind]}`}>{band.kind}</span>
        <span className="font-medium">{appliesTo}</span>
        <span className="ml-auto text-xs text-ink-faint">
          version {band.version} · in force since {formatDate(band.validFrom)} · {band.author}
        </span>
      </header>
      <dl className="mt-2 grid grid-cols-[9rem_1fr] gap-x-3 gap-y-1 text-sm">
        <dt className="text-ink-faint">Reference</dt>
        <dd>
          <span className="font-mono tabular-nums">{band.reference === null ? "none (one-sided limit)" : withUnit(formatSig(band.reference, 4), unit)}</span>
          <span className="block text-ink-soft dark:text-white/70">{band.source}</span>
        </dd>
        <dt className="text-ink-faint">Accepted</dt>
        <dd>
          <span className="font-mono tabular-nums">
            {withUnit(`${formatLimit(band.lower, "lower")} … ${formatLimit(band.upper, "upper")}`, unit)}
          </span>
          {rel && <span className="ml-2 text-xs text-ink-faint">{rel}</span>}
        </dd>
        <dt className="text-ink-faint">Marginal</dt>
        <dd>{band.marginalMargin > 0 ? `a value inside the band within ${withUnit(formatSig(band.marginalMargin, 3), unit)} of a limit` : "no marginal strip"}</dd>
        <dt className="text-ink-faint">Noise floor</dt>
        <dd>{withUnit(formatSig(band.noiseFloor, 3), unit)} <span className="text-xs text-ink-faint">(smaller changes against the baseline are not drift)</span></dd>
        {overrides.length > 0 && (
          <>
            <dt className="text-ink-faint">Fit settings</dt>
            <dd>
              {overrides.map((o) => (
                <span key={o.label} className="block">
                  {o.label}: <span className="font-mono">{o.value}</span>
                </span>
              ))}
            </dd>
          </>
        )}
      </dl>
      <details className="mt-2 text-sm">
        <summary className="cursor-pointer text-xs text-tide-700 dark:text-tide-300">Why this band</summary>
        <p className="mt-1 text-ink-soft dark:text-white/70">{band.reason}</p>
      </details>
    </article>
  );
}
