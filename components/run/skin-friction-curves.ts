import { linearExtent, logExtent } from "@/components/charts/axis-ticks";
import type { NoteLine, XY } from "@/components/charts/plot-types";
import { logSpace, sampleCurve } from "@/components/charts/sampling";
import { cfPowerLawSeventh, cfSchlichting, cfWhite } from "@/lib/analysis";
import { formatSig } from "@/lib/format/numbers";
import { describeBand, valueWithVerdict } from "./note-format";
import { readNumber, readNumbers, readString, whyMissing, type QuantityView } from "./run-data";

// The skin-friction plot c_f(x). Three readings of x, decided by the case:
// Re_x on a log axis for the flat plate (a station is set), x/H for a step
// (a step height is set; the reattachment is where c_f turns positive), or
// plain x otherwise.

/** Published flat-plate correlations drawn as references (reference sheet §6). */
export const CF_CORRELATIONS = [
  { id: "schlichting", label: "Schlichting: (2 log₁₀ Re_x − 0.65)^−2.3", f: cfSchlichting },
  { id: "seventh", label: "1/7-power law: 0.0576 Re_x^−1/5", f: cfPowerLawSeventh },
  { id: "white", label: "White: 0.455 / ln²(0.06 Re_x)", f: cfWhite },
] as const;

/** The correlations are for a turbulent layer; below this Re_x they are not drawn. */
export const CORRELATION_MIN_RE_X = 1e5;

export type CfMode = "reynolds" | "step" | "plain";

export interface SkinFrictionPlot {
  mode: CfMode;
  xLog: boolean;
  xRange: [number, number];
  yRange: [number, number];
  data: XY[];
  correlations: { id: string; label: string; points: XY[] }[];
  station: { x: number; cf: number | null; label: string } | null;
  reattachment: { xr: number | null; crossings: number[] } | null;
  /** x-range of the reattachment band, in x/H. */
  reattachmentBand: { reference: number | null; lower: number | null; upper: number | null } | null;
  notes: NoteLine[];
}

export interface SkinFrictionInput {
  x: number[];
  cf: number[];
  cfAtX: QuantityView | null;
  reattachment: QuantityView | null;
  caseParameters: Record<string, unknown>;
}

export function buildSkinFrictionPlot(input: SkinFrictionInput): SkinFrictionPlot {
  const { cfAtX, reattachment, caseParameters } = input;
  const station = readNumber(cfAtX?.details, "station") ?? readNumber(caseParameters, "cfStation");
  const stepHeight = readNumber(reattachment?.details, "stepHeight") ?? readNumber(caseParameters, "stepHeight");
  const mode: CfMode = station !== null ? "reynolds" : stepHeight !== null && stepHeight > 0 ? "step" : "plain";
  const scale = mode === "step" && stepHeight ? stepHeight : 1;
  const xLog = mode === "reynolds" && input.x.every((v) => v > 0);
  const data = input.x.map((x, i) => ({ x: x / scale, y: input.cf[i] })).filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  // A station outside the series (c_f there cannot be derived) stays in view.
  const xs = [...data.map((p) => p.x), ...(station !== null ? [station] : [])];
  const xRange = xLog ? logExtent(xs) : linearExtent(xs, 0.02);

  const correlations =
    mode === "reynolds" && xLog
      ? CF_CORRELATIONS.map((c) => {
          const from = Math.max(CORRELATION_MIN_RE_X, Math.min(...data.map((p) => p.x)));
          const to = Math.max(...data.map((p) => p.x));
          return { id: c.id, label: c.label, points: from < to ? sampleCurve(logSpace(from, to, 80), (r) => c.f(r)) : [] };
        })
      : [];

  const ys = data.map((p) => p.y);
  for (const c of correlations) for (const p of c.points) if (Number.isFinite(p.y)) ys.push(p.y);
  // c_f = 0 (separation, the reattachment criterion) is always in view: c_f is
  // read against it, and on the flat plate the empty strip above it holds the notes.
  const [lo, hi] = linearExtent([...ys, 0], 0.06);
  // Behind a step the notes go under the recirculation bubble: room is made there.
  const yRange: [number, number] = [Math.min(...ys) >= 0 ? 0 : mode === "step" ? lo - 0.4 * (hi - lo) : lo, hi];

  const stationInfo = station !== null
    ? { x: station, cf: cfAtX?.value ?? null, label: readString(cfAtX?.details, "stationLabel") ?? readString(caseParameters, "cfStationLabel") ?? `x = ${formatSig(station, 5)}` }
    : null;
  const reattachmentInfo = mode === "step" && reattachment
    ? { xr: reattachment.value, crossings: readNumbers(reattachment.details, "crossings").map((c) => c / scale) }
    : null;
  const reattachmentBand = mode === "step" && reattachment && (reattachment.lower !== null || reattachment.upper !== null || reattachment.reference !== null)
    ? { reference: reattachment.reference, lower: reattachment.lower, upper: reattachment.upper }
    : null;

  return { mode, xLog, xRange, yRange, data, correlations, station: stationInfo, reattachment: reattachmentInfo, reattachmentBand, notes: cfNotes(input, mode, stationInfo) };
}

function cfNotes(input: SkinFrictionInput, mode: CfMode, station: SkinFrictionPlot["station"]): NoteLine[] {
  const notes: NoteLine[] = [];
  if (station) {
    const failure = whyMissing(input.cfAtX);
    notes.push({ text: `station ${station.label}`, tone: "faint" });
    notes.push(failure ? { text: `c_f at the station not derived: ${failure}`, tone: "bad" } : { text: `c_f(station) = ${valueWithVerdict(input.cfAtX, 5)}`, tone: "strong" });
    const band = describeBand(input.cfAtX, 4);
    if (band) notes.push({ text: band });
    if (mode === "reynolds" && station.x >= CORRELATION_MIN_RE_X) {
      const at = CF_CORRELATIONS.map((c) => `${c.id === "seventh" ? "1/7-law" : c.label.split(":")[0]} ${formatSig(c.f(station.x), 4)}`);
      notes.push({ text: "correlations at the station:", tone: "faint" });
      notes.push({ text: at.join(" · "), tone: "faint" });
    }
  }
  if (mode === "step" && input.reattachment) {
    const failure = whyMissing(input.reattachment);
    notes.push(failure ? { text: `no reattachment: ${failure}`, tone: "bad" } : { text: `x_r/H = ${valueWithVerdict(input.reattachment, 4)}`, tone: "strong" });
    const crossings = readNumbers(input.reattachment.details, "crossings");
    if (crossings.length > 1) notes.push({ text: `${crossings.length} changes − to +; the last is the reattachment`, tone: "faint" });
    const band = describeBand(input.reattachment, 3);
    if (band) notes.push({ text: band });
  }
  return notes;
}
