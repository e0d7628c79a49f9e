import { afterAll, describe, expect, it } from "vitest";
import type { BrowserContext } from "playwright-core";
import { closeTestDb, testDb } from "../helpers/db";
import { openBrowserSession, type BrowserSession } from "../helpers/browser";
import { requireEnv } from "../helpers/env";

// The administrator's journey in a real browser: invite someone, hand over the
// link shown once, the invitee sets a password and is signed in with the role
// given, a CI token's secret is shown once, and switching someone off locks
// them out of the page they have open.

const TAG = `itest-ui-${Date.now().toString(36)}`;
const INVITEE = `${TAG}@fenwick-hydro.test`;
const sessions: BrowserSession[] = [];

afterAll(async () => {
  for (const s of sessions) await s.close();
  const db = testDb();
  const users = await db("users").where({ email: INVITEE }).pluck("id");
  const tokens = await db("ci_tokens").where("name", "like", `${TAG}%`).pluck("id");
  await db("audit_log").where({ entity: "user" }).whereIn("entity_id", users.map(String)).delete();
  await db("audit_log").where({ entity: "ci_token" }).whereIn("entity_id", tokens.map(String)).delete();
  await db("mail_outbox").where({ kind: "invite" }).whereRaw("recipients[1] = ?", [INVITEE]).delete();
  await db("ci_tokens").whereIn("id", tokens).delete();
  await db("users").whereIn("id", users).delete();
  await closeTestDb();
});

/** A development server reloads open pages when other files change; the production build used by `npm test` has no such socket. */
async function ignoreDevReloads(context: BrowserContext) {
  await context.routeWebSocket(/hmr/, (ws) => {
    const server = ws.connectToServer();
    ws.onMessage((m) => server.send(m));
    server.onMessage((m) => {
      if (!/reloadPage|"type":"restart"/.test(String(m))) ws.send(m);
    });
  });
}

async function open() {
  const s = await openBrowserSession();
  sessions.push(s);
  await ignoreDevReloads(s.context);
  return s.page;
}

describe("administration screen", () => {
  it("invites a person whose link sets the password and signs them in, shows a token's secret once, and locks out a deactivated person", async () => {
    const base = requireEnv("TAULINE_TEST_URL");
    const admin = await open();
    // The form must be live before typing (a development server hydrates slowly): wait for the network to settle.
    await admin.goto(`${base}/sign-in`, { waitUntil: "networkidle" });
    await admin.getByLabel("E-mail").fill("admin@fenwick-hydro.test");
    await admin.getByLabel("Password").fill(requireEnv("TAULINE_DEMO_PASSWORD"));
    await admin.getByRole("button", { name: "Sign in" }).click();
    await admin.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 60_000 });
    await admin.goto(`${base}/admin`, { waitUntil: "networkidle" });

    await admin.getByLabel("Name", { exact: true }).first().fill("Browser Invitee");
    await admin.getByLabel("E-mail", { exact: true }).fill(INVITEE);
    await admin.getByLabel("Role", { exact: true }).selectOption("release");
    await admin.getByRole("button", { name: "Invite", exact: true }).click();
    const link = (await admin.getByTestId("one-time-secret").textContent({ timeout: 60_000 }))?.trim() ?? "";
    expect(link).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    await expect.poll(() => admin.locator(`tr[data-account="${INVITEE}"]`).textContent()).toContain("invited");

    await admin.getByRole("button", { name: "Done, hide it" }).click();
    await admin.locator('input[name="name"]').last().fill(`${TAG} nightly`);
    await admin.getByRole("button", { name: "Create token" }).click();
    const secret = (await admin.getByTestId("one-time-secret").textContent({ timeout: 60_000 }))?.trim() ?? "";
    expect(secret).toMatch(/^tl_[A-Za-z0-9_-]{43}$/);
    await admin.getByRole("button", { name: "Done, hide it" }).click();
    await admin.reload();
    expect(await admin.content()).not.toContain(secret);

    const invitee = await open();
    await invitee.goto(link.replace(/^https?:\/\/[^/]+/, base), { waitUntil: "networkidle" });
    await expect.poll(() => invitee.locator("h1").textContent()).toBe("Set your Tauline password");
    expect(await invitee.content()).toContain("Browser Invitee");
    await invitee.getByLabel("New password").fill("boundary-layer-77");
    await invitee.getByLabel("The same again").fill("boundary-layer-77");
    await invitee.getByRole("button", { name: "Set password and sign in" }).click();
    await invitee.waitForURL((u) => u.pathname === "/", { timeout: 60_000 });
    await expect.poll(() => invitee.getByTestId("role").textContent()).toBe("release manager");

    await admin.reload();
    const row = admin.locator(`tr[data-account="${INVITEE}"]`);
    await expect.poll(() => row.textContent()).toContain("active");
    await row.getByRole("button", { name: "Deactivate" }).click();
    await row.getByRole("button", { name: /Lock .* out/ }).click();
    await expect.poll(() => row.textContent()).toContain("deactivated");

    await invitee.goto(`${base}/builds`);
    await invitee.waitForURL((u) => u.pathname.startsWith("/sign-in"), { timeout: 60_000 });
  }, 240_000);
});
