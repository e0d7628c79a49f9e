import type { ReactNode } from "react";

// The vocabulary of a scientific plot, independent of what is plotted: measured
// points (markers), analytic curves, shaded ranges, reference rules, error bars
// and notes written on the plot.

export interface XY {
  x: number;
  y: number;
}

export interface PlotAxis {
  kind: "linear" | "log";
  min: number;
  max: number;
  /** Axis title; a power of ten moved out of the ticks is appended to it. */
  label: ReactNode;
  /** Plain-text symbol of the plotted variable for tooltips ("y⁺", "c_f"); "x"/"y" when absent. */
  symbol?: string;
  /** Move a power of ten into the title (linear axes only; see axisExponent). */
  exponent?: number;
  ticks?: number[];
}

/** "ring" is an unfilled circle drawn around another marker (a selection). */
export type MarkerShape = "circle" | "square" | "diamond" | "triangle" | "cross" | "ring";

export interface LineStyle {
  color: string;
  width?: number;
  /** SVG stroke-dasharray, e.g. "6 4". */
  dash?: string;
}

/** A curve drawn as a polyline; a non-finite y breaks it. */
export interface PlotCurve {
  id: string;
  label: string;
  points: XY[];
  style: LineStyle;
  /** Leave out of the legend (e.g. a second segment of an already named curve). */
  hideInLegend?: boolean;
}

export interface MarkerPoint extends XY {
  /** Identity of the point for selection (e.g. a sample number). */
  key?: string;
  /** Extra line for the tooltip (e.g. "sample 3, S t = 6"). */
  note?: string;
  /** Short text written beside the marker. */
  tag?: string;
}

/** Measured or derived points; they also get hover tooltips. */
export interface PlotMarkers {
  id: string;
  label: string;
  points: MarkerPoint[];
  shape: MarkerShape;
  color: string;
  hollow?: boolean;
  size?: number;
  /** Join the points with a thin line of the same colour (a sampled distribution). */
  joined?: boolean;
  /**
   * Most glyphs to draw (default 150). A denser set is drawn as a joined line
   * with every k-th glyph, so thousands of markers do not merge into a smear
   * that hides the curves beneath; every point still answers to the pointer.
   */
  maxGlyphs?: number;
}

/** A shaded range across the plot, e.g. the fit window (axis x) or an acceptance band (axis y). */
export interface PlotBand {
  axis: "x" | "y";
  from: number;
  to: number;
  color: string;
  opacity?: number;
  label?: string;
}

/** A straight line across the plot at a fixed x or y, optionally labelled at its end. */
export interface PlotRule {
  axis: "x" | "y";
  at: number;
  style: LineStyle;
  label?: string;
  /** Where the label sits along the line (default: the far end) … */
  labelAt?: "start" | "end";
  /** … and on which side of it (default: above, or at the top for a vertical line). */
  labelSide?: "above" | "below";
}

export interface PlotErrorBar {
  x: number;
  low: number;
  high: number;
  color: string;
}

export type NoteTone = "plain" | "strong" | "warn" | "bad" | "faint";
export interface NoteLine {
  text: ReactNode;
  tone?: NoteTone;
}
export type NoteCorner = "top-left" | "top-right" | "bottom-left" | "bottom-right";

export interface PlotNote {
  /** A fixed corner, or "auto": the corner covering the fewest samples and curve points. */
  corner: NoteCorner | "auto";
  /** With "auto": the order in which corners are tried when several are equally clear. */
  prefer?: NoteCorner[];
  lines: NoteLine[];
}
