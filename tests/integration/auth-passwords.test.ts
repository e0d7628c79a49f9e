import bcrypt from "bcryptjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { postGraphQL } from "../helpers/graphql";
import { signIn } from "../helpers/session";

// Stored password hashes use bcrypt with a cost factor of at least 10 (2^10
// rounds of the key schedule), the floor OWASP's Password Storage Cheat Sheet
// gives for bcrypt (common practice). The cost is read two ways from the
// stored string: the modular crypt format `$2a$<cost>$<22-char salt><31-char
// hash>` (Provos & Mazières 1999, "A Future-Adaptable Password Scheme"), and
// bcryptjs's own getRounds as a cross-check.

const MIN_COST = 10;
const TAG = `itest-passwords-${Date.now().toString(36)}`;
const email = (what: string) => `${TAG}-${what}@fenwick-hydro.test`;
let admin = "";

beforeAll(async () => {
  admin = await signIn("admin@fenwick-hydro.test");
});

afterAll(async () => {
  const db = testDb();
  const ids = await db("users").where("email", "like", `${TAG}-%`).pluck("id");
  await db("audit_log").where({ entity: "user" }).whereIn("entity_id", ids.map(String)).delete();
  await db("mail_outbox").where({ kind: "invite" }).whereRaw("recipients[1] like ?", [`${TAG}-%`]).delete();
  await db("users").whereIn("id", ids).delete();
  await closeTestDb();
});

function costOf(hash: string): number {
  const match = /^\$2[abxy]\$(\d{2})\$[./A-Za-z0-9]{53}$/.exec(hash);
  expect(match, `not a bcrypt hash: ${hash.slice(0, 7)}…`).not.toBeNull();
  const cost = Number(match![1]);
  expect(bcrypt.getRounds(hash)).toBe(cost);
  return cost;
}

async function storedHash(address: string): Promise<string> {
  const row = await testDb()("users").where({ email: address }).first("password_hash");
  expect(row, `no user ${address}`).toBeDefined();
  return row.password_hash;
}

const gql = <T,>(query: string, variables?: Record<string, unknown>) => postGraphQL<T>({ query, variables, cookie: admin });

describe("bcrypt cost of stored passwords", () => {
  it(`stores the demo accounts' passwords with cost ≥ ${MIN_COST}`, async () => {
    const hashes = await testDb()("users").where("email", "like", "%@fenwick-hydro.test").whereIn("email", ["developer@fenwick-hydro.test", "qa@fenwick-hydro.test", "release@fenwick-hydro.test", "admin@fenwick-hydro.test"]).pluck("password_hash");
    expect(hashes).toHaveLength(4);
    for (const hash of hashes) expect(costOf(hash)).toBeGreaterThanOrEqual(MIN_COST);
  });

  it(`hashes a password an administrator sets for a new account with cost ≥ ${MIN_COST}`, async () => {
    const res = await gql("mutation($input: NewUserInput!) { createUser(input: $input) { id } }", { input: { name: "Cost check", email: email("created"), role: "developer", password: "boundary-layer-44" } });
    expect(res.body.errors).toBeUndefined();
    const hash = await storedHash(email("created"));
    expect(costOf(hash)).toBeGreaterThanOrEqual(MIN_COST);
    expect(await bcrypt.compare("boundary-layer-44", hash)).toBe(true);
  });

  it(`hashes a password set through an invitation link with cost ≥ ${MIN_COST}`, async () => {
    const invited = await gql<{ inviteUser: { url: string } }>("mutation($input: InviteInput!) { inviteUser(input: $input) { url } }", { input: { name: "Invited cost check", email: email("invited"), role: "qa" } });
    expect(invited.body.errors).toBeUndefined();
    const token = invited.body.data!.inviteUser.url.split("/invite/")[1];
    const set = await postGraphQL({ query: "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", variables: { input: { token, password: "log-law-intercept-5" } } });
    expect(set.body.errors).toBeUndefined();
    const hash = await storedHash(email("invited"));
    expect(costOf(hash)).toBeGreaterThanOrEqual(MIN_COST);
    expect(await bcrypt.compare("log-law-intercept-5", hash)).toBe(true);
  });

  it(`hashes a password changed through a reset link with cost ≥ ${MIN_COST}`, async () => {
    const created = await gql<{ createUser: { id: string } }>("mutation($input: NewUserInput!) { createUser(input: $input) { id } }", { input: { name: "Reset cost check", email: email("reset"), role: "developer", password: "first-password-1" } });
    const link = await gql<{ issuePasswordLink: { url: string } }>("mutation($id: ID!) { issuePasswordLink(userId: $id) { url } }", { id: created.body.data!.createUser.id });
    const token = link.body.data!.issuePasswordLink.url.split("/invite/")[1];
    const set = await postGraphQL({ query: "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", variables: { input: { token, password: "second-password-2" } } });
    expect(set.body.errors).toBeUndefined();
    const hash = await storedHash(email("reset"));
    expect(costOf(hash)).toBeGreaterThanOrEqual(MIN_COST);
    expect(await bcrypt.compare("second-password-2", hash)).toBe(true);
  });
});
