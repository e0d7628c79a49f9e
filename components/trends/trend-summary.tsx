import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { TrendChartData } from "@/graphql/operations/trends";
import { DRIFT_ALPHA, DRIFT_WINDOW } from "@/lib/evaluation/judge";
import { formatDelta, formatSig, withUnit } from "@/lib/format/numbers";

// The drift test of each model's newest point, as stored when that build was judged.

export function TrendSummary({ chart, colourOf }: { chart: TrendChartData; colourOf: (model: string) => string }) {
  const unit = chart.definition?.unit ?? null;
  const versionOf = new Map(chart.builds.map((b) => [b.id, b.version]));
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <thead className="text-left text-xs text-ink-faint">
          <tr>
            <th className="py-1 pr-3 font-medium">Model</th>
            <th className="py-1 pr-3 font-medium">Newest build</th>
            <th className="py-1 pr-3 text-right font-medium">Value</th>
            <th className="py-1 pr-3 font-medium">Band in force</th>
            <th className="py-1 pr-3 text-right font-medium">Change vs baseline</th>
            <th className="py-1 pr-3 text-right font-medium">Theil–Sen slope (last {DRIFT_WINDOW})</th>
            <th className="py-1 pr-3 text-right font-medium">Mann–Kendall p</th>
            <th className="py-1 font-medium">Drift</th>
          </tr>
        </thead>
        <tbody>
          {chart.series.map((s) => {
            const p = s.points[s.points.length - 1];
            return (
              <tr key={s.model} className="border-t border-ink/5 dark:border-white/10" data-model={s.model}>
                <td className="py-1.5 pr-3 font-medium" style={{ color: colourOf(s.model) }}>
                  {s.model}
                </td>
                {!p ? (
                  <td colSpan={7} className="py-1.5 text-ink-faint">
                    no value on this branch and grid
                  </td>
                ) : (
                  <>
                    <td className="py-1.5 pr-3">{versionOf.get(p.buildId) ?? p.buildId}</td>
                    <td className="py-1.5 pr-3 text-right whitespace-nowrap">
                      <span className="mr-2 font-mono tabular-nums">{withUnit(formatSig(p.value, 4), unit)}</span>
                      <VerdictBadge verdict={p.verdict} />
                    </td>
                    <td className="py-1.5 pr-3 font-mono text-xs whitespace-nowrap">
                      {p.bandId === null ? (
                        "no band"
                      ) : (
                        <>
                          {p.lower === null ? "−∞" : formatSig(p.lower, 4)} … {p.upper === null ? "+∞" : formatSig(p.upper, 4)}
                          <span className="font-sans text-ink-faint">
                            {" "}
                            {p.bandKind} v{p.bandVersion}, noise floor {formatSig(p.noiseFloor, 2)}
                          </span>
                        </>
                      )}
                    </td>
                    <td className="py-1.5 pr-3 text-right font-mono tabular-nums">{formatDelta(p.baselineDelta, 3)}</td>
                    <td className="py-1.5 pr-3 text-right font-mono tabular-nums">{p.driftSlope === null ? "—" : `${formatDelta(p.driftSlope, 3)} /build`}</td>
                    <td className={`py-1.5 pr-3 text-right font-mono tabular-nums ${p.driftPValue !== null && p.driftPValue < DRIFT_ALPHA ? "font-semibold" : ""}`}>{formatSig(p.driftPValue, 2)}</td>
                    <td className="py-1.5 text-xs">{p.drift ? (p.driftReason === "trend" ? "monotone trend" : "step vs baseline") : "none"}</td>
                  </>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-ink-faint">
        Drift is a step against the baseline larger than the band&apos;s noise floor, or a trend whose Mann–Kendall test is significant at α = {DRIFT_ALPHA}{" "}
        <em>and</em> whose Theil–Sen change over the last {DRIFT_WINDOW} builds exceeds the noise floor; a small p alone is not drift.
      </p>
    </div>
  );
}
