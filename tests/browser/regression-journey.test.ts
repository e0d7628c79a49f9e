// A developer's morning: from the overview to the run plot that shows the demo
// regression (the k–ε decay exponent pushed out of its band by a changed Cε2).
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

describe("finding the regression", () => {
  it("follows the band exit on the overview to the decay plot with the fitted exponent", async () => {
    const { page } = session;
    await mkdir("test-results", { recursive: true });
    await page.goto(`${baseUrl}/`, { waitUntil: "networkidle" });
    const exit = page.locator('[data-exit="decaying-hit/k-epsilon/decay_exponent"]').first();
    await exit.waitFor({ timeout: 30_000 });
    await page.screenshot({ path: "test-results/overview.png", fullPage: true });
    expect(await exit.innerText()).toMatch(/outside/);

    await exit.getByRole("link", { name: /run/i }).first().click();
    await page.waitForURL(/\/builds\/\d+\/runs\/\d+/, { timeout: 30_000 });
    const panel = page.locator("section", { hasText: "Decay of turbulent kinetic energy" }).first();
    await panel.waitFor({ timeout: 30_000 });
    await page.waitForLoadState("networkidle");
    await page.screenshot({ path: "test-results/regression-run.png", fullPage: true });
    // The plot states the fitted exponent: 1/(1.87 − 1) = 1.149 (reference sheet §2.2).
    await expect.poll(() => panel.innerText(), { timeout: 20_000 }).toMatch(/n = 1\.149/);
    expect(await panel.locator("svg").count()).toBeGreaterThan(0);
    // The run's own closure coefficients are on the page: the changed Cε2 = 1.87.
    expect(await page.locator("body").innerText()).toMatch(/ε2\s*=\s*1\.87/);
  });
});
