// Browser smoke test: the home page, rendered by the real server on the seeded
// demo history and loaded in Debian's Chromium after signing in, lists the latest builds.
import { mkdir } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowserSession, signInThroughForm, type BrowserSession } from "@/tests/helpers/browser";
import { requireEnv } from "@/tests/helpers/env";

const baseUrl = requireEnv("TAULINE_TEST_URL");
let session: BrowserSession;

beforeAll(async () => {
  session = await openBrowserSession();
  await signInThroughForm(session.page, baseUrl, "developer@fenwick-hydro.test", requireEnv("TAULINE_DEMO_PASSWORD"));
});

afterAll(async () => {
  await session?.close();
});

describe("home page in Chromium", () => {
  it("lists the demo Cormorant builds of main with short commit and verdict", async () => {
    const { page } = session;
    const response = await page.goto(`${baseUrl}/`, { waitUntil: "networkidle" });
    // Screenshot first, so a failing run leaves a picture of what was shown.
    await mkdir("test-results", { recursive: true });
    await page.screenshot({ path: "test-results/home.png", fullPage: true });
    expect(response?.status()).toBe(200);

    // One build per row. Checking inside a single row keeps a column header
    // such as "within / marginal / outside" from passing for a verdict.
    // Tests running beside this one post builds on branches of their own; the
    // demo's main branch (versions 4.3.0-dev.N) is always listed first.
    const releaseRows = page
      .locator("[data-build-id], tbody tr")
      .filter({ hasText: "Cormorant" })
      .filter({ hasText: /4\.3\.0-dev\.\d+/ })
      .filter({ hasText: "main" });
    expect(await releaseRows.count()).toBeGreaterThan(0);

    const row = await releaseRows.first().innerText();
    // A commit is shown by its short SHA (7 to 12 hex digits).
    expect(row).toMatch(/\b[0-9a-f]{7,12}\b/);
    expect(row).toMatch(/\b(within|marginal|outside|unbanded|missing)\b/);
  });
});
