import type { NoteCorner, NoteLine, XY } from "./plot-types";

// Where the notes written on a plot go: the corner whose patch of the plot
// area, the size of the notes, covers the fewest samples and curve points.
// Where the data run depends on the run (a failed fit, a diverging residual),
// so a fixed corner would sooner or later hide what the notes describe.

export const CORNERS: NoteCorner[] = ["top-left", "top-right", "bottom-right", "bottom-left"];

const LINE_PX = 15.5;
const CHAR_PX = 6.7;
const PAD_PX = 14;

/** The notes box never grows wider than this (max-w 26rem in PlotNotes); longer lines wrap. */
export const NOTE_MAX_WIDTH_PX = 416;

/** Size of a notes box in pixels, from its longest line and its number of (wrapped) lines. */
export function estimateNoteSize(lines: NoteLine[]): { width: number; height: number } {
  const chars = lines.map((l) => (typeof l.text === "string" ? l.text.length : 40));
  const textWidth = NOTE_MAX_WIDTH_PX - PAD_PX;
  const rows = chars.reduce((sum, c) => sum + Math.max(1, Math.ceil((c * CHAR_PX) / textWidth)), 0);
  const width = Math.min(NOTE_MAX_WIDTH_PX, Math.max(0, ...chars) * CHAR_PX + PAD_PX);
  return { width, height: rows * LINE_PX + PAD_PX };
}

export interface Frame {
  width: number;
  height: number;
  /** Data to pixel, y measured down from the top as in SVG; null when a point has no place. */
  toPixel: (p: XY) => [number, number] | null;
}

/**
 * The corner to use: the first in `preference` among those covering the fewest
 * obstacles. Curve points count half, samples fully.
 */
export function chooseNoteCorner(frame: Frame, box: { width: number; height: number }, samples: XY[], curvePoints: XY[], preference: NoteCorner[] = CORNERS): NoteCorner {
  const w = Math.min(box.width, frame.width);
  const h = Math.min(box.height, frame.height);
  const cost = (corner: NoteCorner) => {
    const left = corner.endsWith("left") ? 0 : frame.width - w;
    const top = corner.startsWith("top") ? 0 : frame.height - h;
    const inside = (p: XY) => {
      const at = frame.toPixel(p);
      return at !== null && at[0] >= left - 4 && at[0] <= left + w + 4 && at[1] >= top - 4 && at[1] <= top + h + 4;
    };
    let c = 0;
    for (const p of samples) if (inside(p)) c += 1;
    for (const p of curvePoints) if (inside(p)) c += 0.5;
    return c;
  };
  let best = preference[0];
  let bestCost = Infinity;
  for (const corner of preference) {
    const c = cost(corner);
    if (c < bestCost) {
      best = corner;
      bestCost = c;
    }
  }
  return best;
}
