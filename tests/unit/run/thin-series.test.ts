import { describe, expect, it } from "vitest";
import { thinSeries } from "@/components/charts/thin-series";

describe("thinSeries", () => {
  it("returns a short series unchanged with its length", () => {
    const t = thinSeries([1, 2, 3], [4, 5, 6], 100);
    expect(t).toEqual({ x: [1, 2, 3], y: [4, 5, 6], totalPoints: 3 });
  });

  it("keeps at most maxPoints samples, the first and last among them", () => {
    const n = 100_000;
    const x = Array.from({ length: n }, (_, i) => i);
    const y = x.map((i) => Math.exp(-i / 1e4));
    const t = thinSeries(x, y, 1000);
    expect(t.x.length).toBeLessThanOrEqual(1000);
    expect(t.x[0]).toBe(0);
    expect(t.x[t.x.length - 1]).toBe(n - 1);
    expect(t.totalPoints).toBe(n);
  });

  it("keeps a single-sample spike of a residual history so the envelope survives", () => {
    const n = 50_000;
    const x = Array.from({ length: n }, (_, i) => i + 1);
    const y = x.map((i) => 10 ** (-i / 1e4));
    y[31_337] = 5; // one spike
    y[42_000] = 1e-12; // one dip
    const t = thinSeries(x, y, 400);
    expect(t.y).toContain(5);
    expect(t.y).toContain(1e-12);
  });

  it("keeps x strictly increasing when the input is", () => {
    const x = Array.from({ length: 10_000 }, (_, i) => i * 0.5);
    const y = x.map((v) => Math.sin(v));
    const t = thinSeries(x, y, 300);
    for (let i = 1; i < t.x.length; i++) expect(t.x[i]).toBeGreaterThan(t.x[i - 1]);
  });
});
