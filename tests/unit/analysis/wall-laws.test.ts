import { describe, expect, it } from "vitest";
import {
  AnalysisError,
  colesWake,
  logLawUPlus,
  muskerUPlus,
  reichardtUPlus,
  spaldingUPlus,
} from "@/lib/analysis";

// Oracle: reference sheet §1.4 first table (u+ at fixed y+), [derived] there from
// the exact forms of §1.3: Spalding 1961 (J. Appl. Mech. 28:455), Reichardt 1951
// (ZAMM 31:208), Musker 1979 (AIAA J 17:655, closed form as coded in ONERA Fast).
// Printed to 5 decimals, so a value matches when it is within half a unit of the
// last printed digit (plus a hair for the table's own rounding).
const TOL5 = 5.1e-6;

const U_PLUS_TABLE: Array<[number, number, number, number, number, number, number | null]> = [
  // y+, Spalding(.41,5), Spalding(.40,5.5), Reichardt a=k=.41, Reichardt a=k=.40, Musker, log law
  [1, 0.99984, 0.99987, 1.00775, 1.01091, 0.99133, null],
  [5, 4.86565, 4.89383, 4.89926, 4.92594, 4.83913, null],
  [10, 8.2945, 8.51791, 8.37825, 8.42809, 8.40219, null],
  [30, 12.6338, 13.20003, 13.60055, 13.70131, 13.01156, 13.2956],
  [100, 16.0771, 16.80894, 16.91539, 17.08305, 16.21484, 16.23212],
  [300, 18.87936, 19.70695, 19.55678, 19.78948, 18.88671, 18.91166],
  [1000, 21.84823, 22.7616, 22.4795, 22.7849, 21.80552, 21.84818],
  [10000, 27.46739, 28.52773, 28.09021, 28.53575, 27.40059, 27.46424],
];

describe("wall laws reproduce the u+ table of reference sheet §1.4", () => {
  for (const [yPlus, sp41, sp40, re41, re40, mu, log] of U_PLUS_TABLE) {
    it(`matches every law at y+ = ${yPlus}`, () => {
      expect(Math.abs(spaldingUPlus(yPlus) - sp41)).toBeLessThan(TOL5);
      expect(Math.abs(spaldingUPlus(yPlus, 0.4, 5.5) - sp40)).toBeLessThan(TOL5);
      expect(Math.abs(reichardtUPlus(yPlus) - re41)).toBeLessThan(TOL5);
      expect(Math.abs(reichardtUPlus(yPlus, { kappa: 0.4 }) - re40)).toBeLessThan(TOL5);
      expect(Math.abs(muskerUPlus(yPlus) - mu)).toBeLessThan(TOL5);
      if (log !== null) expect(Math.abs(logLawUPlus(yPlus) - log)).toBeLessThan(TOL5);
    });
  }
});

describe("spaldingUPlus", () => {
  // The implicit formula itself (sheet §1.3, Spalding 1961) is the oracle: the
  // returned u+ must satisfy it to round-off across the whole range of y+.
  const spaldingYPlus = (u: number, kappa: number, b: number): number => {
    const x = kappa * u;
    return u + Math.exp(-kappa * b) * (Math.exp(x) - 1 - x - (x * x) / 2 - (x * x * x) / 6);
  };

  it("satisfies Spalding's implicit formula to 1e-12 relative from y+ = 0.01 to 1e8", () => {
    for (const [kappa, b] of [[0.41, 5.0], [0.4, 5.5], [0.384, 4.17]]) {
      for (let e = -2; e <= 8; e += 0.25) {
        const yPlus = 10 ** e;
        const u = spaldingUPlus(yPlus, kappa, b);
        expect(Math.abs(spaldingYPlus(u, kappa, b) - yPlus) / yPlus).toBeLessThan(1e-12);
      }
    }
  });

  it("stays finite and on the log law at an extreme y+ of 1e300", () => {
    expect(Math.abs(spaldingUPlus(1e300) - logLawUPlus(1e300))).toBeLessThan(1e-9);
  });

  it("follows the viscous line u+ = y+ very near the wall and is exactly 0 at the wall", () => {
    // Series of the formula: y+ = u+ + E (kappa u+)^4/24 + ..., so u+ -> y+ (common practice).
    expect(spaldingUPlus(0)).toBe(0);
    expect(Math.abs(spaldingUPlus(1e-6) - 1e-6)).toBeLessThan(1e-20);
  });

  it("approaches the log law with the same kappa and B far from the wall", () => {
    // Sheet §1.4: Spalding approaches the log law slowly; at y+ = 1e10 the
    // remaining difference is O(u+^3/y+), about 1e-7.
    expect(Math.abs(spaldingUPlus(1e10) - logLawUPlus(1e10))).toBeLessThan(1e-6);
  });

  it("rejects a negative or non-finite y+", () => {
    expect(() => spaldingUPlus(-1)).toThrow(AnalysisError);
    expect(() => spaldingUPlus(Number.NaN)).toThrow(AnalysisError);
    expect(() => spaldingUPlus(Number.POSITIVE_INFINITY)).toThrow(AnalysisError);
  });
});

describe("reichardtUPlus", () => {
  it("tends to the log law with B_eff = C + ln(a)/kappa for every stated variant", () => {
    // Sheet §1.3 [derived]: 5.6254 (a = kappa = 0.41), 5.5651 (a = 0.4, kappa = 0.41),
    // 5.5093 (a = kappa = 0.4).
    const y = 1e9;
    expect(reichardtUPlus(y) - Math.log(y) / 0.41).toBeCloseTo(5.6254, 4);
    expect(reichardtUPlus(y, { kappa: 0.41, a: 0.4 }) - Math.log(y) / 0.41).toBeCloseTo(5.5651, 4);
    expect(reichardtUPlus(y, { kappa: 0.4 }) - Math.log(y) / 0.4).toBeCloseTo(5.5093, 4);
  });

  it("is zero at the wall", () => {
    expect(reichardtUPlus(0)).toBe(0);
  });
});

describe("muskerUPlus", () => {
  it("is not exactly u+ = y+ at the wall, as the sheet notes for the curve fit", () => {
    // Sheet §1.3 [derived]: u+(1) = 0.9913. The sheet also prints u+(0) = -0.0083,
    // but evaluating its own closed form at y+ = 0 by hand gives
    // 5.424 atan(-8.15/16.7) + 9.6 log10(10.6) - 2 log10(86) - 3.52 = -0.008670
    // (checked independently in double precision); we assert the formula's value.
    expect(muskerUPlus(1)).toBeCloseTo(0.9913, 4);
    const byHand = 5.424 * Math.atan(-8.15 / 16.7) + 9.6 * Math.log10(10.6) - 2 * Math.log10(86) - 3.52;
    expect(byHand).toBeCloseTo(-0.00867, 5);
    expect(muskerUPlus(0)).toBeCloseTo(byHand, 14);
  });

  it("tends to the log law with kappa = ln(10)/5.6 and B = 5.424 pi/2 - 3.52", () => {
    // Sheet §1.3 [derived]: kappa = 0.411176, B = 5.0000.
    const kappa = Math.LN10 / 5.6;
    const b = (5.424 * Math.PI) / 2 - 3.52;
    expect(kappa).toBeCloseTo(0.411176, 6);
    expect(b).toBeCloseTo(5.0, 4);
    expect(Math.abs(muskerUPlus(1e9) - (Math.log(1e9) / kappa + b))).toBeLessThan(1e-6);
  });
});

describe("logLawUPlus and colesWake", () => {
  it("evaluates u+ = ln(y+)/kappa + B", () => {
    // Definition, sheet conventions: u+ = (1/kappa) ln y+ + B.
    expect(logLawUPlus(Math.E, 0.4, 5.5)).toBeCloseTo(1 / 0.4 + 5.5, 14);
    expect(logLawUPlus(1)).toBe(5.0);
  });

  it("rejects y+ <= 0 for the log law", () => {
    expect(() => logLawUPlus(0)).toThrow(AnalysisError);
  });

  it("gives Coles' wake 0 at the wall, half strength at mid-layer and 2 Pi/kappa at the edge", () => {
    // Coles 1956 wake (2 Pi/kappa) sin^2(pi y/(2 delta)), sheet §1.3.
    expect(colesWake(0, 0.55)).toBe(0);
    expect(colesWake(0.5, 0.55)).toBeCloseTo((2 * 0.55) / 0.41 / 2, 14);
    expect(colesWake(1, 0.55)).toBeCloseTo((2 * 0.55) / 0.41, 14);
    expect(colesWake(0.25, 0.14, 0.4)).toBeCloseTo(((2 * 0.14) / 0.4) * Math.sin(Math.PI / 8) ** 2, 14);
  });

  it("holds the wake at its edge value outside the layer instead of oscillating", () => {
    expect(colesWake(1.7, 0.55)).toBe(colesWake(1, 0.55));
  });

  it("rejects a negative wall distance for the wake", () => {
    expect(() => colesWake(-0.1, 0.55)).toThrow(AnalysisError);
  });
});
