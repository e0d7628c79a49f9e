import { describe, expect, it } from "vitest";
import { analyticDecayExponent, buildDecayPlot } from "@/components/run/decay-curves";
import { noteText, quantity } from "./quantity-fixture";

describe("analyticDecayExponent", () => {
  it("gives n = 1/(C_ε2 − 1) = 1.0869565 for standard k–ε (reference sheet §2.2)", () => {
    const a = analyticDecayExponent([{ name: "C_mu", value: 0.09 }, { name: "C_eps2", value: 1.92 }]);
    expect(a?.n).toBeCloseTo(1.0869565, 7);
    expect(a?.formula).toContain("C_ε2 = 1.92");
  });

  it("follows a changed C_ε2: 1.87 gives 1/0.87 = 1.1494", () => {
    // Same formula (sheet §2.2), evaluated for the demo regression's coefficient.
    expect(analyticDecayExponent([{ name: "C_eps2", value: 1.87 }])?.n).toBeCloseTo(1 / 0.87, 12);
  });

  it("gives β*/β0 = 1.27119 for Wilcox 2006 k–ω (reference sheet §2.3)", () => {
    expect(analyticDecayExponent([{ name: "beta_star", value: 0.09 }, { name: "beta_0", value: 0.0708 }])?.n).toBeCloseTo(1.27119, 5);
  });

  it("gives β*/β2 = 1.08696 for SST's outer set (reference sheet §2.3)", () => {
    expect(analyticDecayExponent([{ name: "beta_star", value: 0.09 }, { name: "beta_1", value: 0.075 }, { name: "beta_2", value: 0.0828 }])?.n).toBeCloseTo(1.08696, 5);
  });

  it("returns null when the run reported no coefficient that fixes the exponent", () => {
    expect(analyticDecayExponent([{ name: "c_b1", value: 0.1355 }])).toBeNull();
  });
});

describe("buildDecayPlot", () => {
  // Reference sheet §2.2: with k0 = 1, eps0 = 1/0.92, C_eps2 = 1.92 the exact
  // solution is k = (1 + t)^-1.0869565, i.e. A = 1, t0 = -1; worked values
  // k(1) = 0.470753, k(9) = 0.0818547, k(99) = 0.00670019.
  const n = 1 / 0.92;
  const t = [0, 1, 9, 99];
  const k = t.map((ti) => (1 + ti) ** -n);
  const q = quantity("decay_exponent", { value: n, reference: n, details: { t0: -1, a: 1, r2: 1, points: 4 } });

  it("plots k against t − t0 and draws the fitted power law through the sheet's worked values", () => {
    const plot = buildDecayPlot(t, k, q, null);
    expect(plot.shifted).toBe(true);
    expect(plot.data.map((p) => p.x)).toEqual([1, 2, 10, 100]);
    expect(plot.data[1].y).toBeCloseTo(0.470753, 6);
    expect(plot.fitted[0]).toEqual({ x: 1, y: 1 });
    expect(plot.fitted[plot.fitted.length - 1].x).toBe(100);
    expect(plot.fitted[plot.fitted.length - 1].y).toBeCloseTo(0.00670019, 8);
  });

  it("anchors the band's reference slope to the fit at the geometric middle of the data", () => {
    const steeper = quantity("decay_exponent", { value: n, reference: 1.25, details: { t0: -1, a: 1, r2: 1 } });
    const plot = buildDecayPlot(t, k, steeper, null);
    const ref = plot.reference?.points ?? [];
    const slope = Math.log(ref[ref.length - 1].y / ref[0].y) / Math.log(ref[ref.length - 1].x / ref[0].x);
    expect(slope).toBeCloseTo(-1.25, 10);
    // Both lines pass through the same k at s = sqrt(1 · 100) = 10.
    const aRef = ref[0].y * ref[0].x ** 1.25;
    expect(aRef * 10 ** -1.25).toBeCloseTo(10 ** -n, 12);
  });

  it("falls back to k against t and writes the failure when the fit has no result", () => {
    const failed = quantity("decay_exponent", { value: null, verdict: "missing", details: { error: "no power-law origin" } });
    const plot = buildDecayPlot(t, k, failed, null);
    expect(plot.shifted).toBe(false);
    expect(plot.hidden).toBe(1); // t = 0 has no place on a log axis
    expect(plot.fitted).toEqual([]);
    expect(noteText(plot.notes)).toMatch(/decay fit failed: no power-law origin/);
  });

  it("compares the fitted n with the closure's own exponent from the run's C_ε2", () => {
    const plot = buildDecayPlot(t, k, q, analyticDecayExponent([{ name: "C_eps2", value: 1.92 }]));
    expect(noteText(plot.notes)).toMatch(/1\/\(C_ε2 − 1\) with C_ε2 = 1.92 → 1.087/);
  });
});
