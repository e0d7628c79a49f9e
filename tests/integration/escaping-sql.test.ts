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
