import { describe, expect, it } from "vitest";
import { formatBand, formatUntil } from "@/components/gate/gate-format";
import { sortFindings } from "@/components/gate/sort-findings";
import type { GateFindingItem } from "@/graphql/operations/gate";
import { endOfUtcDay, gateDecisionSchema, MAX_WAIVER_DAYS, waiverGrantSchema } from "@/lib/validation/gate";

const DAY = 86_400_000;

describe("gate decision input", () => {
  it("needs one of the three decisions and a comment that says why", () => {
    expect(gateDecisionSchema.safeParse({ buildId: "60", state: "approved", comment: "  All cases within their bands.  " }).data).toEqual({ buildId: 60, state: "approved", comment: "All cases within their bands." });
    const bad = gateDecisionSchema.safeParse({ buildId: "0", state: "pending", comment: "   " });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => i.path.join("."))).toEqual(["buildId", "state", "comment"]);
  });
});

describe("waiver input", () => {
  const base = { case: "decaying-hit", quantity: "decay_exponent", model: "k-epsilon", branch: "release/4.2", reason: "C_eps2 change under review; see the closure ticket." };

  it("accepts a waiver until a future date within the limit and reads an absent model or branch as 'every'", () => {
    const r = waiverGrantSchema.safeParse({ ...base, model: undefined, branch: null, expiresAt: new Date(Date.now() + 14 * DAY).toISOString() });
    expect(r.success).toBe(true);
    expect(r.data!.model).toBeNull();
    expect(r.data!.branch).toBeNull();
    expect(r.data!.expiresAt).toBeInstanceOf(Date);
  });

  it("refuses a waiver that has already ended or runs past the limit", () => {
    const past = waiverGrantSchema.safeParse({ ...base, expiresAt: new Date(Date.now() - 1000) });
    expect(past.error!.issues[0]).toMatchObject({ path: ["expiresAt"], message: "must be in the future" });
    const long = waiverGrantSchema.safeParse({ ...base, expiresAt: new Date(Date.now() + (MAX_WAIVER_DAYS + 1) * DAY) });
    expect(long.error!.issues[0].message).toBe(`must be at most ${MAX_WAIVER_DAYS} days ahead`);
  });

  it("refuses a short reason and a branch name with spaces", () => {
    const r = waiverGrantSchema.safeParse({ ...base, reason: "ok", branch: "release 4.2", expiresAt: new Date(Date.now() + DAY) });
    expect(r.error!.issues.map((i) => i.path[0]).sort()).toEqual(["branch", "reason"]);
  });

  it("makes a waiver 'until 14 Dec' count through that whole UTC day", () => {
    expect(endOfUtcDay("2026-12-14").toISOString()).toBe("2026-12-15T00:00:00.000Z");
    expect(Number.isNaN(endOfUtcDay("14/12/2026").getTime())).toBe(true);
    expect(formatUntil("2026-12-15T00:00:00.000Z")).toBe("14 Dec 2026");
  });
});

describe("gate wording", () => {
  it("writes two-sided and one-sided bands with their unit", () => {
    expect(formatBand({ lower: 1.07608695652, upper: 1.09782608696, unit: "1" })).toBe("1.076 – 1.098");
    // Residual drop of at least 3 orders (reference sheet §10, common practice).
    expect(formatBand({ lower: 3, upper: null, unit: "orders of magnitude" })).toBe("≥ 3 orders of magnitude");
    expect(formatBand({ lower: null, upper: 0, unit: "samples" })).toBe("≤ 0 samples");
  });

  it("lists blockers first, then waived items, then the rest by severity with drifting ones first", () => {
    const f = (id: string, over: Partial<GateFindingItem>): GateFindingItem =>
      ({ id, case: "c", model: "m", grid: "default", quantity: id, verdict: "within", drift: false, blockReason: null, waiver: null, ...over }) as GateFindingItem;
    const rows = sortFindings([
      f("steady-marginal", { verdict: "marginal" }),
      f("drifting", { drift: true }),
      f("waived", { verdict: "outside", blockReason: "outside", waiver: { id: "1" } as GateFindingItem["waiver"] }),
      f("missing", { verdict: "missing" }),
      f("drifting-marginal", { verdict: "marginal", drift: true }),
      f("blocking", { verdict: "outside", blockReason: "outside" }),
    ]);
    expect(rows.map((r) => r.id)).toEqual(["blocking", "waived", "missing", "drifting-marginal", "steady-marginal", "drifting"]);
  });
});
