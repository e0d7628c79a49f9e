import { describe, expect, it } from "vitest";
import {
  AnalysisError,
  kEpsilonDecay,
  kEpsilonDecayExponent,
  kOmegaDecay,
  kOmegaDecayExponent,
} from "@/lib/analysis";

// Closed-form decay of homogeneous isotropic turbulence, reference sheet §2.2
// (standard k–eps) and §2.3 (k–omega). The sheet's worked numbers are [derived]
// and checked there by ODE integration to 1e-12.

const KE = { k0: 1, eps0: 1 / 0.92, cEps2: 1.92 };

describe("kEpsilonDecay", () => {
  it("reproduces the worked k and eps of sheet §2.2 at t = 1, 9, 99", () => {
    // Sheet §2.2 worked numbers (k0 = 1, eps0 = 1/0.92, C_eps2 = 1.92), printed to
    // 6 significant digits (eps at t = 99 to 5).
    const rows: Array<[number, number, number, number]> = [
      [1, 0.470753, 0.255844, 1e-6],
      [9, 0.0818547, 0.00889725, 1e-6],
      [99, 0.00670019, 7.2828e-5, 1e-5],
    ];
    for (const [t, k, eps, rel] of rows) {
      const r = kEpsilonDecay(t, KE);
      expect(Math.abs(r.k / k - 1)).toBeLessThan(rel);
      expect(Math.abs(r.eps / eps - 1)).toBeLessThan(rel);
    }
  });

  it("matches the TrioCFD form K(t) = K(0)(t+1)^(-1/(C_eps2-1)) when eps0/k0 = 1/(C_eps2-1)", () => {
    // Sheet §2.2, TrioCFD "k-eps free decay" validation case.
    for (const t of [0, 0.5, 3, 40, 1e3]) {
      expect(kEpsilonDecay(t, KE).k).toBeCloseTo((t + 1) ** (-1 / 0.92), 14);
    }
  });

  it("satisfies dk/dt = -eps and deps/dt = -C_eps2 eps^2/k (model equations, sheet §2.2)", () => {
    const p = { k0: 2.5, eps0: 0.7, cEps2: 1.83 };
    for (const t of [0.3, 2, 17]) {
      const h = 1e-5 * Math.max(1, t);
      const a = kEpsilonDecay(t - h, p);
      const b = kEpsilonDecay(t + h, p);
      const m = kEpsilonDecay(t, p);
      expect((b.k - a.k) / (2 * h) / -m.eps).toBeCloseTo(1, 8);
      expect((b.eps - a.eps) / (2 * h) / ((-p.cEps2 * m.eps * m.eps) / m.k)).toBeCloseTo(1, 8);
    }
  });

  it("decays exponentially in the C_eps2 = 1 limit", () => {
    // Limit of [1 + c eps0 t/k0]^(-1/c) as c -> 0 (derived from sheet §2.2).
    const r = kEpsilonDecay(2, { k0: 1, eps0: 0.5, cEps2: 1 });
    expect(r.k).toBeCloseTo(Math.exp(-1), 14);
  });

  it("rejects a negative time and a non-positive k0", () => {
    expect(() => kEpsilonDecay(-1, KE)).toThrow(AnalysisError);
    expect(() => kEpsilonDecay(1, { ...KE, k0: 0 })).toThrow(AnalysisError);
    expect(() => kEpsilonDecay(Number.NaN, KE)).toThrow(AnalysisError);
  });
});

describe("kEpsilonDecayExponent", () => {
  it("gives n = 1/(C_eps2 - 1) = 1.0869565 for the Launder & Spalding 1974 constants", () => {
    // Sheet §2.2 and §3.1 (C_eps2 = 1.92); TrioCFD plots 1.0869565217391306.
    expect(kEpsilonDecayExponent(1.92)).toBeCloseTo(1.0869565217391306, 14);
  });

  it("gives the C_eps2 implied by measured exponents (sheet §2.2)", () => {
    // Implied C_eps2 = 1 + 1/n: n = 1.2 -> 1.8333, 1.25 -> 1.80, 1.3 -> 1.7692, 10/7 -> 1.70.
    expect(kEpsilonDecayExponent(1 + 1 / 1.2)).toBeCloseTo(1.2, 12);
    expect(kEpsilonDecayExponent(1.8)).toBeCloseTo(1.25, 12);
    expect(kEpsilonDecayExponent(1.7)).toBeCloseTo(10 / 7, 12);
  });

  it("rejects C_eps2 <= 1, which has no power-law decay", () => {
    expect(() => kEpsilonDecayExponent(1)).toThrow(AnalysisError);
    expect(() => kEpsilonDecayExponent(0.9)).toThrow(AnalysisError);
  });
});

describe("kOmegaDecay", () => {
  // Sheet §2.3 table: n = beta*/beta for each model with no strain.
  const MODELS: Array<[string, number, number, number]> = [
    ["Wilcox 1988", 0.075, 0.09, 1.2],
    ["Wilcox 1998", 0.072, 0.09, 1.25],
    ["Wilcox 2006", 0.0708, 0.09, 1.27119],
    ["SST outer set (F1 = 0)", 0.0828, 0.09, 1.08696],
  ];

  for (const [name, beta, betaStar, n] of MODELS) {
    it(`decays as (1 + beta omega0 t)^-n with n = ${n} for ${name}`, () => {
      expect(kOmegaDecayExponent(beta, betaStar)).toBeCloseTo(n, 5);
      const p = { k0: 0.3, omega0: 12, beta, betaStar };
      for (const t of [0.1, 1, 25]) {
        const r = kOmegaDecay(t, p);
        const base = 1 + beta * p.omega0 * t;
        expect(Math.log(r.k / p.k0) / Math.log(base)).toBeCloseTo(-betaStar / beta, 12);
        expect(r.omega).toBeCloseTo(p.omega0 / base, 12);
      }
    });
  }

  it("satisfies dk/dt = -beta* k omega and domega/dt = -beta omega^2 (sheet §2.3)", () => {
    const p = { k0: 1.5, omega0: 4, beta: 0.075, betaStar: 0.09 };
    const t = 3;
    const h = 1e-5;
    const a = kOmegaDecay(t - h, p);
    const b = kOmegaDecay(t + h, p);
    const m = kOmegaDecay(t, p);
    expect((b.k - a.k) / (2 * h) / (-p.betaStar * m.k * m.omega)).toBeCloseTo(1, 8);
    expect((b.omega - a.omega) / (2 * h) / (-p.beta * m.omega * m.omega)).toBeCloseTo(1, 8);
  });

  it("rejects a negative omega0", () => {
    expect(() => kOmegaDecay(1, { k0: 1, omega0: -1, beta: 0.075, betaStar: 0.09 })).toThrow(AnalysisError);
  });
});
