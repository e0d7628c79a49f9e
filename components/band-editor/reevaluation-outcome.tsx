import Link from "next/link";
import { formatUtc } from "@/components/builds/format-time";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { ReevaluatedQuantityInfo, ReevaluationInfo } from "@/graphql/operations/library-edit";
import { formatSig } from "@/lib/format/numbers";

const bandText = (version: number | null, model: string | null) => (version === null ? "no band" : `band v${version} ${model ?? "all models"}`);

/** One re-judged value: where it is, its stored value, and its verdict then and now with the band versions behind them. */
function ChangedValue({ c, buildId }: { c: ReevaluatedQuantityInfo; buildId: string }) {
  return (
    <li className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm">
      <Link href={`/builds/${buildId}/runs/${c.runId}`} className="font-mono text-xs text-tide-700 hover:underline dark:text-tide-300">
        {c.case} · {c.model}
        {c.grid !== "default" ? ` · ${c.grid}` : ""} · {c.quantity}
      </Link>
      <span className="font-mono text-xs tabular-nums">= {c.value === null ? "no value" : formatSig(c.value, 5)}</span>
      {c.originalVerdict ? <VerdictBadge verdict={c.originalVerdict} /> : <span className="text-xs text-ink-faint">not expected then</span>}
      <span className="text-xs text-ink-faint">({bandText(c.originalBandVersion, c.originalBandModel)})</span>
      <span aria-hidden>→</span>
      <VerdictBadge verdict={c.verdict} />
      <span className="text-xs text-ink-faint">({bandText(c.bandVersion, c.bandModel)})</span>
    </li>
  );
}

/** A re-judgement of one build: the verdict it was judged with, the verdict now, and the values that changed. */
export function ReevaluationOutcome({ r, title, limit = 12 }: { r: ReevaluationInfo; title?: React.ReactNode; limit?: number }) {
  const verdictChanges = r.changes.filter((c) => c.originalVerdict !== c.verdict);
  const bandOnly = r.changes.length - verdictChanges.length;
  return (
    <div className="text-sm" data-reevaluation={r.id}>
      <div className="flex flex-wrap items-center gap-2">
        {title}
        <span className="text-xs text-ink-faint">as judged</span>
        {r.originalVerdict ? <VerdictBadge verdict={r.originalVerdict} /> : <span className="text-xs">—</span>}
        <span aria-hidden>→</span>
        <span className="text-xs text-ink-faint">re-judged</span>
        <VerdictBadge verdict={r.verdict} />
        <span className="text-xs text-ink-faint">
          {formatUtc(r.evaluatedAt)}
          {r.by ? ` · ${r.by}` : ""}
        </span>
      </div>
      <p className="mt-0.5 text-xs text-ink-soft dark:text-white/60">“{r.reason}”</p>
      {verdictChanges.length > 0 ? (
        <ul className="mt-1 space-y-1">
          {verdictChanges.slice(0, limit).map((c) => (
            <ChangedValue key={`${c.runId}/${c.quantity}`} c={c} buildId={r.buildId} />
          ))}
          {verdictChanges.length > limit && <li className="text-xs text-ink-faint">and {verdictChanges.length - limit} more</li>}
        </ul>
      ) : (
        <p className="mt-1 text-xs text-ink-faint">No verdict changed.</p>
      )}
      {bandOnly > 0 && (
        <p className="mt-1 text-xs text-ink-faint">
          {bandOnly} value{bandOnly === 1 ? "" : "s"} judged against a newer band version with the same verdict.
        </p>
      )}
    </div>
  );
}
