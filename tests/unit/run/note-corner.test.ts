import { describe, expect, it } from "vitest";
import { chooseNoteCorner, estimateNoteSize, NOTE_MAX_WIDTH_PX } from "@/components/charts/note-corner";

// Unit-square frame of 400 × 300 px, data coordinates 0..1 on both axes.
const frame = { width: 400, height: 300, toPixel: (p: { x: number; y: number }) => [p.x * 400, (1 - p.y) * 300] as [number, number] };
const diagonal = (from: number, to: number) => Array.from({ length: 50 }, (_, i) => ({ x: i / 49, y: from + ((to - from) * i) / 49 }));

describe("chooseNoteCorner", () => {
  it("keeps the preferred corner when it is clear", () => {
    expect(chooseNoteCorner(frame, { width: 150, height: 60 }, diagonal(0, 1), [])).toBe("top-left");
  });

  it("moves off a residual history that rises into the top-right corner", () => {
    const rising = diagonal(0.1, 1);
    expect(chooseNoteCorner(frame, { width: 150, height: 60 }, rising, [], ["top-right", "bottom-left", "bottom-right", "top-left"])).not.toBe("top-right");
  });

  it("counts curve points as well as samples", () => {
    const decay = diagonal(1, 0);
    expect(chooseNoteCorner(frame, { width: 150, height: 60 }, [], decay, ["top-left", "bottom-left"])).toBe("bottom-left");
  });

  it("sizes a box from its longest line and its number of lines", () => {
    const size = estimateNoteSize([{ text: "x".repeat(40) }, { text: "short" }]);
    expect(size.width).toBeGreaterThan(250);
    expect(size.height).toBeGreaterThan(30);
  });

  it("wraps a long line at the box's maximum width and counts the extra rows", () => {
    const one = estimateNoteSize([{ text: "x".repeat(40) }]);
    const wrapped = estimateNoteSize([{ text: "x".repeat(120) }]);
    expect(wrapped.width).toBe(NOTE_MAX_WIDTH_PX);
    expect(wrapped.height).toBeGreaterThan(one.height * 1.5);
  });
});
