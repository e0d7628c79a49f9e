import { chooseNoteCorner, CORNERS, estimateNoteSize } from "./note-corner";
import type { NoteCorner, PlotAxis, PlotCurve, PlotMarkers, PlotNote, XY } from "./plot-types";

// Turns the notes of a plot into notes with a fixed corner: "auto" ones get the
// clearest free corner for the axes, samples and curves actually drawn.

/** Resolves "auto" corners, each note to a different corner, against the plotted points. */
export function placeNotes(a: { x: PlotAxis; y: PlotAxis; notes: PlotNote[]; markers: PlotMarkers[]; curves: PlotCurve[]; width: number; height: number }): (PlotNote & { corner: NoteCorner })[] {
  const frame = { width: a.width, height: a.height, toPixel: (p: XY) => toPixel(a.x, a.y, a.width, a.height, p) };
  const samples = a.markers.flatMap((m) => m.points);
  const curvePoints = a.curves.flatMap((c) => c.points);
  const used = new Set<NoteCorner>(a.notes.flatMap((n) => (n.corner === "auto" ? [] : [n.corner])));
  return a.notes.map((n) => {
    if (n.corner !== "auto") return { ...n, corner: n.corner };
    const free = (n.prefer ?? CORNERS).filter((c) => !used.has(c));
    const corner = chooseNoteCorner(frame, estimateNoteSize(n.lines), samples, curvePoints, free.length ? free : CORNERS);
    used.add(corner);
    return { ...n, corner };
  });
}

function toPixel(x: PlotAxis, y: PlotAxis, width: number, height: number, p: XY): [number, number] | null {
  const fx = fraction(x, p.x);
  const fy = fraction(y, p.y);
  return fx === null || fy === null ? null : [fx * width, (1 - fy) * height];
}

function fraction(axis: PlotAxis, v: number): number | null {
  if (!Number.isFinite(v)) return null;
  if (axis.kind === "log") return v > 0 ? Math.log(v / axis.min) / Math.log(axis.max / axis.min) : null;
  return (v - axis.min) / (axis.max - axis.min);
}
