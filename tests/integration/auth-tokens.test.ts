import { createHash, randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { requireEnv } from "../helpers/env";
import { signIn } from "../helpers/session";

// CI tokens at the door of the GraphQL route (graphql/context.ts): every way a
// bearer header can be wrong is a 401 that says what is wrong and carries
// WWW-Authenticate (RFC 6750 §3, "Bearer" scheme), and nothing runs. Which
// operations a *valid* token may call is checked field by field in the role
// matrix (roles.test.ts, caller "ci"); here the token-specific edges.

const TAG = `itest-auth-tokens-${Date.now().toString(36)}`;
const sha256 = (s: string) => createHash("sha256").update(s, "utf8").digest("hex");

async function insertToken(what: string, fields: { expires_at?: Date; revoked_at?: Date } = {}): Promise<string> {
  const secret = `tl_${randomBytes(32).toString("base64url")}`;
  await testDb()("ci_tokens").insert({ name: `${TAG} ${what}`, token_hash: sha256(secret), ...fields });
  return secret;
}

/** Posts with a raw Authorization header (postGraphQL would add the `Bearer ` itself). */
async function postWithHeader(authorization: string | null, query = "{ branches }", variables?: Record<string, unknown>, cookie?: string) {
  const res = await fetch(`${requireEnv("TAULINE_TEST_URL")}/api/graphql`, {
    method: "POST",
    headers: {
      "content-type": "application/json",
      ...(authorization === null ? {} : { authorization }),
      ...(cookie ? { cookie } : {}),
    },
    body: JSON.stringify({ query, variables }),
  });
  const body = (await res.json()) as { data?: unknown; errors?: { message: string; extensions?: { code?: string } }[] };
  return { status: res.status, challenge: res.headers.get("www-authenticate"), body };
}

const submission = () => ({ input: { build: { solver: "Cormorant", version: "0.0.0-auth", commit: randomCommit(), branch: "test/auth-tokens" }, runs: [{ case: "backstep", model: "sa", status: "COMPLETED" }] } });

let expired = "";
let revoked = "";
let developer = "";

beforeAll(async () => {
  expired = await insertToken("expired", { expires_at: new Date(Date.now() - 60_000) });
  revoked = await insertToken("revoked", { revoked_at: new Date(Date.now() - 60_000) });
  developer = await signIn("developer@fenwick-hydro.test");
});

afterAll(async () => {
  const db = testDb();
  await db("ci_tokens").where("name", "like", `${TAG} %`).delete();
  await closeTestDb();
});

describe("refused CI credentials", () => {
  const cases: [string, () => string | null, RegExp][] = [
    ["no Authorization header and no session", () => null, /sign in or send a valid CI token/i],
    ["the scheme alone (`Bearer`)", () => "Bearer", /must be `Bearer <CI token>`/],
    ["two words after the scheme (`Bearer x y`)", () => "Bearer x y", /must be `Bearer <CI token>`/],
    ["another scheme (Basic)", () => `Basic ${Buffer.from("ci:secret").toString("base64")}`, /must be `Bearer <CI token>`/],
    ["non-ASCII characters in the token", () => `Bearer ${"é".repeat(24)}`, /must be `Bearer <CI token>`/],
    ["a 10 kB token", () => `Bearer ${"a".repeat(10 * 1024)}`, /must be `Bearer <CI token>`/],
    ["a well-formed token nobody issued", () => `Bearer tl_${randomBytes(32).toString("base64url")}`, /unknown, revoked or expired/],
    ["an expired token", () => `Bearer ${expired}`, /unknown, revoked or expired/],
    ["a revoked token", () => `Bearer ${revoked}`, /unknown, revoked or expired/],
  ];
  for (const [what, header, message] of cases) {
    it(`answers 401 with a Bearer challenge and a clear message for ${what}`, async () => {
      const res = await postWithHeader(header());
      expect(res.status).toBe(401);
      expect(res.challenge).toMatch(/^Bearer\b/);
      expect(res.body.errors?.[0]?.extensions?.code).toBe("UNAUTHENTICATED");
      expect(res.body.errors?.[0]?.message).toMatch(message);
    });
  }

  it("stores nothing from a submission sent with a revoked token", async () => {
    const variables = submission();
    const res = await postWithHeader(`Bearer ${revoked}`, SUBMIT, variables);
    expect(res.status).toBe(401);
    const stored = await testDb()("builds").where({ commit: variables.input.build.commit }).count<{ count: string }[]>({ count: "*" });
    expect(Number(stored[0].count)).toBe(0);
  });

  it("does not fall back to the session cookie when the bearer header beside it is bad", async () => {
    const res = await postWithHeader(`Bearer ${revoked}`, "{ branches }", undefined, developer);
    expect(res.status).toBe(401);
    expect(res.body.data ?? null).toBeNull();
  });

  it("does not mark an expired or revoked token as used", async () => {
    const rows = await testDb()("ci_tokens").where("name", "like", `${TAG} %`).select("name", "last_used_at");
    expect(rows.length).toBeGreaterThanOrEqual(2);
    for (const row of rows) expect(row.last_used_at).toBeNull();
  });
});

describe("a valid CI token", () => {
  it("submits results and reads the release gate", async () => {
    const sent = await postGraphQL<{ submitResults: { build: { commit: string } } }>({ query: SUBMIT, variables: submission(), token: ciToken() });
    expect(sent.body.errors).toBeUndefined();
    const commit = sent.body.data!.submitResults.build.commit;
    const gate = await postGraphQL<{ releaseGate: { state: string } }>({ query: `{ releaseGate(commit: "${commit}") { state } }`, token: ciToken() });
    expect(gate.body.errors).toBeUndefined();
    expect(gate.body.data!.releaseGate.state).toBe("pending");
  });

  it("acts as the pipeline, not as the person whose session cookie rides along", async () => {
    // A developer may read builds; the token may not, and the cookie must not lend it the right.
    const res = await postWithHeader(`Bearer ${ciToken()}`, "{ builds(first: 1) { totalCount } }", undefined, developer);
    expect(res.status).toBe(403);
    expect(res.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
    expect(res.body.errors?.[0]?.message).toMatch(/CI token may only submit results and read the release gate/);
  });

  it("is refused with 403 for an administrator's mutation, and nothing is made", async () => {
    const name = `${TAG} minted by a token`;
    const res = await postWithHeader(`Bearer ${ciToken()}`, "mutation($input: CiTokenInput!) { createCiToken(input: $input) { secret } }", { input: { name } });
    expect(res.status).toBe(403);
    const made = await testDb()("ci_tokens").where({ name }).count<{ count: string }[]>({ count: "*" });
    expect(Number(made[0].count)).toBe(0);
  });
});
