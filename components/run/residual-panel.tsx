"use client";

import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { PlotBand, PlotRule } from "@/components/charts/plot-types";
import { Panel } from "@/components/ui/panel";
import { formatSig } from "@/lib/format/numbers";
import { PlotFootnotes } from "./plot-footnotes";
import { buildResidualPlot } from "./residual-curves";
import { findQuantity, readNumber, type RunView, type SeriesView } from "./run-data";

/** Residual history of the steady solve on a log axis, with the drop and the stall test written on it. */
export function ResidualPanel({ run, series, caseParameters }: { run: RunView; series: SeriesView; caseParameters: Record<string, unknown> }) {
  const q = findQuantity(run, "residual_drop_orders");
  const targetOrders = readNumber(caseParameters, "residualTargetOrders") ?? q?.lower ?? null;
  const plot = buildResidualPlot(series.x, series.y, q, targetOrders);
  const bands: PlotBand[] = plot.tail && plot.data.length
    ? [{ axis: "x", from: plot.data[plot.tail.from].x, to: plot.data[plot.tail.to].x, color: PLOT_COLOURS.window, opacity: 0.12, label: "tail judged by the stall test" }]
    : [];
  const rules: PlotRule[] = plot.target
    ? [{ axis: "y", at: plot.target.level, style: { color: PLOT_COLOURS.reference, dash: "6 4" }, label: `target: ${formatSig(plot.target.orders, 3)} orders below the first residual`, labelAt: "start" }]
    : [];
  const stalled = q?.details.stalled === true;
  return (
    <Panel title="Residual history" subtitle="steady-solve residual against iteration, logarithmic residual axis">
      <PlotFrame
        ariaLabel="Residual against iteration on a logarithmic axis with the convergence target and the tail trend"
        x={{ kind: "linear", min: plot.xRange[0], max: plot.xRange[1], label: "iteration", symbol: "iteration" }}
        y={{ kind: "log", min: plot.yRange[0], max: plot.yRange[1], label: "residual", symbol: "residual" }}
        height={340}
        bands={bands}
        rules={rules}
        curves={plot.tail?.trend.length ? [{ id: "trend", label: "least-squares trend over the tail", points: plot.tail.trend, style: { color: stalled ? PLOT_COLOURS.bad : PLOT_COLOURS.fit, width: 2.4 } }] : []}
        markers={[{ id: "data", label: "residual posted by the run", points: plot.data, shape: "circle", size: 2.5, joined: true, color: PLOT_COLOURS.data }]}
        notes={[{ corner: "auto", prefer: ["top-right", "bottom-left", "bottom-right", "top-left"], lines: plot.notes }]}
      />
      <PlotFootnotes series={series} sources={[q]} />
    </Panel>
  );
}
