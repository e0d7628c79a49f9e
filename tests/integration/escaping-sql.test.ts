import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { postGraphQL } from "../helpers/graphql";
import { plantHostileText, removeHostileText, signInEveryRole, type HostileText, type Planted } from "./escaping-fixtures";

// SQL meta-characters in every free-text field are data: written through
// GraphQL by the role that may write them and read back byte for byte (every
// query is parameterised; nothing is quoted by hand). The characters: an
// injection attempt, backslash, LIKE wildcards, a positional-parameter
// look-alike, both quote kinds, an emoji outside the BMP (a UTF-16 surrogate
// pair) and the Unicode bidirectional marks RLM/LRM (U+200F, U+200E).

const LONG = `x'; drop table builds; -- \\ %_ $1 "q" 'q' 😀 \u200fRTL\u200e`;
const TEXT: HostileText = {
  long: LONG,
  short: `'; drop --\\%_$1"😀\u200f`,
  // Git allows quotes, `;`, `$`, `%` and emoji in a branch; not space or backslash.
  branch: `test/h4-sql/';drop-table-builds;--%_$1"😀\u200f`,
};

type Cookies = Awaited<ReturnType<typeof signInEveryRole>>;
let cookies: Cookies;
let planted: Planted;

beforeAll(async () => {
  cookies = await signInEveryRole();
  planted = await plantHostileText(TEXT, cookies);
});

afterAll(async () => {
  if (planted) await removeHostileText(planted);
  await closeTestDb();
});

async function read<T>(role: keyof Cookies, query: string, variables?: Record<string, unknown>): Promise<T> {
  const res = await postGraphQL<T>({ query, variables, cookie: cookies[role] });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!;
}

describe("SQL meta-characters round-trip verbatim", () => {
  it("in the build's solver, version and branch, and a run's coefficient name", async () => {
    const { build } = await read<{ build: { solver: string; version: string; branch: string; runs: { coefficients: { name: string }[] }[] } }>(
      "developer",
      "query($id: ID!) { build(id: $id) { solver version branch runs { coefficients { name } } } }",
      { id: planted.buildId },
    );
    expect(build).toMatchObject({ solver: TEXT.long, version: TEXT.long, branch: TEXT.branch });
    expect(build.runs[0].coefficients.map((c) => c.name)).toEqual([TEXT.short]);
  });

  it("in the gate decision's comment and the waiver's reason and branch", async () => {
    const { gateReview } = await read<{ gateReview: { decision: { comment: string }; waivers: { reason: string; branch: string }[] } }>(
      "release",
      "query($id: ID!) { gateReview(buildId: $id) { decision { comment } waivers { reason branch } } }",
      { id: planted.buildId },
    );
    expect(gateReview.decision.comment).toBe(TEXT.long);
    expect(gateReview.waivers).toContainEqual({ reason: TEXT.long, branch: TEXT.branch });
  });

  it("in the case's title and description, the quantity's label, unit and meaning, and the band's source and reason", async () => {
    const data = await read<{ case: { title: string; description: string }; quantities: { key: string; label: string; unit: string; meaning: string }[]; bandVersions: { source: string; reason: string }[] }>(
      "developer",
      "query($c: String!, $q: String!) { case(key: $c) { title description } quantities { key label unit meaning } bandVersions(caseKey: $c, quantityKey: $q) { source reason } }",
      { c: planted.caseKey, q: planted.quantityKey },
    );
    expect(data.case).toEqual({ title: TEXT.long, description: `${TEXT.long} (escaping check case)` });
    expect(data.quantities.find((q) => q.key === planted.quantityKey)).toEqual({ key: planted.quantityKey, label: TEXT.long, unit: TEXT.short, meaning: `${TEXT.long} (escaping check quantity)` });
    expect(data.bandVersions).toEqual([{ source: TEXT.long, reason: TEXT.long }]);
  });

  it("in a re-judgement's reason", async () => {
    const { build } = await read<{ build: { reevaluations: { reason: string }[] } }>("developer", "query($id: ID!) { build(id: $id) { reevaluations { reason } } }", { id: planted.buildId });
    expect(build.reevaluations.map((r) => r.reason)).toEqual([TEXT.long]);
  });

  it("in a person's name, a CI token's name and an alert subscription's branch", async () => {
    const admin = await read<{ userAccounts: { email: string; name: string }[]; ciTokens: { name: string }[] }>("admin", "{ userAccounts { email name } ciTokens { name } }");
    expect(admin.userAccounts.find((u) => u.email === planted.userEmail)?.name).toBe(TEXT.long);
    expect(admin.ciTokens.map((t) => t.name)).toContain(planted.tokenName);
    const mine = await read<{ myAlerts: { subscriptions: { id: string; branch: string }[] } }>("developer", "{ myAlerts { subscriptions { id branch } } }");
    expect(mine.myAlerts.subscriptions.find((s) => s.id === planted.subscriptionId)?.branch).toBe(TEXT.branch);
  });

  it("and the builds table is still there, holding the planted build once", async () => {
    const rows = await testDb()("builds").where({ commit: planted.commit }).select("solver", "branch");
    expect(rows).toEqual([{ solver: TEXT.long, branch: TEXT.branch }]);
  });
});

// PostgreSQL text cannot hold U+0000 (its string functions are NUL-terminated),
// so a NUL in free text must be refused at the door, naming the field, with
// 400 — not reach the INSERT and come back as a masked 500.
describe("a NUL character in free text", () => {
  const NUL = "refused\u0000text that is long enough";
  const soon = () => new Date(Date.now() + 86_400_000).toISOString();
  const nulKey = () => `nul-${Math.random().toString(36).slice(2, 10)}`;
  const cases: { field: string; role: keyof Cookies; query: string; variables: () => Record<string, unknown>; path: string; stored?: () => Promise<number> }[] = [
    { field: "a person's name", role: "admin", path: "input.name", query: "mutation($input: NewUserInput!) { createUser(input: $input) { id } }", variables: () => ({ input: { name: NUL, email: `${nulKey()}@fenwick-hydro.test`, role: "developer", password: "nul-check-password-1" } }) },
    { field: "a CI token's name", role: "admin", path: "input.name", query: "mutation($input: CiTokenInput!) { createCiToken(input: $input) { secret } }", variables: () => ({ input: { name: NUL } }) },
    { field: "a gate decision's comment", role: "release", path: "input.comment", query: "mutation($input: GateDecisionInput!) { decideGate(input: $input) { state } }", variables: () => ({ input: { buildId: planted.buildId, state: "rejected", comment: NUL } }) },
    { field: "a waiver's reason", role: "release", path: "input.reason", query: "mutation($input: WaiverInput!) { grantWaiver(input: $input) { id } }", variables: () => ({ input: { case: "backstep", quantity: "reattachment_xr_h", model: "sa", branch: TEXT.branch, reason: NUL, expiresAt: soon() } }) },
    { field: "a waiver withdrawal's reason", role: "release", path: "reason", query: "mutation($id: ID!, $reason: String!) { revokeWaiver(id: $id, reason: $reason) { id } }", variables: () => ({ id: planted.waiverId, reason: NUL }) },
    { field: "a case's title", role: "qa", path: "input.title", query: "mutation($input: CaseInput!) { createCase(input: $input) { key } }", variables: () => ({ input: { key: nulKey(), title: NUL, description: "a description long enough", models: ["sa"], reason: "checking NUL refusal" } }) },
    { field: "a quantity's meaning", role: "qa", path: "input.meaning", query: "mutation($input: QuantityDefinitionInput!) { defineQuantity(input: $input) { key } }", variables: () => ({ input: { key: nulKey().replace("-", "_"), label: "NUL check", unit: "1", meaning: NUL, reason: "checking NUL refusal" } }) },
    { field: "a band's source", role: "qa", path: "input.source", query: "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id } }", variables: () => ({ input: { caseKey: planted.caseKey, quantityKey: planted.quantityKey, model: null, kind: "validation", reference: 1, source: NUL, lower: 0, upper: 2, marginalMargin: 0, noiseFloor: 0, reason: "checking NUL refusal" } }) },
    { field: "a re-judgement's reason", role: "qa", path: "input.reason", query: "mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id } }", variables: () => ({ input: { buildIds: [planted.buildId], caseKey: "backstep", reason: NUL } }) },
  ];
  for (const c of cases) {
    it(`is refused with 400 naming ${c.path} in ${c.field}`, async () => {
      const res = await postGraphQL({ query: c.query, variables: c.variables(), cookie: cookies[c.role] });
      expect(res.status).toBe(400);
      expect(res.body.errors?.[0]?.extensions?.code).toBe("BAD_USER_INPUT");
      expect(res.body.errors?.[0]?.extensions?.issues).toContainEqual({ path: c.path, message: "must not contain a NUL character (U+0000)" });
    });
  }

  it("leaves nothing behind: no decision, waiver, band version or re-judgement was added by the refused calls", async () => {
    const db = testDb();
    const count = async (table: string, where: Record<string, unknown>) => Number((await db(table).where(where).count<{ count: string }[]>({ count: "*" }))[0].count);
    expect(await count("gate_decisions", { build_id: planted.buildId })).toBe(1);
    expect(await count("waivers", { branch: TEXT.branch })).toBe(1);
    expect(await count("bands", { case_key: planted.caseKey })).toBe(1);
    expect(await count("reevaluations", { build_id: planted.buildId })).toBe(1);
  });
});
