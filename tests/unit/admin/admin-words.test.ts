import { describe, expect, it } from "vitest";
import { describeStatus } from "@/components/admin/account-words";
import { describeChange } from "@/components/admin/change-words";
import { endOfDayUtc } from "@/components/admin/new-token-form";

const NOW = Date.parse("2026-12-02T12:00:00Z");

describe("administration wording", () => {
  it("tells an invite whose link is still open from one that needs a new link", () => {
    const base = { status: "invited" as const, deactivatedAt: null, hasPassword: false };
    expect(describeStatus({ ...base, inviteExpiresAt: "2026-12-09T12:00:00Z" }, NOW).text).toBe("waits for the password, link open until 9 Dec 2026, 12:00 UTC");
    expect(describeStatus({ ...base, inviteExpiresAt: "2026-12-01T12:00:00Z" }, NOW).text).toMatch(/expired, issue a new one/);
    expect(describeStatus({ ...base, inviteExpiresAt: null }, NOW).text).toMatch(/expired/);
  });

  it("adds nothing to an active account unless a password link is open", () => {
    const base = { status: "active" as const, deactivatedAt: null, hasPassword: true };
    expect(describeStatus({ ...base, inviteExpiresAt: null }, NOW).text).toBe("");
    expect(describeStatus({ ...base, inviteExpiresAt: "2026-12-03T00:00:00Z" }, NOW).text).toMatch(/^password link open until/);
  });

  it("words audit entries with role names and says when a reactivation returns someone to invited", () => {
    expect(describeChange({ action: "user.role_changed", entity: "user", entityId: "7", details: { email: "a@fenwick-hydro.test", from: "developer", to: "release" } })).toBe(
      "changed the role of a@fenwick-hydro.test from solver developer to release manager",
    );
    expect(describeChange({ action: "user.reactivated", entity: "user", entityId: "7", details: { email: "a@fenwick-hydro.test", to: "invited" } })).toMatch(/invited again/);
    expect(describeChange({ action: "ci_token.revoked", entity: "ci_token", entityId: "3", details: { name: "nightly" } })).toBe("revoked CI token “nightly”");
  });

  it("reads a picked expiry day as valid through the end of that day in UTC", () => {
    expect(endOfDayUtc("2027-03-31")).toBe("2027-03-31T23:59:59.999Z");
    expect(endOfDayUtc("")).toBeNull();
  });
});
