import { describe, expect, it } from "vitest";
import { formatDelta, formatSig, withUnit } from "@/lib/format/numbers";

describe("formatSig", () => {
  it("keeps four significant figures and switches to powers of ten for small magnitudes", () => {
    expect(formatSig(1 / 0.92)).toBe("1.087");
    expect(formatSig(0.0027056)).toBe("0.002706");
    expect(formatSig(2.5e-4)).toBe("2.500×10⁻⁴");
    expect(formatSig(-0.2169)).toBe("−0.2169");
    expect(formatSig(4.8504e6)).toBe("4.850×10⁶");
    expect(formatSig(null)).toBe("—");
  });
  it("signs changes and drops the unit of dimensionless quantities", () => {
    expect(formatDelta(0.0025)).toBe("+0.0025");
    expect(formatDelta(-2.5e-6)).toBe("−2.50×10⁻⁶");
    expect(withUnit("6.26", "1")).toBe("6.26");
    expect(withUnit("2.2", "%")).toBe("2.2 %");
  });
});
