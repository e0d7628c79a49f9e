"use client";

import { ResponsiveLine, type LineSvgLayer } from "@nivo/line";
import { useRouter } from "next/navigation";
import { useMemo } from "react";
import type { TrendChartData } from "@/graphql/operations/trends";
import { formatSig } from "@/lib/format/numbers";
import { cellEdges, dayTicks, missingPoints, niceTicks, orderTicks, tickLabel, toBandRegions, toPlotSeries, xPositions, yRange, type XMode } from "./trend-data";
import { baselineLayer, bandLayer, DriftLayer, missingLayer, VerdictPointsLayer, type TrendSeries } from "./trend-layers";
import { SHARED_BAND_COLOUR, TREND_COLOUR_VARS, trendTheme } from "./trend-theme";
import { trendTooltip } from "./trend-tooltip";

const day = new Intl.DateTimeFormat("en-GB", { day: "2-digit", month: "short", timeZone: "UTC" });
const MAX_TICKS = 14;

/** The trend of one quantity for several models: bands per version, verdict points, drift flags, baseline. */
export function TrendChart({ chart, mode, colourOf }: { chart: TrendChartData; mode: XMode; colourOf: (model: string) => string }) {
  const router = useRouter();
  const view = useMemo(() => {
    const xs = xPositions(chart.builds, mode);
    const edges = cellEdges(xs);
    const series: TrendSeries[] = toPlotSeries(chart, xs);
    const regions = toBandRegions(series, edges);
    const versions = new Set(regions.map((r) => `${r.model}:${r.version}`));
    const modelsWithBands = new Set(regions.map((r) => r.model));
    const baselineIndex = chart.baseline ? chart.builds.findIndex((b) => b.id === chart.baseline!.id) : -1;
    const integer = chart.definition?.unit === "samples";
    const range = yRange(series, regions, { integer });
    const y = range ? niceTicks(range[0], range[1], 7, { integer }) : { ticks: [], step: 1 };
    const yLabels = y.ticks.map((t) => tickLabel(t, y.step));
    return {
      xs,
      series,
      range,
      yTicks: y.ticks,
      yLabel: new Map(y.ticks.map((t, i) => [t, yLabels[i]])),
      // Room for the longest tick label (≈ 6.5 px a character at 10.5 px) plus the axis title.
      left: 34 + 6.5 * Math.max(3, ...yLabels.map((l) => l.length)),
      xDomain: [edges[0], edges[edges.length - 1]] as const,
      tickValues: mode === "order" ? orderTicks(xs, MAX_TICKS) : dayTicks(edges[0], edges[edges.length - 1], 10),
      layers: [
        "grid",
        bandLayer(regions, (m) => (m === null ? SHARED_BAND_COLOUR : colourOf(m)), versions.size > modelsWithBands.size),
        baselineLayer(baselineIndex >= 0 ? xs[baselineIndex] : null, chart.baseline ? `baseline ${chart.baseline.version}` : ""),
        "axes",
        "lines",
        missingLayer(missingPoints(series), colourOf),
        VerdictPointsLayer,
        DriftLayer,
        "crosshair",
        "mesh",
      ] as LineSvgLayer<TrendSeries>[],
    };
  }, [chart, mode, colourOf]);

  if (!view.range) return null;
  const unit = chart.definition?.unit ?? null;
  const axisLabel = `${chart.definition?.label ?? chart.quantity}${unit && unit !== "1" ? ` [${unit}]` : ""}`;
  const byIndex = new Map(view.xs.map((x, i) => [x, chart.builds[i]]));
  return (
    <div className={`h-[440px] text-ink dark:text-white/85 ${TREND_COLOUR_VARS}`}>
      <ResponsiveLine<TrendSeries>
        data={view.series}
        theme={trendTheme}
        margin={{ top: 24, right: 24, bottom: mode === "order" ? 78 : 48, left: view.left }}
        xScale={{ type: "linear", min: view.xDomain[0], max: view.xDomain[1] }}
        yScale={{ type: "linear", min: view.range[0], max: view.range[1] }}
        colors={(s) => colourOf(String(s.id))}
        lineWidth={1.75}
        enablePoints={false}
        enableGridX={false}
        animate={false}
        useMesh
        enableCrosshair
        crosshairType="x"
        gridYValues={view.yTicks}
        axisLeft={{ legend: axisLabel, legendOffset: 14 - view.left, legendPosition: "middle", tickValues: view.yTicks, format: (v) => view.yLabel.get(Number(v)) ?? formatSig(Number(v), 4) }}
        axisBottom={{
          tickValues: view.tickValues,
          tickRotation: mode === "order" ? -38 : 0,
          format: (v) => (mode === "order" ? (byIndex.get(Number(v))?.version ?? "") : day.format(new Date(Number(v)))),
          legend: mode === "order" ? undefined : "received (UTC)",
          legendOffset: 38,
          legendPosition: "middle",
        }}
        layers={view.layers}
        tooltip={trendTooltip(unit)}
        onClick={(datum) => {
          if ("data" in datum && "build" in datum.data) router.push(`/builds/${datum.data.build.id}`);
        }}
      />
    </div>
  );
}
