import { describe, expect, it } from "vitest";
import { cellEdges, dayTicks, missingPoints, niceTicks, orderTicks, tickLabel, toBandRegions, toPlotSeries, xPositions, yRange } from "@/components/trends/trend-data";
import type { TrendChartData, TrendPointData } from "@/graphql/operations/trends";

// Shaping of the trend chart: band regions must follow the band version each
// build was judged against, and the axis must hold every build of every model.

const build = (i: number) => ({ id: String(100 + i), version: `4.3.0-dev.${i}`, commit: `c${i}`.padEnd(40, "0"), receivedAt: new Date(Date.UTC(2026, 10, 1 + 2 * i)).toISOString(), gate: "pending" as const });

function point(i: number, over: Partial<TrendPointData> = {}): TrendPointData {
  return {
    buildId: String(100 + i), runId: String(500 + i), value: 1.087, verdict: "within", drift: false, driftReason: null, driftPValue: null, driftSlope: null,
    baselineValue: null, baselineDelta: null, bandId: "7", bandVersion: 1, bandKind: "verification", bandModel: "k-epsilon",
    reference: 1.087, lower: 1.076, upper: 1.098, marginalMargin: 0.002, noiseFloor: 0.001, ...over,
  };
}

function chart(series: TrendChartData["series"], builds = [0, 1, 2, 3, 4].map(build)): TrendChartData {
  return { case: "decaying-hit", quantity: "decay_exponent", branch: "main", grid: "default", last: 50, definition: null, builds, baseline: null, series };
}

describe("cellEdges", () => {
  it("puts edges midway between builds and half a gap beyond both ends", () => {
    expect(cellEdges([0, 1, 2])).toEqual([-0.5, 0.5, 1.5, 2.5]);
    expect(cellEdges([0, 10, 30])).toEqual([-5, 5, 20, 40]);
  });

  it("gives a single build a cell one unit wide", () => {
    expect(cellEdges([4])).toEqual([3.5, 4.5]);
    expect(cellEdges([])).toEqual([]);
  });
});

describe("toPlotSeries", () => {
  it("places each model's points on the shared build axis by build id", () => {
    const c = chart([
      { model: "k-epsilon", points: [point(0), point(2), point(4)] },
      { model: "k-omega", points: [point(1), point(3)] },
    ]);
    const series = toPlotSeries(c, xPositions(c.builds, "order"));
    expect(series.map((s) => s.data.map((d) => d.x))).toEqual([[0, 2, 4], [1, 3]]);
    expect(series[1].data[0].build.version).toBe("4.3.0-dev.1");
  });

  it("uses received time in milliseconds on the time axis", () => {
    const c = chart([{ model: "k-epsilon", points: [point(0)] }]);
    expect(xPositions(c.builds, "time")[1] - xPositions(c.builds, "time")[0]).toBe(2 * 86_400_000);
  });
});

describe("toBandRegions", () => {
  it("starts a new region where the band version changes", () => {
    const c = chart([{ model: "k-epsilon", points: [point(0), point(1), point(2, { bandId: "9", bandVersion: 2, upper: 1.1 }), point(3, { bandId: "9", bandVersion: 2, upper: 1.1 })] }]);
    const xs = xPositions(c.builds, "order");
    const regions = toBandRegions(toPlotSeries(c, xs), cellEdges(xs));
    expect(regions.map((r) => [r.version, r.x0, r.x1, r.upper])).toEqual([
      [1, -0.5, 1.5, 1.098],
      [2, 1.5, 3.5, 1.1],
    ]);
  });

  it("draws a band shared by every model once", () => {
    const shared: Partial<TrendPointData> = { bandId: "3", bandModel: null, bandKind: "validation" };
    const c = chart([
      { model: "sa", points: [0, 1, 2].map((i) => point(i, shared)) },
      { model: "sst", points: [0, 1, 2].map((i) => point(i, shared)) },
    ]);
    const xs = xPositions(c.builds, "order");
    const regions = toBandRegions(toPlotSeries(c, xs), cellEdges(xs));
    expect(regions).toHaveLength(1);
    expect(regions[0].model).toBeNull();
  });

  it("leaves unbanded values without a region", () => {
    const c = chart([{ model: "k-epsilon", points: [point(0, { bandId: null, lower: null, upper: null, reference: null })] }]);
    const xs = xPositions(c.builds, "order");
    expect(toBandRegions(toPlotSeries(c, xs), cellEdges(xs))).toEqual([]);
  });
});

describe("yRange", () => {
  it("covers the values and both limits with 8 % padding", () => {
    const c = chart([{ model: "k-epsilon", points: [point(0, { value: 1.149 }), point(1)] }]);
    const xs = xPositions(c.builds, "order");
    const series = toPlotSeries(c, xs);
    const [lo, hi] = yRange(series, toBandRegions(series, cellEdges(xs)))!;
    const span = 1.149 - 1.076;
    expect(lo).toBeCloseTo(1.076 - 0.08 * span, 12);
    expect(hi).toBeCloseTo(1.149 + 0.08 * span, 12);
  });

  it("opens a constant series by 5 % of its magnitude, ±1 at zero, and returns null without values", () => {
    const constant = (value: number) => {
      const c = chart([{ model: "sa", points: [point(0, { value, bandId: null, lower: null, upper: null, reference: null })] }]);
      return yRange(toPlotSeries(c, xPositions(c.builds, "order")), [])!;
    };
    const [lo, hi] = constant(0.0027);
    expect(hi - lo).toBeCloseTo(2 * 0.05 * 0.0027, 15);
    expect(constant(0)).toEqual([-1, 1]);
    expect(yRange([{ data: [] }], [])).toBeNull();
  });

  it("keeps a count of zero violations half a unit above the bottom, with room for one", () => {
    const c = chart([{ model: "sst", points: [point(0, { value: 0, lower: null, upper: 0, reference: 0 })] }]);
    const xs = xPositions(c.builds, "order");
    const series = toPlotSeries(c, xs);
    expect(yRange(series, toBandRegions(series, cellEdges(xs)), { integer: true })).toEqual([-0.5, 1.5]);
  });
});

describe("ticks and missing values", () => {
  it("labels the newest build and every k-th before it", () => {
    expect(orderTicks([0, 1, 2, 3, 4, 5, 6], 3)).toEqual([0, 3, 6]);
  });

  it("puts day ticks on UTC midnights a whole number of days apart", () => {
    const start = Date.UTC(2026, 9, 7, 13);
    const ticks = dayTicks(start, start + 40 * 86_400_000, 10);
    expect(ticks.every((t) => t % 86_400_000 === 0)).toBe(true);
    expect(ticks.length).toBeLessThanOrEqual(10);
    expect(new Set(ticks.slice(1).map((t, i) => t - ticks[i])).size).toBe(1);
  });

  it("collects the builds where a model ran but has no value", () => {
    const c = chart([{ model: "k-epsilon", points: [point(0), point(1, { value: null, verdict: "missing" })] }]);
    expect(missingPoints(toPlotSeries(c, xPositions(c.builds, "order"))).map((m) => m.index)).toEqual([1]);
  });
});

describe("niceTicks and tickLabel", () => {
  it("steps c_f ticks by 2×10⁻⁵ and labels them with the same decimals", () => {
    const { ticks, step } = niceTicks(0.002625, 0.002758, 7);
    expect(step).toBeCloseTo(2e-5, 18);
    expect(ticks.map((t) => tickLabel(t, step))).toEqual(["0.00264", "0.00266", "0.00268", "0.00270", "0.00272", "0.00274"]);
  });

  it("gives whole-number ticks for counts and writes tiny values in exponent form", () => {
    expect(niceTicks(-0.5, 1.5, 7, { integer: true }).ticks).toEqual([0, 1]);
    expect(tickLabel(-2.5e-6, 5e-7)).toBe("−2.5×10⁻⁶");
    expect(tickLabel(0, 0.1)).toBe("0");
  });
});
