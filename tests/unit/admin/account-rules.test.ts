import { describe, expect, it } from "vitest";
import { refuseAccountChange, type AccountChangeFacts } from "@/lib/services/account-rules";

// The lock-out rules of the administration (DESIGN.md roles; brief: "cannot
// deactivate yourself or remove the last admin"). Pure facts in, refusal out.

const admin = (id: number, status: "active" | "invited" | "deactivated" = "active") => ({ id, role: "admin" as const, status });
const facts = (over: Partial<AccountChangeFacts>): AccountChangeFacts => ({ actorUserId: 1, target: admin(2), change: { kind: "deactivate" }, activeAdmins: 2, ...over });

describe("refuseAccountChange", () => {
  it("refuses deactivating your own account even when other admins remain", () => {
    expect(refuseAccountChange(facts({ target: admin(1), activeAdmins: 5 }))?.code).toBe("forbidden");
  });

  it("refuses changing your own role but lets setting the role you already have through", () => {
    expect(refuseAccountChange(facts({ target: admin(1), change: { kind: "role", role: "qa" }, activeAdmins: 3 }))?.code).toBe("forbidden");
    expect(refuseAccountChange(facts({ target: admin(1), change: { kind: "role", role: "admin" }, activeAdmins: 1 }))).toBeNull();
  });

  it("refuses deactivating or demoting the last active administrator", () => {
    expect(refuseAccountChange(facts({ actorUserId: null, activeAdmins: 1 }))?.code).toBe("conflict");
    expect(refuseAccountChange(facts({ actorUserId: 1, change: { kind: "role", role: "release" }, activeAdmins: 1 }))?.message).toMatch(/last active administrator/);
  });

  it("allows removing an admin while another active admin remains", () => {
    expect(refuseAccountChange(facts({ activeAdmins: 2 }))).toBeNull();
    expect(refuseAccountChange(facts({ change: { kind: "role", role: "developer" }, activeAdmins: 2 }))).toBeNull();
  });

  it("does not count an invited or deactivated admin as the last one to protect", () => {
    expect(refuseAccountChange(facts({ target: admin(2, "invited"), activeAdmins: 1 }))).toBeNull();
    expect(refuseAccountChange(facts({ target: admin(2, "deactivated"), change: { kind: "role", role: "qa" }, activeAdmins: 1 }))).toBeNull();
  });

  it("lets any change of a non-admin through when no self-rule applies", () => {
    const dev = { id: 7, role: "developer" as const, status: "active" as const };
    expect(refuseAccountChange(facts({ target: dev, activeAdmins: 1 }))).toBeNull();
    expect(refuseAccountChange(facts({ target: dev, change: { kind: "role", role: "admin" }, activeAdmins: 1 }))).toBeNull();
  });
});
