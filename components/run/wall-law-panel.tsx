"use client";

import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { PlotBand, PlotCurve, PlotRule } from "@/components/charts/plot-types";
import { Panel } from "@/components/ui/panel";
import { formatSig } from "@/lib/format/numbers";
import { PlotFootnotes } from "./plot-footnotes";
import { findQuantity, readWindow, type RunView, type SeriesView } from "./run-data";
import { buildDiagnosticPlot, buildWallLawPlot, SPALDING } from "./wall-law-curves";

/** u+ against y+ with the fitted and reference log laws, and the diagnostic function Ξ beneath. */
export function WallLawPanel({ run, series, caseParameters }: { run: RunView; series: SeriesView; caseParameters: Record<string, unknown> }) {
  const kappa = findQuantity(run, "kappa");
  const logB = findQuantity(run, "log_b");
  const plot = buildWallLawPlot({ yPlus: series.x, uPlus: series.y, kappa, logB, r2: findQuantity(run, "log_fit_r2"), caseWindow: readWindow(caseParameters) });
  const windowBand: PlotBand[] = plot.window
    ? [{ axis: "x", from: plot.window.yPlusMin, to: plot.window.yPlusMax, color: PLOT_COLOURS.window, opacity: 0.13, label: "log-law fit window" }]
    : [];
  const curves: PlotCurve[] = [
    ...(plot.sublayer.length ? [{ id: "sublayer", label: "viscous sublayer u⁺ = y⁺", points: plot.sublayer, style: { color: PLOT_COLOURS.sublayer, dash: "2 3", width: 1.5 } }] : []),
    { id: "spalding", label: `Spalding (1961) composite law, κ = ${SPALDING.kappa}, B = ${SPALDING.b.toFixed(1)}`, points: plot.spalding, style: { color: PLOT_COLOURS.composite, dash: "8 3 2 3", width: 1.5 } },
    ...(plot.reference
      ? [{ id: "reference", label: `reference log law (band): κ = ${formatSig(plot.reference.kappa, 3)}, B = ${formatSig(plot.reference.b, 3)}`, points: plot.reference.points, style: { color: PLOT_COLOURS.reference, dash: "6 4", width: 1.6 } }]
      : []),
    ...(plot.fitted
      ? [{ id: "fitted", label: `fitted log law: κ = ${formatSig(plot.fitted.kappa, 4)}, B = ${formatSig(plot.fitted.b, 4)}`, points: plot.fitted.points, style: { color: PLOT_COLOURS.fit, width: 2.6 } }]
      : []),
  ];

  const plateaus = [plot.fitted?.kappa, plot.reference?.kappa].filter((k): k is number => k !== undefined && k > 0).map((k) => 1 / k);
  const xi = buildDiagnosticPlot(series.x, series.y, plateaus);
  // The two plateau lines are close; the upper one is labelled above at the
  // right, the lower one below at the left, so the labels never collide.
  const refUpper = plot.reference && plot.fitted ? plot.reference.kappa < plot.fitted.kappa : true;
  const rules: PlotRule[] = [
    ...(plot.reference
      ? [{ axis: "y" as const, at: 1 / plot.reference.kappa, style: { color: PLOT_COLOURS.reference, dash: "6 4" }, label: `1/κ reference = ${formatSig(1 / plot.reference.kappa, 4)}`, labelAt: refUpper ? ("end" as const) : ("start" as const), labelSide: refUpper ? ("above" as const) : ("below" as const) }]
      : []),
    ...(plot.fitted
      ? [{ axis: "y" as const, at: 1 / plot.fitted.kappa, style: { color: PLOT_COLOURS.fit, width: 1.8 }, label: `1/κ fitted = ${formatSig(1 / plot.fitted.kappa, 4)}`, labelAt: refUpper ? ("start" as const) : ("end" as const), labelSide: refUpper ? ("below" as const) : ("above" as const) }]
      : []),
  ];

  return (
    <Panel title="Law of the wall" subtitle="u⁺ against y⁺ on a logarithmic y⁺ axis" className="lg:col-span-2">
      <div className="grid gap-6 xl:grid-cols-[3fr_2fr]">
        <div className="min-w-0">
          <PlotFrame
            ariaLabel="Mean velocity u+ against y+ with the fitted log law, the band's reference log law, Spalding's composite law and the viscous sublayer"
            x={{ kind: "log", min: plot.xRange[0], max: plot.xRange[1], label: "y⁺", symbol: "y⁺" }}
            y={{ kind: "linear", min: plot.yRange[0], max: plot.yRange[1], label: "u⁺", symbol: "u⁺" }}
            height={400}
            bands={windowBand}
            curves={curves}
            markers={[{ id: "data", label: "u⁺ posted by the run", points: plot.data, shape: "circle", hollow: true, size: 5, color: PLOT_COLOURS.data }]}
            notes={[{ corner: "auto", prefer: ["top-left", "bottom-right", "top-right", "bottom-left"], lines: plot.notes }]}
          />
        </div>
        <div className="min-w-0">
          <h3 className="mb-1 text-xs font-semibold tracking-tight">Diagnostic function Ξ = y⁺ du⁺/dy⁺</h3>
          <p className="mb-1 text-xs text-ink-faint">A log region shows as a plateau at 1/κ; without a plateau the fitted κ describes no log layer.</p>
          <PlotFrame
            ariaLabel="Diagnostic function Xi against y+ with the 1/kappa plateau lines"
            x={{ kind: "log", min: xi.xRange[0], max: xi.xRange[1], label: "y⁺", symbol: "y⁺" }}
            y={{ kind: "linear", min: xi.yRange[0], max: xi.yRange[1], label: "Ξ = y⁺ du⁺/dy⁺", symbol: "Ξ" }}
            height={300}
            bands={windowBand.map((b) => ({ ...b, label: undefined }))}
            rules={rules}
            curves={[{ id: "spalding-xi", label: "Ξ of Spalding's law (κ = 0.41)", points: xi.spalding, style: { color: PLOT_COLOURS.composite, dash: "8 3 2 3", width: 1.4 } }]}
            markers={[{ id: "xi", label: "Ξ of the posted profile", points: xi.data, shape: "circle", size: 3.5, joined: true, color: PLOT_COLOURS.data }]}
            notes={xi.error ? [{ corner: "top-right", lines: [{ text: `Ξ not computed: ${xi.error}`, tone: "bad" }] }] : []}
          />
        </div>
      </div>
      <PlotFootnotes series={series} sources={[kappa, logB]} />
    </Panel>
  );
}
