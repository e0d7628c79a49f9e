// "My alerts" and the administrator's mailbox through the real pages in
// Debian's Chromium: a person manages their own subscriptions; the admin reads
// an alert with its HTML part in a sandboxed frame; other roles are refused.
import { afterEach, describe, expect, it } from "vitest";
import { openBrowserSession, signInThroughForm, type BrowserSession } from "@/tests/helpers/browser";
import { requireEnv } from "@/tests/helpers/env";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "@/tests/helpers/graphql";
import { waitForStoredMail } from "@/tests/helpers/mail";

const baseUrl = requireEnv("TAULINE_TEST_URL");
const password = () => requireEnv("TAULINE_DEMO_PASSWORD");
let session: BrowserSession | undefined;

afterEach(async () => {
  await session?.close();
  session = undefined;
});

describe("My alerts page", () => {
  it("lets the QA lead subscribe to a case on a branch, switch the delivery, see a refused branch named, and remove it", async () => {
    session = await openBrowserSession();
    const { page } = session;
    await signInThroughForm(page, baseUrl, "qa@fenwick-hydro.test", password());
    await page.goto(`${baseUrl}/settings`);
    const branch = `test/alerts-ui-${randomCommit().slice(0, 6)}`;
    const form = page.getByRole("form", { name: "Add an alert subscription" });
    await form.getByLabel("Case").selectOption("backstep");
    await form.getByLabel("Branch (empty: every branch)").fill(branch);
    await form.getByLabel("hourly digest").check();
    await form.getByRole("button", { name: "Subscribe" }).click();

    const row = page.locator(`[data-subscription="backstep@${branch}"]`);
    await expect.poll(() => row.count(), { timeout: 15_000 }).toBe(1);
    expect(await row.locator("select").inputValue()).toBe("digest");
    await row.locator("select").selectOption("immediate");
    await expect.poll(async () => (await postGraphQL<{ myAlerts: { subscriptions: { branch: string; mode: string }[] } }>({ query: "{ myAlerts { subscriptions { branch mode } } }", cookie: await cookieOf(session!) })).body.data?.myAlerts.subscriptions.find((s) => s.branch === branch)?.mode).toBe("immediate");

    await form.getByLabel("Branch (empty: every branch)").fill("main branch");
    await form.getByRole("button", { name: "Subscribe" }).click();
    await expect.poll(() => form.getByRole("alert").innerText()).toMatch(/^Branch is not a git branch name/);

    await row.getByRole("button", { name: "Remove" }).click();
    await expect.poll(() => row.count(), { timeout: 15_000 }).toBe(0);
  });
});

describe("Mailbox page", () => {
  it("shows the admin a stored alert: envelope with Bcc, plain text, and the HTML part only inside a sandboxed frame", async () => {
    const commit = randomCommit();
    const t = Array.from({ length: 60 }, (_, i) => i * 0.5);
    // k–ε decay with Cε2 = 1.87: n = 1/0.87 = 1.149, outside the k–ε band (reference sheet §2.2).
    const series = [{ key: "k_decay", x: t, y: t.map((ti) => 1.5 * Math.pow(1 + (0.87 * 0.9 * ti) / 1.5, -1 / 0.87)) }];
    const res = await postGraphQL<{ submitResults: { build: { id: string } } }>({
      query: SUBMIT,
      token: ciToken(),
      variables: { input: { build: { solver: "Cormorant", version: "9.9.0-mailbox <b>ui</b>", commit, branch: "test/alerts-ui" }, runs: [{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series }] } },
    });
    const buildId = res.body.data!.submitResults.build.id;
    const [stored] = await waitForStoredMail(`X-Tauline-Event: alert:build:${buildId}:`);

    session = await openBrowserSession();
    const { page } = session;
    await signInThroughForm(page, baseUrl, "admin@fenwick-hydro.test", password());
    await page.goto(`${baseUrl}/admin/mailbox?message=${encodeURIComponent(stored.name)}`);
    const message = page.getByRole("article", { name: "Message" });
    await expect.poll(() => message.locator("h3").innerText(), { timeout: 20_000 }).toContain("9.9.0-mailbox <b>ui</b>");
    expect(await message.innerText()).toContain("release@fenwick-hydro.test");
    expect(await message.locator("pre").innerText()).toContain("Decay exponent n (decay_exponent) = 1.149");

    await message.getByRole("tab", { name: "HTML (sandboxed)" }).click();
    const frame = message.locator("iframe");
    expect(await frame.getAttribute("sandbox")).toBe("");
    const inner = page.frameLocator("iframe").locator("body");
    await expect.poll(() => inner.innerText()).toContain("Outside the band (1)");
    // The version's markup arrived as text: no <b> element inside the frame.
    expect(await page.frameLocator("iframe").locator("h2 b").count()).toBe(0);
  });

  it("refuses the mailbox to a release manager on the page and in the API", async () => {
    session = await openBrowserSession();
    const { page } = session;
    await signInThroughForm(page, baseUrl, "release@fenwick-hydro.test", password());
    await page.goto(`${baseUrl}/admin/mailbox`);
    // (Next adds a route announcer with role alert of its own, hence the filter.)
    await expect.poll(() => page.getByRole("alert").filter({ hasText: "Administrators only" }).count()).toBe(1);
    expect(await page.getByRole("list", { name: "Stored messages" }).count()).toBe(0);
    const api = await postGraphQL({ query: "{ storedMail { total } }", cookie: await cookieOf(session) });
    expect(api.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
  });
});

async function cookieOf(s: BrowserSession): Promise<string> {
  return (await s.context.cookies(baseUrl)).map((c) => `${c.name}=${c.value}`).join("; ");
}
