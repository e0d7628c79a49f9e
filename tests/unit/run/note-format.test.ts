import { describe, expect, it } from "vitest";
import { describeBand, formatLimits, formatR2, valueWithVerdict } from "@/components/run/note-format";
import { quantity } from "./quantity-fixture";

describe("note wording", () => {
  it("writes two-sided and one-sided acceptance limits", () => {
    expect(formatLimits(0.302, 0.372)).toBe("[0.302, 0.372]");
    expect(formatLimits(3, null)).toBe("≥ 3");
    expect(formatLimits(null, 1)).toBe("≤ 1");
  });

  it("names the band's kind and model beside its reference", () => {
    const q = quantity("decay_exponent", { reference: 1.0869565, lower: 1.0761, upper: 1.0978, bandKind: "verification", bandModel: "k-epsilon" });
    expect(describeBand(q, 4)).toBe("band (verification, k-epsilon): 1.087, accepted [1.076, 1.098]");
    expect(describeBand(quantity("x"))).toBeNull();
  });

  it("reads r² close to 1 by its distance from 1", () => {
    expect(formatR2(0.999999999999635)).toBe("1 − 3.7×10⁻¹³");
    expect(formatR2(0.99874)).toBe("0.99874");
  });

  it("shows a missing value as a dash with its verdict", () => {
    expect(valueWithVerdict(quantity("kappa", { value: null, verdict: "missing" }))).toBe("— (missing)");
  });
});
