// The release manager's decision, through the real pages in Debian's Chromium:
// a fresh candidate with the step's reattachment length outside its band waits
// in the gate; she opens it, sees the caution and the blocker, grants a waiver,
// approves with a comment and sees the state change. The build is posted by
// the test on a release branch of its own; the demo's candidate stays pending.
import { mkdir } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowserSession, signInThroughForm, type BrowserSession } from "@/tests/helpers/browser";
import { closeTestDb, testDb } from "@/tests/helpers/db";
import { requireEnv } from "@/tests/helpers/env";
import { randomCommit } from "@/tests/helpers/graphql";
import { postStepBuild, XR_OUTSIDE, type PostedBuild } from "@/tests/integration/gate-helpers";

const baseUrl = requireEnv("TAULINE_TEST_URL");
const BRANCH = `release/9.7-test-${randomCommit().slice(0, 6)}`;
let session: BrowserSession;
let build: PostedBuild;

beforeAll(async () => {
  await mkdir("test-results", { recursive: true });
  build = await postStepBuild({ branch: BRANCH, xr: XR_OUTSIDE, version: "9.7.0-rc.1" });
  session = await openBrowserSession();
  await signInThroughForm(session.page, baseUrl, "release@fenwick-hydro.test", requireEnv("TAULINE_DEMO_PASSWORD"));
});

afterAll(async () => {
  await session?.close();
  await closeTestDb();
});

describe("approving a release candidate", () => {
  it("finds the waiting candidate, waives its outside quantity, approves it and sees it approved", async () => {
    const { page } = session;
    await page.goto(`${baseUrl}/gate?branch=${encodeURIComponent(BRANCH)}`, { waitUntil: "networkidle" });
    const row = page.locator(`[data-candidate="${build.id}"]`);
    await row.waitFor({ timeout: 30_000 });
    expect(await row.innerText()).toMatch(/1 blocks approval/);
    await page.screenshot({ path: "test-results/gate-candidates.png", fullPage: true });

    await row.getByRole("link", { name: /review and decide/i }).click();
    await page.waitForURL(new RegExp(`/gate/${build.id}$`), { timeout: 30_000 });
    // The caution comes first, before anything that reads like a clearance.
    await expect.poll(() => page.getByRole("note").innerText()).toMatch(/does not validate the solver for a particular design/);
    expect(await page.getByRole("note").innerText()).toMatch(/codes, standards and licensed engineering practice govern/);
    const blocker = page.locator('[data-blocker="backstep/sa/reattachment_xr_h"]');
    await blocker.waitFor({ timeout: 30_000 });
    expect(await blocker.innerText()).toMatch(/outside\s+7\.4\s+band 5\.97 – 6\.92/);
    const approve = page.getByRole("button", { name: "Approve" });
    expect(await approve.isDisabled()).toBe(true);
    await page.screenshot({ path: "test-results/gate-review-blocked.png", fullPage: true });

    await blocker.getByRole("button", { name: /grant a waiver/i }).click();
    await page.getByLabel(/why it may pass/i).fill("Reattachment on the coarse step grid under review; the fine-grid rerun is within its band.");
    await page.getByRole("button", { name: "Grant waiver" }).click();
    await page.getByTestId("no-blockers").waitFor({ timeout: 30_000 });
    expect(await page.getByTestId("waived").innerText()).toMatch(/coarse step grid/);

    await page.getByLabel(/^comment/i).fill("Approved with the reattachment waiver; every other case within its band.");
    await expect.poll(() => approve.isDisabled()).toBe(false);
    await approve.click();
    await expect.poll(() => page.getByTestId("gate-state").innerText(), { timeout: 30_000 }).toMatch(/approved/);
    expect(await page.getByTestId("decision-history").innerText()).toMatch(/Approved with the reattachment waiver/);
    await page.screenshot({ path: "test-results/release-approve.png", fullPage: true });

    const [decision] = await testDb()("gate_decisions").where({ build_id: Number(build.id) });
    expect(decision.state).toBe("approved");
  });
});
