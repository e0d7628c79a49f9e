"use client";

import { axisExponent } from "@/components/charts/axis-ticks";
import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { PlotBand, PlotCurve, PlotMarkers, PlotRule } from "@/components/charts/plot-types";
import { svgSub } from "@/components/charts/svg-label";
import { Panel } from "@/components/ui/panel";
import { formatSig } from "@/lib/format/numbers";
import { formatLimits } from "./note-format";
import { PlotFootnotes } from "./plot-footnotes";
import { findQuantity, type RunView, type SeriesView } from "./run-data";
import { buildSkinFrictionPlot } from "./skin-friction-curves";

const CORRELATION_STYLE: Record<string, { color: string; dash: string }> = {
  schlichting: { color: PLOT_COLOURS.composite, dash: "8 3 2 3" },
  seventh: { color: PLOT_COLOURS.sublayer, dash: "6 4" },
  white: { color: PLOT_COLOURS.extra, dash: "2 3" },
};

/** Wall skin friction c_f(x) with the station or reattachment point and published references. */
export function SkinFrictionPanel({ run, series, caseParameters }: { run: RunView; series: SeriesView; caseParameters: Record<string, unknown> }) {
  const cfAtX = findQuantity(run, "cf_at_x");
  const reattachment = findQuantity(run, "reattachment_xr_h");
  const plot = buildSkinFrictionPlot({ x: series.x, cf: series.y, cfAtX, reattachment, caseParameters });

  const curves: PlotCurve[] = plot.correlations.map((c) => ({ id: c.id, label: c.label, points: c.points, style: { ...CORRELATION_STYLE[c.id], width: 1.5 } }));
  const rules: PlotRule[] = [];
  const bands: PlotBand[] = [];
  const markers: PlotMarkers[] = [{ id: "data", label: "c_f posted by the run", points: plot.data, shape: "circle", size: 3.5, joined: true, color: PLOT_COLOURS.data }];

  if (plot.yRange[0] < 0) rules.push({ axis: "y", at: 0, style: { color: PLOT_COLOURS.guide, width: 1.2 }, label: "c_f = 0" });
  if (plot.station) {
    rules.push({ axis: "x", at: plot.station.x, style: { color: PLOT_COLOURS.guide, dash: "4 3" }, label: "station" });
    if (plot.station.cf !== null) {
      markers.push({ id: "station", label: `c_f at the station = ${formatSig(plot.station.cf, 5)}`, points: [{ x: plot.station.x, y: plot.station.cf }], shape: "diamond", size: 9, color: PLOT_COLOURS.fit });
    }
  }
  if (plot.reattachmentBand) {
    const { lower, upper, reference } = plot.reattachmentBand;
    if (lower !== null && upper !== null) bands.push({ axis: "x", from: lower, to: upper, color: PLOT_COLOURS.band, opacity: 0.14, label: `x_r/H band ${formatLimits(lower, upper, 3)}` });
    if (reference !== null) rules.push({ axis: "x", at: reference, style: { color: PLOT_COLOURS.reference, dash: "6 4" }, label: `ref. ${formatSig(reference, 3)}` });
  }
  if (plot.reattachment) {
    const { xr, crossings } = plot.reattachment;
    const secondary = crossings.filter((c) => xr === null || Math.abs(c - xr) > 1e-9);
    if (secondary.length) markers.push({ id: "crossings", label: "other sign changes of c_f (− to +)", points: secondary.map((c) => ({ x: c, y: 0 })), shape: "triangle", hollow: true, size: 8, color: PLOT_COLOURS.guide });
    if (xr !== null) markers.push({ id: "xr", label: `reattachment x_r/H = ${formatSig(xr, 4)}`, points: [{ x: xr, y: 0, tag: `x_r/H = ${formatSig(xr, 4)}` }], shape: "diamond", size: 10, color: PLOT_COLOURS.fit });
  }

  const xLabel = plot.mode === "reynolds" ? svgSub("Re", "x") : plot.mode === "step" ? "x/H" : "x";
  return (
    <Panel title="Skin friction" subtitle={plot.mode === "reynolds" ? "c_f against Re_x (log axis) with flat-plate correlations" : plot.mode === "step" ? "c_f along the lower wall behind the step, x in step heights" : "c_f along the wall"}>
      <PlotFrame
        ariaLabel="Skin friction coefficient along the wall"
        x={{ kind: plot.xLog ? "log" : "linear", min: plot.xRange[0], max: plot.xRange[1], label: xLabel, symbol: plot.mode === "reynolds" ? "Re_x" : plot.mode === "step" ? "x/H" : "x" }}
        y={{ kind: "linear", min: plot.yRange[0], max: plot.yRange[1], label: svgSub("c", "f"), symbol: "c_f", exponent: axisExponent(plot.yRange[0], plot.yRange[1]) }}
        height={340}
        bands={bands}
        rules={rules}
        curves={curves}
        markers={markers}
        notes={plot.notes.length ? [{ corner: "auto", prefer: plot.mode === "step" ? ["bottom-right", "top-left", "top-right", "bottom-left"] : ["bottom-left", "top-right", "bottom-right", "top-left"], lines: plot.notes }] : []}
      />
      <PlotFootnotes series={series} sources={[cfAtX, reattachment]} />
    </Panel>
  );
}
