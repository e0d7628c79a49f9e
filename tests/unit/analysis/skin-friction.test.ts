import { describe, expect, it } from "vitest";
import {
  AnalysisError,
  cfPowerLawSeventh,
  cfPowerLawSeventhCalibrated,
  cfSchlichting,
  cfSchultzGrunow,
  cfVonKarman,
  cfWhite,
} from "@/lib/analysis";

// Oracle: reference sheet §6, local c_f worked values [derived] from the formulas
// in the same section: 1/7 power law (CFD-Wiki "Skin friction coefficient");
// Schlichting 7th ed. Eq. 21.12 (0.0592), 21.16 (log form) and 21.19a
// (Schultz-Grunow); von Kármán 1934; White, Viscous Fluid Flow (marked [memory]
// in the sheet, so "from memory" here). Printed to 6 decimals: half a unit of the
// last digit is 5e-7.
const HALF_UNIT = 5.01e-7;

const ROWS: Array<[number, number, number, number, number, number, number]> = [
  // Re_x, 0.0592 Re^-0.2, 0.0576 Re^-0.2, Schlichting, White, Schultz-Grunow, Karman
  [1e6, 0.003735, 0.003634, 0.003745, 0.003759, 0.00361, 0.003675],
  [4.8504e6, 0.002724, 0.00265, 0.002881, 0.002875, 0.002729, 0.002812],
  [1e7, 0.002357, 0.002293, 0.002579, 0.00257, 0.002424, 0.00251],
  [1e8, 0.001487, 0.001447, 0.00187, 0.001868, 0.001716, 0.001808],
];

describe("flat-plate local skin-friction correlations (sheet §6)", () => {
  for (const [reX, p592, p576, sch, white, sg, karman] of ROWS) {
    it(`match the worked values at Re_x = ${reX}`, () => {
      expect(Math.abs(cfPowerLawSeventhCalibrated(reX) - p592)).toBeLessThan(HALF_UNIT);
      expect(Math.abs(cfPowerLawSeventh(reX) - p576)).toBeLessThan(HALF_UNIT);
      expect(Math.abs(cfSchlichting(reX) - sch)).toBeLessThan(HALF_UNIT);
      expect(Math.abs(cfWhite(reX) - white)).toBeLessThan(HALF_UNIT); // White: from memory (sheet)
      expect(Math.abs(cfSchultzGrunow(reX) - sg)).toBeLessThan(HALF_UNIT);
      expect(Math.abs(cfVonKarman(reX) - karman)).toBeLessThan(HALF_UNIT);
    });
  }

  it("solves von Kármán's implicit law 1/sqrt(cf) = 4.15 log10(Re_x cf) + 1.7 to round-off", () => {
    for (const reX of [1e5, 3.3e6, 1e9]) {
      const cf = cfVonKarman(reX);
      expect(1 / Math.sqrt(cf)).toBeCloseTo(4.15 * Math.log10(reX * cf) + 1.7, 12);
    }
  });

  it("spread of the correlations at Re_x = 4.85e6 is the sheet's 0.00265-0.00288", () => {
    const values = [cfPowerLawSeventh, cfSchlichting, cfWhite, cfSchultzGrunow, cfVonKarman].map((f) => f(4.8504e6));
    expect(Math.min(...values)).toBeCloseTo(0.00265, 5);
    expect(Math.max(...values)).toBeCloseTo(0.00288, 5);
  });

  it("rejects Re_x that is not positive and finite, or where a formula is singular", () => {
    expect(() => cfPowerLawSeventh(0)).toThrow(AnalysisError);
    expect(() => cfSchlichting(-5)).toThrow(AnalysisError);
    expect(() => cfWhite(Number.NaN)).toThrow(AnalysisError);
    expect(() => cfWhite(10)).toThrow(AnalysisError); // ln(0.06 Re_x) < 0
    expect(() => cfSchultzGrunow(1)).toThrow(AnalysisError); // log10(1) = 0
  });
});
