import type { ReactNode } from "react";
import { PLOT_COLOURS } from "./chart-theme";
import type { MarkerShape, PlotBand, PlotCurve, PlotErrorBar, PlotMarkers, PlotRule } from "./plot-types";

// SVG drawn inside nivo's plot area (custom layers). Everything is clipped to
// the axes, and a point with no place on a log axis (≤ 0) breaks a curve
// instead of being drawn at an invented position.

export interface LayerGeometry {
  innerWidth: number;
  innerHeight: number;
  xScale: (v: number) => number;
  yScale: (v: number) => number;
  xLog: boolean;
  yLog: boolean;
  clipId: string;
}

const HALO = { paintOrder: "stroke" as const, stroke: PLOT_COLOURS.halo, strokeWidth: 3, strokeLinejoin: "round" as const };

function place(g: LayerGeometry, x: number, y: number): [number, number] | null {
  if (!Number.isFinite(x) || !Number.isFinite(y)) return null;
  if ((g.xLog && !(x > 0)) || (g.yLog && !(y > 0))) return null;
  const px = g.xScale(x);
  const py = g.yScale(y);
  return Number.isFinite(px) && Number.isFinite(py) ? [px, py] : null;
}

export function curvePath(g: LayerGeometry, points: { x: number; y: number }[]): string {
  let d = "";
  let pen = false;
  for (const p of points) {
    const at = place(g, p.x, p.y);
    if (!at) {
      pen = false;
      continue;
    }
    d += `${pen ? "L" : "M"}${at[0].toFixed(2)},${at[1].toFixed(2)}`;
    pen = true;
  }
  return d;
}

export function markerGlyph(shape: MarkerShape, x: number, y: number, size: number, color: string, hollow: boolean, key?: string | number): ReactNode {
  const r = size / 2;
  const fill = hollow ? PLOT_COLOURS.halo : color;
  const common = { stroke: color, strokeWidth: 1.4, fill };
  switch (shape) {
    case "circle":
      return <circle key={key} {...common} cx={x} cy={y} r={r} />;
    case "square":
      return <rect key={key} {...common} x={x - r * 0.9} y={y - r * 0.9} width={1.8 * r} height={1.8 * r} />;
    case "diamond":
      return <path key={key} {...common} d={`M${x},${y - r * 1.25}L${x + r * 1.1},${y}L${x},${y + r * 1.25}L${x - r * 1.1},${y}Z`} />;
    case "triangle":
      return <path key={key} {...common} d={`M${x},${y - r * 1.2}L${x + r * 1.1},${y + r * 0.75}L${x - r * 1.1},${y + r * 0.75}Z`} />;
    case "ring":
      return <circle key={key} cx={x} cy={y} r={r} stroke={color} strokeWidth={2} fill="none" />;
    case "cross":
      return <path key={key} stroke={color} strokeWidth={2} fill="none" d={`M${x - r},${y - r}L${x + r},${y + r}M${x - r},${y + r}L${x + r},${y - r}`} />;
  }
}

export function drawBands(g: LayerGeometry, bands: PlotBand[]) {
  return bands.map((b, i) => {
    if (b.axis === "x") {
      const a = place(g, b.from, g.yLog ? 1 : 0);
      const c = place(g, b.to, g.yLog ? 1 : 0);
      if (!a || !c) return null;
      return <rect key={i} x={Math.min(a[0], c[0])} y={0} width={Math.abs(c[0] - a[0])} height={g.innerHeight} fill={b.color} fillOpacity={b.opacity ?? 0.12} />;
    }
    const a = place(g, g.xLog ? 1 : 0, b.from);
    const c = place(g, g.xLog ? 1 : 0, b.to);
    if (!a || !c) return null;
    return <rect key={i} x={0} y={Math.min(a[1], c[1])} width={g.innerWidth} height={Math.abs(c[1] - a[1])} fill={b.color} fillOpacity={b.opacity ?? 0.12} />;
  });
}

export function drawRules(g: LayerGeometry, rules: PlotRule[]) {
  return rules.map((r, i) => {
    const at = r.axis === "x" ? place(g, r.at, g.yLog ? 1 : 0) : place(g, g.xLog ? 1 : 0, r.at);
    if (!at) return null;
    const line =
      r.axis === "x"
        ? { x1: at[0], x2: at[0], y1: 0, y2: g.innerHeight }
        : { x1: 0, x2: g.innerWidth, y1: at[1], y2: at[1] };
    const nearRight = r.axis === "x" && at[0] > g.innerWidth - 140;
    const atStart = r.labelAt === "start";
    const below = r.labelSide === "below";
    return (
      <g key={i}>
        <line {...line} stroke={r.style.color} strokeWidth={r.style.width ?? 1.2} strokeDasharray={r.style.dash} />
        {r.label && (
          <text
            x={r.axis === "x" ? at[0] + (nearRight ? -4 : 4) : atStart ? 4 : g.innerWidth - 4}
            y={r.axis === "x" ? (below ? g.innerHeight - 6 : 12) : below ? at[1] + 12 : at[1] - 4}
            textAnchor={r.axis === "x" ? (nearRight ? "end" : "start") : atStart ? "start" : "end"}
            fontSize={10.5}
            fill={r.style.color}
            style={HALO}
          >
            {r.label}
          </text>
        )}
      </g>
    );
  });
}

export function drawCurves(g: LayerGeometry, curves: PlotCurve[]) {
  return curves.map((c) => (
    <path key={c.id} d={curvePath(g, c.points)} fill="none" stroke={c.style.color} strokeWidth={c.style.width ?? 1.6} strokeDasharray={c.style.dash} strokeLinejoin="round" />
  ));
}

export function drawMarkers(g: LayerGeometry, sets: PlotMarkers[]) {
  return sets.map((m) => {
    const limit = m.maxGlyphs ?? 150;
    const dense = m.points.length > limit;
    const every = dense ? Math.ceil(m.points.length / limit) : 1;
    return (
    <g key={m.id}>
      {(m.joined || dense) && <path d={curvePath(g, m.points)} fill="none" stroke={m.color} strokeWidth={dense ? 1.3 : 1} strokeOpacity={0.7} />}
      {m.points.map((p, i) => {
        if (i % every !== 0) return null;
        const at = place(g, p.x, p.y);
        return at ? markerGlyph(m.shape, at[0], at[1], m.size ?? 6, m.color, m.hollow ?? false, i) : null;
      })}
      {m.points.map((p, i) => {
        const at = p.tag ? place(g, p.x, p.y) : null;
        return at ? (
          <text key={`t${i}`} x={at[0] + 7} y={at[1] - 6} fontSize={10} fill={m.color} style={HALO}>
            {p.tag}
          </text>
        ) : null;
      })}
    </g>
    );
  });
}

export function drawErrorBars(g: LayerGeometry, bars: PlotErrorBar[]) {
  return bars.map((b, i) => {
    const lo = place(g, b.x, b.low);
    const hi = place(g, b.x, b.high);
    if (!lo || !hi) return null;
    const cap = 6;
    return (
      <path key={i} stroke={b.color} strokeWidth={1.5} fill="none" d={`M${lo[0]},${lo[1]}L${hi[0]},${hi[1]}M${lo[0] - cap},${lo[1]}L${lo[0] + cap},${lo[1]}M${hi[0] - cap},${hi[1]}L${hi[0] + cap},${hi[1]}`} />
    );
  });
}

/** Faint lines at 2…9 × 10ⁿ on log axes, so a reader can interpolate between decades. */
export function drawMinorGrid(g: LayerGeometry, xMinor: number[], yMinor: number[]) {
  return (
    <g stroke="currentColor" strokeOpacity={0.06} strokeWidth={1}>
      {xMinor.map((v) => {
        const px = g.xScale(v);
        return <line key={`x${v}`} x1={px} x2={px} y1={0} y2={g.innerHeight} />;
      })}
      {yMinor.map((v) => {
        const py = g.yScale(v);
        return <line key={`y${v}`} x1={0} x2={g.innerWidth} y1={py} y2={py} />;
      })}
    </g>
  );
}
