import { linearExtent } from "@/components/charts/axis-ticks";
import type { MarkerPoint, NoteLine, XY } from "@/components/charts/plot-types";
import { linSpace } from "@/components/charts/sampling";
import { formatSig } from "@/lib/format/numbers";
import { describeBand, valueWithVerdict } from "./note-format";
import { readNumber, type GridStudyView, type QuantityView } from "./run-data";

// The grid study plotted as φ against the normalised spacing h/h1 with
// h = N^(−1/dim) (Celik et al. 2008, reference sheet §8.2): the three grids,
// the Richardson-extrapolated value at h = 0, the fine-grid GCI as an error bar
// and, for monotonic convergence, the curve φ_ext + (φ1 − φ_ext)(h/h1)^p.

/** h_i/h_1 = (N_1/N_i)^(1/dim), fine grid first. */
export function normalisedSpacing(cells: number[], dimension: number): number[] {
  return cells.map((n) => (cells[0] / n) ** (1 / dimension));
}

/** Richardson's error model through the fine-grid value, tending to φ_ext as h → 0. */
export function richardsonCurve(phi1: number, phiExt: number, p: number, hMax: number, count = 80): XY[] {
  return linSpace(0, hMax, count).map((h) => ({ x: h, y: phiExt + (phi1 - phiExt) * h ** p }));
}

/** Half-width of the fine-grid uncertainty band: GCI_fine (in %) of |φ1|. */
export function gciHalfWidth(phi1: number, gciFinePct: number): number {
  return (Math.abs(phi1) * gciFinePct) / 100;
}

export interface GridStudyPlot {
  xRange: [number, number];
  yRange: [number, number];
  grids: MarkerPoint[];
  extrapolated: XY | null;
  curve: XY[];
  errorBar: { x: number; low: number; high: number } | null;
  reference: number | null;
  notes: NoteLine[];
}

export function buildGridStudyPlot(study: GridStudyView, quantities: { order: QuantityView | null; extrapolated: QuantityView | null; gci: QuantityView | null }): GridStudyPlot {
  const h = normalisedSpacing(study.cells, study.dimension);
  const names = ["fine", "medium", "coarse"];
  const grids = study.values.map((v, i) => ({ x: h[i], y: v, tag: names[i] ?? `grid ${i + 1}`, note: `${names[i] ?? "grid"}: N = ${study.cells[i].toLocaleString("en-GB")} cells, h/h₁ = ${formatSig(h[i], 4)}` }));
  const phi1 = study.values[0];
  const ext = study.extrapolatedValue;
  const p = study.observedOrder;
  const extrapolated = ext !== null ? { x: 0, y: ext } : null;
  const hMax = Math.max(...h);
  const curve = study.convergence === "monotonic" && ext !== null && p !== null && p > 0 ? richardsonCurve(phi1, ext, p, hMax) : [];
  const errorBar = study.gciFinePct !== null ? { x: h[0], low: phi1 - gciHalfWidth(phi1, study.gciFinePct), high: phi1 + gciHalfWidth(phi1, study.gciFinePct) } : null;

  const ys = [...study.values, ...(ext !== null ? [ext] : []), ...(errorBar ? [errorBar.low, errorBar.high] : [])];
  const yRange = linearExtent(ys, 0.12);
  // The band's reference is drawn only when it sits near the data; a ±1 % band
  // around 0.04 % differences would flatten the study into a line.
  const ref = quantities.extrapolated?.reference ?? null;
  const span = yRange[1] - yRange[0];
  const reference = ref !== null && ref >= yRange[0] - span && ref <= yRange[1] + span ? ref : null;
  const finalRange: [number, number] = reference !== null ? [Math.min(yRange[0], reference - 0.05 * span), Math.max(yRange[1], reference + 0.05 * span)] : yRange;
  return { xRange: [-0.04 * hMax, hMax * 1.08], yRange: finalRange, grids, extrapolated, curve, errorBar, reference, notes: gridNotes(study, quantities) };
}

function gridNotes(study: GridStudyView, q: { order: QuantityView | null; extrapolated: QuantityView | null; gci: QuantityView | null }): NoteLine[] {
  const notes: NoteLine[] = [];
  const kind = study.convergence;
  notes.push({ text: `${kind} convergence`, tone: kind === "monotonic" || kind === "converged" ? "strong" : kind === "oscillatory" ? "warn" : "bad" });
  if (study.observedOrder !== null) notes.push({ text: `p = ${q.order ? valueWithVerdict(q.order, 4) : formatSig(study.observedOrder, 4)}` });
  else notes.push({ text: "no observed order (p undefined for this study)", tone: "bad" });
  if (study.extrapolatedValue !== null) notes.push({ text: `φ_ext = ${q.extrapolated ? valueWithVerdict(q.extrapolated, 6) : formatSig(study.extrapolatedValue, 6)}` });
  if (study.gciFinePct !== null) notes.push({ text: `GCI_fine = ${formatSig(study.gciFinePct, 3)} %${q.gci ? ` (${q.gci.verdict})` : ""}`, tone: "strong" });
  notes.push({ text: `e_a = ${formatSig(study.eaPct, 3)} %   e_ext = ${formatSig(study.eextPct, 3)} %`, tone: "faint" });
  const r21 = readNumber(q.order?.details, "r21");
  const r32 = readNumber(q.order?.details, "r32");
  if (r21 !== null && r32 !== null) notes.push({ text: `r₂₁ = ${formatSig(r21, 4)}, r₃₂ = ${formatSig(r32, 4)} (${study.dimension}-D, h = N^−1/${study.dimension})`, tone: "faint" });
  const ratio = readNumber(q.order?.details, "asymptoticRatio");
  if (ratio !== null) notes.push({ text: `asymptotic ratio GCI₃₂/(r₂₁ᵖ GCI₂₁) = ${formatSig(ratio, 4)}`, tone: "faint" });
  const band = describeBand(q.extrapolated, 5);
  if (band) notes.push({ text: `φ_ext ${band}`, tone: "faint" });
  return notes;
}
