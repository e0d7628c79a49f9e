import { linearRegression, rSquared } from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  AnalysisError,
  colesWake,
  defaultLogLawWindow,
  diagnosticFunction,
  fitLogLaw,
  logLawUPlus,
  muskerUPlus,
  reichardtUPlus,
  spaldingUPlus,
} from "@/lib/analysis";
import { logSpace, mapSeries, seededNormal } from "./support/series";

type Law = (yPlus: number) => number;
const LAWS: Array<[string, Law]> = [
  ["Spalding 0.41/5.0", (y) => spaldingUPlus(y, 0.41, 5.0)],
  ["Spalding 0.40/5.5", (y) => spaldingUPlus(y, 0.4, 5.5)],
  ["Reichardt a=kappa=0.41", (y) => reichardtUPlus(y, { kappa: 0.41 })],
  ["Reichardt a=kappa=0.40", (y) => reichardtUPlus(y, { kappa: 0.4 })],
  ["Musker", muskerUPlus],
];

// Reference sheet §1.4 "Fitted constants" [derived]: OLS of u+ on ln y+, 200
// log-spaced points over the window, no wake. kappa printed to 4 decimals, B to 3:
// a match is within half a unit of the last digit (+ a hair for the table's rounding).
const KAPPA_TOL = 6e-5;
const B_TOL = 6e-4;
const FIT_TABLE: Array<[number, number, Array<[number, number]>]> = [
  [30, 300, [[0.3723, 3.651], [0.3577, 3.87], [0.3998, 5.353], [0.3908, 5.257], [0.3976, 4.596]]],
  [30, 1000, [[0.3858, 4.06], [0.3724, 4.349], [0.4071, 5.547], [0.3976, 5.445], [0.405, 4.795]]],
  [50, 500, [[0.3881, 4.185], [0.3748, 4.492], [0.4145, 5.8], [0.4047, 5.697], [0.4087, 4.933]]],
  [100, 1000, [[0.4001, 4.607], [0.388, 4.988], [0.4136, 5.77], [0.4036, 5.661], [0.4123, 5.052]]],
  [200, 2000, [[0.4059, 4.827], [0.3946, 5.252], [0.4118, 5.706], [0.4018, 5.594], [0.4124, 5.054]]],
  [1000, 1e4, [[0.4099, 4.997], [0.3994, 5.471], [0.4104, 5.645], [0.4004, 5.53], [0.4115, 5.018]]],
  [1e4, 1e5, [[0.4102, 5.012], [0.4001, 5.507], [0.41, 5.628], [0.4, 5.512], [0.4112, 5.002]]],
];

describe("fitLogLaw on composite wall laws (sheet §1.4 fitted-constant table)", () => {
  for (const [lo, hi, cells] of FIT_TABLE) {
    it(`returns the tabulated kappa and B of every law for the window ${lo}-${hi}`, () => {
      const y = logSpace(lo, hi, 200);
      LAWS.forEach(([name, law], j) => {
        const fit = fitLogLaw(y, mapSeries(y, law), { yPlusMin: lo, yPlusMax: hi });
        const [kappa, b] = cells[j];
        expect(fit.points, name).toBe(200);
        expect(Math.abs(fit.kappa - kappa), `${name} kappa`).toBeLessThan(KAPPA_TOL);
        expect(Math.abs(fit.b - b), `${name} B`).toBeLessThan(B_TOL);
      });
    });
  }
});

describe("fitLogLaw on a log law with a Coles wake (sheet §1.4, Pi = 0.55)", () => {
  // Pure log law (0.41, 5.0) + Coles 1956 wake, Pi = 0.55 (sheet §1.3, memory there).
  const profile = (deltaPlus: number) => (y: number) => logLawUPlus(y) + colesWake(y / deltaPlus, 0.55);
  const rows: Array<[number, number, number, number, number]> = [
    [5000, 30, 0.2 * 5000, 0.4024, 4.802],
    [5000, 3 * Math.sqrt(5000), 0.15 * 5000, 0.3943, 4.473],
    [1000, 30, 0.2 * 1000, 0.3924, 4.59],
  ];
  for (const [deltaPlus, lo, hi, kappa, b] of rows) {
    it(`gives ${kappa} / ${b} for delta+ = ${deltaPlus} over ${lo.toFixed(1)}-${hi}`, () => {
      const y = logSpace(lo, hi, 200);
      const fit = fitLogLaw(y, mapSeries(y, profile(deltaPlus)), { yPlusMin: lo, yPlusMax: hi });
      expect(Math.abs(fit.kappa - kappa)).toBeLessThan(KAPPA_TOL);
      expect(Math.abs(fit.b - b)).toBeLessThan(B_TOL);
    });
  }
});

describe("fitLogLaw arithmetic", () => {
  it("returns a pure log law exactly for any window (sheet §1.4: tests only the arithmetic)", () => {
    const y = logSpace(1, 1e5, 300);
    const u = mapSeries(y, (v) => logLawUPlus(v, 0.384, 4.17));
    for (const [lo, hi] of [[30, 300], [1e3, 1e5], [2, 7]]) {
      const fit = fitLogLaw(y, u, { yPlusMin: lo, yPlusMax: hi });
      expect(fit.kappa).toBeCloseTo(0.384, 12);
      expect(fit.b).toBeCloseTo(4.17, 11);
      expect(fit.r2).toBeCloseTo(1, 12);
    }
  });

  it("agrees with simple-statistics linearRegression and rSquared on noisy, unsorted data", () => {
    // Registry reference library: simple-statistics (OLS slope/intercept, r^2).
    const noise = seededNormal(7);
    const yPlus: number[] = [];
    const uPlus: number[] = [];
    for (let i = 0; i < 150; i++) {
      const y = 20 * 1.03 ** ((i * 37) % 150); // a permutation of a log grid
      yPlus.push(y);
      uPlus.push(logLawUPlus(y) + 0.2 * noise());
    }
    const window = { yPlusMin: 40, yPlusMax: 900 };
    const fit = fitLogLaw(yPlus, uPlus, window);
    const pairs: number[][] = [];
    for (let i = 0; i < yPlus.length; i++) {
      if (yPlus[i] >= 40 && yPlus[i] <= 900) pairs.push([Math.log(yPlus[i]), uPlus[i]]);
    }
    const ref = linearRegression(pairs);
    expect(fit.points).toBe(pairs.length);
    expect(1 / fit.kappa).toBeCloseTo(ref.m, 10);
    expect(fit.b).toBeCloseTo(ref.b, 10);
    expect(fit.r2).toBeCloseTo(rSquared(pairs, (x) => ref.b + ref.m * x), 10);
  });

  it("treats the window bounds as inclusive and ignores a wall point at y+ = 0", () => {
    const y = [0, 10, 30, 100, 300, 1000];
    const u = y.map((v) => (v === 0 ? 0 : logLawUPlus(v)));
    const fit = fitLogLaw(y, u, { yPlusMin: 30, yPlusMax: 300 });
    expect(fit.points).toBe(3);
    expect(fit.yPlusMin).toBe(30);
    expect(fit.yPlusMax).toBe(300);
  });

  it("keeps end samples that sit a few ulps outside the window (round-off of a generated grid)", () => {
    const y = [30 * (1 - 1e-15), 100, 300 * (1 + 4e-16)];
    expect(fitLogLaw(y, y.map((v) => logLawUPlus(v)), { yPlusMin: 30, yPlusMax: 300 }).points).toBe(3);
    expect(() => fitLogLaw([29.9, 100, 301], [1, 2, 3], { yPlusMin: 30, yPlusMax: 300 })).toThrow(AnalysisError);
  });

  it("gives the same answer for Float64Array and number[] input", () => {
    const y = logSpace(30, 300, 50);
    const u = mapSeries(y, (v) => spaldingUPlus(v));
    const a = fitLogLaw(y, u, { yPlusMin: 30, yPlusMax: 300 });
    const b = fitLogLaw(Array.from(y), Array.from(u), { yPlusMin: 30, yPlusMax: 300 });
    expect(b).toEqual(a);
  });

  it("rejects fewer than 3 samples in the window", () => {
    expect(() => fitLogLaw([10, 40, 50, 400], [1, 2, 3, 4], { yPlusMin: 30, yPlusMax: 300 })).toThrow(AnalysisError);
  });

  it("rejects a series whose y+ and u+ lengths differ", () => {
    expect(() => fitLogLaw([30, 40, 50], [1, 2], { yPlusMin: 30, yPlusMax: 300 })).toThrow(/length/);
  });

  it("rejects empty series, non-finite numbers and negative y+", () => {
    const w = { yPlusMin: 30, yPlusMax: 300 };
    expect(() => fitLogLaw([], [], w)).toThrow(AnalysisError);
    expect(() => fitLogLaw([30, Number.NaN, 50, 60], [1, 2, 3, 4], w)).toThrow(AnalysisError);
    expect(() => fitLogLaw([30, 40, 50, 60], [1, 2, Number.POSITIVE_INFINITY, 4], w)).toThrow(AnalysisError);
    expect(() => fitLogLaw([-30, 40, 50, 60], [1, 2, 3, 4], w)).toThrow(AnalysisError);
  });

  it("rejects an inverted or non-positive window", () => {
    const y = [30, 40, 50];
    expect(() => fitLogLaw(y, [1, 2, 3], { yPlusMin: 300, yPlusMax: 30 })).toThrow(AnalysisError);
    expect(() => fitLogLaw(y, [1, 2, 3], { yPlusMin: 0, yPlusMax: 30 })).toThrow(AnalysisError);
  });

  it("reports the subject of the bad input on the error", () => {
    try {
      fitLogLaw([1, 2], [1, 2, 3], { yPlusMin: 30, yPlusMax: 300 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AnalysisError);
      expect((e as AnalysisError).subject).toBe("uPlus");
    }
  });
});

describe("defaultLogLawWindow", () => {
  it("uses 30 to 0.15 Re_tau when Re_tau is known and large enough", () => {
    // Outer limit 0.15 Re_tau: Marusic et al. 2013 (sheet §1.1, memory there).
    expect(defaultLogLawWindow(5186)).toEqual({ yPlusMin: 30, yPlusMax: 0.15 * 5186 });
    expect(defaultLogLawWindow(301).yPlusMax).toBeCloseTo(45.15, 12);
  });

  it("falls back to 30-300 when Re_tau is unknown or too low for a log layer", () => {
    // 30 < y+ < 300 is the conventional RANS window (sheet §1.1, common practice).
    expect(defaultLogLawWindow(null)).toEqual({ yPlusMin: 30, yPlusMax: 300 });
    expect(defaultLogLawWindow(180)).toEqual({ yPlusMin: 30, yPlusMax: 300 });
    expect(defaultLogLawWindow(300)).toEqual({ yPlusMin: 30, yPlusMax: 300 });
  });

  it("rejects a non-positive Re_tau", () => {
    expect(() => defaultLogLawWindow(0)).toThrow(AnalysisError);
  });
});

describe("diagnosticFunction", () => {
  it("gives Spalding's Xi = y+ du+/dy+ at y+ = 30 ... 1e4 as in sheet §1.4", () => {
    // Sheet §1.4 [derived]: 3.2111, 2.6366, 2.4930, 2.4488, 2.4377 (target 1/kappa = 2.4390).
    const targets: Array<[number, number]> = [[30, 3.2111], [100, 2.6366], [300, 2.493], [1000, 2.4488], [1e4, 2.4377]];
    // A log grid (400 per decade) with the targets inserted: non-uniform around them.
    const grid = Array.from(logSpace(1, 1e5, 2001)).filter((v) =>
      targets.every(([t]) => Math.abs(v / t - 1) > 1e-6),
    );
    const y = Float64Array.from([...grid, ...targets.map(([v]) => v)]).sort();
    const d = diagnosticFunction(y, mapSeries(y, (v) => spaldingUPlus(v)));
    for (const [yPlus, xi] of targets) {
      const i = d.yPlus.indexOf(yPlus);
      expect(i).toBeGreaterThanOrEqual(0);
      expect(Math.abs(d.xi[i] - xi)).toBeLessThan(5.1e-5);
    }
  });

  it("is exact for u+ quadratic in ln y+ on a non-uniform grid, ends included", () => {
    // Three-point formulas are exact for quadratics (common practice, any numerical-methods text).
    const y = [1.3, 2, 5, 5.5, 40, 41, 700];
    const u = y.map((v) => 2 + 3 * Math.log(v) - 0.25 * Math.log(v) ** 2);
    const d = diagnosticFunction(y, u);
    for (let i = 0; i < y.length; i++) expect(d.xi[i]).toBeCloseTo(3 - 0.5 * Math.log(d.yPlus[i]), 10);
  });

  it("returns 1/kappa everywhere for a pure log law and sorts unsorted input", () => {
    const y = [300, 30, 1000, 100, 3000];
    const d = diagnosticFunction(y, y.map((v) => logLawUPlus(v)));
    expect(Array.from(d.yPlus)).toEqual([30, 100, 300, 1000, 3000]);
    for (const xi of d.xi) expect(xi).toBeCloseTo(1 / 0.41, 11);
  });

  it("rejects repeated or non-positive y+ and fewer than 3 samples", () => {
    expect(() => diagnosticFunction([10, 10, 20], [1, 2, 3])).toThrow(AnalysisError);
    expect(() => diagnosticFunction([0, 10, 20], [0, 2, 3])).toThrow(AnalysisError);
    expect(() => diagnosticFunction([10, 20], [1, 2])).toThrow(AnalysisError);
  });
});
