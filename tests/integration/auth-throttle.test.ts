import { createHash } from "node:crypto";
import bcrypt from "bcryptjs";
import { afterAll, describe, expect, it } from "vitest";
import { getEnv } from "@/lib/env";
import { closeTestDb, testDb } from "../helpers/db";
import { freshLoopbackAddress, openSignInClient } from "./auth-sign-in-client";

// Sign-in throttling through the real next-auth credentials sign-in, on
// throwaway accounts (the demo accounts stay usable for tests running beside
// this one) and from loopback addresses of this file's own (127.x.y.z), so the
// per-address counts never touch 127.0.0.1, which the rest of the suite shares.
// Limits are read from the same settings the server reads (lib/env.ts):
// SIGNIN_ACCOUNT_LIMIT (default 5), SIGNIN_ADDRESS_LIMIT (30), SIGNIN_WINDOW_MINUTES (15).

const env = getEnv();
const TAG = `itest-throttle-${Date.now().toString(36)}`;
const PASSWORD = "wall-shear-stress-7";
const made: string[] = [];
const addresses: string[] = [];

async function throwawayUser(what: string): Promise<string> {
  const email = `${TAG}-${what}@fenwick-hydro.test`;
  // Cost 4 keeps these sign-ins fast; the cost of real hashes is checked in auth-passwords.test.ts.
  await testDb()("users").insert({ email, name: `Throttle ${what}`, role: "developer", password_hash: bcrypt.hashSync(PASSWORD, 4), active: true });
  made.push(email);
  return email;
}

async function client() {
  const from = freshLoopbackAddress();
  addresses.push(from);
  return openSignInClient(from);
}

const accountKey = (email: string) => `account:${createHash("sha256").update(email).digest("hex")}`;
const windowSeconds = env.SIGNIN_WINDOW_MINUTES * 60;

afterAll(async () => {
  const db = testDb();
  await db("sign_in_throttle").whereIn("key", made.map(accountKey)).delete();
  await db("sign_in_throttle").whereIn("key", addresses.map((a) => `address:${a}`)).delete();
  await db("users").whereIn("email", made).delete();
  await closeTestDb();
});

describe("per account", () => {
  it(`refuses the attempt after ${env.SIGNIN_ACCOUNT_LIMIT} wrong passwords with 429, even with the right password, saying how many minutes to wait`, async () => {
    const email = await throwawayUser("guessed");
    const tab = await client();
    for (let i = 0; i < env.SIGNIN_ACCOUNT_LIMIT; i++) {
      const wrong = await tab.attempt(email, `not-it-${i}`);
      expect(wrong).toMatchObject({ status: 401, error: "CredentialsSignin", signedIn: false });
    }
    const right = await tab.attempt(email, PASSWORD);
    expect(right.status).toBe(429);
    expect(right.signedIn).toBe(false);
    expect(right.error).toBe(`Too many sign-in attempts for this account; try again in ${env.SIGNIN_WINDOW_MINUTES} min.`);
    const retryAfter = Number(right.retryAfter);
    expect(retryAfter).toBeGreaterThan(windowSeconds - 120);
    expect(retryAfter).toBeLessThanOrEqual(windowSeconds);

    // The lock belongs to the account, not to the address the guesses came from.
    const elsewhere = await (await client()).attempt(email, PASSWORD);
    expect(elsewhere.status).toBe(429);
    expect(elsewhere.signedIn).toBe(false);
  });

  it("clears an account's failures when its owner signs in", async () => {
    const email = await throwawayUser("forgetful");
    const tab = await client();
    for (let round = 0; round < 2; round++) {
      for (let i = 0; i < env.SIGNIN_ACCOUNT_LIMIT - 1; i++) expect((await tab.attempt(email, "almost-it")).status).toBe(401);
      // Without the reset, the second round would have gone past the limit here.
      expect(await tab.attempt(email, PASSWORD)).toMatchObject({ status: 200, signedIn: true });
    }
  });

  it("counts parallel guesses exactly: no more than the limit get a password check", async () => {
    const email = await throwawayUser("raced");
    const tab = await client();
    const tries = env.SIGNIN_ACCOUNT_LIMIT * 2;
    const answers = await Promise.all(Array.from({ length: tries }, (_, i) => tab.attempt(email, `parallel-${i}`)));
    expect(answers.filter((a) => a.status === 401)).toHaveLength(env.SIGNIN_ACCOUNT_LIMIT);
    expect(answers.filter((a) => a.status === 429)).toHaveLength(tries - env.SIGNIN_ACCOUNT_LIMIT);
  });

  it("keeps the e-mail out of the throttle table (its SHA-256 is the key)", async () => {
    const email = await throwawayUser("private");
    await (await client()).attempt(email, "wrong");
    const rows = await testDb()("sign_in_throttle").where("key", "like", `%${TAG}%`).count<{ count: string }[]>({ count: "*" });
    expect(Number(rows[0].count)).toBe(0);
    expect(await testDb()("sign_in_throttle").where({ key: accountKey(email) }).first("points")).toEqual({ points: 1 });
  });
});

describe("per address", () => {
  it(`refuses an address after ${env.SIGNIN_ADDRESS_LIMIT} failed sign-ins, whatever X-Forwarded-For each claims, while other addresses still get in`, async () => {
    const victim = await throwawayUser("bystander");
    // The guesses are spread over throwaway accounts (cheap cost-4 hashes), each kept under
    // its own account limit, so that only the address limit can be what stops them.
    const perAccount = env.SIGNIN_ACCOUNT_LIMIT - 1;
    const targets = await Promise.all(Array.from({ length: Math.ceil(env.SIGNIN_ADDRESS_LIMIT / perAccount) }, (_, i) => throwawayUser(`spray-${i}`)));
    const attacker = await client();
    for (let i = 0; i < env.SIGNIN_ADDRESS_LIMIT; i++) {
      // Without TRUST_PROXY the header is the client's own claim and must not move the count elsewhere.
      const claim: Record<string, string> = env.TRUST_PROXY ? {} : { "x-forwarded-for": `198.51.100.${(i % 250) + 1}` };
      expect((await attacker.attempt(targets[Math.floor(i / perAccount)], "spray-guess", claim)).status).toBe(401);
    }
    const refused = await attacker.attempt(victim, PASSWORD);
    expect(refused.status).toBe(429);
    expect(refused.error).toBe(`Too many failed sign-ins from your network address; try again in ${env.SIGNIN_WINDOW_MINUTES} min.`);
    expect(await (await client()).attempt(victim, PASSWORD)).toMatchObject({ status: 200, signedIn: true });
  });

  it("never fills an address's limit with successful sign-ins (a whole team, or this suite, behind one address)", async () => {
    const email = await throwawayUser("regular");
    const office = await client();
    for (let i = 0; i < env.SIGNIN_ADDRESS_LIMIT + 3; i++) {
      expect(await office.attempt(email, PASSWORD)).toMatchObject({ status: 200, signedIn: true });
    }
  });
});
