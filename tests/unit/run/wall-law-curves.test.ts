import { describe, expect, it } from "vitest";
import { logSpace } from "@/components/charts/sampling";
import { buildDiagnosticPlot, buildWallLawPlot, spaldingDiagnostic, SUBLAYER_TOP } from "@/components/run/wall-law-curves";
import { spaldingUPlus } from "@/lib/analysis";
import { noteText, quantity } from "./quantity-fixture";

describe("spaldingDiagnostic", () => {
  it("gives Spalding's Ξ = y+ du+/dy+ of reference sheet §1.4 at y+ = 30 … 10^4", () => {
    // Reference sheet §1.4 [derived]: Spalding (1961) with κ = 0.41, B = 5.0 has
    // Ξ = 3.2111, 2.6366, 2.4930, 2.4488, 2.4377 at y+ = 30, 100, 300, 1000, 10^4.
    const table: [number, number][] = [
      [30, 3.2111],
      [100, 2.6366],
      [300, 2.493],
      [1000, 2.4488],
      [1e4, 2.4377],
    ];
    for (const [yPlus, xi] of table) expect(spaldingDiagnostic(yPlus)).toBeCloseTo(xi, 3);
  });

  it("tends to 1/κ = 2.4390 far out and to y+ in the viscous sublayer", () => {
    // Sheet §1.4: the target plateau is 1/κ = 2.4390; u+ = y+ near the wall (sheet §1.1, common practice).
    expect(spaldingDiagnostic(1e7)).toBeCloseTo(1 / 0.41, 3);
    expect(spaldingDiagnostic(0.1) / 0.1).toBeCloseTo(1, 4);
  });
});

describe("buildDiagnosticPlot", () => {
  it("differentiates a dense Spalding profile to the closed-form Ξ within 0.1 %", () => {
    const yPlus = logSpace(0.5, 5000, 400);
    const uPlus = yPlus.map((y) => spaldingUPlus(y, 0.41, 5.0));
    const plot = buildDiagnosticPlot(yPlus, uPlus, [1 / 0.41]);
    expect(plot.error).toBeNull();
    for (const p of plot.data.filter((d) => d.x >= 30 && d.x <= 1000)) {
      expect(Math.abs(p.y / spaldingDiagnostic(p.x) - 1)).toBeLessThan(1e-3);
    }
  });

  it("reports why Ξ cannot be computed from fewer than three samples instead of drawing it", () => {
    const plot = buildDiagnosticPlot([10, 100], [8, 16], [2.44]);
    expect(plot.data).toEqual([]);
    expect(plot.error).toMatch(/at least 3/);
  });
});

describe("buildWallLawPlot", () => {
  const yPlus = [0, ...logSpace(0.5, 180, 120)];
  const uPlus = yPlus.map((y) => spaldingUPlus(y, 0.41, 5.0));
  const details = { window: { yPlusMin: 30, yPlusMax: 100 }, points: 25, r2: 0.9987 };

  it("draws the fitted log law only over the fit window, with the fitted κ and B", () => {
    const plot = buildWallLawPlot({
      yPlus,
      uPlus,
      kappa: quantity("kappa", { value: 0.3521, details }),
      logB: quantity("log_b", { value: 3.629, details }),
      r2: quantity("log_fit_r2", { value: 0.9987 }),
      caseWindow: null,
    });
    const first = plot.fitted?.points[0];
    const last = plot.fitted?.points[plot.fitted.points.length - 1];
    expect(first?.x).toBe(30);
    expect(last?.x).toBe(100);
    // u+ = (1/κ) ln y+ + B (sheet conventions) at the window's ends.
    expect(first?.y).toBeCloseTo(Math.log(30) / 0.3521 + 3.629, 10);
    expect(last?.y).toBeCloseTo(Math.log(100) / 0.3521 + 3.629, 10);
  });

  it("takes the reference log law from the band's reference κ and B, not from fixed constants", () => {
    // channel-re180 has a window-specific band reference (κ 0.342, B 3.14, library seed).
    const plot = buildWallLawPlot({
      yPlus,
      uPlus,
      kappa: quantity("kappa", { value: 0.35, reference: 0.34208, details }),
      logB: quantity("log_b", { value: 3.6, reference: 3.1405, details }),
      r2: null,
      caseWindow: null,
    });
    expect(plot.reference?.kappa).toBe(0.34208);
    expect(plot.reference?.b).toBe(3.1405);
    const p = plot.reference?.points.find((q) => Math.abs(q.x - 100) / 100 < 0.05);
    expect(p?.y).toBeCloseTo(Math.log(p?.x ?? 1) / 0.34208 + 3.1405, 10);
  });

  it("draws Spalding's law over the whole axis and u+ = y+ only below y+ = 12", () => {
    const plot = buildWallLawPlot({ yPlus, uPlus, kappa: null, logB: null, r2: null, caseWindow: null });
    // Sheet §1.4: Spalding (0.41, 5.0) at y+ = 100 is 16.07710.
    expect(spaldingUPlus(100, 0.41, 5.0)).toBeCloseTo(16.0771, 4);
    expect(plot.spalding[0].x).toBeCloseTo(plot.xRange[0], 12);
    expect(plot.spalding[plot.spalding.length - 1].x).toBeCloseTo(plot.xRange[1], 9);
    expect(Math.max(...plot.sublayer.map((p) => p.x))).toBeCloseTo(SUBLAYER_TOP, 12);
    for (const p of plot.sublayer) expect(p.y).toBe(p.x);
  });

  it("writes a failed fit on the plot and falls back to the case's window", () => {
    const plot = buildWallLawPlot({
      yPlus,
      uPlus,
      kappa: quantity("kappa", { value: null, verdict: "missing", details: { error: "yPlus: needs at least 3 samples in the window, found 1" } }),
      logB: quantity("log_b", { value: null, verdict: "missing" }),
      r2: null,
      caseWindow: { yPlusMin: 30, yPlusMax: 100 },
    });
    expect(plot.fitted).toBeNull();
    expect(plot.window).toEqual({ yPlusMin: 30, yPlusMax: 100 });
    expect(noteText(plot.notes)).toMatch(/log-law fit failed: yPlus: needs at least 3 samples/);
  });

  it("counts the wall sample y+ = 0 as hidden on the log axis and says so", () => {
    const plot = buildWallLawPlot({ yPlus, uPlus, kappa: null, logB: null, r2: null, caseWindow: null });
    expect(plot.hiddenAtWall).toBe(1);
    expect(plot.data).toHaveLength(120);
    expect(noteText(plot.notes)).toMatch(/1 sample at y⁺ = 0 not shown/);
  });
});
