import { describe, expect, it } from "vitest";
import { coefficientChanged, pairRuns } from "@/lib/services/builds-view-join";

// Pairing two builds' runs for the comparison. The coefficient values are the
// standard k–ε constants of Launder & Spalding (1974): Cε2 = 1.92 (reference
// sheet §2.2), against the demo regression's 1.87; σ = 2/3 is the
// Spalart–Allmaras diffusion constant (Spalart & Allmaras 1994, from memory).

const run = (id: number, model: string, verdict: "within" | "outside", caseKey = "decaying-hit") => ({ id, case_key: caseKey, model_key: model, grid: "default", status: "COMPLETED", verdict });

describe("coefficientChanged", () => {
  it("flags a changed closure constant", () => {
    expect(coefficientChanged(1.87, 1.92)).toBe(true);
  });

  it("does not flag the same constant printed with different round-off", () => {
    expect(coefficientChanged(2 / 3, 0.666666666666667)).toBe(false);
  });
});

describe("pairRuns", () => {
  it("pairs runs by case, model and grid and gives value differences as this − other", () => {
    const [pair] = pairRuns({
      runs: [run(2, "k-epsilon", "outside")],
      otherRuns: [run(1, "k-epsilon", "within")],
      values: [
        { run_id: 1, quantity_key: "decay_exponent", value: 1 / 0.92, verdict: "within" },
        { run_id: 2, quantity_key: "decay_exponent", value: 1 / 0.87, verdict: "outside" },
      ],
      coefficients: [
        { run_id: 1, name: "C_eps2", value: 1.92 },
        { run_id: 2, name: "C_eps2", value: 1.87 },
        { run_id: 1, name: "C_mu", value: 0.09 },
        { run_id: 2, name: "C_mu", value: 0.09 },
      ],
    });
    expect(pair.verdictChanged).toBe(true);
    expect(pair.changedCoefficientCount).toBe(1);
    expect(pair.coefficients).toEqual([
      { name: "C_eps2", value: 1.87, otherValue: 1.92, changed: true },
      { name: "C_mu", value: 0.09, otherValue: 0.09, changed: false },
    ]);
    const q = pair.quantities[0];
    expect(q.difference).toBeCloseTo(1 / 0.87 - 1 / 0.92, 12);
    expect(q.differencePct).toBeCloseTo((100 * (1 / 0.87 - 1 / 0.92)) / (1 / 0.92), 10);
  });

  it("keeps a run present in only one build, without calling its coefficients changed", () => {
    const pairs = pairRuns({
      runs: [run(2, "k-epsilon", "within"), run(3, "sst", "within")],
      otherRuns: [run(1, "k-epsilon", "within")],
      values: [],
      coefficients: [{ run_id: 3, name: "beta_star", value: 0.09 }],
    });
    const sst = pairs.find((p) => p.model === "sst")!;
    expect(sst.otherRun).toBeNull();
    expect(sst.changedCoefficientCount).toBe(0);
    expect(sst.coefficients[0].changed).toBe(false);
  });
});
