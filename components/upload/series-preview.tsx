"use client";

import { axisExponent, linearExtent, logExtent } from "@/components/charts/axis-ticks";
import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { PlotAxis, PlotRule } from "@/components/charts/plot-types";
import { thinSeries } from "@/components/charts/thin-series";
import { SERIES_COLUMNS, type UploadSeriesKey } from "@/lib/validation/upload";
import type { CsvSeries } from "@/lib/validation/upload-csv";

// A look at the CSV before it is sent, on the axes its physics wants: a wrong
// column order or a profile in the wrong units shows here, where no schema can
// catch it. The fits are drawn on the run page once the server has derived them.

const MAX_DRAWN = 2000;

type Scale = "log" | "linear" | "log-if-wide";
const AXES: Record<UploadSeriesKey, { x: Scale; y: Scale; zeroRule?: boolean; why: string }> = {
  u_plus: { x: "log", y: "linear", why: "y⁺ on a log axis: the log-law region is a straight line" },
  k_decay: {
    x: "log-if-wide",
    y: "log",
    why: "k on a log axis (t stays linear when it starts at 0). The server fits k = A (t − t₀)⁻ⁿ with the virtual origin t₀ free; the run page draws that fit on log–log axes",
  },
  cf: { x: "log-if-wide", y: "linear", zeroRule: true, why: "The dashed line c_f = 0 marks separation and reattachment; an x spanning decades (Re_x) goes on a log axis" },
  residual: { x: "linear", y: "log", why: "Residual on a log axis: each decade is one order of convergence" },
};

export function SeriesPreview({ csv, seriesKey }: { csv: CsvSeries; seriesKey: UploadSeriesKey }) {
  const spec = AXES[seriesKey];
  const meaning = SERIES_COLUMNS[seriesKey];
  const drawn = thinSeries(csv.x, csv.y, MAX_DRAWN);
  // The file's own column names title the axes; the series key says what they mean.
  const x = axisFor(spec.x, csv.x, csv.columns[0]);
  const y = axisFor(spec.y, csv.y, csv.columns[1]);
  // Thinning drops points, so file rows are named only when every point is drawn.
  const thinned = drawn.totalPoints > drawn.x.length;
  const hidden = countOffAxis(x, csv.x) + countOffAxis(y, csv.y);
  const rules: PlotRule[] = spec.zeroRule && y.min < 0 && y.max > 0 ? [{ axis: "y", at: 0, style: { color: PLOT_COLOURS.guide, dash: "4 3" }, label: `${meaning.y} = 0` }] : [];
  return (
    <figure className="space-y-1" data-testid="series-preview">
      <PlotFrame
        ariaLabel={`Preview of the uploaded ${meaning.title}: ${csv.columns[1]} against ${csv.columns[0]}`}
        x={x}
        y={y}
        height={260}
        rules={rules}
        markers={[{ id: "file", label: `${csv.columns[1]} from the file`, points: drawn.x.map((v, i) => ({ x: v, y: drawn.y[i], note: thinned ? undefined : `file row ${csv.rows[i]}` })), shape: "circle", hollow: !thinned, size: thinned ? 1.5 : 4, joined: thinned, color: PLOT_COLOURS.data }]}
      />
      <figcaption className="text-xs text-ink-faint">
        {spec.why}.{" "}
        {thinned && `Drawn from ${drawn.x.length.toLocaleString("en-GB")} of ${drawn.totalPoints.toLocaleString("en-GB")} points (every peak kept). `}
        {hidden > 0 && `${hidden} value${hidden === 1 ? "" : "s"} ≤ 0 cannot appear on a log axis. `}
      </figcaption>
    </figure>
  );
}

function axisFor(scale: Scale, values: number[], label: string): PlotAxis {
  const positive = values.every((v) => v > 0);
  const log = scale === "log" || (scale === "log-if-wide" && positive && spread(values) >= 100);
  if (log) {
    const [min, max] = logExtent(values);
    return { kind: "log", min, max, label };
  }
  const [min, max] = linearExtent(values);
  return { kind: "linear", min, max, label, exponent: axisExponent(min, max) };
}

function spread(values: number[]): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return hi / lo;
}

function countOffAxis(axis: PlotAxis, values: number[]): number {
  if (axis.kind !== "log") return 0;
  let n = 0;
  for (const v of values) if (!(v > 0)) n++;
  return n;
}
