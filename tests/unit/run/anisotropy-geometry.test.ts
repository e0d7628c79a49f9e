import { describe, expect, it } from "vitest";
import { barycentricOutline, LUMLEY_VERTICES, lumleyBoundaries, placeAnisotropy, placeSamples, twoComponentEta } from "@/components/run/anisotropy-geometry";
import type { StressView } from "@/components/run/run-data";

describe("Lumley triangle boundaries", () => {
  it("runs the two-component line from the 2C axisymmetric vertex to the 1C vertex (reference sheet §9.2)", () => {
    // Sheet §9.2: η = (1/27 + 2ξ³)^(1/2); 2C axisymmetric vertex (−1/6, 1/6), 1C vertex (1/3, 1/3).
    expect(twoComponentEta(-1 / 6)).toBeCloseTo(1 / 6, 14);
    expect(twoComponentEta(1 / 3)).toBeCloseTo(1 / 3, 14);
    const { twoComponent, prolate, oblate } = lumleyBoundaries();
    expect(twoComponent[0].x).toBeCloseTo(-1 / 6, 14);
    expect(twoComponent[twoComponent.length - 1].x).toBeCloseTo(1 / 3, 14);
    // Axisymmetric edges ξ = ±η from the isotropic point.
    expect(prolate[1].x).toBe(prolate[1].y);
    expect(oblate[1].x).toBe(-oblate[1].y);
    expect(LUMLEY_VERTICES.isotropic).toEqual({ x: 0, y: 0 });
  });

  it("closes the barycentric triangle on the vertices 2C (0,0), 1C (1,0), 3C (1/2, √3/2)", () => {
    // Banerjee et al. 2007 vertex convention as stated in reference sheet §9.3.
    const o = barycentricOutline();
    expect(o[0]).toEqual(o[o.length - 1]);
    expect(o).toContainEqual({ x: 1, y: 0 });
    expect(o).toContainEqual({ x: 0.5, y: Math.sqrt(3) / 2 });
  });
});

describe("placeAnisotropy", () => {
  it("places the shear-like worked example of reference sheet §9.4", () => {
    // Sheet §9.4: b11 = .20, b22 = −.14, b33 = −.06, b12 = −.15 → η 0.134288, ξ 0.114852, (x_B, y_B) = (0.521642, 0.354943).
    const p = placeAnisotropy({ b11: 0.2, b22: -0.14, b33: -0.06, b12: -0.15 });
    expect(p.lumley.y).toBeCloseTo(0.134288, 6);
    expect(p.lumley.x).toBeCloseTo(0.114852, 6);
    expect(p.barycentric.x).toBeCloseTo(0.521642, 6);
    expect(p.barycentric.y).toBeCloseTo(0.354943, 6);
    expect(p.realizable).toBe(true);
  });
});

describe("placeSamples", () => {
  const sample = (over: Partial<StressView>): StressView => ({
    at: 1, uu: 1, vv: 1, ww: 1, uv: 0, uw: 0, vw: 0, k: 1.5, eta: 0, xi: 0, lumleyF: 1, barycentricX: 0.5, barycentricY: Math.sqrt(3) / 2, realizable: true, violations: [], ...over,
  });

  it("picks out non-realizable samples and counts those with no invariants to place", () => {
    const placed = placeSamples([
      sample({ at: 2 }),
      // Sheet §9.4 non-realizable example: |R12| = 1.2 > 1, (x_B, y_B) = (0.3, −0.173205).
      sample({ at: 6, uv: 1.2, realizable: false, eta: 0.23094, xi: 0, lumleyF: -0.44, barycentricX: 0.3, barycentricY: -0.173205, violations: ["Schwarz"] }),
      sample({ at: 9, uu: -1, vv: 0, ww: 0, k: -0.5, eta: null, xi: null, lumleyF: null, barycentricX: null, barycentricY: null, realizable: false, violations: ["non-positive trace"] }),
    ]);
    expect(placed.realizable.lumley).toHaveLength(1);
    expect(placed.violating.barycentric).toEqual([expect.objectContaining({ x: 0.3, y: -0.173205, tag: "6" })]);
    expect(placed.unplaced).toBe(1);
  });
});
