import { describe, expect, it } from "vitest";
import { AnalysisError, cfAtX, cfPowerLawSeventh, cfSchlichting, findReattachment } from "@/lib/analysis";
import { linSpace, logSpace, mapSeries } from "./support/series";

describe("cfAtX", () => {
  it("reads the sheet §6 value at the TMR station from a correlation-generated Re_x series", () => {
    // Sheet §6 worked values at Re_x = 4.8504e6: 0.0576 Re^-0.2 -> 0.002650,
    // Schlichting -> 0.002881 (printed to 6 decimals).
    const reX = logSpace(1e5, 1e8, 3001);
    expect(Math.abs(cfAtX(reX, mapSeries(reX, cfPowerLawSeventh), 4.8504e6) - 0.00265)).toBeLessThan(5.01e-7);
    expect(Math.abs(cfAtX(reX, mapSeries(reX, cfSchlichting), 4.8504e6) - 0.002881)).toBeLessThan(5.01e-7);
  });

  it("reads the TMR flat-plate station x = 0.970084071 on x/L with Re = 5e6 per unit length", () => {
    // TMR 2DZP (sheet §7.2): monitored station x = 0.970084071, Re_x = 4.8504e6.
    const x = linSpace(0.01, 2, 800);
    const value = cfAtX(x, mapSeries(x, (v) => cfSchlichting(5e6 * v)), 0.970084071);
    expect(Math.abs(value - 0.002881)).toBeLessThan(5.01e-7);
  });

  it("is exact for a linear distribution and at the samples themselves", () => {
    const x = [0, 0.3, 1.1, 2];
    const cf = x.map((v) => 0.004 - 0.001 * v);
    expect(cfAtX(x, cf, 0.7)).toBeCloseTo(0.004 - 0.0007, 16);
    expect(cfAtX(x, cf, 0)).toBe(cf[0]);
    expect(cfAtX(x, cf, 2)).toBe(cf[3]);
    expect(cfAtX(x, cf, 1.1)).toBe(cf[2]);
  });

  it("rejects a station outside the series, non-increasing x and bad numbers", () => {
    expect(() => cfAtX([0, 1, 2], [1, 2, 3], 2.01)).toThrow(AnalysisError);
    expect(() => cfAtX([0, 1, 2], [1, 2, 3], -0.01)).toThrow(AnalysisError);
    expect(() => cfAtX([0, 2, 1], [1, 2, 3], 0.5)).toThrow(AnalysisError);
    expect(() => cfAtX([0, 1, 1], [1, 2, 3], 0.5)).toThrow(AnalysisError);
    expect(() => cfAtX([0, 1, 2], [1, Number.NaN, 3], 0.5)).toThrow(AnalysisError);
    expect(() => cfAtX([0, 1, 2], [1, 2], 0.5)).toThrow(/length/);
    expect(() => cfAtX([], [], 0)).toThrow(AnalysisError);
  });
});

describe("findReattachment", () => {
  it("returns the exact root of an analytic linear crossing", () => {
    // cf = 0.002 (x - 6.26): zero at the Driver & Seegmiller x_r/H = 6.26 (sheet §7.1).
    const x = [5, 5.5, 6, 6.5, 7];
    const r = findReattachment(x, x.map((v) => 0.002 * (v - 6.26)));
    expect(r.xr).toBeCloseTo(6.26, 13);
    expect(r.crossings).toHaveLength(1);
  });

  it("returns the primary reattachment of a backstep with a secondary corner bubble", () => {
    // Synthetic backstep c_f(x/H) (shape: common practice for a BFS): a tiny
    // reversed tertiary region at the corner, a secondary corner eddy with c_f > 0,
    // the primary bubble with c_f < 0, and attached flow after x_r/H = 6.26.
    const x = linSpace(0, 20, 401);
    const cf = mapSeries(x, (v) => {
      if (v < 0.2) return -1e-4 * Math.sin((Math.PI * v) / 0.2); // tertiary, zero at 0.2
      if (v < 1.2) return 3e-4 * Math.sin((Math.PI * (v - 0.2)) / 1.0); // secondary, zero at 1.2
      if (v < 6.26) return -1.5e-3 * Math.sin((Math.PI * (v - 1.2)) / 5.06); // primary
      return 2e-3 * (1 - Math.exp(-(v - 6.26) / 2)); // recovery
    });
    const r = findReattachment(x, cf);
    // Located by linear interpolation between the bracketing samples x = 6.25 and 6.30,
    // hence within the interpolation error (<1e-3 here) of the true zero 6.26.
    const i = 125; // x[125] = 6.25
    const linear = x[i] - (cf[i] * (x[i + 1] - x[i])) / (cf[i + 1] - cf[i]);
    expect(r.xr).toBeCloseTo(linear, 13);
    expect(Math.abs((r.xr ?? 0) - 6.26)).toBeLessThan(1e-3);
    expect(r.crossings).toHaveLength(2); // tertiary->secondary at 0.2, primary reattachment
    expect(r.crossings[0]).toBeCloseTo(0.2, 12);
  });

  it("places the crossing on an exact zero sample and ignores a zero that is only touched", () => {
    expect(findReattachment([0, 1, 2, 3], [-1, 0, 1, 2])).toEqual({ xr: 1, crossings: [1] });
    // touches 0 at x = 1, negative again, then reattaches between 2 and 3
    expect(findReattachment([0, 1, 2, 3], [-1, 0, -1, 1]).crossings).toEqual([2.5]);
    // zeros then positive: the crossing is where c_f first reaches zero
    expect(findReattachment([0, 1, 2, 3], [-1, 0, 0, 1]).crossings).toEqual([1]);
    // zeros to the end: never attached
    expect(findReattachment([0, 1, 2], [-1, 0, 0]).xr).toBeNull();
  });

  it("returns null when c_f never goes from negative to positive", () => {
    expect(findReattachment([0, 1, 2], [0.003, 0.002, 0.001]).xr).toBeNull();
    expect(findReattachment([0, 1, 2], [0.001, -0.001, -0.002])).toEqual({ xr: null, crossings: [] });
  });

  it("rejects non-increasing x and non-finite c_f", () => {
    expect(() => findReattachment([0, 0, 1], [-1, 1, 2])).toThrow(AnalysisError);
    expect(() => findReattachment([0, 1, 2], [-1, Number.POSITIVE_INFINITY, 2])).toThrow(AnalysisError);
  });
});
