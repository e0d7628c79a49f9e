// HTML and script typed into any free-text field is shown as text on every page
// that displays it, in the CSV export and in the mails — never run. The text is
// written through GraphQL by the role that may write it (the pipeline, the QA
// lead, the release manager, the administrator, a developer), then each page is
// opened in Debian's Chromium: the literal text must be on the page and
// window.__pwned, which the payload would set if it ran, must stay undefined.
// Both checks together: a strict CSP alone would also stop the script, but the
// literal tags being readable as text proves the value was escaped, not parsed.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowserSession, type BrowserSession } from "@/tests/helpers/browser";
import { closeTestDb, testDb } from "@/tests/helpers/db";
import { requireEnv } from "@/tests/helpers/env";
import { postGraphQL } from "@/tests/helpers/graphql";
import { signIn } from "@/tests/helpers/session";
import { waitForStoredMail } from "@/tests/helpers/mail";
import { plantHostileText, plantedPassword, removeHostileText, signInEveryRole, type HostileText, type Planted } from "@/tests/integration/escaping-fixtures";

const baseUrl = requireEnv("TAULINE_TEST_URL");
const TEXT: HostileText = {
  long: `<script>window.__pwned=1</script><img src=x onerror="window.__pwned=2">`,
  short: `<img src=x onerror="window.__pwned=3">`,
  branch: `test/h4-esc/<script>window.__pwned=4</script><img/src=x/onerror=window.__pwned=5>`,
};

type Cookies = Awaited<ReturnType<typeof signInEveryRole>>;
let cookies: Cookies;
let planted: Planted;
let inviteEmail = "";
const sessions: BrowserSession[] = [];

beforeAll(async () => {
  cookies = await signInEveryRole();
  // Outside its band, so the build also sends an alert mail with the same text.
  planted = await plantHostileText(TEXT, cookies, { reattachment: 60 });
  inviteEmail = `esc-invite-${planted.tag}@fenwick-hydro.test`;
  const invited = await postGraphQL({ query: "mutation($input: InviteInput!) { inviteUser(input: $input) { expiresAt } }", variables: { input: { name: TEXT.long, email: inviteEmail, role: "qa" } }, cookie: cookies.admin });
  expect(invited.body.errors).toBeUndefined();
});

afterAll(async () => {
  for (const s of sessions) await s.close();
  if (planted) await removeHostileText(planted);
  const db = testDb();
  const invitee = await db("users").where({ email: inviteEmail }).first("id");
  if (invitee) {
    await db("audit_log").where({ entity: "user", entity_id: String(invitee.id) }).delete();
    await db("users").where({ id: invitee.id }).delete();
  }
  await closeTestDb();
});

/** A browser that carries the session cookie an HTTP sign-in got. */
async function browserWithCookie(cookie: string): Promise<BrowserSession> {
  const session = await openBrowserSession();
  sessions.push(session);
  const pairs = cookie.split("; ").map((pair) => pair.split("="));
  await session.context.addCookies(pairs.map(([name, ...value]) => ({ name, value: value.join("="), url: baseUrl })));
  return session;
}

const browserAs = (role: keyof Cookies) => browserWithCookie(cookies[role]);

/** `texts`: each text with the least number of times the page shows it (one per field named in the test). */
async function expectShownAsText(session: BrowserSession, path: string, texts: [string, number][]) {
  const { page } = session;
  await page.goto(`${baseUrl}${path}`, { waitUntil: "domcontentloaded" });
  for (const [text, times] of texts) {
    const shown = () => page.evaluate((t) => document.body.innerText.split(t).length - 1, text);
    await expect.poll(shown, { timeout: 60_000, message: `${path} shows "${text}" at least ${times}×` }).toBeGreaterThanOrEqual(times);
  }
  expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
  // Nothing of the payload became an element, whether or not a CSP would have stopped it from running.
  const injected = await page.evaluate(() => ({
    images: document.querySelectorAll('img[src="x"], [onerror]').length,
    scripts: [...document.querySelectorAll("script")].filter((el) => (el.textContent ?? "").startsWith("window.__pwned")).length,
  }));
  expect(injected).toEqual({ images: 0, scripts: 0 });
  expect(new URL(page.url()).pathname).toBe(path.split("?")[0]);
}

const q = encodeURIComponent;

describe("free text on the pages", () => {
  let admin: BrowserSession;
  beforeAll(async () => {
    admin = await browserAs("admin");
  });

  it("is text in the build table (solver, version, branch)", async () => {
    await expectShownAsText(admin, `/builds?branch=${q(TEXT.branch)}`, [[TEXT.long, 2], [TEXT.branch, 1]]);
  });

  it("is text on the build page (solver, version, branch, gate comment)", async () => {
    await expectShownAsText(admin, `/builds/${planted.buildId}`, [[TEXT.long, 3], [TEXT.branch, 1]]);
  });

  it("is text on the run page", async () => {
    await expectShownAsText(admin, `/builds/${planted.buildId}/runs/${planted.runId}`, [[TEXT.long, 2]]);
  });

  it("is text on the gate review (solver, version, decision comment, waiver reason, branch)", async () => {
    await expectShownAsText(admin, `/gate/${planted.buildId}`, [[TEXT.long, 4], [TEXT.branch, 1]]);
  });

  it("injects nothing into the gate list and the morning view", async () => {
    await expectShownAsText(admin, "/gate", []);
    await expectShownAsText(admin, "/", []);
  });

  it("is text in the case library and on the case page (title, description, quantity label, unit and meaning, band source)", async () => {
    await expectShownAsText(admin, "/cases", [[TEXT.long, 1]]);
    await expectShownAsText(admin, `/cases/${planted.caseKey}`, [[TEXT.long, 5], [TEXT.short, 1]]);
  });

  it("is text in the case editor's quantity list", async () => {
    await expectShownAsText(admin, `/cases/${planted.caseKey}/edit/quantities`, [[TEXT.long, 1]]);
  });

  it("is text on the trend page (branch and build versions)", async () => {
    await expectShownAsText(admin, `/trends?case=backstep&quantity=reattachment_xr_h&model=sa&branch=${q(TEXT.branch)}`, [[TEXT.branch, 1]]);
  });

  it("is text on the administration page (person's name, token name)", async () => {
    await expectShownAsText(admin, "/admin", [[TEXT.long, 1], [planted.tokenName, 1]]);
  });

  it("is text on the developer's alert settings (subscribed branch)", async () => {
    await expectShownAsText(await browserAs("developer"), "/settings", [[TEXT.branch, 1]]);
  });

  it("is text in the page header of the person whose display name it is", async () => {
    const session = await browserWithCookie(await signIn(planted.userEmail, plantedPassword(planted)));
    await expectShownAsText(session, "/", [[TEXT.long, 1]]);
  });

  it("is text in the administrator's mailbox, whose message view cannot run scripts", async () => {
    await waitForAlert();
    await expectShownAsText(admin, "/admin/mailbox", [[TEXT.long, 1]]);
    const frames = await admin.page.locator("iframe").evaluateAll((els) => els.map((e) => e.getAttribute("sandbox")));
    for (const sandbox of frames) expect(sandbox).toBe("");
  });
});

describe("free text in files and mail", () => {
  it("is a quoted CSV cell in the build export, sent as an attachment, not as a page", async () => {
    const res = await fetch(`${baseUrl}/builds/export?branch=${q(TEXT.branch)}`, { headers: { cookie: cookies.developer } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/^attachment/);
    const body = await res.text();
    // RFC 4180 §2.7: a field holding quotes is quoted and its quotes doubled.
    expect(body).toContain(`"${TEXT.long.replace(/"/g, '""')}"`);
  });

  it("is escaped in the alert mail's HTML part and literal in its text part", async () => {
    const [message] = await waitForAlert();
    const html = String(message.mail.html);
    expect(html).not.toContain("<script>window.__pwned");
    expect(html).not.toContain("<img src=x");
    expect(html).toContain("&lt;script&gt;window.__pwned=1&lt;/script&gt;&lt;img src=x onerror=");
    expect(message.mail.text).toContain(TEXT.long);
  });

  it("is escaped in the invitation mail's HTML part", async () => {
    const [message] = await waitForStoredMail(inviteEmail, { timeoutMs: 45_000 });
    const html = String(message.mail.html);
    expect(html).not.toContain("<script>window.__pwned");
    expect(html).toContain("&lt;script&gt;window.__pwned=1&lt;/script&gt;");
  });
});

function waitForAlert() {
  const commit = planted.commit.slice(0, 10);
  return waitForStoredMail("", { timeoutMs: 45_000, where: (m) => String(m.mail.html ?? "").includes(commit) && String(m.mail.subject ?? "").includes("Tauline") });
}
