// The pages run under their Content-Security-Policy (proxy.ts) without a single
// violation: Chromium reports each blocked script, style, image or connection
// as a `securitypolicyviolation` event, which the page records from its first
// moment. Signed in as an administrator, the main screens are visited and must
// also have run their scripts.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowserSession, signInThroughForm, type BrowserSession } from "@/tests/helpers/browser";
import { closeTestDb, testDb } from "@/tests/helpers/db";
import { requireEnv } from "@/tests/helpers/env";

const baseUrl = requireEnv("TAULINE_TEST_URL");
let session: BrowserSession;
const consoleCsp: string[] = [];
const pageErrors: string[] = [];

interface Violation {
  directive: string;
  blocked: string;
  page: string;
}

beforeAll(async () => {
  session = await openBrowserSession();
  await session.context.addInitScript(() => {
    const seen: { directive: string; blocked: string; page: string }[] = [];
    (window as unknown as { __cspViolations: typeof seen }).__cspViolations = seen;
    document.addEventListener("securitypolicyviolation", (event) => {
      seen.push({ directive: event.effectiveDirective, blocked: event.blockedURI, page: location.pathname });
    });
  });
  session.page.on("console", (message) => {
    if (message.type() === "error" && /content security policy|refused to/i.test(message.text())) consoleCsp.push(message.text());
  });
  session.page.on("pageerror", (error) => pageErrors.push(error.message));
  await signInThroughForm(session.page, baseUrl, "admin@fenwick-hydro.test", requireEnv("TAULINE_DEMO_PASSWORD"));
});

afterAll(async () => {
  await session?.close();
  await closeTestDb();
});

async function violationsOnPage(): Promise<Violation[]> {
  return session.page.evaluate(() => (window as unknown as { __cspViolations?: Violation[] }).__cspViolations ?? []);
}

async function scriptsRan(): Promise<{ inlineData: boolean; runtime: boolean }> {
  return session.page.evaluate(() => {
    const w = window as unknown as { __next_f?: unknown[]; next?: { version?: unknown } };
    return { inlineData: Array.isArray(w.__next_f), runtime: typeof w.next?.version === "string" };
  });
}

/** A demo run with plots (the k–ε decay on main) and its build. */
async function demoRun(): Promise<{ buildId: number; runId: number }> {
  const row = await testDb()("runs as r")
    .join("builds as b", "b.id", "r.build_id")
    .where({ "b.branch": "main", "r.case_key": "decaying-hit" })
    .orderBy("b.id", "desc")
    .first<{ buildId: number; runId: number }>("b.id as buildId", "r.id as runId");
  if (!row) throw new Error("no demo decay run on main: is the demo seeded?");
  return row;
}

describe("pages under the Content-Security-Policy", () => {
  // 90 s: a development server compiles each screen on first visit; a production build takes ~10 s.
  it("render the main screens with no CSP violation and with their scripts running", { timeout: 90_000 }, async () => {
    const { buildId, runId } = await demoRun();
    const paths = ["/", "/builds", `/builds/${buildId}`, `/builds/${buildId}/runs/${runId}`, "/trends", "/gate", "/cases", "/admin"];
    for (const path of paths) {
      const response = await session.page.goto(`${baseUrl}${path}`, { waitUntil: "networkidle" });
      expect(response?.status(), path).toBe(200);
      expect(response?.headers()["content-security-policy"], path).toMatch(/'nonce-/);
      // The page's scripts ran: Next's inline flight data (nonce'd inline scripts)
      // and its client runtime (chunks loaded through 'strict-dynamic').
      expect(await scriptsRan(), `${path}: scripts did not run`).toEqual({ inlineData: true, runtime: true });
      expect(await violationsOnPage(), path).toEqual([]);
      // The run page drew its plots (nivo SVG with inline styles) under the policy.
      if (path.includes("/runs/")) await session.page.locator("section svg").first().waitFor({ timeout: 20_000 });
    }
    expect(consoleCsp).toEqual([]);
    expect(pageErrors).toEqual([]);
  });

  it("blocks an injected inline event handler and reports it (the check above can see violations)", async () => {
    await session.page.goto(`${baseUrl}/builds`, { waitUntil: "networkidle" });
    await session.page.evaluate(() => {
      document.body.insertAdjacentHTML("beforeend", '<img src="/no-such-image-h3.png" onerror="window.__h3Injected = true">');
    });
    await expect.poll(async () => (await violationsOnPage()).length, { timeout: 10_000 }).toBeGreaterThan(0);
    expect(await session.page.evaluate(() => (window as unknown as { __h3Injected?: boolean }).__h3Injected)).toBeUndefined();
    expect((await violationsOnPage())[0].directive).toMatch(/^script-src/);
  });
});
