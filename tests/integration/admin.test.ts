import { createHash } from "node:crypto";
import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";
import { simpleParser } from "mailparser";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { SUBMIT, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { requireEnv } from "../helpers/env";

// Users, roles and CI tokens over real HTTP: a revoked or expired token and a
// deactivated person are refused on the very next request, a role change counts
// at once, an invited person gets in only through the one-time link.

const TAG = `itest-admin-${Date.now().toString(36)}`;
const email = (what: string) => `${TAG}-${what}@fenwick-hydro.test`;
const PASSWORD = "pressure-gradient-1";
let admin = "";

beforeAll(async () => {
  admin = await signIn("admin@fenwick-hydro.test");
});

afterAll(async () => {
  // The shared development database keeps the demo clean: remove what this file made.
  const db = testDb();
  const users = await db("users").where("email", "like", `${TAG}-%`).pluck("id");
  const tokens = await db("ci_tokens").where("name", "like", `${TAG}%`).pluck("id");
  await db("audit_log").where({ entity: "user" }).whereIn("entity_id", users.map(String)).delete();
  await db("audit_log").where({ entity: "ci_token" }).whereIn("entity_id", tokens.map(String)).delete();
  await db("mail_outbox").where({ kind: "invite" }).whereRaw("recipients[1] like ?", [`${TAG}-%`]).delete();
  await db("ci_tokens").whereIn("id", tokens).delete();
  await db("users").whereIn("id", users).delete();
  await closeTestDb();
});

const gql = <T = Record<string, unknown>>(cookie: string | undefined, query: string, variables?: Record<string, unknown>) => postGraphQL<T>({ query, variables, cookie });

async function createToken(name: string, expiresAt: string | null = null) {
  const res = await gql<{ createCiToken: { secret: string; token: { id: string; status: string } } }>(
    admin,
    "mutation($input: CiTokenInput!) { createCiToken(input: $input) { secret token { id status } } }",
    { input: { name, expiresAt } },
  );
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.createCiToken;
}

const submitWith = (token: string) =>
  postGraphQL({
    query: SUBMIT,
    variables: { input: { build: { solver: "Cormorant", version: "0.0.0-admin", commit: randomCommit(), branch: "test/admin" }, runs: [{ case: "backstep", model: "sa", status: "COMPLETED" }] } },
    token,
  });

async function createUser(what: string, role = "developer") {
  const res = await gql<{ createUser: { id: string; status: string } }>(admin, "mutation($input: NewUserInput!) { createUser(input: $input) { id status role } }", {
    input: { name: `Test ${what}`, email: email(what), role, password: PASSWORD },
  });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.createUser;
}

describe("CI tokens", () => {
  it("creates a token that works for submitResults, stores only its SHA-256, and refuses it with 401 right after revocation", async () => {
    const { secret, token } = await createToken(`${TAG} pipeline`);
    expect(secret).toMatch(/^tl_[A-Za-z0-9_-]{43}$/);
    expect(token.status).toBe("usable");
    const row = await testDb()("ci_tokens").where({ id: token.id }).first();
    // SHA-256 as FIPS 180-4 defines it, via Node's OpenSSL binding (not the project's code).
    expect(row.token_hash).toBe(createHash("sha256").update(secret).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(secret.slice(3));

    const accepted = await submitWith(secret);
    expect(accepted.body.errors).toBeUndefined();
    expect(accepted.status).toBe(200);
    const used = await testDb()("ci_tokens").where({ id: token.id }).first();
    expect(used.last_used_at).not.toBeNull();

    const revoked = await gql<{ revokeCiToken: { status: string } }>(admin, "mutation($id: ID!) { revokeCiToken(id: $id) { status revokedAt } }", { id: token.id });
    expect(revoked.body.data?.revokeCiToken.status).toBe("revoked");
    const refused = await submitWith(secret);
    expect(refused.status).toBe(401);
    expect(refused.body.errors?.[0]?.extensions?.code).toBe("UNAUTHENTICATED");

    const audit = await testDb()("audit_log").where({ entity: "ci_token", entity_id: token.id }).orderBy("id").pluck("action");
    expect(audit).toEqual(["ci_token.created", "ci_token.revoked"]);
  });

  it("refuses a token with 401 once its expiry has passed", async () => {
    const { secret, token } = await createToken(`${TAG} short-lived`, new Date(Date.now() + 3_600_000).toISOString());
    expect((await submitWith(secret)).status).toBe(200);
    await testDb()("ci_tokens").where({ id: token.id }).update({ expires_at: new Date(Date.now() - 1000) });
    const refused = await submitWith(secret);
    expect(refused.status).toBe(401);
    const list = await gql<{ ciTokens: { id: string; status: string }[] }>(admin, "{ ciTokens { id status } }");
    expect(list.body.data!.ciTokens.find((t) => t.id === token.id)?.status).toBe("expired");
  });

  it("names the field when the expiry is already past, and refuses revoking twice", async () => {
    const res = await gql(admin, "mutation($input: CiTokenInput!) { createCiToken(input: $input) { secret } }", { input: { name: `${TAG} stale`, expiresAt: "2020-01-01T00:00:00Z" } });
    expect(res.body.errors?.[0]?.extensions?.issues?.map((i) => i.path)).toEqual(["input.expiresAt"]);
    const { token } = await createToken(`${TAG} twice`);
    await gql(admin, "mutation($id: ID!) { revokeCiToken(id: $id) { id } }", { id: token.id });
    const again = await gql(admin, "mutation($id: ID!) { revokeCiToken(id: $id) { id } }", { id: token.id });
    expect(again.body.errors?.[0]?.extensions?.code).toBe("CONFLICT");
  });
});

describe("people", () => {
  it("refuses a deactivated person's existing session on the next request and at sign-in, and lets them back after reactivation", async () => {
    const user = await createUser("leaver");
    const cookie = await signIn(email("leaver"), PASSWORD);
    expect((await gql(cookie, "{ branches }")).body.errors).toBeUndefined();

    const off = await gql<{ deactivateUser: { status: string } }>(admin, "mutation($id: ID!) { deactivateUser(userId: $id) { status deactivatedAt } }", { id: user.id });
    expect(off.body.data?.deactivateUser.status).toBe("deactivated");
    const refused = await gql(cookie, "{ branches }");
    expect(refused.status).toBe(401);
    expect(refused.body.errors?.[0]?.extensions?.code).toBe("UNAUTHENTICATED");
    await expect(signIn(email("leaver"), PASSWORD)).rejects.toThrow(/sign-in .* failed/);
    // The dashboard no longer lets the stale cookie in either.
    const page = await fetch(`${requireEnv("TAULINE_TEST_URL")}/builds`, { headers: { cookie }, redirect: "manual" });
    expect([302, 303, 307, 308]).toContain(page.status);

    await gql(admin, "mutation($id: ID!) { reactivateUser(userId: $id) { status } }", { id: user.id });
    // Switching back on does not revive the cookie from before the switch-off; a fresh sign-in works.
    expect((await gql(cookie, "{ branches }")).status).toBe(401);
    const back = await signIn(email("leaver"), PASSWORD);
    expect((await gql(back, "{ branches }")).body.errors).toBeUndefined();
  });

  it("ends the sessions opened with the old password when a password is reset through a link", async () => {
    const user = await createUser("forgetful");
    const before = await signIn(email("forgetful"), PASSWORD);
    const res = await gql<{ issuePasswordLink: { url: string; account: { status: string } } }>(admin, "mutation($id: ID!) { issuePasswordLink(userId: $id) { url account { status } } }", { id: user.id });
    expect(res.body.data!.issuePasswordLink.account.status).toBe("active");
    // Until the link is used, the old password and its session keep working.
    expect((await gql(before, "{ branches }")).body.errors).toBeUndefined();
    const token = res.body.data!.issuePasswordLink.url.split("/invite/")[1];
    const set = await postGraphQL({ query: "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", variables: { input: { token, password: "separation-bubble-9" } } });
    expect(set.body.errors).toBeUndefined();
    expect((await gql(before, "{ branches }")).status).toBe(401);
    await expect(signIn(email("forgetful"), PASSWORD)).rejects.toThrow();
    const after = await signIn(email("forgetful"), "separation-bubble-9");
    expect((await gql(after, "{ branches }")).body.errors).toBeUndefined();
  });

  it("applies a role change on the next request of an existing session", async () => {
    const user = await createUser("promoted");
    const cookie = await signIn(email("promoted"), PASSWORD);
    const before = await gql(cookie, "{ userAccounts { id } }");
    expect(before.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
    await gql(admin, "mutation($id: ID!) { setUserRole(userId: $id, role: admin) { role } }", { id: user.id });
    const after = await gql<{ userAccounts: { id: string }[] }>(cookie, "{ userAccounts { id } }");
    expect(after.body.errors).toBeUndefined();
    await gql(admin, "mutation($id: ID!) { setUserRole(userId: $id, role: qa) { role } }", { id: user.id });
    expect((await gql(cookie, "{ userAccounts { id } }")).body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
    const audit = await testDb()("audit_log").where({ entity: "user", entity_id: user.id, action: "user.role_changed" }).orderBy("id");
    expect(audit.map((a) => [a.details.from, a.details.to])).toEqual([["developer", "admin"], ["admin", "qa"]]);
  });

  it("refuses an administrator deactivating or demoting themselves, and a second account on the same e-mail", async () => {
    const me = await testDb()("users").where({ email: "admin@fenwick-hydro.test" }).first("id");
    const off = await gql(admin, "mutation($id: ID!) { deactivateUser(userId: $id) { id } }", { id: String(me.id) });
    expect(off.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
    const demote = await gql(admin, "mutation($id: ID!) { setUserRole(userId: $id, role: developer) { id } }", { id: String(me.id) });
    expect(demote.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
    expect((await testDb()("users").where({ id: me.id }).first()).active).toBe(true);
    await createUser("twin");
    const twin = await gql(admin, "mutation($input: NewUserInput!) { createUser(input: $input) { id } }", { input: { name: "Twin", email: email("twin").toUpperCase(), role: "qa", password: PASSWORD } });
    expect(twin.body.errors?.[0]?.extensions?.code).toBe("CONFLICT");
  });

  it("refuses every non-administrator and changes nothing", async () => {
    const target = await createUser("bystander");
    for (const role of ["developer", "qa", "release"]) {
      const cookie = await signIn(`${role}@fenwick-hydro.test`);
      const off = await gql(cookie, "mutation($id: ID!) { deactivateUser(userId: $id) { id } }", { id: target.id });
      expect(off.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
      const promote = await gql(cookie, "mutation($id: ID!) { setUserRole(userId: $id, role: admin) { id } }", { id: target.id });
      expect(promote.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
      const token = await gql(cookie, "mutation($input: CiTokenInput!) { createCiToken(input: $input) { secret } }", { input: { name: `${TAG} by ${role}` } });
      expect(token.status).toBe(403);
    }
    const row = await testDb()("users").where({ id: target.id }).first();
    expect([row.role, row.active]).toEqual(["developer", true]);
    expect(await testDb()("ci_tokens").where("name", "like", `${TAG} by %`).pluck("id")).toEqual([]);
  });

  it("stores a bcrypt hash of cost 10 or more and never returns the password", async () => {
    const res = await gql(admin, "mutation($input: NewUserInput!) { createUser(input: $input) { id name email role status } }", {
      input: { name: "Hash Check", email: email("hash"), role: "qa", password: PASSWORD },
    });
    expect(JSON.stringify(res.body)).not.toContain(PASSWORD);
    const row = await testDb()("users").where({ email: email("hash") }).first();
    // Modular crypt format $2a$/$2b$, two-digit cost (Provos & Mazières 1999; format common practice).
    const cost = Number(/^\$2[aby]\$(\d\d)\$/.exec(row.password_hash)?.[1]);
    expect(cost).toBeGreaterThanOrEqual(10);
  });
});

/** The link goes out once through the outbox to the account's own address; with the test stack's SMTP fake, as a real message. */
async function expectLinkMailed(to: string, url: string) {
  const rows = await testDb()("mail_outbox").where({ kind: "invite" }).whereRaw("? = any(recipients)", [to]);
  expect(rows).toHaveLength(1);
  expect(rows[0].recipients).toEqual([to]);
  expect(rows[0].text_body).toContain(url);
  const dir = process.env.MAIL_DIR;
  if (!dir) return; // the shared dev server may have no SMTP fake listening; the outbox row is the contract
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    for (const name of (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith(".eml"))) {
      const mail = await simpleParser(await readFile(join(dir, name)));
      const address = (Array.isArray(mail.to) ? mail.to[0] : mail.to)?.value[0]?.address;
      if (address === to) {
        expect(mail.text).toContain(url);
        expect(mail.html || "").toContain(url);
        return;
      }
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no set-password mail to ${to} in ${dir}`);
}

describe("invitations", () => {
  it("invites a person who cannot sign in until they set a password through the link, which then works only once", async () => {
    const res = await gql<{ inviteUser: { url: string; expiresAt: string; account: { id: string; status: string } } }>(
      admin,
      "mutation($input: InviteInput!) { inviteUser(input: $input) { url expiresAt account { id status } } }",
      { input: { name: "Invited Engineer", email: email("invited"), role: "release" } },
    );
    expect(res.body.errors).toBeUndefined();
    const invite = res.body.data!.inviteUser;
    expect(invite.account.status).toBe("invited");
    const token = invite.url.split("/invite/")[1];
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(await testDb()("user_invites").where({ token_hash: createHash("sha256").update(token).digest("hex") }).first()).toBeDefined();
    await expectLinkMailed(email("invited"), invite.url);

    const page = await fetch(`${requireEnv("TAULINE_TEST_URL")}/invite/${token}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Invited Engineer");

    const set = await postGraphQL<{ setPasswordWithLink: { email: string } }>({ query: "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", variables: { input: { token, password: PASSWORD } } });
    expect(set.body.data?.setPasswordWithLink.email).toBe(email("invited"));
    const cookie = await signIn(email("invited"), PASSWORD);
    expect((await gql(cookie, "{ branches }")).body.errors).toBeUndefined();

    const reuse = await postGraphQL({ query: "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", variables: { input: { token, password: "another-password-2" } } });
    expect(reuse.body.errors?.[0]?.message).toMatch(/already been used/);
  });

  it("refuses an expired link and a link voided by a newer one", async () => {
    const res = await gql<{ inviteUser: { url: string; account: { id: string } } }>(admin, "mutation($input: InviteInput!) { inviteUser(input: $input) { url account { id } } }", {
      input: { name: "Late Engineer", email: email("late"), role: "developer" },
    });
    const first = res.body.data!.inviteUser.url.split("/invite/")[1];
    const renewed = await gql<{ issuePasswordLink: { url: string } }>(admin, "mutation($id: ID!) { issuePasswordLink(userId: $id) { url } }", { id: res.body.data!.inviteUser.account.id });
    const second = renewed.body.data!.issuePasswordLink.url.split("/invite/")[1];
    const attempt = (token: string) => postGraphQL({ query: "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", variables: { input: { token, password: PASSWORD } } });
    expect((await attempt(first)).body.errors?.[0]?.message).toMatch(/expired/);
    await testDb()("user_invites").where({ token_hash: createHash("sha256").update(second).digest("hex") }).update({ expires_at: new Date(Date.now() - 1000) });
    expect((await attempt(second)).body.errors?.[0]?.message).toMatch(/expired/);
    await expect(signIn(email("late"), PASSWORD)).rejects.toThrow();
  });
});
