import { describe, expect, it } from "vitest";
import { AnalysisError, analyseGridStudy } from "@/lib/analysis";

/** |got - want| within half a unit of the last printed decimal of `want` (given as text). */
function expectPrinted(got: number | null, printed: string, label: string): void {
  const decimals = printed.includes(".") ? printed.split(".")[1].replace(/e.*$/i, "").length : 0;
  const exponent = /e(-?\d+)$/i.test(printed) ? Number(printed.split(/e/i)[1]) : 0;
  const tol = 0.5 * 10 ** (exponent - decimals) * 1.0001;
  expect(got, label).not.toBeNull();
  expect(Math.abs((got as number) - Number(printed)), `${label}: ${got} vs ${printed}`).toBeLessThanOrEqual(tol);
}

// Celik, Ghia, Roache, Freitas, Coleman & Raad 2008, J. Fluids Eng. 130, 078001,
// Table 1 — inputs and outputs as given in reference sheet §8.2 (column-1 outputs
// confirmed there by pyGCS tests; the parenthesised digits are the sheet's
// [derived] recomputation, which we check to the printed digits).
describe("analyseGridStudy on Celik et al. 2008 Table 1 (sheet §8.2)", () => {
  const columns = [
    { name: "column 1, reattachment length, monotonic", cells: [18000, 8000, 4500], values: [6.063, 5.972, 5.863],
      r21: "1.5", r32: "1.333", p: "1.53397", ext: "6.1685", ea: "1.50091", eext: "1.71023", gci: "2.17499", gci32: "4.11285", ratio: "1.0152", conv: "monotonic" },
    { name: "column 2, axial velocity, monotonic", cells: [18000, 4500, 980], values: [10.788, 10.725, 10.605],
      r21: "2.0", r32: "2.143", p: "0.75190", ext: "10.8801", ea: "0.58398", eext: "0.84654", gci: "1.06720", gci32: "1.80774", ratio: "1.0059", conv: "monotonic" },
    { name: "column 3, axial velocity, oscillatory", cells: [18000, 4500, 980], values: [6.0042, 5.9624, 6.0909],
      r21: "2.0", r32: "2.143", p: "1.50769", ext: "6.0269", ea: "0.69618", eext: "0.37621", gci: "0.47204", gci32: "1.24995", ratio: "0.9312", conv: "oscillatory" },
  ] as const;

  for (const c of columns) {
    it(`reproduces ${c.name}`, () => {
      const r = analyseGridStudy({ cells: [...c.cells], values: [...c.values], dimension: 2 });
      expectPrinted(r.r21, c.r21, "r21");
      expectPrinted(r.r32, c.r32, "r32");
      expectPrinted(r.p, c.p, "p");
      expectPrinted(r.extrapolated, c.ext, "phi_ext");
      expectPrinted(r.eaPct, c.ea, "e_a");
      expectPrinted(r.eextPct, c.eext, "e_ext");
      expectPrinted(r.gciFinePct, c.gci, "GCI_fine");
      expectPrinted(r.gci32Pct, c.gci32, "GCI_32");
      expectPrinted(r.asymptoticRatio, c.ratio, "asymptotic ratio");
      expect(r.convergence).toBe(c.conv);
    });
  }

  it("passes the pyGCS bounds for column 1 (tomrobin-teschner/pyGCS tests/test_GCI.py, via the sheet)", () => {
    const r = analyseGridStudy({ cells: [18000, 8000, 4500], values: [6.063, 5.972, 5.863], dimension: 2 });
    expect(r.p).toBeGreaterThan(1.53);
    expect(r.p).toBeLessThan(1.54);
    expect(r.extrapolated).toBeGreaterThan(6.168);
    expect(r.extrapolated).toBeLessThan(6.169);
    expect(r.gciFinePct! / 100).toBeGreaterThan(0.0217);
    expect(r.gciFinePct! / 100).toBeLessThan(0.0218);
    expect(r.gci32Pct! / 100).toBeGreaterThan(0.0411);
    expect(r.gci32Pct! / 100).toBeLessThan(0.0412);
    expect(r.asymptoticRatio).toBeGreaterThan(1.015);
    expect(r.asymptoticRatio).toBeLessThan(1.016);
  });
});

// NASA TMR verification cases (sheet §7.2 flat plate, §7.3 bump), 2-D, h = sqrt(1/N).
// Published p / e_a / e_ext / GCI and the sheet's [derived] recomputation (brackets).
describe("analyseGridStudy on NASA TMR grid studies (sheet §7.2, §7.3)", () => {
  const plate = [208896, 52224, 13056] as [number, number, number];
  const rows = [
    { name: "flat plate SA CFL3D c_f(0.97)", cells: plate, values: [0.270562153e-2, 0.270673749e-2, 0.271115173e-2],
      pub: ["1.98", "0.041", "0.014", "0.017"], ours: ["1.9839", "0.0412", "0.0140", "0.0174"], ext: "2.70524395e-3" },
    { name: "flat plate SA FUN3D c_f(0.97)", cells: plate, values: [0.270540472596778e-2, 0.270448474835251e-2, 0.270215403362043e-2],
      pub: ["1.34", "0.034", "0.022", "0.028"], ours: ["1.3411", "0.0340", "0.0222", "0.0277"], ext: "2.70600467e-3" },
    { name: "flat plate SST CFL3D c_f(0.97)", cells: plate, values: [0.269085355e-2, 0.268299226e-2, 0.266477116e-2],
      pub: ["1.21", "0.292", "0.221", "0.277"], ours: ["1.2128", "0.2921", "0.2212", "0.2771"], ext: "2.69681890e-3" },
  ];
  for (const row of rows) {
    it(`reproduces ${row.name}: published p, e_a, e_ext, GCI and the extrapolated value`, () => {
      const r = analyseGridStudy({ cells: row.cells, values: row.values as [number, number, number], dimension: 2 });
      const got = [r.p, r.eaPct, r.eextPct, r.gciFinePct];
      const labels = ["p", "e_a %", "e_ext %", "GCI %"];
      got.forEach((g, i) => expectPrinted(g, row.pub[i], `published ${labels[i]}`));
      got.forEach((g, i) => expectPrinted(g, row.ours[i], `recomputed ${labels[i]}`));
      expectPrinted(r.extrapolated, row.ext, "extrapolated c_f");
      expect(r.r21).toBeCloseTo(2, 14);
      expect(r.convergence).toBe("monotonic");
    });
  }

  it("shows SA CFL3D approaching from above and FUN3D from below (TMR remark, sheet §7.2)", () => {
    const cfl3d = analyseGridStudy({ cells: plate, values: [0.270562153e-2, 0.270673749e-2, 0.271115173e-2], dimension: 2 });
    const fun3d = analyseGridStudy({ cells: plate, values: [0.270540472596778e-2, 0.270448474835251e-2, 0.270215403362043e-2], dimension: 2 });
    expect(cfl3d.eps21).toBeGreaterThan(0);
    expect(fun3d.eps21).toBeLessThan(0);
  });

  const bump = [901120, 225280, 56320] as [number, number, number];
  // Sheet §7.3 table; the x = 0.632 rows are excluded (their published GCI does
  // not follow from the other columns — the sheet flags them).
  const bumpRows = [
    { name: "x = 0.75, CFL3D", values: [0.614936603e-2, 0.614223862e-2, 0.612309808e-2], pub: ["1.43", "0.116", "0.069", "0.086"], ours: ["1.425", "0.1159", "0.0687", "0.0860"] },
    { name: "x = 0.75, FUN3D", values: [0.61513628593166e-2, 0.613979314311939e-2, 0.610550165521303e-2], pub: ["1.57", "0.188", "0.096", "0.120"], ours: ["1.567", "0.1881", "0.0957", "0.1197"] },
    { name: "x = 0.868, CFL3D", values: [0.267774123e-2, 0.267873053e-2, 0.268404209e-2], pub: ["2.42", "0.037", "0.008", "0.011"], ours: ["2.425", "0.0369", "0.0085", "0.0106"] },
    { name: "x = 0.868, FUN3D", values: [0.268084145548046e-2, 0.268519712062217e-2, 0.269947427519225e-2], pub: ["1.71", "0.162", "0.071", "0.089"], ours: ["1.713", "0.1625", "0.0714", "0.0892"] },
    { name: "C_L, CFL3D", values: [0.2490011e-1, 0.2483824e-1, 0.247157e-1], pub: ["0.99", "0.248", "0.253", "0.317"], ours: ["0.986", "0.2485", "0.2527", "0.3167"] },
    { name: "C_D, CFL3D", values: [0.3572382e-2, 0.3576407e-2, 0.3597215e-2], pub: ["2.37", "0.113", "0.027", "0.034"], ours: ["2.370", "0.1127", "0.0270", "0.0338"] },
  ];
  for (const row of bumpRows) {
    it(`reproduces the bump-in-channel study ${row.name}`, () => {
      const r = analyseGridStudy({ cells: bump, values: row.values as [number, number, number], dimension: 2 });
      const got = [r.p, r.eaPct, r.eextPct, r.gciFinePct];
      got.forEach((g, i) => expectPrinted(g, row.pub[i], `published #${i}`));
      got.forEach((g, i) => expectPrinted(g, row.ours[i], `recomputed #${i}`));
    });
  }
});

describe("analyseGridStudy classification and edge cases", () => {
  it("returns the exact order in one iteration for equal ratios and a known power law", () => {
    // phi(h) = 1 + 0.3 h^2 sampled at h = 1, 2, 4 (1-D): p = 2, phi_ext = 1 exactly.
    const r = analyseGridStudy({ cells: [1, 0.5, 0.25], values: [1.3, 2.2, 5.8], dimension: 1 });
    expect(r.p).toBeCloseTo(2, 13);
    expect(r.extrapolated).toBeCloseTo(1, 13);
    expect(r.iterations).toBe(1);
  });

  it("recovers the order of a power law on unequal refinement ratios in 3-D", () => {
    // phi = 2 - 0.5 h^1.7 with h = N^(-1/3); the fixed-point iteration must find 1.7.
    const cells: [number, number, number] = [3.2e6, 9e5, 1.5e5];
    const values = cells.map((n) => 2 - 0.5 * (n ** (-1 / 3)) ** 1.7) as [number, number, number];
    const r = analyseGridStudy({ cells, values, dimension: 3 });
    expect(r.p).toBeCloseTo(1.7, 10);
    expect(r.extrapolated).toBeCloseTo(2, 12);
    expect(r.convergence).toBe("monotonic");
  });

  it("calls a study divergent when the change grows under refinement and gives no order or GCI", () => {
    const r = analyseGridStudy({ cells: [4000, 1000, 250], values: [1.0, 1.1, 1.15], dimension: 2 });
    expect(r.convergence).toBe("divergent");
    expect(r.p).toBeNull();
    expect(r.gciFinePct).toBeNull();
    expect(r.extrapolated).toBeNull();
    expect(r.eaPct).toBeCloseTo(10, 12);
  });

  it("calls a study divergent when the two coarse values are equal but the fine pair differ", () => {
    const r = analyseGridStudy({ cells: [4000, 1000, 250], values: [1.0, 1.1, 1.1], dimension: 2 });
    expect(r.convergence).toBe("divergent");
    expect(r.p).toBeNull();
  });

  it("reports identical values as converged with zero error, not NaN", () => {
    const r = analyseGridStudy({ cells: [4000, 1000, 250], values: [0.0027, 0.0027, 0.0027], dimension: 2 });
    expect(r.convergence).toBe("converged");
    expect(r.extrapolated).toBe(0.0027);
    expect(r.eaPct).toBe(0);
    expect(r.gciFinePct).toBe(0);
    expect(r.p).toBeNull();
  });

  it("reports a fine pair that agree exactly as converged even when the coarse grid differs", () => {
    const r = analyseGridStudy({ cells: [4000, 1000, 250], values: [2, 2, 2.5], dimension: 2 });
    expect(r.convergence).toBe("converged");
    expect(r.gciFinePct).toBe(0);
    expect(Object.values(r).some((v) => typeof v === "number" && Number.isNaN(v))).toBe(false);
  });

  it("leaves relative errors null rather than infinite when the fine value is zero", () => {
    const r = analyseGridStudy({ cells: [4000, 1000, 250], values: [0, 0.01, 0.05], dimension: 2 });
    expect(r.eaPct).toBeNull();
    expect(r.gciFinePct).toBeNull();
    expect(r.p).toBeCloseTo(Math.log(4) / Math.log(2), 12);
  });

  it("rejects cells that do not decrease from fine to coarse, bad counts and non-finite values", () => {
    expect(() => analyseGridStudy({ cells: [1000, 1000, 250], values: [1, 2, 3], dimension: 2 })).toThrow(AnalysisError);
    expect(() => analyseGridStudy({ cells: [250, 1000, 4000], values: [1, 2, 3], dimension: 2 })).toThrow(AnalysisError);
    expect(() => analyseGridStudy({ cells: [1000, 0, -1], values: [1, 2, 3], dimension: 2 })).toThrow(AnalysisError);
    expect(() => analyseGridStudy({ cells: [4000, 1000, 250], values: [1, Number.NaN, 3], dimension: 2 })).toThrow(AnalysisError);
    expect(() => analyseGridStudy({ cells: [4000, 1000, 250], values: [1, 2, 3], dimension: 4 as 3 })).toThrow(AnalysisError);
  });
});
