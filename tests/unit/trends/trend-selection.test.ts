import { describe, expect, it } from "vitest";
import { resolveSelection, selectionQuery } from "@/components/trends/trend-selection";
import type { PickerCase } from "@/graphql/operations/trends";

// The trend selection lives in the query string; unknown values fall back to what the case has.

const cases: PickerCase[] = [
  {
    key: "channel-re180", title: "Channel", models: ["sa", "k-epsilon", "sst"], grids: ["default"],
    quantities: [{ key: "kappa", label: "κ", unit: "1" }, { key: "residual_drop_orders", label: "drop", unit: "orders of magnitude" }],
    bands: [{ quantity: "kappa" }],
  },
  {
    key: "decaying-hit", title: "HIT", models: ["k-epsilon", "k-omega"], grids: ["coarse", "default"],
    quantities: [{ key: "residual_drop_orders", label: "drop", unit: "orders of magnitude" }, { key: "decay_exponent", label: "n", unit: "1" }],
    bands: [{ quantity: "decay_exponent" }],
  },
];
const branches = ["main", "release/4.2", "test/x"];

describe("resolveSelection", () => {
  it("keeps a complete, valid selection from the address", () => {
    const s = resolveSelection(new URLSearchParams("case=decaying-hit&quantity=decay_exponent&model=k-omega&branch=release/4.2&grid=coarse&last=100&x=time"), cases, branches);
    expect(s).toEqual({ caseKey: "decaying-hit", quantity: "decay_exponent", models: ["k-omega"], branch: "release/4.2", grid: "coarse", last: 100, x: "time" });
  });

  it("falls back to the first banded quantity, all models, main, the default grid and 50 builds", () => {
    const s = resolveSelection(new URLSearchParams("case=decaying-hit&quantity=kappa&model=nope&branch=gone&last=9999"), cases, branches)!;
    expect(s.quantity).toBe("decay_exponent");
    expect(s.models).toEqual(["k-epsilon", "k-omega"]);
    expect([s.branch, s.grid, s.last, s.x]).toEqual(["main", "default", 50, "order"]);
  });

  it("drops models the case is not run with and repeated ones", () => {
    const s = resolveSelection(new URLSearchParams("case=channel-re180&model=sst,lrr,sst,sa"), cases, branches)!;
    expect(s.models).toEqual(["sst", "sa"]);
  });

  it("returns null when there is nothing to choose from", () => {
    expect(resolveSelection(new URLSearchParams(""), [], branches)).toBeNull();
    expect(resolveSelection(new URLSearchParams(""), cases, [])).toBeNull();
  });
});

describe("selectionQuery", () => {
  it("writes a selection that resolves back to itself, leaving defaults out", () => {
    const s = resolveSelection(new URLSearchParams("case=channel-re180&model=sa,sst&branch=main"), cases, branches)!;
    const q = selectionQuery(s);
    expect(q).toBe("case=channel-re180&quantity=kappa&model=sa%2Csst&branch=main");
    expect(resolveSelection(new URLSearchParams(q), cases, branches)).toEqual(s);
  });
});
