import { describe, expect, it } from "vitest";
import { subscriptionInputSchema } from "@/lib/validation/subscriptions";

describe("subscriptionInputSchema", () => {
  it("reads an empty case or branch as 'every'", () => {
    expect(subscriptionInputSchema.parse({ caseKey: "", branch: "  ", mode: "digest" })).toEqual({ caseKey: null, branch: null, mode: "digest" });
    expect(subscriptionInputSchema.parse({ mode: "immediate" })).toEqual({ caseKey: null, branch: null, mode: "immediate" });
  });

  it("keeps a case key and a branch with slashes and dots", () => {
    expect(subscriptionInputSchema.parse({ caseKey: "decaying-hit", branch: "release/4.2", mode: "immediate" })).toEqual({ caseKey: "decaying-hit", branch: "release/4.2", mode: "immediate" });
  });

  it("rejects a branch with spaces or markup, an upper-case case key and an unknown mode", () => {
    const r = subscriptionInputSchema.safeParse({ caseKey: "Decaying HIT", branch: "main <b>", mode: "weekly" });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path[0]).sort()).toEqual(["branch", "caseKey", "mode"]);
  });
});
