import { linearRegression } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { buildResidualPlot, tailStartIndex, tailTrend } from "@/components/run/residual-curves";
import { residualDropOrders } from "@/lib/analysis";
import { noteText, quantity } from "./quantity-fixture";

// The shaded tail and its trend must be the ones lib/analysis judged; the
// trend is also checked against simple-statistics' least squares.

const iterations = Array.from({ length: 100 }, (_, i) => 1 + i * 50);
const residuals = iterations.map((it, i) => 10 ** (-it / 1000) * (1 + 0.3 * Math.sin(i)));

describe("residual tail", () => {
  it("spans the same samples as the stall rule and its trend gives the same tail drop", () => {
    const summary = residualDropOrders(iterations, residuals, { targetOrders: 3 });
    const from = tailStartIndex(iterations);
    const trend = tailTrend(iterations, residuals, from);
    const dropFromTrend = Math.log10(trend[0].y / trend[1].y);
    expect(dropFromTrend).toBeCloseTo(summary.tailDropOrders, 10);
  });

  it("is the least-squares line of log10(residual) on iteration (simple-statistics as reference)", () => {
    const from = tailStartIndex(iterations);
    const pts = iterations.slice(from).map((x, i) => [x, Math.log10(residuals[from + i])]);
    const { m, b } = linearRegression(pts);
    const trend = tailTrend(iterations, residuals, from);
    expect(Math.log10(trend[0].y)).toBeCloseTo(m * trend[0].x + b, 10);
    expect(Math.log10(trend[1].y)).toBeCloseTo(m * trend[1].x + b, 10);
  });

  it("widens a short tail to the last five samples", () => {
    expect(tailStartIndex([1, 2, 3, 4, 5, 6, 100])).toBe(2);
  });
});

describe("buildResidualPlot", () => {
  it("draws the target level the set number of orders below the first residual", () => {
    const plot = buildResidualPlot([1, 2, 3], [2, 1e-2, 1e-4], quantity("residual_drop_orders", { value: 4.3 }), 3);
    expect(plot.target?.level).toBeCloseTo(2e-3, 15);
  });

  it("writes a diverged run's rise and stall on the plot", () => {
    const plot = buildResidualPlot([1, 2, 3, 4, 5, 6], [1, 0.1, 1, 10, 100, 1e4], quantity("residual_drop_orders", { value: -4, verdict: "outside", details: { stalled: true, tailDropOrders: -2.3 } }), 3);
    const text = noteText(plot.notes);
    expect(text).toMatch(/residual ROSE by 4 orders/);
    expect(text).toMatch(/rises 2.3 orders/);
    expect(text).toMatch(/STALLED: the residual rises/);
  });
});
