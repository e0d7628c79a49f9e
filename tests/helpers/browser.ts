// Launches Debian's Chromium through playwright-core (no browser download) with
// a fresh profile per launch, so no cookie or cache leaks between tests.
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const CHROMIUM_PATH = "/usr/bin/chromium";

// Headless and quiet: no GPU in CI, no sandbox as root, and no background
// traffic (updates, sync, QUIC) on a machine without internet.
const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
  "--disable-quic",
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

export async function openBrowserSession(): Promise<BrowserSession> {
  const profileDir = await mkdtemp(join(tmpdir(), "tauline-chromium-"));
  let context: BrowserContext;
  try {
    context = await chromium.launchPersistentContext(profileDir, {
      executablePath: CHROMIUM_PATH,
      headless: true,
      args: CHROMIUM_ARGS,
      viewport: { width: 1440, height: 900 },
      locale: "en-GB",
      timezoneId: "UTC",
    });
  } catch (error) {
    await rm(profileDir, { recursive: true, force: true });
    throw error;
  }
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      await rm(profileDir, { recursive: true, force: true });
    },
  };
}

/** Signs in through the real sign-in form, as a person would, and waits to leave it. */
export async function signInThroughForm(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`, { waitUntil: "domcontentloaded" });
  // The form is live once React has hydrated it (the button is disabled before).
  await page.locator('form[data-ready="true"]').waitFor({ timeout: 60_000 });
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout: 60_000 });
}
