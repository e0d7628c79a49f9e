import type { QuantityView, SeriesView } from "./run-data";

/**
 * Under a plot: where each band's reference comes from, and whether the drawn
 * series was thinned (the derived quantities always use every posted sample).
 */
export function PlotFootnotes({ series = [], sources = [] }: { series?: SeriesView | SeriesView[]; sources?: (QuantityView | null)[] }) {
  const list = Array.isArray(series) ? series : [series];
  const thinned = list.filter((s) => s.totalPoints > s.x.length);
  const cited = sources.filter((q): q is QuantityView => q !== null && q.source !== null);
  if (thinned.length === 0 && cited.length === 0) return null;
  return (
    <div className="mt-3 space-y-0.5 border-t border-ink/5 pt-2 text-[11px] leading-snug text-ink-faint dark:border-white/10">
      {cited.map((q) => (
        <p key={q.key}>
          <span className="font-medium">{q.label ?? q.key}</span> band source: {q.source}
        </p>
      ))}
      {thinned.map((s) => (
        <p key={s.key}>
          <span className="font-mono">{s.key}</span>: {s.x.length.toLocaleString("en-GB")} of {s.totalPoints.toLocaleString("en-GB")} samples drawn (each stretch keeps its lowest and highest value); the derived quantities use all of them.
        </p>
      ))}
    </div>
  );
}
