import { beforeAll, describe, expect, it } from "vitest";
import { ciToken } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { detectServerMode, postJson, send } from "./http-helpers";

// Security headers on pages and API answers (proxy.ts, next.config.mjs,
// lib/http/content-security-policy.ts). The browser side — that the pages run
// under this policy without violations — is tests/browser/csp.test.ts.

function directives(policy: string | null): Map<string, string[]> {
  const map = new Map<string, string[]>();
  for (const part of (policy ?? "").split(";")) {
    const [name, ...values] = part.trim().split(/\s+/);
    if (name) map.set(name.toLowerCase(), values);
  }
  return map;
}

function expectCommonHeaders(headers: Headers) {
  expect(headers.get("x-content-type-options")).toBe("nosniff");
  expect(headers.get("x-frame-options")).toBe("DENY");
  expect(["strict-origin-when-cross-origin", "no-referrer"]).toContain(headers.get("referrer-policy"));
  expect(headers.get("permissions-policy")).toMatch(/camera=\(\)/);
  expect(headers.get("x-powered-by")).toBeNull();
}

let admin = "";
let mode: "development" | "production";
beforeAll(async () => {
  admin = await signIn("admin@fenwick-hydro.test");
  mode = await detectServerMode();
});

describe("page security headers", () => {
  it.each(["/sign-in", "/", "/builds", "/trends", "/gate", "/cases", "/admin"])("%s carries a nonce CSP that its every script tag uses", async (path) => {
    const page = await send(path, { headers: path === "/sign-in" ? {} : { cookie: admin } });
    expect(page.status).toBe(200);
    expectCommonHeaders(page.headers);
    const csp = directives(page.headers.get("content-security-policy"));
    const scriptSrc = csp.get("script-src") ?? [];
    const nonce = scriptSrc.find((v) => v.startsWith("'nonce-"))?.slice(7, -1);
    expect(nonce, "script-src has a nonce").toMatch(/^[A-Za-z0-9+/=]{16,}$/);
    expect(scriptSrc).toContain("'strict-dynamic'");
    expect(scriptSrc).not.toContain("'unsafe-inline'");
    if (mode === "production") expect(scriptSrc).not.toContain("'unsafe-eval'");
    expect(csp.get("frame-ancestors")).toEqual(["'none'"]);
    expect(csp.get("object-src")).toEqual(["'none'"]);
    expect(csp.get("base-uri")).toEqual(["'self'"]);
    expect(csp.get("default-src")).toEqual(["'self'"]);
    const scripts = page.text.match(/<script\b[^>]*>/g) ?? [];
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
  });

  it("gives every response a fresh nonce", async () => {
    const nonces = new Set<string>();
    for (let i = 0; i < 3; i++) {
      const page = await send("/sign-in");
      nonces.add(/'nonce-([^']+)'/.exec(page.headers.get("content-security-policy") ?? "")?.[1] ?? "");
    }
    expect(nonces.size).toBe(3);
    expect(nonces.has("")).toBe(false);
  });

  it("still sends a signed-out visitor to the sign-in page", async () => {
    const page = await send("/builds");
    expect(page.status).toBe(307);
    expect(page.headers.get("location")).toMatch(/\/sign-in\?callbackUrl=%2Fbuilds$/);
  });

  it("lets a signed-out visitor open a set-password link page (the link is the proof)", async () => {
    const page = await send("/invite/not-a-real-token-0123456789");
    expect(page.headers.get("location") ?? "").not.toMatch(/sign-in/);
    expect(page.headers.get("content-security-policy")).toMatch(/'nonce-/);
  });
});

describe("API security headers", () => {
  it("sets nosniff, frame and referrer headers on GraphQL answers, and a deny-all policy in production", async () => {
    const answer = await postJson({ query: "{ __typename }" }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(200);
    expectCommonHeaders(answer.headers);
    if (mode === "production") expect(answer.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
  });

  it("sets the same headers on refusals and on the health endpoint", async () => {
    const refused = await send("/api/graphql", { method: "POST", headers: { "content-type": "text/plain" }, body: "x" });
    expect(refused.status).toBe(415);
    expectCommonHeaders(refused.headers);
    const health = await send("/api/health");
    expectCommonHeaders(health.headers);
  });
});
