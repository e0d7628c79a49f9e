"use client";

import { axisExponent } from "@/components/charts/axis-ticks";
import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { PlotMarkers } from "@/components/charts/plot-types";
import { Panel } from "@/components/ui/panel";
import { formatSig } from "@/lib/format/numbers";
import { buildGridStudyPlot } from "./grid-study-curves";
import { PlotFootnotes } from "./plot-footnotes";
import { findQuantity, type GridStudyView, type RunView } from "./run-data";

/** Three-grid study against normalised spacing with Richardson extrapolation and the fine-grid GCI. */
export function GridStudyPanel({ run, study, definitions }: { run: RunView; study: GridStudyView; definitions: { key: string; label: string; unit: string }[] }) {
  const order = findQuantity(run, "observed_order");
  const extrapolated = findQuantity(run, "extrapolated_value");
  const gci = findQuantity(run, "gci_fine_pct");
  const plot = buildGridStudyPlot(study, { order, extrapolated, gci });
  const def = definitions.find((d) => d.key === study.quantity);
  const markers: PlotMarkers[] = [
    { id: "grids", label: "value on each grid (fine, medium, coarse)", points: plot.grids, shape: "circle", size: 8, joined: true, color: PLOT_COLOURS.data },
    ...(plot.extrapolated ? [{ id: "ext", label: `Richardson-extrapolated φ_ext = ${formatSig(plot.extrapolated.y, 6)} at h = 0`, points: [{ ...plot.extrapolated, tag: "φ_ext" }], shape: "diamond" as const, size: 11, color: PLOT_COLOURS.fit }] : []),
  ];
  return (
    <Panel title="Grid convergence" subtitle={`φ = ${def?.label ?? study.quantity} (${study.quantity}) on three grids against h/h₁ (Celik et al. 2008)`} className="lg:col-span-2">
      <PlotFrame
        ariaLabel="Grid study: the studied value against normalised grid spacing with Richardson extrapolation and the fine-grid GCI error bar"
        x={{ kind: "linear", min: plot.xRange[0], max: plot.xRange[1], label: `h/h₁ (h = N^−1/${study.dimension})`, symbol: "h/h₁" }}
        y={{ kind: "linear", min: plot.yRange[0], max: plot.yRange[1], label: "φ", symbol: "φ", exponent: axisExponent(plot.yRange[0], plot.yRange[1]) }}
        height={340}
        rules={plot.reference !== null ? [{ axis: "y", at: plot.reference, style: { color: PLOT_COLOURS.reference, dash: "6 4" }, label: `band reference ${formatSig(plot.reference, 6)}` }] : []}
        curves={plot.curve.length ? [{ id: "richardson", label: `φ_ext + (φ₁ − φ_ext)(h/h₁)^p, p = ${formatSig(study.observedOrder, 4)}`, points: plot.curve, style: { color: PLOT_COLOURS.fit, width: 1.8, dash: "6 3" } }] : []}
        errorBars={plot.errorBar ? [{ ...plot.errorBar, color: PLOT_COLOURS.reference }] : []}
        markers={markers}
        notes={[{ corner: "auto", prefer: ["top-left", "bottom-left", "top-right", "bottom-right"], lines: plot.notes }]}
        footer={
          plot.errorBar && (
            <p className="mt-1 text-xs text-ink-faint">
              Error bar on the fine grid: φ₁ ± GCI_fine·|φ₁| = {formatSig(study.values[0], 6)} ± {formatSig(plot.errorBar.high - study.values[0], 3)}
              {def?.unit && def.unit !== "1" ? ` ${def.unit}` : ""}.
            </p>
          )
        }
      />
      <PlotFootnotes sources={[extrapolated, order, gci]} />
    </Panel>
  );
}
