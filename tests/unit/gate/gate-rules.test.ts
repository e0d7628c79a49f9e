import { describe, expect, it } from "vitest";
import { blockingReason, isWaiverInForce, sortOutBlockers, waiverCovers, type GateItem, type WaiverScope } from "@/lib/services/gate-rules";

// The gate's policy (DESIGN.md "gate", issue 4): an outside quantity or a run
// that did not complete blocks approval unless a waiver in force names it.
// Values are physical ones so the messages read as they will in CI logs.

// k–ε decay exponent n = 1/(C_eps2 − 1): 1.0870 for C_eps2 = 1.92, 1.1494 for the
// demo's changed C_eps2 = 1.87 (reference sheet §2.2; Launder & Spalding 1974).
const N_STANDARD = 1 / (1.92 - 1);
const N_CHANGED = 1 / (1.87 - 1);

const decay = (value: number, verdict: GateItem["verdict"]): GateItem => ({
  runId: 7,
  caseKey: "decaying-hit",
  modelKey: "k-epsilon",
  grid: "default",
  runStatus: "COMPLETED",
  quantityKey: "decay_exponent",
  verdict,
  value,
  unit: "1",
  lower: N_STANDARD * 0.99,
  upper: N_STANDARD * 1.01,
});

const waiver = (over: Partial<WaiverScope> = {}): WaiverScope => ({
  id: 1,
  caseKey: "decaying-hit",
  quantityKey: "decay_exponent",
  modelKey: null,
  branch: null,
  grantedAt: new Date("2026-12-01T00:00:00Z"),
  expiresAt: new Date("2026-12-15T00:00:00Z"),
  revokedAt: null,
  ...over,
});

const AT = new Date("2026-12-05T12:00:00Z");

describe("blockingReason", () => {
  it("blocks an outside quantity and states value and band", () => {
    expect(N_CHANGED).toBeCloseTo(1.1494, 4);
    expect(blockingReason(decay(N_CHANGED, "outside"))).toBe("decay_exponent = 1.149 is outside its band [1.076, 1.098]");
  });

  it("lets within, marginal and missing quantities of a completed run pass", () => {
    for (const verdict of ["within", "marginal", "missing", "unbanded"] as const) expect(blockingReason(decay(N_STANDARD, verdict))).toBeNull();
  });

  it("blocks every quantity of a run that did not complete, even one inside its band", () => {
    // A residual that rose four orders instead of falling three (reference sheet §10: a drop of ≥ 3 orders, common practice).
    const residual: GateItem = { ...decay(-4, "outside"), caseKey: "backstep", runStatus: "DIVERGED", quantityKey: "residual_drop_orders", unit: "orders of magnitude", lower: 3, upper: null };
    expect(blockingReason(residual)).toBe("run diverged, so residual_drop_orders = −4 orders of magnitude is not a converged result");
    expect(blockingReason({ ...decay(N_STANDARD, "within"), runStatus: "TIMEOUT" })).toMatch(/^run timeout, so decay_exponent = 1\.087/);
    expect(blockingReason({ ...decay(N_STANDARD, "missing"), value: null, runStatus: "CRASHED" })).toBe("run crashed; decay_exponent not delivered");
  });

  it("blocks a failed run that left no quantity, saying no waiver can name it", () => {
    expect(blockingReason({ ...decay(0, null), quantityKey: null, value: null, runStatus: "DIVERGED" })).toBe("run diverged; it reports no quantity a waiver could name");
  });
});

describe("isWaiverInForce", () => {
  it("counts from the grant up to, not including, the expiry instant", () => {
    expect(isWaiverInForce(waiver(), new Date("2026-11-30T23:59:59Z"))).toBe(false);
    expect(isWaiverInForce(waiver(), new Date("2026-12-01T00:00:00Z"))).toBe(true);
    expect(isWaiverInForce(waiver(), new Date("2026-12-14T23:59:59Z"))).toBe(true);
    expect(isWaiverInForce(waiver(), new Date("2026-12-15T00:00:00Z"))).toBe(false);
  });

  it("stops counting once withdrawn", () => {
    const w = waiver({ revokedAt: new Date("2026-12-03T00:00:00Z") });
    expect(isWaiverInForce(w, new Date("2026-12-02T00:00:00Z"))).toBe(true);
    expect(isWaiverInForce(w, AT)).toBe(false);
  });
});

describe("waiverCovers", () => {
  const item = decay(N_CHANGED, "outside");
  it("matches case and quantity, with model and branch optional", () => {
    expect(waiverCovers(waiver(), item, "release/4.2")).toBe(true);
    expect(waiverCovers(waiver({ modelKey: "k-epsilon", branch: "release/4.2" }), item, "release/4.2")).toBe(true);
    expect(waiverCovers(waiver({ modelKey: "sst" }), item, "release/4.2")).toBe(false);
    expect(waiverCovers(waiver({ branch: "release/4.3" }), item, "release/4.2")).toBe(false);
    expect(waiverCovers(waiver({ quantityKey: "kappa" }), item, "release/4.2")).toBe(false);
    expect(waiverCovers(waiver({ caseKey: "channel-re180" }), item, "release/4.2")).toBe(false);
  });

  it("never covers a failed run without quantities", () => {
    expect(waiverCovers(waiver(), { ...item, quantityKey: null, runStatus: "DIVERGED" }, "main")).toBe(false);
  });
});

describe("sortOutBlockers", () => {
  const outside = decay(N_CHANGED, "outside");
  const marginal = { ...decay(N_STANDARD * 1.009, "marginal"), runId: 8, modelKey: "sst" };

  it("keeps an outside quantity blocking when no waiver applies, and ignores what does not block", () => {
    const r = sortOutBlockers([outside, marginal], [waiver({ modelKey: "sst" })], { branch: "release/4.2", at: AT });
    expect(r.blockers.map((b) => b.item)).toEqual([outside]);
    expect(r.waived).toEqual([]);
  });

  it("lets it through with the waiver that runs longest", () => {
    const short = waiver({ id: 2, expiresAt: new Date("2026-12-10T00:00:00Z") });
    const long = waiver({ id: 3, expiresAt: new Date("2027-01-10T00:00:00Z"), modelKey: "k-epsilon" });
    const r = sortOutBlockers([outside], [short, long], { branch: "release/4.2", at: AT });
    expect(r.blockers).toEqual([]);
    expect(r.waived.map((w) => w.waiver.id)).toEqual([3]);
    expect(r.waived[0].reason).toMatch(/outside its band/);
  });

  it("no longer counts an expired or withdrawn waiver", () => {
    const expired = waiver({ expiresAt: new Date("2026-12-05T12:00:00Z") });
    const withdrawn = waiver({ id: 4, revokedAt: new Date("2026-12-04T00:00:00Z") });
    const r = sortOutBlockers([outside], [expired, withdrawn], { branch: "release/4.2", at: AT });
    expect(r.blockers).toHaveLength(1);
    expect(r.waived).toHaveLength(0);
  });
});
