"use client";

import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { PlotCurve } from "@/components/charts/plot-types";
import { Panel } from "@/components/ui/panel";
import { formatSig } from "@/lib/format/numbers";
import { analyticDecayExponent, buildDecayPlot } from "./decay-curves";
import { PlotFootnotes } from "./plot-footnotes";
import { findQuantity, type RunView, type SeriesView } from "./run-data";

/** Turbulent kinetic energy decay on log–log axes against t − t0, with the fitted power law. */
export function DecayPanel({ run, series }: { run: RunView; series: SeriesView }) {
  const q = findQuantity(run, "decay_exponent");
  const plot = buildDecayPlot(series.x, series.y, q, analyticDecayExponent(run.coefficients));
  const curves: PlotCurve[] = [
    ...(plot.reference
      ? [{ id: "reference", label: `band reference slope n = ${formatSig(plot.reference.n, 4)} (matched to the fit at mid-range)`, points: plot.reference.points, style: { color: PLOT_COLOURS.reference, dash: "6 4", width: 1.6 } }]
      : []),
    ...(plot.fitted.length ? [{ id: "fitted", label: `fitted power law k = A (t − t₀)⁻ⁿ, n = ${formatSig(q?.value, 5)}`, points: plot.fitted, style: { color: PLOT_COLOURS.fit, width: 2.4 } }] : []),
  ];
  return (
    <Panel title="Decay of turbulent kinetic energy" subtitle={plot.shifted ? "k against t − t₀, log–log: a power law is a straight line of slope −n" : "k against t, log–log"}>
      <PlotFrame
        ariaLabel="Turbulent kinetic energy k against t minus t0 on log-log axes with the fitted power law and the band's reference slope"
        x={{ kind: "log", min: plot.xRange[0], max: plot.xRange[1], label: plot.shifted ? "t − t₀" : "t", symbol: plot.shifted ? "t − t₀" : "t" }}
        y={{ kind: "log", min: plot.yRange[0], max: plot.yRange[1], label: "k", symbol: "k" }}
        height={340}
        curves={curves}
        markers={[{ id: "data", label: "k posted by the run", points: plot.data, shape: "circle", hollow: true, size: 5, color: PLOT_COLOURS.data }]}
        notes={[{ corner: "auto", prefer: ["bottom-left", "top-right", "bottom-right", "top-left"], lines: plot.notes }]}
      />
      <PlotFootnotes series={series} sources={[q]} />
    </Panel>
  );
}
