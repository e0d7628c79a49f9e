import { describe, expect, it } from "vitest";
import { AnalysisError, residualDropOrders } from "@/lib/analysis";
import { seededNormal } from "./support/series";

// Synthetic histories. The 3-orders rule of thumb and the 5-orders verification
// level are from reference sheet §10 (common practice; cfd-online thread and the
// INS2D textbook example cited there).

function geometric(iterations: number, r0: number, ordersPerIteration: number) {
  const it: number[] = [];
  const res: number[] = [];
  for (let i = 0; i <= iterations; i++) {
    it.push(i);
    res.push(r0 * 10 ** (-ordersPerIteration * i));
  }
  return { it, res };
}

describe("residualDropOrders", () => {
  it("measures the drop of a geometric history exactly", () => {
    const { it: iter, res } = geometric(600, 3.2, 0.01); // 6 orders
    const r = residualDropOrders(iter, res);
    expect(r.dropOrders).toBeCloseTo(6, 10);
    expect(r.tailDropOrders).toBeCloseTo(0.01 * 120, 9); // last 20 % = 120 iterations
    expect(r.stalled).toBe(false);
  });

  it("passes a 3-order drop under the rule of thumb and flags the plateau that follows as stalled", () => {
    const iter: number[] = [];
    const res: number[] = [];
    for (let i = 0; i <= 1000; i++) {
      iter.push(i);
      res.push(i <= 300 ? 10 ** (-i / 100) : 1e-3 * (1 + 0.3 * Math.sin(i / 3))); // 3 orders, then a limit cycle
    }
    const r = residualDropOrders(iter, res);
    expect(r.dropOrders).toBeGreaterThanOrEqual(2.8);
    expect(r.dropOrders).toBeLessThan(3.2);
    expect(Math.abs(r.tailDropOrders)).toBeLessThan(0.1);
    expect(r.stalled).toBe(true);
  });

  it("does not call a history stalled once it has reached the target drop", () => {
    const iter: number[] = [];
    const res: number[] = [];
    for (let i = 0; i <= 100; i++) {
      iter.push(10 * i);
      res.push(i <= 60 ? 10 ** (-i / 5) : 1e-12); // 12 orders, then round-off floor
    }
    expect(residualDropOrders(iter, res).stalled).toBe(false);
    expect(residualDropOrders(iter, res, { targetOrders: 13 }).stalled).toBe(true);
  });

  it("reports a negative drop for a rising (diverging) residual", () => {
    const { it: iter, res } = geometric(50, 1e-3, -0.04);
    const r = residualDropOrders(iter, res);
    expect(r.dropOrders).toBeCloseTo(-2, 10);
    expect(r.stalled).toBe(true);
  });

  it("sees through noise in the tail with the trend, not the end points", () => {
    const noise = seededNormal(11);
    const iter: number[] = [];
    const res: number[] = [];
    for (let i = 0; i <= 500; i++) {
      iter.push(i);
      res.push(10 ** (-i / 250) * 10 ** (0.05 * noise())); // 2 orders with +-0.05-order scatter
    }
    const r = residualDropOrders(iter, res);
    expect(r.tailDropOrders).toBeGreaterThan(0.3); // true tail drop is 0.4 orders
    expect(r.tailDropOrders).toBeLessThan(0.5);
    expect(r.stalled).toBe(false);
  });

  it("uses at least the last 5 samples for the tail of a short history", () => {
    const r = residualDropOrders([1, 2, 3, 4, 5, 6], [1, 0.1, 0.01, 0.01, 0.01, 0.01]);
    // tail = samples 2..6; least-squares slope over them is -0.2 orders/iteration
    expect(r.tailDropOrders).toBeCloseTo(0.8, 12);
  });

  it("rejects residuals <= 0, non-increasing iterations and mismatched lengths", () => {
    expect(() => residualDropOrders([1, 2, 3], [1, 0, 0.1])).toThrow(AnalysisError);
    expect(() => residualDropOrders([1, 1, 3], [1, 0.5, 0.1])).toThrow(AnalysisError);
    expect(() => residualDropOrders([1, 2, 3], [1, 0.5])).toThrow(/length/);
    expect(() => residualDropOrders([1], [1])).toThrow(AnalysisError);
    expect(() => residualDropOrders([1, 2], [1, Number.NaN])).toThrow(AnalysisError);
  });
});
