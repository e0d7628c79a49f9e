import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { acceptInviteSchema, ciTokenSchema, createUserSchema, passwordSchema } from "@/lib/validation/users";
import { generateTokenSecret } from "@/lib/services/tokens";

const pathsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) => (r.error?.issues ?? []).map((i) => i.path.join("."));

describe("account inputs", () => {
  it("stores e-mails trimmed and lower-case so that one address cannot hold two accounts", () => {
    const r = createUserSchema.parse({ name: " Ada Quill ", email: "  Ada.Quill@Fenwick-Hydro.TEST ", role: "qa", password: "long-enough-pw" });
    expect(r).toMatchObject({ name: "Ada Quill", email: "ada.quill@fenwick-hydro.test" });
  });

  it("refuses a password bcrypt would truncate: more than 72 bytes counts bytes, not characters", () => {
    // bcrypt uses at most 72 bytes of the key (OpenBSD bcrypt, Provos & Mazières 1999; limit common practice).
    expect(passwordSchema.safeParse("a".repeat(72)).success).toBe(true);
    expect(passwordSchema.safeParse("a".repeat(73)).success).toBe(false);
    // "é" is two bytes in UTF-8 (RFC 3629): 36 of them are 72 bytes, 37 are 74.
    expect(passwordSchema.safeParse("é".repeat(36)).success).toBe(true);
    expect(passwordSchema.safeParse("é".repeat(37)).success).toBe(false);
  });

  it("names every bad field of a new account at once", () => {
    const r = createUserSchema.safeParse({ name: "A", email: "not-an-address", role: "owner", password: "short" });
    expect(pathsOf(r).sort()).toEqual(["email", "name", "password", "role"]);
  });

  it("rejects a set-password token that is not 43 base64url characters", () => {
    expect(pathsOf(acceptInviteSchema.safeParse({ token: "abc", password: "long-enough-pw" }))).toEqual(["token"]);
    expect(acceptInviteSchema.safeParse({ token: "A".repeat(43), password: "long-enough-pw" }).success).toBe(true);
  });
});

describe("CI token inputs and secrets", () => {
  it("accepts no expiry or a future one and refuses one in the past", () => {
    expect(ciTokenSchema.parse({ name: "nightly" }).expiresAt).toBeNull();
    expect(ciTokenSchema.safeParse({ name: "nightly", expiresAt: new Date(Date.now() + 86_400_000).toISOString() }).success).toBe(true);
    expect(pathsOf(ciTokenSchema.safeParse({ name: "nightly", expiresAt: "2001-01-01T00:00:00Z" }))).toEqual(["expiresAt"]);
  });

  it("makes a tl_-prefixed secret of 32 random bytes, different every time", () => {
    const a = generateTokenSecret();
    const b = generateTokenSecret();
    expect(a).toMatch(/^tl_[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(a.slice(3), "base64url")).toHaveLength(32);
    expect(a).not.toBe(b);
    // What the server stores is SHA-256 in hex (FIPS 180-4): 64 hex digits, as the ci_tokens check demands.
    expect(createHash("sha256").update(a).digest("hex")).toMatch(/^[0-9a-f]{64}$/);
  });
});
