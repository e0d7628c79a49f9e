"use client";

import { isPoint, Line, type LineCustomSvgLayerProps, type LineSvgLayer, type PointTooltipProps } from "@nivo/line";
import { useId, useMemo, type ReactNode } from "react";
import { exponentSuffix, formatLinearTick, formatLogTick, linearTicks, logMinorTicks, logTicks, needsPowersOfTen, niceStep } from "./axis-ticks";
import { PLOT_COLOUR_VARS, plotTheme } from "./chart-theme";
import { drawBands, drawCurves, drawErrorBars, drawMarkers, drawMinorGrid, drawRules, type LayerGeometry } from "./plot-layers";
import { PlotLegend, PlotNotes } from "./plot-legend";
import { placeNotes } from "./place-notes";
import { MarkerTooltip } from "./plot-tooltip";
import type { MarkerPoint, PlotAxis, PlotBand, PlotCurve, PlotErrorBar, PlotMarkers, PlotNote, PlotRule } from "./plot-types";
import { useElementWidth } from "./use-element-width";

export type Series = { id: string; data: { x: number; y: number }[] };

export interface PlotFrameProps {
  /** Read by screen readers in place of the picture. */
  ariaLabel: string;
  x: PlotAxis;
  y: PlotAxis;
  curves?: PlotCurve[];
  markers?: PlotMarkers[];
  bands?: PlotBand[];
  rules?: PlotRule[];
  errorBars?: PlotErrorBar[];
  notes?: PlotNote[];
  /** Plot height in px; ignored when equalAspect is set. */
  height?: number;
  /** Same length per unit on both (linear) axes, for geometric maps such as invariant triangles. */
  equalAspect?: boolean;
  /** Widest the plot area may get with equalAspect (keeps a triangle from filling a wide screen). */
  maxWidth?: number;
  footer?: ReactNode;
  /** Called with the marker set and the point a click landed nearest to. */
  onPointClick?: (setId: string, point: MarkerPoint) => void;
}

const MARGIN = { top: 14, right: 18, bottom: 46, left: 66 };
/** Below this width there is no room for a plot area; the frame waits for a real measurement. */
const MIN_WIDTH = MARGIN.left + MARGIN.right + 60;
const NOTES_MIN_INNER_WIDTH = 440;

/**
 * One scientific plot: nivo draws axes, grid and the hover mesh; our layers draw
 * shaded ranges, rules, curves, markers and error bars; notes sit on the plot.
 * Only the marker sets are handed to nivo as data (they get tooltips); the axis
 * ranges are always explicit, so reference curves never stretch the axes.
 */
export function PlotFrame(props: PlotFrameProps) {
  const { ref, width: measured } = useElementWidth<HTMLDivElement>();
  const width = props.maxWidth ? Math.min(measured, props.maxWidth) : measured;
  const clipId = `clip${useId().replace(/[^a-zA-Z0-9]/g, "")}`;
  const { x, y } = props;
  const innerWidth = Math.max(10, width - MARGIN.left - MARGIN.right);
  const height = props.equalAspect
    ? Math.round((innerWidth * (y.max - y.min)) / (x.max - x.min)) + MARGIN.top + MARGIN.bottom
    : (props.height ?? 320);
  const innerHeight = Math.max(10, height - MARGIN.top - MARGIN.bottom);
  // On a phone the notes would cover the data; they move under the plot.
  const notesBelow = width > 0 && innerWidth < NOTES_MIN_INNER_WIDTH;

  const markers = useMemo(() => props.markers ?? [], [props.markers]);
  // The points nivo may place (a log axis has no room for x <= 0); the tooltip
  // indexes into the same filtered lists.
  const visible = useMemo(() => markers.map((m) => ({ ...m, points: m.points.filter((p) => inAxis(x, p.x) && inAxis(y, p.y)) })), [markers, x, y]);
  const data: Series[] = useMemo(() => visible.map((m) => ({ id: m.id, data: m.points.map((p) => ({ x: p.x, y: p.y })) })), [visible]);
  const layers = useMemo(() => buildLayers(props, clipId), [props, clipId]);
  const notes = useMemo(
    () => placeNotes({ x: props.x, y: props.y, notes: props.notes ?? [], markers: props.markers ?? [], curves: props.curves ?? [], width: innerWidth, height: innerHeight }),
    [props.x, props.y, props.notes, props.markers, props.curves, innerWidth, innerHeight],
  );
  const xAxis = axisProps(x, innerWidth, 36);
  const yAxis = axisProps(y, innerHeight, -52);

  return (
    <div className={`${PLOT_COLOUR_VARS} min-w-0 text-ink-soft dark:text-white/75`}>
      <div ref={ref} className="relative w-full" style={{ height }} role="figure" aria-label={props.ariaLabel}>
        {width >= MIN_WIDTH && (
          <Line<Series>
            width={width}
            height={height}
            data={data}
            margin={MARGIN}
            theme={plotTheme}
            animate={false}
            xScale={scaleSpec(x)}
            yScale={scaleSpec(y)}
            gridXValues={xAxis.tickValues}
            gridYValues={yAxis.tickValues}
            axisBottom={xAxis}
            axisLeft={yAxis}
            layers={layers}
            useMesh
            enableCrosshair={false}
            tooltip={(t: PointTooltipProps<Series>) => <MarkerTooltip {...t} markers={visible} xSymbol={x.symbol} ySymbol={y.symbol} />}
            onClick={
              props.onPointClick
                ? (datum) => {
                    if (!isPoint(datum)) return;
                    const set = visible.find((m) => m.id === datum.seriesId);
                    const point = set?.points[datum.indexInSeries];
                    if (set && point) props.onPointClick?.(set.id, point);
                  }
                : undefined
            }
          />
        )}
        {width >= MIN_WIDTH && !notesBelow && <PlotNotes notes={notes} box={{ left: MARGIN.left, top: MARGIN.top, width: innerWidth, height: innerHeight }} />}
      </div>
      {notesBelow && <PlotNotes notes={notes} box={{ left: 0, top: 0, width: innerWidth, height: innerHeight }} below />}
      <PlotLegend curves={props.curves ?? []} markers={markers} bands={props.bands ?? []} />
      {props.footer}
    </div>
  );
}

function inAxis(axis: PlotAxis, v: number) {
  return Number.isFinite(v) && (axis.kind === "linear" || v > 0);
}

function scaleSpec(axis: PlotAxis) {
  return axis.kind === "log"
    ? ({ type: "log", base: 10, min: axis.min, max: axis.max, nice: false } as const)
    : ({ type: "linear", min: axis.min, max: axis.max, nice: false } as const);
}

function axisProps(axis: PlotAxis, length: number, legendOffset: number) {
  const target = Math.max(3, Math.min(8, Math.round(length / 70)));
  const tickValues = axis.ticks ?? (axis.kind === "log" ? logTicks(axis.min, axis.max) : linearTicks(axis.min, axis.max, target));
  const step = tickValues.length > 1 ? tickValues[1] - tickValues[0] : niceStep(axis.min, axis.max, target);
  const exponent = axis.kind === "linear" ? (axis.exponent ?? 0) : 0;
  const powers = axis.kind === "log" && needsPowersOfTen(tickValues);
  const format = (v: number | string | Date) => (axis.kind === "log" ? formatLogTick(Number(v), powers) : formatLinearTick(Number(v), step, exponent));
  const legend = exponent === 0 ? axis.label : <>{axis.label}{exponentSuffix(exponent)}</>;
  return { tickValues, format, legend, legendPosition: "middle" as const, legendOffset, tickSize: 4, tickPadding: 4 };
}

function buildLayers(props: PlotFrameProps, clipId: string): LineSvgLayer<Series>[] {
  const geometry = (l: LineCustomSvgLayerProps<Series>): LayerGeometry => ({
    innerWidth: l.innerWidth,
    innerHeight: l.innerHeight,
    xScale: l.xScale as (v: number) => number,
    yScale: l.yScale as (v: number) => number,
    xLog: props.x.kind === "log",
    yLog: props.y.kind === "log",
    clipId,
  });
  const under = (l: LineCustomSvgLayerProps<Series>) => {
    const g = geometry(l);
    const xMinor = g.xLog ? logMinorTicks(props.x.min, props.x.max) : [];
    const yMinor = g.yLog ? logMinorTicks(props.y.min, props.y.max) : [];
    return (
      <g>
        <defs>
          <clipPath id={clipId}>
            <rect x={0} y={0} width={l.innerWidth} height={l.innerHeight} />
          </clipPath>
        </defs>
        {drawMinorGrid(g, xMinor, yMinor)}
        <g clipPath={`url(#${clipId})`}>{drawBands(g, props.bands ?? [])}</g>
      </g>
    );
  };
  const over = (l: LineCustomSvgLayerProps<Series>) => {
    const g = geometry(l);
    return (
      <g clipPath={`url(#${clipId})`}>
        {drawRules(g, props.rules ?? [])}
        {drawCurves(g, props.curves ?? [])}
        {drawErrorBars(g, props.errorBars ?? [])}
        {drawMarkers(g, props.markers ?? [])}
      </g>
    );
  };
  return ["grid", under, "axes", over, "mesh"];
}
