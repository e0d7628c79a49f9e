import { randomBytes } from "node:crypto";
import { testDb } from "../helpers/db";
import { SUBMIT, ciToken, postGraphQL, randomCommit, type GraphQLResponse } from "../helpers/graphql";
import { signIn } from "../helpers/session";

// Every free-text field a person or a pipeline can fill, written through
// GraphQL by the role that may write it. escaping-sql.test.ts plants SQL
// meta-characters and reads them back; tests/browser/escaping.test.ts plants
// HTML/script and visits every page that shows them. Keys and e-mails are
// unique per call, and removeHostileText() takes it all out again.

export interface HostileText {
  /** Any length up to 75 characters; spaces and newlines allowed. */
  long: string;
  /** At most 38 characters (coefficient names, units). */
  short: string;
  /** A legal git branch name (no space, backslash, ~ ^ : ? * [). */
  branch: string;
}

export interface Planted {
  tag: string;
  commit: string;
  buildId: string;
  runId: string;
  caseKey: string;
  quantityKey: string;
  userEmail: string;
  tokenName: string;
  subscriptionId: string;
  waiverId: string;
}

type Cookies = Record<"developer" | "qa" | "release" | "admin", string>;

function expectOk<T>(what: string, res: GraphQLResponse<T>): T {
  if (res.body.errors?.length || !res.body.data) throw new Error(`${what} failed (${res.status}): ${JSON.stringify(res.body.errors)}`);
  return res.body.data;
}

export async function signInEveryRole(): Promise<Cookies> {
  const [developer, qa, release, admin] = await Promise.all(["developer", "qa", "release", "admin"].map((r) => signIn(`${r}@fenwick-hydro.test`)));
  return { developer, qa, release, admin };
}

/** `reattachment`: the run's reported reattachment length; a value outside its band (e.g. 60) makes the build send an alert mail. */
export async function plantHostileText(text: HostileText, cookies: Cookies, { reattachment = 6.3 }: { reattachment?: number } = {}): Promise<Planted> {
  const tag = randomBytes(4).toString("hex");
  const commit = randomCommit();
  const as = (role: keyof Cookies, what: string, query: string, variables: Record<string, unknown>) => postGraphQL({ query, variables, cookie: cookies[role] }).then((r) => expectOk(what, r));

  const receipt = expectOk(
    "submitResults",
    await postGraphQL<{ submitResults: { build: { id: string }; runs: { id: string }[] } }>({
      query: SUBMIT,
      token: ciToken(),
      variables: {
        input: {
          build: { solver: text.long, version: text.long, commit, branch: text.branch, pipelineUrl: `https://ci.fenwick-hydro.test/pipelines/${tag}?q=${encodeURIComponent(text.short)}` },
          runs: [{ case: "backstep", model: "sa", status: "COMPLETED", quantities: [{ key: "reattachment_xr_h", value: reattachment }], coefficients: [{ name: text.short, value: 0.41 }] }],
        },
      },
    }),
  ).submitResults;
  const buildId = receipt.build.id;

  await as("release", "decideGate", "mutation($input: GateDecisionInput!) { decideGate(input: $input) { state } }", { input: { buildId, state: "held", comment: text.long } });
  const waiver = (await as("release", "grantWaiver", "mutation($input: WaiverInput!) { grantWaiver(input: $input) { id } }", {
    input: { case: "backstep", quantity: "reattachment_xr_h", model: "sa", branch: text.branch, reason: text.long, expiresAt: new Date(Date.now() + 86_400_000).toISOString() },
  })) as { grantWaiver: { id: string } };

  const caseKey = `esc-${tag}`;
  const quantityKey = `esc_${tag}`;
  await as("qa", "createCase", "mutation($input: CaseInput!) { createCase(input: $input) { key } }", {
    input: { key: caseKey, title: text.long, description: `${text.long} (escaping check case)`, models: ["sa"], reason: text.long },
  });
  await as("qa", "defineQuantity", "mutation($input: QuantityDefinitionInput!) { defineQuantity(input: $input) { key } }", {
    input: { key: quantityKey, label: text.long, unit: text.short, meaning: `${text.long} (escaping check quantity)`, reason: text.long },
  });
  await as("qa", "reviseBand", "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id } }", {
    input: { caseKey, quantityKey, model: null, kind: "validation", reference: 1, source: text.long, lower: 0, upper: 2, marginalMargin: 0, noiseFloor: 0, reason: text.long },
  });
  await as("qa", "reevaluateBuilds", "mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id } }", { input: { buildIds: [buildId], caseKey: "backstep", reason: text.long } });

  const userEmail = `esc-${tag}@fenwick-hydro.test`;
  await as("admin", "createUser", "mutation($input: NewUserInput!) { createUser(input: $input) { id } }", { input: { name: text.long, email: userEmail, role: "developer", password: plantedPassword({ tag }) } });
  // Its own text (not a part of `long`), so a page can be checked for showing the token's name itself.
  const tokenName = `token ${text.short}`;
  await as("admin", "createCiToken", "mutation($input: CiTokenInput!) { createCiToken(input: $input) { token { id } } }", { input: { name: tokenName, expiresAt: null } });

  const subscription = (await as("developer", "saveAlertSubscription", "mutation($input: AlertSubscriptionInput!) { saveAlertSubscription(input: $input) { id } }", {
    input: { caseKey: null, branch: text.branch, mode: "digest" },
  })) as { saveAlertSubscription: { id: string } };

  return { tag, commit, buildId, runId: receipt.runs[0].id, caseKey, quantityKey, userEmail, tokenName, subscriptionId: subscription.saveAlertSubscription.id, waiverId: waiver.grantWaiver.id };
}

/** The password of the person plantHostileText creates (whose name is the hostile text). */
export const plantedPassword = ({ tag }: { tag: string }) => `escaping-${tag}-pw`;

/** Takes out what plantHostileText made, so the shared demo database stays as it was. */
export async function removeHostileText(p: Planted): Promise<void> {
  const db = testDb();
  await db("audit_log").where({ entity: "subscription", entity_id: p.subscriptionId }).delete();
  await db("subscriptions").where({ id: p.subscriptionId }).delete();
  const user = await db("users").where({ email: p.userEmail }).first("id");
  const tokens = await db("ci_tokens").where({ name: p.tokenName }).pluck("id");
  await db("audit_log").where({ entity: "ci_token" }).whereIn("entity_id", tokens.map(String)).delete();
  await db("ci_tokens").whereIn("id", tokens).delete();
  if (user) {
    await db("audit_log").where({ entity: "user", entity_id: String(user.id) }).delete();
    await db("users").where({ id: user.id }).delete();
  }
  const bands = await db("bands").where({ case_key: p.caseKey }).pluck("id");
  await db("audit_log").where({ entity: "build", entity_id: p.buildId }).delete();
  await db("audit_log").where({ entity: "waiver", entity_id: p.waiverId }).delete();
  await db("audit_log").where({ entity: "band" }).whereIn("entity_id", bands.map(String)).delete();
  await db("audit_log").whereIn("entity", ["case", "quantity"]).whereRaw("entity_id like ?", [`%${p.tag}%`]).delete();
  await db("builds").where({ commit: p.commit }).delete();
  await db("waivers").where({ id: p.waiverId }).delete();
  await db("bands").whereIn("id", bands).delete();
  await db("cases").where({ key: p.caseKey }).delete();
  await db("quantity_definitions").where({ key: p.quantityKey }).delete();
}
