import { describe, expect, it } from "vitest";
import { alertCaseKeys, alertEventKey, needsAlert } from "@/lib/mail/alert-facts";
import { decayAlert } from "./alert-fixture";

describe("alertEventKey", () => {
  it("gives a re-post with the same findings the same key, even when values differ in the last digits", () => {
    const first = decayAlert();
    const again = decayAlert({ exits: [{ ...first.exits[0], value: first.exits[0].value! + 1e-9 }] });
    expect(alertEventKey(again)).toBe(alertEventKey(first));
    expect(alertEventKey(first)).toMatch(/^alert:build:42:[0-9a-f]{20}$/);
  });

  it("does not depend on the order in which findings are listed", () => {
    const a = decayAlert({ incompleteRuns: [{ runId: 8, caseKey: "backstep", model: "sa", grid: "fine", status: "DIVERGED", iterations: 900 }, { runId: 9, caseKey: "backstep", model: "sst", grid: "fine", status: "CRASHED", iterations: null }] });
    const b = decayAlert({ incompleteRuns: [...a.incompleteRuns].reverse() });
    expect(alertEventKey(a)).toBe(alertEventKey(b));
  });

  it("changes when a finding is added, removed, or its drift reason changes", () => {
    const base = decayAlert();
    const drift = {
      runId: 7, caseKey: "decaying-hit", model: "k-epsilon", grid: "default", quantity: "decay_exponent", label: null, unit: "1",
      value: 1.149, verdict: "outside", reason: "baseline" as const, baselineValue: 1.087, baselineDelta: 0.062, noiseFloor: 0.002, pValue: null, slopePerBuild: null,
    };
    const withDrift = decayAlert({ drifts: [drift] });
    const withTrend = decayAlert({ drifts: [{ ...drift, reason: "trend" }] });
    const keys = new Set([base, withDrift, withTrend, decayAlert({ exits: [] })].map(alertEventKey));
    expect(keys.size).toBe(4);
  });

  it("belongs to its build: the same findings on another build are another event", () => {
    expect(alertEventKey(decayAlert({ build: { ...decayAlert().build, id: 43 } }))).not.toBe(alertEventKey(decayAlert()));
  });
});

describe("needsAlert and alertCaseKeys", () => {
  it("asks for no mail when nothing left its band, failed or drifts", () => {
    expect(needsAlert(decayAlert({ exits: [] }))).toBe(false);
    expect(needsAlert(decayAlert())).toBe(true);
  });

  it("lists each case the findings touch once, sorted", () => {
    const f = decayAlert({ incompleteRuns: [{ runId: 8, caseKey: "backstep", model: "sa", grid: "default", status: "TIMEOUT", iterations: 10 }] });
    expect(alertCaseKeys(f)).toEqual(["backstep", "decaying-hit"]);
  });
});
