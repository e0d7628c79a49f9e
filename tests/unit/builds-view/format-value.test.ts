import { describe, expect, it } from "vitest";
import { formatDifference, formatDifferencePct, formatValue } from "@/components/quantities/format-value";

// Table numbers: a fixed count of significant figures with trailing zeros kept
// (ECMA-262 Number.prototype.toPrecision semantics), as tables of measured or
// computed values are printed in the trade (common practice).

describe("formatValue", () => {
  it("keeps trailing zeros so one column shows one precision", () => {
    expect(formatValue(1 / (1.92 - 1), 5)).toBe("1.0870"); // k–ε decay exponent n = 1/(Cε2 − 1), reference sheet §2.2
    expect(formatValue(6.4, 4)).toBe("6.400");
    expect(formatValue(0.0027326691, 4)).toBe("0.002733");
  });

  it("writes whole numbers (sample counts, exact zeros) without decimals and uses a true minus sign", () => {
    expect(formatValue(0)).toBe("0");
    expect(formatValue(12)).toBe("12");
    expect(formatValue(-0.2168994125, 4)).toBe("−0.2169");
  });

  it("falls back to exponent form for magnitudes below 10⁻³", () => {
    expect(formatValue(2.5e-5, 3)).toBe("2.50×10⁻⁵");
  });
});

describe("formatDifference", () => {
  it("reads round-off below one part per million of the value as ≈ 0", () => {
    expect(formatDifference(1.26e-11, 0.002697)).toBe("≈ 0");
    expect(formatDifferencePct(4.66e-7)).toBe("≈ 0 %");
  });

  it("keeps a real difference with its sign, and an exact zero as ±0", () => {
    expect(formatDifference(0.0625, 1.087)).toBe("+0.0625");
    expect(formatDifference(-3.71e-4, 5.4)).toBe("−3.71×10⁻⁴");
    expect(formatDifference(0, 5.2)).toBe("±0");
  });
});
