import { describe, expect, it } from "vitest";
import { judgeRun } from "@/lib/evaluation/judge";
import type { BandInForce } from "@/lib/evaluation/types";
import { bandsForModel, rejudgeBuild, type RejudgeRun, type RejudgeValue } from "@/lib/services/reevaluate-judge";

// Re-judging stored values against the bands in force now (pure step). Numbers:
// standard k–ε decays with n = 1/(Cε2 − 1) = 1/0.92 = 1.08696 and a changed
// Cε2 = 1.87 gives n = 1/0.87 = 1.14943 (reference sheet §2.2, derivation after
// Launder & Spalding 1974); grid-turbulence experiments span 1.15 ≤ n ≤ 1.45
// (reference sheet §2.1, Pope 2000 summary, from memory).

const N_STANDARD = 1 / 0.92;
const N_CHANGED = 1 / 0.87;

let nextId = 1;
const band = (over: Partial<BandInForce>): BandInForce => ({
  id: nextId++,
  caseKey: "decaying-hit",
  quantityKey: "decay_exponent",
  modelKey: null,
  version: 1,
  kind: "verification",
  reference: N_STANDARD,
  source: "reference sheet §2.2",
  lower: N_STANDARD * 0.99,
  upper: N_STANDARD * 1.01,
  marginalMargin: 0.002,
  noiseFloor: 0.001,
  fitSettings: {},
  ...over,
});

const run = (id: number, modelKey: string, status: RejudgeRun["status"] = "COMPLETED"): RejudgeRun => ({ id, caseKey: "decaying-hit", modelKey, status });
const value = (id: number, runId: number, quantityKey: string, v: number | null): RejudgeValue => ({ id, runId, quantityKey, value: v });

describe("bandsForModel", () => {
  it("prefers a model's own band over the case-wide one and ignores other cases", () => {
    const caseWide = band({ modelKey: null, kind: "validation", lower: 1.15, upper: 1.45, reference: 1.25 });
    const own = band({ modelKey: "k-epsilon" });
    const elsewhere = band({ caseKey: "channel-re180", quantityKey: "kappa", modelKey: null });
    expect(bandsForModel("decaying-hit", "k-epsilon", [own, caseWide, elsewhere]).get("decay_exponent")).toBe(own);
    expect(bandsForModel("decaying-hit", "sst", [own, caseWide, elsewhere]).get("decay_exponent")).toBe(caseWide);
    expect(bandsForModel("decaying-hit", "sst", [own, caseWide, elsewhere]).has("kappa")).toBe(false);
  });
});

describe("rejudgeBuild", () => {
  it("judges the changed-coefficient exponent n = 1.149 outside the k–ε verification band and the standard one within", () => {
    const bands = [band({ modelKey: "k-epsilon" })];
    const out = rejudgeBuild({ runs: [run(1, "k-epsilon"), run(2, "k-epsilon")], values: [value(10, 1, "decay_exponent", N_STANDARD), value(11, 2, "decay_exponent", N_CHANGED)], bands });
    expect(out.values.map((v) => v.verdict)).toEqual(["within", "outside"]);
    expect(out.runs).toEqual([{ runId: 1, verdict: "within" }, { runId: 2, verdict: "outside" }]);
    expect(out.verdict).toBe("outside");
  });

  it("keeps n = 1.149 outside a validation band of 1.15–1.45 (just below its lower limit) and puts n = 1.2 (Saffman 6/5) inside", () => {
    const bands = [band({ kind: "validation", reference: 1.25, lower: 1.15, upper: 1.45, marginalMargin: 0.02 })];
    const out = rejudgeBuild({ runs: [run(1, "k-epsilon"), run(2, "lrr")], values: [value(10, 1, "decay_exponent", N_CHANGED), value(11, 2, "decay_exponent", 1.2)], bands });
    expect(out.values.map((v) => v.verdict)).toEqual(["outside", "within"]);
  });

  it("judges a run that did not complete outside whatever its stored values say", () => {
    const out = rejudgeBuild({ runs: [run(1, "k-epsilon", "DIVERGED")], values: [value(10, 1, "decay_exponent", N_STANDARD)], bands: [band({})] });
    expect(out.values[0].verdict).toBe("within");
    expect(out.runs[0].verdict).toBe("outside");
  });

  it("adds a missing verdict, with no stored value to point to, for a quantity a band added later expects", () => {
    const bands = [band({}), band({ quantityKey: "residual_drop_orders", kind: "verification", reference: null, lower: 3, upper: null, marginalMargin: 0 })];
    const out = rejudgeBuild({ runs: [run(1, "sst")], values: [value(10, 1, "decay_exponent", N_STANDARD)], bands });
    const added = out.values.find((v) => v.quantityKey === "residual_drop_orders");
    expect(added).toMatchObject({ quantityValueId: null, verdict: "missing", runId: 1 });
    expect(out.verdict).toBe("missing");
  });

  it("leaves a value with no band unbanded and a build with no runs missing", () => {
    expect(rejudgeBuild({ runs: [run(1, "sst")], values: [value(10, 1, "b11", 0.2)], bands: [] }).values[0].verdict).toBe("unbanded");
    expect(rejudgeBuild({ runs: [], values: [], bands: [] }).verdict).toBe("missing");
  });

  it("agrees with the ingest judgement (judgeRun) for the same values and bands", () => {
    const bands = [band({ modelKey: "k-epsilon" }), band({ kind: "validation", reference: 1.25, lower: 1.15, upper: 1.45, marginalMargin: 0.02 }), band({ quantityKey: "realizability_violations", reference: 0, lower: null, upper: 0, marginalMargin: 0 })];
    const cases: [string, number | null, number | null][] = [
      ["k-epsilon", N_STANDARD, 0],
      ["k-epsilon", N_STANDARD * 0.99 + 0.001, 0],
      ["k-epsilon", N_CHANGED, null],
      ["sst", 1.16, 2],
      ["ssg", 1.2048, 0],
      ["lrr", null, 0],
    ];
    cases.forEach(([model, n, violations], i) => {
      const stored = [value(100 + i, i, "decay_exponent", n), ...(violations === null ? [] : [value(200 + i, i, "realizability_violations", violations)])];
      const mine = rejudgeBuild({ runs: [run(i, model)], values: stored, bands });
      const own = bandsForModel("decaying-hit", model, bands);
      const ingest = judgeRun({
        status: "COMPLETED",
        quantities: stored.map((s) => ({ key: s.quantityKey, value: s.value, origin: "derived" as const, details: {} })),
        bandFor: (k) => own.get(k) ?? null,
        expectedKeys: [...own.keys()],
        baseline: null,
        history: () => [],
      });
      expect(mine.runs[0].verdict).toBe(ingest.verdict);
      const byKey = new Map(ingest.quantities.map((q) => [q.key, q.verdict]));
      for (const v of mine.values) expect(v.verdict).toBe(byKey.get(v.quantityKey));
    });
  });
});
