import { describe, expect, it } from "vitest";
import { logSpace } from "@/components/charts/sampling";
import { buildSkinFrictionPlot, CF_CORRELATIONS } from "@/components/run/skin-friction-curves";
import { noteText, quantity } from "./quantity-fixture";

const correlation = (id: string) => CF_CORRELATIONS.find((c) => c.id === id)!.f;

describe("flat-plate correlations drawn on the c_f plot", () => {
  it("match the worked values of reference sheet §6 at Re_x = 10^6 and at the TMR station", () => {
    // Reference sheet §6 worked values [derived]: Schlichting, 0.0576 Re^-0.2, White 0.455/ln².
    expect(correlation("schlichting")(1e6)).toBeCloseTo(0.003745, 6);
    expect(correlation("seventh")(1e6)).toBeCloseTo(0.003634, 6);
    expect(correlation("white")(1e6)).toBeCloseTo(0.003759, 6);
    expect(correlation("schlichting")(4.8504e6)).toBeCloseTo(0.002881, 6);
    expect(correlation("seventh")(4.8504e6)).toBeCloseTo(0.00265, 6);
    expect(correlation("white")(4.8504e6)).toBeCloseTo(0.002875, 6);
  });
});

describe("buildSkinFrictionPlot", () => {
  const reX = logSpace(1e5, 1e7, 150);
  const cf = reX.map((r) => correlation("schlichting")(r) * 0.99);

  it("reads x as Re_x on a log axis when the case sets a station, and marks the station", () => {
    const plot = buildSkinFrictionPlot({
      x: reX,
      cf,
      cfAtX: quantity("cf_at_x", { value: 0.0027112, details: { station: 4.8504e6, stationLabel: "Re_x = 4.8504e6 (TMR x = 0.97008)" } }),
      reattachment: null,
      caseParameters: { cfStation: 4.8504e6 },
    });
    expect(plot.mode).toBe("reynolds");
    expect(plot.xLog).toBe(true);
    expect(plot.station).toEqual({ x: 4.8504e6, cf: 0.0027112, label: "Re_x = 4.8504e6 (TMR x = 0.97008)" });
    expect(plot.correlations.map((c) => c.id)).toEqual(["schlichting", "seventh", "white"]);
    expect(plot.yRange[0]).toBe(0);
    expect(noteText(plot.notes)).toMatch(/Schlichting 0.002881 · 1\/7-law 0.00265 · White 0.002875/);
  });

  it("does not draw turbulent correlations below Re_x = 10^5", () => {
    const low = logSpace(1e3, 1e7, 100);
    const plot = buildSkinFrictionPlot({ x: low, cf: low.map(() => 0.003), cfAtX: null, reattachment: null, caseParameters: { cfStation: 1e6 } });
    for (const c of plot.correlations) expect(Math.min(...c.points.map((p) => p.x))).toBeGreaterThanOrEqual(1e5);
  });

  it("plots a step case in step heights with the zero line and the reattachment from the derivation", () => {
    const x = [0, 2, 4, 6, 8, 10, 12];
    const c = [0.001, -0.002, -0.001, -0.0002, 0.0005, 0.001, 0.001];
    const plot = buildSkinFrictionPlot({
      x,
      cf: c,
      cfAtX: null,
      reattachment: quantity("reattachment_xr_h", { value: 3.25, reference: 6.26, lower: 5.97, upper: 6.92, details: { xr: 6.5, stepHeight: 2, crossings: [6.5] } }),
      caseParameters: { stepHeight: 2 },
    });
    expect(plot.mode).toBe("step");
    expect(plot.data.map((p) => p.x)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(plot.reattachment).toEqual({ xr: 3.25, crossings: [3.25] });
    expect(plot.yRange[0]).toBeLessThan(-0.002);
    expect(plot.yRange[1]).toBeGreaterThan(0.001);
    expect(noteText(plot.notes)).toMatch(/x_r\/H = 3.25 \(within\)/);
  });

  it("says on the plot that no reattachment was found instead of marking one", () => {
    const plot = buildSkinFrictionPlot({
      x: [0, 1, 2],
      cf: [-1e-3, -2e-3, -1e-3],
      cfAtX: null,
      reattachment: quantity("reattachment_xr_h", { value: null, verdict: "missing", details: { error: "c_f never changes sign from negative to positive: no reattachment" } }),
      caseParameters: { stepHeight: 1 },
    });
    expect(plot.reattachment?.xr).toBeNull();
    expect(noteText(plot.notes)).toMatch(/no reattachment: c_f never changes sign/);
  });
});
