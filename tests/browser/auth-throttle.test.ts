// The sign-in form tells a person who is throttled what happened and how long
// to wait, instead of "wrong password". The account is locked beforehand from a
// loopback address of this test's own (see tests/integration/auth-sign-in-client.ts);
// the browser's one refused attempt is the only failure 127.0.0.1 is charged.
import { createHash } from "node:crypto";
import bcrypt from "bcryptjs";
import { afterAll, afterEach, describe, expect, it } from "vitest";
import { getEnv } from "@/lib/env";
import { openBrowserSession, type BrowserSession } from "@/tests/helpers/browser";
import { closeTestDb, testDb } from "@/tests/helpers/db";
import { requireEnv } from "@/tests/helpers/env";
import { freshLoopbackAddress, openSignInClient } from "@/tests/integration/auth-sign-in-client";

const baseUrl = requireEnv("TAULINE_TEST_URL");
const env = getEnv();
const email = `itest-throttle-form-${Date.now().toString(36)}@fenwick-hydro.test`;
const PASSWORD = "recirculation-zone-3";
const from = freshLoopbackAddress();
let session: BrowserSession | undefined;

afterEach(async () => {
  await session?.close();
  session = undefined;
});

afterAll(async () => {
  const db = testDb();
  await db("sign_in_throttle").whereIn("key", [`account:${createHash("sha256").update(email).digest("hex")}`, `address:${from}`]).delete();
  await db("users").where({ email }).delete();
  await closeTestDb();
});

describe("sign-in form under throttling", () => {
  it("says the account is throttled and for how many minutes, even for the right password, and stays on the form", async () => {
    await testDb()("users").insert({ email, name: "Throttle form check", role: "developer", password_hash: bcrypt.hashSync(PASSWORD, 4), active: true });
    const guesser = await openSignInClient(from);
    for (let i = 0; i < env.SIGNIN_ACCOUNT_LIMIT; i++) expect((await guesser.attempt(email, `guess-${i}`)).status).toBe(401);

    session = await openBrowserSession();
    const { page } = session;
    await page.goto(`${baseUrl}/sign-in`, { waitUntil: "domcontentloaded" });
    await page.locator('form[data-ready="true"]').waitFor({ timeout: 60_000 });
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect
      .poll(() => page.locator("#sign-in-error").innerText(), { timeout: 30_000 })
      .toBe(`Too many sign-in attempts for this account; try again in ${env.SIGNIN_WINDOW_MINUTES} min.`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  }, 120_000);
});
