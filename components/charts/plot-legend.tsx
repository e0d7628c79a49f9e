import type { ReactNode } from "react";
import { PLOT_COLOURS } from "./chart-theme";
import { markerGlyph } from "./plot-layers";
import type { NoteCorner, NoteLine, PlotBand, PlotCurve, PlotMarkers, PlotNote } from "./plot-types";

// The key under a plot and the notes written on it. Both are HTML so that they
// wrap, inherit the page's light or dark colours and stay selectable.

export function PlotLegend({ curves, markers, bands }: { curves: PlotCurve[]; markers: PlotMarkers[]; bands: PlotBand[] }) {
  const items: { key: string; swatch: ReactNode; label: string }[] = [
    ...markers.map((m) => ({
      key: `m-${m.id}`,
      label: m.label,
      swatch: (
        <svg width={22} height={12} aria-hidden>
          {m.joined && <line x1={1} x2={21} y1={6} y2={6} stroke={m.color} strokeWidth={1} />}
          {markerGlyph(m.shape, 11, 6, m.size ?? 6, m.color, m.hollow ?? false)}
        </svg>
      ),
    })),
    ...curves
      .filter((c) => !c.hideInLegend)
      .map((c) => ({
        key: `c-${c.id}`,
        label: c.label,
        swatch: (
          <svg width={26} height={12} aria-hidden>
            <line x1={1} x2={25} y1={6} y2={6} stroke={c.style.color} strokeWidth={c.style.width ?? 1.6} strokeDasharray={c.style.dash} />
          </svg>
        ),
      })),
    ...bands
      .filter((b) => b.label)
      .map((b, i) => ({
        key: `b-${i}`,
        label: b.label ?? "",
        swatch: (
          <svg width={16} height={12} aria-hidden>
            <rect x={1} y={1} width={14} height={10} fill={b.color} fillOpacity={Math.max(0.2, b.opacity ?? 0.12)} />
          </svg>
        ),
      })),
  ];
  if (items.length === 0) return null;
  return (
    <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft dark:text-white/70">
      {items.map((it) => (
        <li key={it.key} className="flex items-center gap-1.5">
          {it.swatch}
          <span>{it.label}</span>
        </li>
      ))}
    </ul>
  );
}

const TONE: Record<NonNullable<NoteLine["tone"]>, string> = {
  plain: "",
  strong: "font-semibold",
  warn: "font-semibold text-verdict-marginal",
  bad: "font-semibold text-verdict-outside",
  faint: "text-ink-faint dark:text-white/55",
};

const CORNER: Record<NoteCorner, string> = {
  "top-left": "items-start",
  "top-right": "items-end text-right",
  "bottom-left": "items-start justify-end",
  "bottom-right": "items-end justify-end text-right",
};

/** Notes laid over the plot area (inside the axes), one block per corner; below the plot when it is too narrow to share. */
export function PlotNotes({ notes, box, below = false }: { notes: (PlotNote & { corner: NoteCorner })[]; box: { left: number; top: number; width: number; height: number }; below?: boolean }) {
  if (notes.length === 0) return null;
  if (below) {
    return (
      <div className="mt-2 space-y-1">
        {notes.map((n) => (
          <div key={n.corner} className="rounded border border-ink/10 px-2 py-1 font-mono text-[11px] leading-snug dark:border-white/15">
            {n.lines.map((l, i) => (
              <div key={i} className={TONE[l.tone ?? "plain"]}>
                {l.text}
              </div>
            ))}
          </div>
        ))}
      </div>
    );
  }
  return (
    <>
      {notes.map((n) => (
        <div
          key={n.corner}
          className={`pointer-events-none absolute flex flex-col p-1.5 ${CORNER[n.corner]}`}
          style={{ left: box.left, top: box.top, width: box.width, height: box.height }}
        >
          <div
            className="pointer-events-auto max-w-[min(26rem,100%)] rounded border border-ink/10 px-2 py-1 font-mono text-[11px] leading-snug text-ink shadow-sm dark:border-white/15 dark:text-white/90"
            style={{ background: `color-mix(in srgb, ${PLOT_COLOURS.halo} 88%, transparent)` }}
          >
            {n.lines.map((l, i) => (
              <div key={i} className={TONE[l.tone ?? "plain"]}>
                {l.text}
              </div>
            ))}
          </div>
        </div>
      ))}
    </>
  );
}
