// The QA lead's journey in a real browser: open a band, get per-field errors for
// limits in the wrong order, tighten the band with a reason, see the new version
// with its diff in the history, re-judge the build judged under the old version,
// and find the re-judged verdict beside the original on the build page.
// Band numbers: κ = 0.41 with the modern spread 0.37–0.44 (reference sheet §1.2;
// Coles & Hirst 1969 value via NASA TMR). Runs on a case of its own, removed afterwards.
import { mkdir } from "node:fs/promises";
import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowserSession, type BrowserSession } from "@/tests/helpers/browser";
import { closeTestDb, testDb } from "@/tests/helpers/db";
import { requireEnv } from "@/tests/helpers/env";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "@/tests/helpers/graphql";
import { signIn } from "@/tests/helpers/session";

const baseUrl = requireEnv("TAULINE_TEST_URL");
const CASE = `test-qa-band-${randomCommit().slice(0, 8)}`;
let session: BrowserSession;
let buildId = "";

/** A development server reloads open pages when other files change; the production build of `npm test` has no such socket. */
async function ignoreDevReloads(context: BrowserContext) {
  await context.routeWebSocket(/hmr/, (ws) => {
    const server = ws.connectToServer();
    ws.onMessage((m) => server.send(m));
    server.onMessage((m) => {
      if (!/reloadPage|"type":"restart"|turbopack-message/.test(String(m))) ws.send(m);
    });
  });
}

beforeAll(async () => {
  const qa = await signIn("qa@fenwick-hydro.test");
  const setup = async (query: string, input: Record<string, unknown>) => {
    const res = await postGraphQL({ query, variables: { input }, cookie: qa });
    if (res.body.errors) throw new Error(res.body.errors[0].message);
  };
  await setup("mutation($input: CaseInput!) { createCase(input: $input) { key } }", {
    key: CASE,
    title: "Browser test case for band editing",
    description: "Created by the QA band browser test; removed afterwards.",
    models: ["sa"],
    reason: "browser test of the band editor",
  });
  await setup("mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id } }", {
    caseKey: CASE, quantityKey: "kappa", model: null, kind: "validation", reference: 0.41, source: "Coles & Hirst 1969 (reference sheet §1.2)",
    lower: 0.37, upper: 0.44, marginalMargin: 0.005, noiseFloor: 0.002, reason: "modern spread of published kappa values",
  });
  const posted = await postGraphQL<{ submitResults: { build: { id: string } } }>({
    query: SUBMIT,
    token: ciToken(),
    variables: { input: { build: { solver: "Cormorant", version: "0.0.0-qa-band", commit: randomCommit(), branch: "test/qa-band" }, runs: [{ case: CASE, model: "sa", status: "COMPLETED", quantities: [{ key: "kappa", value: 0.405 }] }] } },
  });
  buildId = posted.body.data!.submitResults.build.id;
  session = await openBrowserSession();
  await ignoreDevReloads(session.context);
  // The form must be live before typing (a development server hydrates slowly): wait for the network to settle.
  const { page } = session;
  await page.goto(`${baseUrl}/sign-in`, { waitUntil: "networkidle" });
  await page.getByLabel("E-mail").fill("qa@fenwick-hydro.test");
  await page.getByLabel("Password").fill(requireEnv("TAULINE_DEMO_PASSWORD"));
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 60_000 });
});

afterAll(async () => {
  await session?.close();
  const db = testDb();
  if (buildId) await db("builds").where({ id: Number(buildId) }).delete();
  await db("bands").where({ case_key: CASE }).delete();
  await db("cases").where({ key: CASE }).delete();
  await closeTestDb();
});

describe("tightening a band", () => {
  it("saves a new version with its reason, shows the diff in the history and re-judges the build judged under the old one", async () => {
    const { page } = session;
    await mkdir("test-results", { recursive: true });
    await page.goto(`${baseUrl}/cases/${CASE}/edit/bands/kappa`, { waitUntil: "load" });
    const form = page.getByRole("form", { name: "New band version" });
    await form.waitFor({ timeout: 60_000 });

    // Limits in the wrong order and no reason: refused in the form, field by field, nothing sent.
    await form.getByLabel("Lower limit").fill("0.45");
    await form.getByLabel("Upper limit").fill("0.40");
    await form.getByRole("button", { name: "Save as version 2" }).click();
    await expect.poll(() => form.innerText()).toMatch(/must not be below the lower limit/);
    expect(await form.innerText()).toMatch(/must say why the band changes \(at least 10 characters\)/);
    expect(await testDb()("bands").where({ case_key: CASE }).count<{ count: string }[]>({ count: "*" })).toEqual([{ count: "1" }]);

    await form.getByLabel("Lower limit").fill("0.408");
    await form.getByLabel("Upper limit").fill("0.43");
    await form.getByLabel("Reason for this change").fill("Tightened to the channel DNS spread after the closure review");
    await form.getByRole("button", { name: "Save as version 2" }).click();

    const v2 = page.locator('[data-version="2"]');
    await v2.waitFor({ timeout: 30_000 });
    const entry = await v2.innerText();
    expect(entry).toMatch(/in force/);
    expect(entry).toMatch(/Tightened to the channel DNS spread/);
    expect(entry).toMatch(/lower limit\s*0\.37 → 0\.408/);
    expect(entry).toMatch(/upper limit\s*0\.44 → 0\.43/);
    await page.screenshot({ path: "test-results/qa-band-history.png", fullPage: true });

    // The build judged under version 1 is preselected; κ = 0.405 is below the new lower limit 0.408.
    const candidate = page.locator(`[data-candidate="${buildId}"]`);
    await candidate.waitFor({ timeout: 30_000 });
    await expect.poll(() => candidate.getByRole("checkbox").isChecked(), { timeout: 20_000 }).toBe(true);
    expect(await candidate.innerText()).toMatch(/within\s*→\s*✕?\s*outside/);
    await page.getByRole("button", { name: /^Re-judge 1 build$/ }).click();
    const outcome = page.getByRole("region", { name: "Re-judged just now" });
    await outcome.waitFor({ timeout: 30_000 });
    expect(await outcome.innerText()).toMatch(/kappa/);
    await page.screenshot({ path: "test-results/qa-band-rejudged.png", fullPage: true });

    await page.goto(`${baseUrl}/builds/${buildId}`, { waitUntil: "load" });
    const note = page.getByTestId("reevaluation-note");
    await note.waitFor({ timeout: 60_000 });
    expect(await note.innerText()).toMatch(/as judged\s*●?\s*within[\s\S]*re-judged\s*✕?\s*outside/);
    await page.screenshot({ path: "test-results/qa-band-build.png" });

    // The case's change record lists the band revision with its diff and the re-judgement.
    await page.goto(`${baseUrl}/cases/${CASE}/edit`, { waitUntil: "load" });
    const record = page.getByRole("list", { name: "Change record" });
    await record.waitFor({ timeout: 60_000 });
    const text = await record.innerText();
    expect(text).toMatch(/band kappa · all models v2[\s\S]*upper limit\s*0\.44 → 0\.43/);
    expect(text).toMatch(/build 0\.0\.0-qa-band re-judged/);
    await page.screenshot({ path: "test-results/qa-band-change-record.png", fullPage: true });
  });
});
