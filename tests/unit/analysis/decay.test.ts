import { linearRegression } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { AnalysisError, fitDecayExponent, kEpsilonDecay, kOmegaDecay } from "@/lib/analysis";
import { linSpace, logSpace, mapSeries, seededNormal, seededUniform } from "./support/series";

// Oracles: the closed-form decay of reference sheet §2.2 (k–eps, n = 1/(C_eps2 - 1))
// and §2.3 (k–omega, n = beta*/beta), both [derived] there.

const LS74 = { k0: 1, eps0: 1 / 0.92, cEps2: 1.92 }; // Launder & Spalding 1974 C_eps2 (sheet §3.1)

describe("fitDecayExponent on exact closed-form decay", () => {
  it("recovers n = 1/(C_eps2 - 1) to 1e-6 for random k0, eps0 and C_eps2 in [1.3, 2.2], data from t = 0", () => {
    const rand = seededUniform(2024);
    for (let trial = 0; trial < 40; trial++) {
      const cEps2 = 1.3 + 0.9 * rand();
      const k0 = 10 ** (-4 + 6 * rand()); // 1e-4 .. 1e2
      const eps0 = k0 * 10 ** (-2 + 4 * rand()); // decay time k0/eps0 from 1e-2 to 1e2
      const tEnd = (k0 / eps0) * 10 ** (0.5 + 2 * rand()); // several decay times
      const t = linSpace(0, tEnd, 20 + Math.floor(80 * rand()));
      const k = mapSeries(t, (v) => kEpsilonDecay(v, { k0, eps0, cEps2 }).k);
      const fit = fitDecayExponent(t, k);
      const n = 1 / (cEps2 - 1);
      expect(Math.abs(fit.n / n - 1), `C_eps2 = ${cEps2}`).toBeLessThan(1e-6);
      // Virtual origin of the closed form: t0 = -k0/((C_eps2 - 1) eps0).
      expect(fit.t0 / (-k0 / ((cEps2 - 1) * eps0))).toBeCloseTo(1, 5);
      expect(fit.a / (k0 * ((cEps2 - 1) * eps0 / k0) ** -n)).toBeCloseTo(1, 4);
      expect(fit.r2).toBeCloseTo(1, 12);
    }
  });

  it("returns n = 1.0869565 for the sheet's worked case (C_eps2 = 1.92, t0 = -1)", () => {
    const t = linSpace(0, 99, 100);
    const fit = fitDecayExponent(t, mapSeries(t, (v) => kEpsilonDecay(v, LS74).k));
    expect(fit.n).toBeCloseTo(1.0869565217391306, 9);
    expect(fit.t0).toBeCloseTo(-1, 8);
    expect(fit.points).toBe(100);
  });

  // Sheet §2.3 table: Wilcox 1988 1.2, 1998 1.25, 2006 1.27119, SST outer set 1.08696.
  const K_OMEGA: Array<[string, number, number]> = [
    ["Wilcox 1988", 0.075, 1.2],
    ["Wilcox 1998", 0.072, 1.25],
    ["Wilcox 2006", 0.0708, 1.27119],
    ["SST outer set", 0.0828, 1.08696],
  ];
  for (const [model, beta, n] of K_OMEGA) {
    it(`recovers the k–omega decay exponent ${n} of ${model}`, () => {
      const t = linSpace(0, 40, 60);
      const k = mapSeries(t, (v) => kOmegaDecay(v, { k0: 0.02, omega0: 5, beta, betaStar: 0.09 }).k);
      const fit = fitDecayExponent(t, k);
      expect(Math.abs(fit.n / (0.09 / beta) - 1)).toBeLessThan(1e-6);
      expect(fit.n).toBeCloseTo(n, 5);
    });
  }
});

describe("fitDecayExponent versus a fit without virtual origin (sheet §2.2 caveat)", () => {
  // Sheet §2.2: fitting ln k against ln t (not ln(t + 1)) gives 1.049 over [10, 100]
  // and 0.812 over [1, 10] for the C_eps2 = 1.92 case. Reproduced here with the
  // registry's simple-statistics linearRegression on 50 log-spaced samples.
  const rows: Array<[number, number, number]> = [
    [10, 100, 1.049],
    [1, 10, 0.812],
  ];
  for (const [lo, hi, biased] of rows) {
    it(`an origin-free fit gives ${biased} on [${lo}, ${hi}] but the virtual-origin fit gives 1.0869565`, () => {
      const t = logSpace(lo, hi, 50);
      const k = mapSeries(t, (v) => kEpsilonDecay(v, LS74).k);
      const naive = -linearRegression(Array.from(t, (v, i) => [Math.log(v), Math.log(k[i])])).m;
      expect(Math.abs(naive - biased)).toBeLessThan(5e-4);
      expect(fitDecayExponent(t, k).n).toBeCloseTo(1 / 0.92, 9);
    });
  }

  it("fits only the samples inside tMin..tMax", () => {
    const t = linSpace(0, 100, 201);
    const k = mapSeries(t, (v) => (v < 20 ? 5 : kEpsilonDecay(v, LS74).k)); // junk before t = 20
    const fit = fitDecayExponent(t, k, { tMin: 20, tMax: 90 });
    expect(fit.points).toBe(141);
    expect(fit.n).toBeCloseTo(1 / 0.92, 9);
  });
});

describe("fitDecayExponent with measurement noise", () => {
  it("stays within 0.01 of 1/(C_eps2 - 1) under 1% multiplicative noise (seeded)", () => {
    // 101 samples on [0, 100]; over 200 seeds the scatter of n is about 0.0016
    // (1 sigma), so 0.01 is a ~6-sigma band that still catches a biased fit.
    const t = linSpace(0, 100, 101);
    for (const seed of [1, 2, 3, 4, 5]) {
      const noise = seededNormal(seed);
      const k = mapSeries(t, (v) => kEpsilonDecay(v, LS74).k * (1 + 0.01 * noise()));
      const fit = fitDecayExponent(t, k);
      expect(Math.abs(fit.n - 1 / 0.92)).toBeLessThan(0.01);
      expect(fit.r2).toBeGreaterThan(0.999);
    }
  });
});

describe("fitDecayExponent input checks", () => {
  const t = [0, 1, 2, 3, 4];
  const k = [1, 0.5, 0.3, 0.2, 0.15];

  it("rejects k <= 0", () => {
    expect(() => fitDecayExponent(t, [1, 0.5, 0, 0.2, 0.1])).toThrow(AnalysisError);
    expect(() => fitDecayExponent(t, [1, 0.5, -0.3, 0.2, 0.1])).toThrow(AnalysisError);
  });

  it("rejects times that do not strictly increase", () => {
    expect(() => fitDecayExponent([0, 1, 1, 3, 4], k)).toThrow(AnalysisError);
    expect(() => fitDecayExponent([0, 2, 1, 3, 4], k)).toThrow(AnalysisError);
  });

  it("rejects fewer than 4 samples in the fitted range", () => {
    expect(() => fitDecayExponent([0, 1, 2], [1, 0.5, 0.3])).toThrow(AnalysisError);
    expect(() => fitDecayExponent(t, k, { tMin: 2 })).toThrow(AnalysisError);
  });

  it("rejects NaN, Infinity, empty input and a length mismatch", () => {
    expect(() => fitDecayExponent([0, 1, Number.NaN, 3], [1, 0.5, 0.3, 0.2])).toThrow(AnalysisError);
    expect(() => fitDecayExponent([0, 1, 2, 3], [1, 0.5, Number.POSITIVE_INFINITY, 0.2])).toThrow(AnalysisError);
    expect(() => fitDecayExponent([], [])).toThrow(AnalysisError);
    expect(() => fitDecayExponent(t, [1, 0.5, 0.3])).toThrow(/length/);
  });

  it("refuses to invent an exponent for exponential decay, which has no power-law origin", () => {
    const tt = linSpace(0, 10, 30);
    expect(() => fitDecayExponent(tt, mapSeries(tt, (v) => Math.exp(-0.7 * v)))).toThrow(/power law/);
  });
});
