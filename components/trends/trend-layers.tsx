import type { LineCustomSvgLayerProps } from "@nivo/line";
import type { BandRegion, PlotPoint } from "./trend-data";
import { VERDICT_SHAPE } from "./trend-data";
import { INK, VERDICT_FILL } from "./trend-theme";

// Custom SVG layers of the trend chart: band regions under the lines, the
// baseline marker, verdict-shaped points, drift flags and marks for builds where
// a model reported no value.

export type TrendSeries = { id: string; data: PlotPoint[] };
type LayerProps = LineCustomSvgLayerProps<TrendSeries>;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** Bands: the accepted core shaded, the marginal strips next to each limit lighter, the reference dashed. */
export function bandLayer(regions: readonly BandRegion[], colourOf: (model: string | null) => string, showVersions: boolean) {
  return function BandLayer({ xScale, yScale, innerWidth, innerHeight }: LayerProps) {
    const y = (v: number | null, fallback: number) => (v === null ? fallback : clamp(yScale(v), 0, innerHeight));
    return (
      <g aria-hidden>
        {regions.map((r) => {
          const x0 = clamp(xScale(r.x0), 0, innerWidth);
          const x1 = clamp(xScale(r.x1), 0, innerWidth);
          const w = Math.max(0, x1 - x0);
          const m = r.marginalMargin;
          const colour = colourOf(r.model);
          const yUpper = y(r.upper, 0);
          const yLower = y(r.lower, innerHeight);
          const yCoreTop = r.upper === null ? 0 : y(r.upper - m, 0);
          const yCoreBottom = r.lower === null ? innerHeight : y(r.lower + m, innerHeight);
          return (
            <g key={r.key}>
              <rect x={x0} width={w} y={yUpper} height={Math.max(0, yLower - yUpper)} fill={colour} fillOpacity={0.08} />
              <rect x={x0} width={w} y={yCoreTop} height={Math.max(0, yCoreBottom - yCoreTop)} fill={colour} fillOpacity={0.14} />
              {r.upper !== null && <line x1={x0} x2={x1} y1={yUpper} y2={yUpper} stroke={colour} strokeOpacity={0.7} />}
              {r.lower !== null && <line x1={x0} x2={x1} y1={yLower} y2={yLower} stroke={colour} strokeOpacity={0.7} />}
              {r.reference !== null && (
                <line x1={x0} x2={x1} y1={y(r.reference, 0)} y2={y(r.reference, 0)} stroke={colour} strokeWidth={1.5} strokeDasharray="6 4" />
              )}
              {showVersions && r.version !== null && (
                <text x={x0 + 4} y={Math.max(10, yUpper - 3)} fontSize={9.5} fill={colour}>
                  band v{r.version}
                </text>
              )}
            </g>
          );
        })}
      </g>
    );
  };
}

/** A vertical dashed line at the baseline build with its name. */
export function baselineLayer(x: number | null, label: string) {
  return function BaselineLayer({ xScale, innerHeight }: LayerProps) {
    if (x === null) return null;
    const px = xScale(x);
    return (
      <g aria-hidden>
        <line x1={px} x2={px} y1={0} y2={innerHeight} stroke={INK} strokeOpacity={0.65} strokeWidth={1.25} strokeDasharray="2 3" />
        <text x={px + 4} y={-6} fontSize={10.5} fill={INK}>
          {label}
        </text>
      </g>
    );
  };
}

/** Points in the verdict's colour and shape, outlined in the model's colour. */
export function VerdictPointsLayer({ points }: LayerProps) {
  return (
    <g>
      {points.map((p) => (
        <VerdictMark key={p.id} x={p.x} y={p.y} verdict={p.data.point.verdict} outline={p.seriesColor} />
      ))}
    </g>
  );
}

export function VerdictMark({ x, y, verdict, outline, size = 4.5 }: { x: number; y: number; verdict: PlotPoint["point"]["verdict"]; outline: string; size?: number }) {
  const fill = VERDICT_FILL[verdict];
  switch (VERDICT_SHAPE[verdict]) {
    case "diamond":
      return <path d={`M${x},${y - size * 1.3}L${x + size * 1.3},${y}L${x},${y + size * 1.3}L${x - size * 1.3},${y}Z`} fill={fill} stroke={outline} strokeWidth={1.5} />;
    case "square":
      return <rect x={x - size} y={y - size} width={2 * size} height={2 * size} fill={fill} stroke={outline} strokeWidth={1.5} />;
    case "ring":
      return <circle cx={x} cy={y} r={size} fill="none" stroke={fill} strokeWidth={2} />;
    case "none":
      return null;
    default:
      return <circle cx={x} cy={y} r={size} fill={fill} stroke={outline} strokeWidth={1.5} />;
  }
}

/** Drift: a ring around the point and a triangle pointing the way it moved. */
export function DriftLayer({ points }: LayerProps) {
  return (
    <g aria-hidden>
      {points
        .filter((p) => p.data.point.drift)
        .map((p) => {
          const step = p.data.point.driftReason === "trend" ? p.data.point.driftSlope : p.data.point.baselineDelta;
          const up = (step ?? 0) >= 0;
          const ty = up ? p.y - 15 : p.y + 15;
          const tri = up ? `M${p.x - 4},${ty + 3}L${p.x + 4},${ty + 3}L${p.x},${ty - 4}Z` : `M${p.x - 4},${ty - 3}L${p.x + 4},${ty - 3}L${p.x},${ty + 4}Z`;
          return (
            <g key={p.id}>
              <circle cx={p.x} cy={p.y} r={9} fill="none" stroke={INK} strokeWidth={1.25} />
              <path d={tri} fill={INK} />
            </g>
          );
        })}
    </g>
  );
}

/** A "?" on the x axis where a model has a run but no value (missing). */
export function missingLayer(missing: readonly PlotPoint[], colourOf: (model: string) => string) {
  return function MissingLayer({ xScale, innerHeight }: LayerProps) {
    return (
      <g aria-hidden>
        {missing.map((m) => (
          <text key={`${m.model}:${m.index}`} x={xScale(m.x)} y={innerHeight - 6} textAnchor="middle" fontSize={12} fontWeight={700} fill={colourOf(m.model)}>
            ?
          </text>
        ))}
      </g>
    );
  };
}
