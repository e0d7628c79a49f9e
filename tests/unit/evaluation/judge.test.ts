import { describe, expect, it } from "vitest";
import { judgeRun } from "@/lib/evaluation/judge";
import type { BandInForce, DerivedQuantity } from "@/lib/evaluation/types";

// The judging step on its own (pure): bands, expected quantities, run status,
// baseline change and drift. Band numbers are the k–ε decay verification band:
// n = 1/(Cε2 − 1) = 1.0870 ± 1 % (reference sheet §2.2; Launder & Spalding 1974).

const band = (over: Partial<BandInForce> = {}): BandInForce => ({
  id: 1,
  caseKey: "decaying-hit",
  quantityKey: "decay_exponent",
  modelKey: "k-epsilon",
  version: 1,
  kind: "verification",
  reference: 1 / 0.92,
  source: "Launder & Spalding 1974",
  lower: 1.0761,
  upper: 1.0978,
  marginalMargin: 0.002,
  noiseFloor: 0.001,
  fitSettings: {},
  ...over,
});

const derived = (key: string, value: number | null): DerivedQuantity => ({ key, value, origin: "derived", details: {} });

const base = {
  status: "COMPLETED" as const,
  bandFor: (k: string) => (k === "decay_exponent" ? band() : null),
  expectedKeys: ["decay_exponent"],
  baseline: null,
  history: () => [],
};

describe("judgeRun", () => {
  it("judges n = 1/0.92 within and a changed Cε2 = 1.87 (n = 1.149) outside", () => {
    expect(judgeRun({ ...base, quantities: [derived("decay_exponent", 1 / 0.92)] }).verdict).toBe("within");
    const out = judgeRun({ ...base, quantities: [derived("decay_exponent", 1 / 0.87)] });
    expect(out.verdict).toBe("outside");
    expect(out.quantities[0].verdict).toBe("outside");
  });

  it("adds a missing row for a banded quantity the run did not deliver", () => {
    const r = judgeRun({ ...base, quantities: [derived("log_b", 5.1)] });
    const missing = r.quantities.find((q) => q.key === "decay_exponent");
    expect(missing).toMatchObject({ value: null, origin: "expected", verdict: "missing" });
    expect(r.quantities.find((q) => q.key === "log_b")?.verdict).toBe("unbanded");
    expect(r.verdict).toBe("missing");
  });

  it("judges a run that did not complete outside whatever its quantities say", () => {
    for (const status of ["DIVERGED", "CRASHED", "TIMEOUT"] as const) {
      expect(judgeRun({ ...base, status, quantities: [derived("decay_exponent", 1 / 0.92)] }).verdict).toBe("outside");
    }
  });

  it("reports the change against the baseline and flags it as drift beyond the noise floor", () => {
    const r = judgeRun({
      ...base,
      quantities: [derived("decay_exponent", 1.0895)],
      baseline: { buildId: 7, values: new Map([["decay_exponent", 1.087]]) },
    });
    expect(r.quantities[0].baselineDelta).toBeCloseTo(0.0025, 12);
    expect(r.quantities[0].baselineBuildId).toBe(7);
    expect(r.quantities[0].drift).toBe(true);
    expect(r.quantities[0].driftReason).toBe("baseline");
    expect(r.quantities[0].verdict).toBe("within");
  });

  it("flags a monotone rise over the last builds as a trend even inside the band (Mann–Kendall)", () => {
    const history = [1.0860, 1.0863, 1.0866, 1.0869, 1.0872, 1.0875, 1.0878];
    const r = judgeRun({ ...base, quantities: [derived("decay_exponent", 1.0881)], history: () => history });
    expect(r.quantities[0].verdict).toBe("within");
    expect(r.quantities[0].drift).toBe(true);
    expect(r.quantities[0].driftReason).toBe("trend");
    // Theil–Sen slope of an exact ramp is the ramp's step (Sen 1968).
    expect(r.quantities[0].driftSlope).toBeCloseTo(0.0003, 10);
  });

  it("does not call scatter below the noise floor a drift", () => {
    const history = [1.0869, 1.0871, 1.0870, 1.0869, 1.0871, 1.0870, 1.0869];
    const r = judgeRun({ ...base, quantities: [derived("decay_exponent", 1.0870)], history: () => history, baseline: { buildId: 1, values: new Map([["decay_exponent", 1.0870]]) } });
    expect(r.quantities[0].drift).toBe(false);
  });
});
