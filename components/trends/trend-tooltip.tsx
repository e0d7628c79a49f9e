import type { PointTooltipProps } from "@nivo/line";
import { formatDelta, formatSig, withUnit } from "@/lib/format/numbers";
import type { TrendSeries } from "./trend-layers";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

/** What one point is: build, value, the band version it was judged against, drift. */
export function trendTooltip(unit: string | null) {
  return function TrendTooltip({ point }: PointTooltipProps<TrendSeries>) {
    const { build, point: p, model } = point.data;
    const u = (v: number | null) => withUnit(formatSig(v, 4), unit);
    return (
      <div className="w-72 rounded border border-ink/15 bg-white px-3 py-2 text-xs text-ink shadow-md">
        <p className="font-semibold">
          {build.version} <span className="font-mono font-normal text-ink-faint">{build.commit.slice(0, 10)}</span>
        </p>
        <p className="text-ink-faint">
          {when.format(new Date(build.receivedAt))} UTC · gate: {build.gate === "pending" ? "no decision" : build.gate}
        </p>
        <p className="mt-1">
          <span className="font-medium" style={{ color: point.seriesColor }}>
            {model}
          </span>
          : <span className="font-mono">{u(p.value)}</span> · {p.verdict}
        </p>
        {p.bandId !== null && (
          <p>
            {p.bandKind} band v{p.bandVersion}
            {p.bandModel === null ? " (all models)" : ""}: {p.lower === null ? "−∞" : formatSig(p.lower, 4)} … {p.upper === null ? "+∞" : formatSig(p.upper, 4)}
            {p.reference !== null && <>, reference {formatSig(p.reference, 4)}</>}
          </p>
        )}
        {p.baselineDelta !== null && <p>change vs baseline {formatDelta(p.baselineDelta, 3)}</p>}
        {p.drift && (
          <p className="font-medium">
            drift ({p.driftReason === "trend" ? "monotone trend" : "step vs baseline"}); Theil–Sen {formatDelta(p.driftSlope, 3)}/build, Mann–Kendall p = {formatSig(p.driftPValue, 2)}
          </p>
        )}
        <p className="mt-1 text-ink-faint">Click to open the build.</p>
      </div>
    );
  };
}
