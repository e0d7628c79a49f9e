// Browser smoke test: the home page, rendered by the real server on the seeded
// demo history and loaded in Debian's Chromium, lists the latest builds.
import { mkdir } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowserSession, type BrowserSession } from "@/tests/helpers/browser";
import { requireEnv } from "@/tests/helpers/env";

const baseUrl = requireEnv("TAULINE_TEST_URL");
let session: BrowserSession;

beforeAll(async () => {
  session = await openBrowserSession();
});

afterAll(async () => {
  await session?.close();
});

describe("home page in Chromium", () => {
  it("lists the demo Cormorant builds with branch, short commit and verdict", async () => {
    const { page } = session;
    const response = await page.goto(`${baseUrl}/`, { waitUntil: "networkidle" });
    // Screenshot first, so a failing run leaves a picture of what was shown.
    await mkdir("test-results", { recursive: true });
    await page.screenshot({ path: "test-results/home.png", fullPage: true });
    expect(response?.status()).toBe(200);

    const text = await page.locator("body").innerText();
    expect(text).toContain("Cormorant");
    expect(text).toContain("release/4.2");
    // Builds are identified by their commit's short SHA (7+ hex digits).
    expect(text).toMatch(/\b[0-9a-f]{7,12}\b/);
    expect(text).toMatch(/\b(within|marginal|outside)\b/i);
  });
});
