// Who gets in, through the real pages in Debian's Chromium: each role signs in
// through the form; a visitor without a session is sent to sign-in; a developer's
// page cannot perform a QA-only change even by calling the API itself.
import { mkdir } from "node:fs/promises";
import { afterEach, describe, expect, it } from "vitest";
import { openBrowserSession, signInThroughForm, type BrowserSession } from "@/tests/helpers/browser";
import { requireEnv } from "@/tests/helpers/env";

const baseUrl = requireEnv("TAULINE_TEST_URL");
const password = () => requireEnv("TAULINE_DEMO_PASSWORD");
let session: BrowserSession | undefined;

afterEach(async () => {
  await session?.close();
  session = undefined;
});

const ROLE_LABELS = { developer: "solver developer", qa: "QA lead", release: "release manager", admin: "administrator" } as const;

describe("sign-in and access", () => {
  for (const [role, label] of Object.entries(ROLE_LABELS)) {
    it(`signs in the ${label} through the form and shows the role`, async () => {
      session = await openBrowserSession();
      await signInThroughForm(session.page, baseUrl, `${role}@fenwick-hydro.test`, password());
      await expect.poll(() => session!.page.getByTestId("role").innerText()).toBe(label);
    });
  }

  it("refuses a wrong password with a message and stays on the sign-in page", async () => {
    session = await openBrowserSession();
    const { page } = session;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill("qa@fenwick-hydro.test");
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.locator("#sign-in-error").innerText()).toMatch(/not right/);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });

  it("sends a visitor without a session to sign-in, keeping where they wanted to go", async () => {
    session = await openBrowserSession();
    const { page } = session;
    await page.goto(`${baseUrl}/builds?branch=main`);
    const url = new URL(page.url());
    expect(url.pathname).toBe("/sign-in");
    expect(url.searchParams.get("callbackUrl")).toContain("/builds");
  });

  it("refuses a developer's QA-only band change with FORBIDDEN, even sent straight to the API", async () => {
    session = await openBrowserSession();
    const { page } = session;
    await signInThroughForm(page, baseUrl, "developer@fenwick-hydro.test", password());
    const answer = await page.evaluate(async () => {
      const res = await fetch("/api/graphql", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          query: "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id } }",
          variables: {
            input: { caseKey: "backstep", quantityKey: "reattachment_xr_h", model: null, kind: "validation", reference: 6.26, source: "Driver & Seegmiller 1985", lower: 0, upper: 100, marginalMargin: 0, noiseFloor: 0, reason: "developer trying to widen the band" },
          },
        }),
      });
      return { status: res.status, body: await res.json() };
    });
    await mkdir("test-results", { recursive: true });
    await page.screenshot({ path: "test-results/developer-refused.png" });
    expect(answer.status).toBe(403);
    expect(answer.body.errors[0].extensions.code).toBe("FORBIDDEN");
  });
});
