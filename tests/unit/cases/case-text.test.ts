import { describe, expect, it } from "vitest";
import { describeOrigin, describeSettings, formatLimit, relativeLimits } from "@/components/cases/case-text";

// How the case library writes fit settings, origins and band widths.

describe("describeSettings", () => {
  it("writes the flat-plate fit settings with the station's own label", () => {
    const lines = describeSettings({
      logLawWindow: { yPlusMin: 30, yPlusMax: 450 },
      cfStation: 4.8504e6,
      cfStationLabel: "Re_x = 4.8504e6 (TMR x = 0.97008)",
      residualTargetOrders: 5,
    });
    expect(lines).toEqual([
      { label: "Log-law fit window", value: "30 ≤ y+ ≤ 450" },
      { label: "c_f read at the station", value: "Re_x = 4.8504e6 (TMR x = 0.97008)" },
      { label: "Residual drop expected", value: "≥ 5 orders of magnitude" },
    ]);
  });

  it("names Re_τ and shows keys it does not know as they are", () => {
    expect(describeSettings({ reTau: 180, someNewSetting: { a: 1 } })).toEqual([
      { label: "Friction Reynolds number Re_τ", value: "180" },
      { label: "someNewSetting", value: '{"a":1}' },
    ]);
  });
});

describe("relativeLimits", () => {
  it("gives ±1 % for the k–ε verification band around n = 1/(C_ε2 − 1)", () => {
    const n = 1 / 0.92;
    expect(relativeLimits(n, n * 0.99, n * 1.01)).toBe("−1.0 % / +1.0 % of the reference");
  });

  it("gives an asymmetric width for the grid-turbulence band 1.15–1.45 around 1.25", () => {
    expect(relativeLimits(1.25, 1.15, 1.45)).toBe("−8.0 % / +16 % of the reference");
  });

  it("writes an open side as infinite and says nothing without a reference", () => {
    expect(relativeLimits(5, 5, null)).toBe("+0.0 % / +∞ of the reference");
    expect(relativeLimits(null, 0.99, null)).toBe("");
    expect(formatLimit(null, "lower")).toBe("−∞");
  });
});

describe("describeOrigin", () => {
  it("says which series a quantity is derived from, or that the run reports it", () => {
    expect(describeOrigin("k_decay")).toMatch(/k_decay series .*virtual origin/);
    expect(describeOrigin(null)).toBe("reported by the run");
  });
});
