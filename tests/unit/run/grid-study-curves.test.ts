import { describe, expect, it } from "vitest";
import { buildGridStudyPlot, gciHalfWidth, normalisedSpacing, richardsonCurve } from "@/components/run/grid-study-curves";
import { analyseGridStudy } from "@/lib/analysis";
import { noteText, quantity } from "./quantity-fixture";

describe("normalisedSpacing", () => {
  it("gives h/h1 = 1, 2, 4 for the TMR 2DZP grids (reference sheet §7.2, r = 2, h = N^-1/2)", () => {
    expect(normalisedSpacing([208896, 52224, 13056], 2)).toEqual([1, 2, 4]);
  });

  it("gives r21 = 1.5 and r21·r32 = 2 for Celik et al. 2008 Table 1, column 1 (reference sheet §8.2)", () => {
    const h = normalisedSpacing([18000, 8000, 4500], 2);
    expect(h[1]).toBeCloseTo(1.5, 12);
    expect(h[2]).toBeCloseTo(2, 12);
  });
});

describe("Richardson curve and GCI bar", () => {
  // Reference sheet §7.2: SA CFL3D c_f at x = 0.97 on the finest three grids;
  // published p = 1.98, GCI_fine = 0.017 %, φ_ext = 2.70524395e-3 [derived].
  const values: [number, number, number] = [0.270562153e-2, 0.270673749e-2, 0.271115173e-2];
  const study = analyseGridStudy({ cells: [208896, 52224, 13056], values, dimension: 2 });

  it("passes through the fine and medium values and ends at φ_ext for h → 0", () => {
    expect(study.extrapolated).toBeCloseTo(2.70524395e-3, 11);
    const p = study.p as number;
    const ext = study.extrapolated as number;
    const at = (h: number) => richardsonCurve(values[0], ext, p, h, 2)[1].y;
    expect(richardsonCurve(values[0], ext, p, 4)[0]).toEqual({ x: 0, y: ext });
    expect(at(1)).toBeCloseTo(values[0], 15);
    expect(at(2)).toBeCloseTo(values[1], 15);
    // With a constant ratio r the observed order makes the model exact on the coarse grid too.
    expect(at(4)).toBeCloseTo(values[2], 15);
  });

  it("draws the fine-grid error bar as ±GCI_fine·|φ1|", () => {
    expect(study.gciFinePct).toBeCloseTo(0.0174, 4);
    // Sheet §7.2 recomputed GCI_fine^21 = 0.0174 %: the bar is that fraction of φ1 on each side.
    expect((100 * gciHalfWidth(values[0], study.gciFinePct as number)) / values[0]).toBeCloseTo(0.0174, 4);
    expect(gciHalfWidth(-2, 1.5)).toBeCloseTo(0.03, 15);
  });

  it("builds the plot with the extrapolated point at h = 0 and writes p, φ_ext and GCI on it", () => {
    const view = {
      quantity: "cf_at_x", cells: [208896, 52224, 13056], values, dimension: 2, convergence: study.convergence,
      observedOrder: study.p, extrapolatedValue: study.extrapolated, gciFinePct: study.gciFinePct, eaPct: study.eaPct, eextPct: study.eextPct,
    };
    const plot = buildGridStudyPlot(view, {
      order: quantity("observed_order", { value: study.p, details: { r21: 2, r32: 2, asymptoticRatio: study.asymptoticRatio } }),
      extrapolated: quantity("extrapolated_value", { value: study.extrapolated, reference: 2.70524395e-3 }),
      gci: quantity("gci_fine_pct", { value: study.gciFinePct }),
    });
    expect(plot.extrapolated).toEqual({ x: 0, y: study.extrapolated });
    expect(plot.grids.map((g) => g.x)).toEqual([1, 2, 4]);
    expect(plot.curve.length).toBeGreaterThan(0);
    expect(plot.reference).toBe(2.70524395e-3);
    const text = noteText(plot.notes);
    expect(text).toMatch(/monotonic convergence/);
    expect(text).toMatch(/p = 1.984 \(within\)/);
    expect(text).toMatch(/GCI_fine = 0.0174 %/);
  });

  it("draws no Richardson curve for an oscillatory study (Celik Table 1, column 3)", () => {
    // Sheet §8.2 column 3: N = 18000, 4500, 980; φ = 6.0042, 5.9624, 6.0909 (s = −1).
    const osc = analyseGridStudy({ cells: [18000, 4500, 980], values: [6.0042, 5.9624, 6.0909], dimension: 2 });
    expect(osc.convergence).toBe("oscillatory");
    const plot = buildGridStudyPlot(
      { quantity: "u", cells: [18000, 4500, 980], values: [6.0042, 5.9624, 6.0909], dimension: 2, convergence: osc.convergence, observedOrder: osc.p, extrapolatedValue: osc.extrapolated, gciFinePct: osc.gciFinePct, eaPct: osc.eaPct, eextPct: osc.eextPct },
      { order: null, extrapolated: null, gci: null },
    );
    expect(plot.curve).toEqual([]);
    expect(noteText(plot.notes)).toMatch(/oscillatory convergence/);
  });
});
