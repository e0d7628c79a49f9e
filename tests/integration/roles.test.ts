import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { schema } from "@/graphql/schema";
import { closeTestDb, testDb } from "../helpers/db";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { DECIDE, GRANT, REVOKE, postStepBuild, stepWaiver } from "./gate-helpers";
import { alertOperations } from "./alerts-roles";
import { libraryEditOperations } from "./library-edit-roles";

// The role matrix (DESIGN.md "Who uses it"): every query and mutation, for every
// kind of caller. Enforced on the server: a refused call is an error with a code
// and changes nothing.

type Caller = "anonymous" | "ci" | "developer" | "qa" | "release" | "admin";
const CALLERS: Caller[] = ["anonymous", "ci", "developer", "qa", "release", "admin"];
const PEOPLE: Caller[] = ["developer", "qa", "release", "admin"];

const cookies: Partial<Record<Caller, string>> = {};

beforeAll(async () => {
  for (const role of PEOPLE) cookies[role] = await signIn(`${role}@fenwick-hydro.test`);
});
afterAll(closeTestDb);

function call(caller: Caller, query: string, variables?: Record<string, unknown>) {
  if (caller === "anonymous") return postGraphQL({ query, variables });
  if (caller === "ci") return postGraphQL({ query, variables, token: ciToken() });
  return postGraphQL({ query, variables, cookie: cookies[caller] });
}

const bandInput = (reason: string) => ({
  caseKey: "grid-study",
  quantityKey: "kappa",
  model: "lrr",
  kind: "validation",
  reference: 0.41,
  source: "Coles & Hirst 1969 via Pope 2000 (role-matrix test band)",
  lower: 0.37,
  upper: 0.44,
  marginalMargin: 0.005,
  noiseFloor: 0.002,
  reason,
});

interface Operation {
  name: string;
  allowed: Caller[];
  run: (caller: Caller) => ReturnType<typeof call>;
}

const OPERATIONS: Operation[] = [
  ...[
    ["builds", "{ builds(first: 1) { totalCount } }"],
    ["build", `{ build(id: "1") { id } }`],
    ["run", `{ run(id: "1") { id } }`],
    ["branches", "{ branches }"],
    ["cases", "{ cases { key } }"],
    ["case", `{ case(key: "backstep") { key } }`],
    ["models", "{ models { key } }"],
    ["quantities", "{ quantities { key } }"],
    ["trend", `{ trend(case: "backstep", quantity: "reattachment_xr_h", model: "sa", branch: "main") { points { value } } }`],
    ["trendChart", `{ trendChart(case: "backstep", quantity: "reattachment_xr_h", models: ["sa", "sst"], branch: "main", last: 5) { series { model } } }`],
    ["buildTable", `{ buildTable(first: 2) { totalCount } }`],
    ["buildComparison", `{ buildComparison(buildId: "2", againstId: "1") { __typename } }`],
    ["morningView", `{ morningView { __typename } }`],
  ].map(([name, query]) => ({ name, allowed: PEOPLE, run: (c: Caller) => call(c, query) })),
  { name: "releaseGate", allowed: ["ci", ...PEOPLE], run: (c) => call(c, `{ releaseGate(commit: "abcdef1") { state } }`) },
  {
    name: "submitResults",
    allowed: ["ci", ...PEOPLE],
    run: (c) => call(c, SUBMIT, { input: { build: { solver: "Cormorant", version: "0.0.0-roles", commit: randomCommit(), branch: "test/roles" }, runs: [{ case: "backstep", model: "sa", status: "COMPLETED" }] } }),
  },
  {
    name: "reviseBand",
    allowed: ["qa", "admin"],
    run: (c) => call(c, "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id version } }", { input: bandInput(`role matrix check by ${c}`) }),
  },
  // Release gate: every person reads it; only the release manager (and admin) decides and waives.
  { name: "gateCandidates", allowed: PEOPLE, run: (c) => call(c, "{ gateCandidates(first: 2) { totalCount } }") },
  { name: "gateReview", allowed: PEOPLE, run: (c) => call(c, `{ gateReview(buildId: "1") { id state } }`) },
  { name: "waivers", allowed: PEOPLE, run: (c) => call(c, "{ waivers { id } }") },
  {
    name: "decideGate",
    allowed: ["release", "admin"],
    run: async (c) => call(c, DECIDE, { input: { buildId: await gateTargetBuild(), state: "held", comment: `role matrix check by ${c}` } }),
  },
  { name: "grantWaiver", allowed: ["release", "admin"], run: (c) => call(c, GRANT, { input: stepWaiver("test/roles", { reason: `role matrix check by ${c}` }) }) },
  { name: "revokeWaiver", allowed: ["release", "admin"], run: async (c) => call(c, REVOKE, { id: await freshWaiverId(), reason: `role matrix check by ${c}` }) },
  // Administration: people, roles and CI tokens belong to the administrator; a set-password link works for whoever holds it.
  ...[
    ["userAccounts", "{ userAccounts { id } }"],
    ["ciTokens", "{ ciTokens { id } }"],
    ["accountChanges", "{ accountChanges(last: 5) { id } }"],
  ].map(([name, query]) => ({ name, allowed: ["admin"] as Caller[], run: (c: Caller) => call(c, query) })),
  {
    name: "createUser",
    allowed: ["admin"],
    run: (c) => call(c, "mutation($input: NewUserInput!) { createUser(input: $input) { id } }", { input: { ...matrixPerson(`new-${c}`), role: "developer", password: "role-matrix-pw-1" } }),
  },
  { name: "inviteUser", allowed: ["admin"], run: (c) => call(c, "mutation($input: InviteInput!) { inviteUser(input: $input) { expiresAt } }", { input: { ...matrixPerson(`invite-${c}`), role: "qa" } }) },
  { name: "issuePasswordLink", allowed: ["admin"], run: async (c) => call(c, "mutation($id: ID!) { issuePasswordLink(userId: $id) { expiresAt } }", { id: await matrixAccount(`link-${c}`) }) },
  { name: "setUserRole", allowed: ["admin"], run: async (c) => call(c, "mutation($id: ID!) { setUserRole(userId: $id, role: qa) { role } }", { id: await matrixAccount(`role-${c}`) }) },
  { name: "deactivateUser", allowed: ["admin"], run: async (c) => call(c, "mutation($id: ID!) { deactivateUser(userId: $id) { status } }", { id: await matrixAccount(`off-${c}`) }) },
  { name: "reactivateUser", allowed: ["admin"], run: async (c) => call(c, "mutation($id: ID!) { reactivateUser(userId: $id) { status } }", { id: await matrixAccount(`on-${c}`, { deactivated: true }) }) },
  {
    name: "createCiToken",
    allowed: ["admin"],
    run: (c) => call(c, "mutation($input: CiTokenInput!) { createCiToken(input: $input) { token { id } } }", { input: { name: `${MATRIX} ${c}`, expiresAt: new Date(Date.now() + 3_600_000).toISOString() } }),
  },
  { name: "revokeCiToken", allowed: ["admin"], run: async (c) => call(c, "mutation($id: ID!) { revokeCiToken(id: $id) { status } }", { id: await matrixToken(c) }) },
  {
    name: "setPasswordWithLink",
    allowed: CALLERS,
    run: async (c) => call(c, "mutation($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }", { input: { token: await matrixLink(c), password: "role-matrix-pw-1" } }),
  },
  ...alertOperations(call),
  ...libraryEditOperations(call),
  // The two placeholders graphql/schema/base.ts declares so that every module can
  // `extend type Query/Mutation`: a constant string and a field without resolver
  // (always null). Neither reads nor changes data, so every caller gets them.
  { name: "_version", allowed: CALLERS, run: (c) => call(c, "{ _version }") },
  { name: "_noop", allowed: CALLERS, run: (c) => call(c, "mutation { _noop }") },
];

describe("role matrix coverage", () => {
  // Read from the schema module itself, not over HTTP: production turns introspection off.
  const rootFields = (type: "Query" | "Mutation") => Object.keys((type === "Query" ? schema.getQueryType() : schema.getMutationType())?.getFields() ?? {});

  it("has an entry for every root query and mutation of the schema", () => {
    const covered = new Set(OPERATIONS.map((op) => op.name));
    const missing = [...rootFields("Query"), ...rootFields("Mutation")].filter((name) => !covered.has(name));
    expect(missing).toEqual([]);
  });

  it("names no operation that the schema does not have (a renamed field would leave a stale entry)", () => {
    const fields = new Set([...rootFields("Query"), ...rootFields("Mutation")]);
    // "Type.field" entries check a guarded field below the root (e.g. Build.reevaluations).
    const stale = OPERATIONS.map((op) => op.name).filter((name) => !name.includes(".") && !fields.has(name));
    expect(stale).toEqual([]);
  });
});

describe("role matrix", () => {
  for (const op of OPERATIONS) {
    for (const caller of CALLERS) {
      const allowed = op.allowed.includes(caller);
      it(`${op.name} ${allowed ? "answers" : "refuses"} ${caller}`, async () => {
        const before = op.name === "reviseBand" ? await testDb()("bands").where({ case_key: "grid-study", quantity_key: "kappa", model_key: "lrr" }).count<{ count: string }[]>({ count: "*" }) : null;
        const res = await op.run(caller);
        if (allowed) {
          expect(res.body.errors ?? []).toEqual([]);
        } else {
          const code = res.body.errors?.[0]?.extensions?.code;
          expect(code).toBe(caller === "anonymous" ? "UNAUTHENTICATED" : "FORBIDDEN");
          expect(res.status).toBe(caller === "anonymous" ? 401 : 403);
          if (before) {
            const after = await testDb()("bands").where({ case_key: "grid-study", quantity_key: "kappa", model_key: "lrr" }).count<{ count: string }[]>({ count: "*" });
            expect(after[0].count).toBe(before[0].count);
          }
        }
      });
    }
  }
});

describe("reviseBand", () => {
  it("writes a new version, closes the old one and records the change in the audit log", async () => {
    const qa = cookies.qa!;
    const first = await postGraphQL<{ reviseBand: { id: string; version: number } }>({
      query: "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id version lower upper } }",
      variables: { input: bandInput("initial band for the versioning test") },
      cookie: qa,
    });
    const second = await postGraphQL<{ reviseBand: { id: string; version: number; lower: number } }>({
      query: "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id version lower upper } }",
      variables: { input: { ...bandInput("tightened after the closure review"), lower: 0.38 } },
      cookie: qa,
    });
    expect(second.body.errors).toBeUndefined();
    expect(second.body.data!.reviseBand.version).toBe(first.body.data!.reviseBand.version + 1);
    const rows = await testDb()("bands").where({ case_key: "grid-study", quantity_key: "kappa", model_key: "lrr" }).orderBy("version");
    expect(rows.filter((r) => r.superseded_at === null)).toHaveLength(1);
    expect(rows.at(-1).lower).toBe(0.38);
    const audit = await testDb()("audit_log").where({ entity: "band", entity_id: second.body.data!.reviseBand.id }).first();
    expect(audit.action).toBe("band.revised");
    expect(audit.details.reason).toBe("tightened after the closure review");
    expect(audit.details.before.lower).toBe(0.37);
  });

  it("names the field of a bad revision: limits in the wrong order, no reason", async () => {
    const res = await postGraphQL({
      query: "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id } }",
      variables: { input: { ...bandInput("short"), lower: 0.5, upper: 0.4 } },
      cookie: cookies.qa!,
    });
    const paths = res.body.errors?.[0]?.extensions?.issues?.map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["input.upper", "input.reason"]));
  });
});

// Targets of the gate mutations: a build on the roles branch (a held decision on
// it sets no baseline) and a waiver scoped to that branch, so the demo is untouched.
let gateTarget: Promise<string> | undefined;
function gateTargetBuild(): Promise<string> {
  gateTarget ??= postStepBuild({ branch: "test/roles" }).then((b) => b.id);
  return gateTarget;
}

async function freshWaiverId(): Promise<string> {
  const grantor = await testDb()("users").where({ email: "release@fenwick-hydro.test" }).first("id");
  const [{ id }] = await testDb()("waivers")
    .insert({ case_key: "backstep", quantity_key: "reattachment_xr_h", model_key: "sa", branch: "test/roles", reason: "role matrix waiver to withdraw", granted_by: grantor.id, expires_at: new Date(Date.now() + 86_400_000) })
    .returning("id");
  return String(id);
}

// Targets of the administration mutations: throwaway accounts and tokens made
// straight in the database, so a refusal that failed would hit nobody real.
// They are removed after the file (this hook runs before the one closing the pool).
const MATRIX = `roles-matrix-${Date.now().toString(36)}`;
const matrixPerson = (what: string) => ({ name: `Matrix ${what}`, email: `${MATRIX}-${what}@fenwick-hydro.test` });

async function matrixAccount(what: string, { deactivated = false, active }: { deactivated?: boolean; active?: boolean } = {}): Promise<string> {
  const [{ id }] = await testDb()("users")
    .insert({ ...matrixPerson(what), role: "developer", password_hash: bcrypt.hashSync(randomBytes(16).toString("hex"), 4), active: active ?? !deactivated, deactivated_at: deactivated ? new Date() : null })
    .returning("id");
  return String(id);
}

async function matrixToken(caller: Caller): Promise<string> {
  const [{ id }] = await testDb()("ci_tokens").insert({ name: `${MATRIX} revoke ${caller}`, token_hash: createHash("sha256").update(randomBytes(32)).digest("hex") }).returning("id");
  return String(id);
}

async function matrixLink(caller: Caller): Promise<string> {
  const secret = randomBytes(32).toString("base64url");
  const userId = await matrixAccount(`link-holder-${caller}`, { active: false });
  await testDb()("user_invites").insert({ user_id: userId, token_hash: createHash("sha256").update(secret).digest("hex"), expires_at: new Date(Date.now() + 3_600_000) });
  return secret;
}

afterAll(async () => {
  const db = testDb();
  const users = await db("users").where("email", "like", `${MATRIX}-%`).pluck("id");
  const tokens = await db("ci_tokens").where("name", "like", `${MATRIX} %`).pluck("id");
  await db("audit_log").where({ entity: "user" }).whereIn("entity_id", users.map(String)).delete();
  await db("audit_log").where({ entity: "ci_token" }).whereIn("entity_id", tokens.map(String)).delete();
  await db("mail_outbox").where({ kind: "invite" }).whereRaw("recipients[1] like ?", [`${MATRIX}-%`]).delete();
  await db("ci_tokens").whereIn("id", tokens).delete();
  await db("users").whereIn("id", users).delete();
});
