import { describe, expect, it } from "vitest";
import { AnalysisError, deviationFromReference, judgeValue, VERDICT_ORDER, worstVerdict } from "@/lib/analysis";

// Band semantics are the product's own rules (DESIGN.md "band", "verdict"); the
// example band is the k–eps verification band n = 1/(C_eps2 - 1) = 1.0869565
// (reference sheet §2.2) with invented acceptance limits for the test.
const DECAY_BAND = { lower: 1.08, upper: 1.094, marginalMargin: 0.002 };

describe("judgeValue", () => {
  it("is within for a value well inside both limits", () => {
    expect(judgeValue(1 / 0.92, DECAY_BAND)).toBe("within");
  });

  it("is outside below the lower or above the upper limit", () => {
    expect(judgeValue(1.0799, DECAY_BAND)).toBe("outside");
    expect(judgeValue(1.0941, DECAY_BAND)).toBe("outside");
  });

  it("counts a value exactly on a limit as inside, hence marginal when a margin is set", () => {
    expect(judgeValue(1.08, DECAY_BAND)).toBe("marginal");
    expect(judgeValue(1.094, DECAY_BAND)).toBe("marginal");
    expect(judgeValue(1.08, { ...DECAY_BAND, marginalMargin: 0 })).toBe("within");
  });

  it("is marginal within the margin of either limit, the margin itself included", () => {
    expect(judgeValue(1.081, DECAY_BAND)).toBe("marginal");
    expect(judgeValue(1.093, DECAY_BAND)).toBe("marginal");
    expect(judgeValue(0.5, { lower: 0, upper: 1, marginalMargin: 0.5 })).toBe("marginal");
    expect(judgeValue(0.5, { lower: 0, upper: 1, marginalMargin: 0.25 })).toBe("within");
  });

  it("treats a null limit as open (one-sided bands)", () => {
    // e.g. residual drop >= 3 orders (sheet §10, common practice)
    const atLeastThree = { lower: 3, upper: null, marginalMargin: 0.5 };
    expect(judgeValue(12, atLeastThree)).toBe("within");
    expect(judgeValue(3.2, atLeastThree)).toBe("marginal");
    expect(judgeValue(2.9, atLeastThree)).toBe("outside");
    const atMostZero = { lower: null, upper: 0, marginalMargin: 0 };
    expect(judgeValue(-1e9, atMostZero)).toBe("within");
    expect(judgeValue(1, atMostZero)).toBe("outside");
  });

  it("is unbanded without a band, even without a value", () => {
    expect(judgeValue(1.2, null)).toBe("unbanded");
    expect(judgeValue(null, null)).toBe("unbanded");
  });

  it("is missing for null, undefined, NaN and infinite values", () => {
    for (const v of [null, undefined, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(judgeValue(v, DECAY_BAND)).toBe("missing");
    }
  });

  it("rejects a band whose lower limit exceeds its upper limit or whose margin is negative", () => {
    expect(() => judgeValue(1, { lower: 2, upper: 1, marginalMargin: 0 })).toThrow(AnalysisError);
    expect(() => judgeValue(1, { lower: 0, upper: 2, marginalMargin: -1 })).toThrow(AnalysisError);
  });
});

describe("worstVerdict", () => {
  it("orders within < unbanded < marginal < missing < outside", () => {
    expect([...VERDICT_ORDER]).toEqual(["within", "unbanded", "marginal", "missing", "outside"]);
  });

  it("returns the most severe verdict of a run", () => {
    expect(worstVerdict(["within", "marginal", "unbanded"])).toBe("marginal");
    expect(worstVerdict(["within", "outside", "missing"])).toBe("outside");
    expect(worstVerdict(new Set(["within", "unbanded"] as const))).toBe("unbanded");
  });

  it("returns missing for an empty collection", () => {
    expect(worstVerdict([])).toBe("missing");
  });
});

describe("deviationFromReference", () => {
  it("gives the absolute and percent deviation from the reference", () => {
    const d = deviationFromReference(0.002, 0.0025);
    expect(d?.absolute).toBeCloseTo(-0.0005, 15);
    expect(d?.relativePct).toBeCloseTo(-20, 12);
  });

  it("uses |reference| so a negative reference keeps the sign of the deviation", () => {
    expect(deviationFromReference(-0.9, -1)?.relativePct).toBeCloseTo(10, 12);
  });

  it("returns null without a reference and a null percentage for a zero reference", () => {
    expect(deviationFromReference(1, null)).toBeNull();
    expect(deviationFromReference(null, 1)).toBeNull();
    expect(deviationFromReference(0.3, 0)).toEqual({ absolute: 0.3, relativePct: null });
  });
});
