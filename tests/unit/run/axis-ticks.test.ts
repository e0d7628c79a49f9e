import { describe, expect, it } from "vitest";
import {
  axisExponent,
  exponentSuffix,
  formatLinearTick,
  formatLogTick,
  linearTicks,
  logExtent,
  logMinorTicks,
  logTicks,
  needsPowersOfTen,
} from "@/components/charts/axis-ticks";

// Axis conventions of engineering plots (common practice): decades on log
// axes, 1-2-5 steps on linear ones, a power of ten moved into the axis title.

describe("logExtent", () => {
  it("snaps a profile spanning more than two decades outwards to 1-2-5 values with headroom", () => {
    expect(logExtent([0.5, 3, 180])).toEqual([0.2, 200]);
    expect(logExtent([1e5, 1e7])).toEqual([5e4, 2e7]);
  });

  it("ignores samples at or below zero, which a log axis cannot place", () => {
    expect(logExtent([0, -1, 2, 2000])).toEqual([1, 5000]);
  });

  it("widens a narrow range by a factor 1.25 each way", () => {
    const [lo, hi] = logExtent([2, 8]);
    expect(lo).toBeCloseTo(1.6, 12);
    expect(hi).toBeCloseTo(10, 12);
  });
});

describe("logTicks", () => {
  it("puts ticks on the decades when three or more are in range", () => {
    expect(logTicks(0.2, 200)).toEqual([1, 10, 100]);
  });

  it("thins decades to at most ten ticks over a long residual history", () => {
    const ticks = logTicks(1e-14, 1e2);
    expect(ticks.length).toBeLessThanOrEqual(10);
    expect(ticks[0]).toBeCloseTo(1e-14, 26);
  });

  it("adds 2x and 5x ticks when fewer than three decades are in range", () => {
    expect(logTicks(1, 50)).toEqual([1, 2, 5, 10, 20, 50]);
  });

  it("gives the 2..9 multiples between decades for the minor grid", () => {
    expect(logMinorTicks(1, 10)).toEqual([2, 3, 4, 5, 6, 7, 8, 9]);
  });
});

describe("linear ticks and labels", () => {
  it("steps by 5 over a step-height axis from just below 0 to 30", () => {
    expect(linearTicks(-0.55, 30.6, 6)).toEqual([0, 5, 10, 15, 20, 25, 30]);
  });

  it("moves 10^-3 out of c_f ticks and writes the factor in the title", () => {
    const exponent = axisExponent(0, 0.0063);
    expect(exponent).toBe(-3);
    expect(exponentSuffix(exponent)).toBe(" × 10³");
    expect(formatLinearTick(0.0027, 0.0005, exponent)).toBe("2.7");
  });

  it("keeps plain numbers for quantities of order one", () => {
    expect(axisExponent(0, 20)).toBe(0);
    expect(formatLinearTick(-0.1, 0.1)).toBe("−0.1");
    expect(formatLinearTick(-0.0000001, 0.1)).toBe("0.0");
  });

  it("labels log ticks as numbers near one and as powers of ten far from it", () => {
    expect(formatLogTick(100)).toBe("100");
    expect(formatLogTick(0.01)).toBe("0.01");
    expect(formatLogTick(1e5)).toBe("10⁵");
    expect(formatLogTick(2e-5)).toBe("2×10⁻⁵");
  });

  it("writes every tick of an axis as a power of ten once one of them needs it", () => {
    const ticks = [1e-7, 1e-5, 1e-3, 0.1, 10];
    expect(needsPowersOfTen(ticks)).toBe(true);
    expect(ticks.map((t) => formatLogTick(t, true))).toEqual(["10⁻⁷", "10⁻⁵", "10⁻³", "10⁻¹", "10¹"]);
    expect(needsPowersOfTen([1, 10, 100])).toBe(false);
  });
});
