import type { PointTooltipProps } from "@nivo/line";
import { formatSig } from "@/lib/format/numbers";
import type { Series } from "./plot-frame";
import type { PlotMarkers } from "./plot-types";

/** Hover box of a marker: its set, its coordinates to five figures and its note. */
export function MarkerTooltip({ point, markers, xSymbol = "x", ySymbol = "y" }: PointTooltipProps<Series> & { markers: PlotMarkers[]; xSymbol?: string; ySymbol?: string }) {
  const set = markers.find((m) => m.id === point.seriesId);
  const source = set?.points[point.indexInSeries];
  return (
    <div className="rounded bg-white px-2 py-1 font-mono text-xs text-ink shadow">
      <div className="font-sans font-semibold">{set?.label ?? point.seriesId}</div>
      <div>
        {xSymbol} = {formatSig(Number(point.data.x), 5)}, {ySymbol} = {formatSig(Number(point.data.y), 5)}
      </div>
      {source?.note && <div className="font-sans text-ink-soft">{source.note}</div>}
    </div>
  );
}
