import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, countRows, testDb } from "../helpers/db";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";

// The QA lead's library editing over real HTTP: band versions with readable
// diffs, audited case and quantity edits, field-named validation errors, and
// re-judging stored builds beside their unchanged original verdicts. Everything
// runs on a case of its own (removed afterwards) and builds on test/library-edit.
// Band numbers: κ = 0.41 with the modern spread 0.37–0.44 (reference sheet §1.2;
// Coles & Hirst 1969 value via NASA TMR, spread from the sheet's table).

const suffix = randomCommit().slice(0, 8);
const CASE = `test-bands-${suffix}`;
const QUANTITY = `test_strouhal_${suffix}`;
const BRANCH = "test/library-edit";
let qa = "";
const buildIds: number[] = [];

const gql = <T = Record<string, unknown>>(query: string, variables?: Record<string, unknown>, cookie = qa) => postGraphQL<T>({ query, variables, cookie });

const REVISE = "mutation($input: BandRevisionInput!) { reviseBand(input: $input) { id version lower upper } }";
const kappaBand = (over: Record<string, unknown> = {}) => ({
  caseKey: CASE,
  quantityKey: "kappa",
  model: null,
  kind: "validation",
  reference: 0.41,
  source: "Coles & Hirst 1969 (reference sheet §1.2)",
  lower: 0.37,
  upper: 0.44,
  marginalMargin: 0.005,
  noiseFloor: 0.002,
  reason: "modern spread of published kappa values",
  ...over,
});

async function postBuild(kappa: number) {
  const res = await postGraphQL<{ submitResults: { build: { id: string; verdict: string } } }>({
    query: SUBMIT,
    token: ciToken(),
    variables: {
      input: {
        build: { solver: "Cormorant", version: "0.0.0-library-edit", commit: randomCommit(), branch: BRANCH },
        runs: [{ case: CASE, model: "sa", status: "COMPLETED", quantities: [{ key: "kappa", value: kappa }] }],
      },
    },
  });
  expect(res.body.errors).toBeUndefined();
  const build = res.body.data!.submitResults.build;
  buildIds.push(Number(build.id));
  return build;
}

beforeAll(async () => {
  qa = await signIn("qa@fenwick-hydro.test");
  const created = await gql("mutation($input: CaseInput!) { createCase(input: $input) { key models } }", {
    input: { key: CASE, title: "Test case for band editing", description: "Created by the library-edit integration test; removed afterwards.", models: ["sa", "sst"], parameters: { reTau: 180 }, reason: "integration test of the case editor" },
  });
  expect(created.body.errors).toBeUndefined();
  expect((await gql(REVISE, { input: kappaBand() })).body.errors).toBeUndefined();
});

afterAll(async () => {
  const db = testDb();
  if (buildIds.length) await db("builds").whereIn("id", buildIds).delete();
  await db("bands").where({ case_key: CASE }).delete();
  await db("cases").where({ key: CASE }).delete();
  await db("quantity_definitions").where({ key: QUANTITY }).delete();
  await closeTestDb();
});

describe("band history", () => {
  it("records a tightened band as a new version with an audit row, and the history query shows the diff", async () => {
    const res = await gql<{ reviseBand: { id: string; version: number } }>(REVISE, { input: kappaBand({ upper: 0.43, reason: "tightened after the closure review" }) });
    expect(res.body.errors).toBeUndefined();
    const revised = res.body.data!.reviseBand;
    expect(revised.version).toBe(2);
    expect(await countRows("audit_log", { entity: "band", entity_id: revised.id, action: "band.revised" })).toBe(1);

    const history = await gql<{ bandVersions: { version: number; author: string; reason: string; supersededAt: string | null; changes: { field: string; before: unknown; after: unknown }[] }[] }>(
      `query($c: String!) { bandVersions(caseKey: $c, quantityKey: "kappa") { version author reason supersededAt changes { field before after } } }`,
      { c: CASE },
    );
    const [newest, first] = history.body.data!.bandVersions;
    expect(newest).toMatchObject({ version: 2, author: "Tomasz Breck", reason: "tightened after the closure review", supersededAt: null });
    expect(newest.changes).toEqual([{ field: "upper", before: 0.44, after: 0.43 }]);
    expect(first.version).toBe(1);
    expect(first.supersededAt).not.toBeNull();

    const record = await gql<{ caseChangeRecord: { subject: string; reason: string; changes: { field: string }[] }[] }>(`query($c: String!) { caseChangeRecord(caseKey: $c) { subject reason changes { field } } }`, { c: CASE });
    expect(record.body.data!.caseChangeRecord[0]).toMatchObject({ subject: "band kappa · all models v2", reason: "tightened after the closure review", changes: [{ field: "upper" }] });
  });

  it("keeps a model's own band beside the case-wide one as its own scope", async () => {
    const res = await gql<{ reviseBand: { version: number } }>(REVISE, { input: kappaBand({ model: "sst", kind: "verification", lower: 0.4, upper: 0.42, reason: "SST log layer: kappa = 0.41 by construction" }) });
    expect(res.body.data!.reviseBand.version).toBe(1);
    const scopes = await gql<{ all: { version: number }[]; sst: { version: number }[] }>(
      `query($c: String!) { all: bandVersions(caseKey: $c, quantityKey: "kappa") { version } sst: bandVersions(caseKey: $c, quantityKey: "kappa", model: "sst") { version } }`,
      { c: CASE },
    );
    expect(scopes.body.data!.all.map((v) => v.version)).toEqual([2, 1]);
    expect(scopes.body.data!.sst.map((v) => v.version)).toEqual([1]);
  });
});

describe("case and quantity edits", () => {
  it("audits a case edit with before and after and lists its diff in the change record", async () => {
    const res = await gql(`mutation($k: String!, $input: CaseRevisionInput!) { reviseCase(key: $k, input: $input) { title models parameters } }`, {
      k: CASE,
      input: { title: "Test case for band editing (revised)", description: "Created by the library-edit integration test; removed afterwards.", models: ["sa", "sst", "k-omega"], parameters: { reTau: 180, logLawWindow: { yPlusMin: 30, yPlusMax: 100 } }, reason: "add k-omega and a log-law window" },
    });
    expect(res.body.errors).toBeUndefined();
    const audit = await testDb()("audit_log").where({ entity: "case", entity_id: CASE, action: "case.revised" }).first();
    expect(audit.details.before.models).toEqual(["sa", "sst"]);
    expect(audit.details.after.models).toEqual(["sa", "sst", "k-omega"]);
    const record = await gql<{ caseChangeRecord: { subject: string; changes: { field: string; before: unknown; after: unknown }[] }[] }>(`query($c: String!) { caseChangeRecord(caseKey: $c) { subject changes { field before after } } }`, { c: CASE });
    const edit = record.body.data!.caseChangeRecord.find((e) => e.subject === "case edited")!;
    expect(edit.changes.map((c) => c.field)).toEqual(["title", "models", "parameters.logLawWindow.yPlusMax", "parameters.logLawWindow.yPlusMin"]);
  });

  it("defines a reported quantity and audits a later edit of its unit", async () => {
    const defined = await gql<{ defineQuantity: { key: string; derivedFrom: string | null } }>(`mutation($input: QuantityDefinitionInput!) { defineQuantity(input: $input) { key derivedFrom } }`, {
      input: { key: QUANTITY, label: "Strouhal number St", unit: "1", meaning: "f D / U of the shedding frequency behind the cylinder", reason: "new reported quantity for the test" },
    });
    expect(defined.body.data!.defineQuantity).toEqual({ key: QUANTITY, derivedFrom: null });
    const revised = await gql(`mutation($k: String!, $input: QuantityRevisionInput!) { reviseQuantity(key: $k, input: $input) { unit } }`, {
      k: QUANTITY,
      input: { label: "Strouhal number St", unit: "-", meaning: "f D / U of the shedding frequency behind the cylinder", reason: "write dimensionless as a dash" },
    });
    expect(revised.body.errors).toBeUndefined();
    const audit = await testDb()("audit_log").where({ entity: "quantity", entity_id: QUANTITY, action: "quantity.revised" }).first();
    expect([audit.details.before.unit, audit.details.after.unit]).toEqual(["1", "-"]);
  });
});

describe("validation errors name the field", () => {
  it("refuses a case with a bad key, no models and a short reason", async () => {
    const res = await gql(`mutation($input: CaseInput!) { createCase(input: $input) { key } }`, { input: { key: "Bad Key", title: "x", description: "too short", models: [], reason: "why" } });
    expect(res.status).toBe(400);
    const paths = res.body.errors![0].extensions!.issues!.map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["input.key", "input.title", "input.description", "input.models", "input.reason"]));
  });

  it("refuses an unknown model, a duplicate quantity key and an empty re-judgement", async () => {
    const model = await gql(`mutation($k: String!, $input: CaseRevisionInput!) { reviseCase(key: $k, input: $input) { key } }`, {
      k: CASE,
      input: { title: "Test case", description: "A description long enough.", models: ["sa", "les-smagorinsky"], reason: "try an unknown model" },
    });
    expect(model.body.errors![0].extensions!.issues).toEqual([{ path: "input.models[1]", message: 'is not a known turbulence model: "les-smagorinsky"' }]);
    const dup = await gql(`mutation($input: QuantityDefinitionInput!) { defineQuantity(input: $input) { key } }`, { input: { key: "kappa", label: "κ", unit: "1", meaning: "already defined by the library", reason: "duplicate on purpose" } });
    expect(dup.body.errors![0].extensions!.issues![0].path).toBe("input.key");
    const empty = await gql(`mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id } }`, { input: { buildIds: [], reason: "nothing chosen at all" } });
    expect(empty.body.errors![0].extensions!.issues![0]).toEqual({ path: "input.buildIds", message: "choose at least one build" });
  });
});

describe("re-judging stored builds", () => {
  it("writes new verdicts beside the unchanged originals and shows them on the build", async () => {
    // κ = 0.405 sits inside 0.37–0.43 (the case-wide band in force for sa).
    const build = await postBuild(0.405);
    expect(build.verdict).toBe("within");
    const stored = await testDb()("quantity_values").where({ build_id: Number(build.id), quantity_key: "kappa" }).first();
    expect(stored.verdict).toBe("within");

    // Tighten the lower limit past the stored value: 0.405 < 0.408 is outside.
    const tightened = await gql<{ reviseBand: { id: string } }>(REVISE, { input: kappaBand({ lower: 0.408, upper: 0.43, reason: "lower limit raised to the Nagib & Chauhan pipe value" }) });
    expect(tightened.body.errors).toBeUndefined();

    const candidates = await gql<{ reevaluationCandidates: { build: { id: string }; stale: boolean; verdictAsJudged: string; verdictNow: string }[] }>(
      `query($c: String!) { reevaluationCandidates(caseKey: $c, quantityKey: "kappa", branch: "${BRANCH}") { build { id } stale verdictAsJudged verdictNow } }`,
      { c: CASE },
    );
    expect(candidates.body.data!.reevaluationCandidates.find((c) => c.build.id === build.id)).toMatchObject({ stale: true, verdictAsJudged: "within", verdictNow: "outside" });

    const res = await gql<{ reevaluateBuilds: { id: string; verdict: string; originalVerdict: string; by: string; changes: { quantity: string; value: number; originalVerdict: string; verdict: string; originalBandVersion: number; bandVersion: number }[] }[] }>(
      `mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id verdict originalVerdict by changes { quantity value originalVerdict verdict originalBandVersion bandVersion } } }`,
      { input: { buildIds: [build.id], caseKey: CASE, reason: "kappa band tightened to version 3" } },
    );
    expect(res.body.errors).toBeUndefined();
    const [r] = res.body.data!.reevaluateBuilds;
    expect(r).toMatchObject({ verdict: "outside", originalVerdict: "within", by: "Tomasz Breck" });
    expect(r.changes).toEqual([{ quantity: "kappa", value: 0.405, originalVerdict: "within", verdict: "outside", originalBandVersion: 2, bandVersion: 3 }]);

    // The original judgement is untouched; the new one sits beside it.
    const after = await testDb()("quantity_values").where({ id: stored.id }).first();
    expect([after.verdict, after.band_id]).toEqual(["within", stored.band_id]);
    expect((await testDb()("builds").where({ id: Number(build.id) }).first()).verdict).toBe("within");
    const beside = await testDb()("reevaluated_values").where({ reevaluation_id: Number(r.id), quantity_value_id: stored.id }).first();
    expect(beside.verdict).toBe("outside");
    expect(String(beside.band_id)).toBe(tightened.body.data!.reviseBand.id);
    expect(await countRows("audit_log", { entity: "build", entity_id: build.id, action: "build.reevaluated" })).toBe(1);

    const shown = await gql<{ build: { reevaluations: { verdict: string; reason: string }[] } }>(`query($id: ID!) { build(id: $id) { reevaluations { verdict reason } } }`, { id: build.id });
    expect(shown.body.data!.build.reevaluations).toEqual([{ verdict: "outside", reason: "kappa band tightened to version 3" }]);
    const again = await gql<{ reevaluationCandidates: { build: { id: string }; stale: boolean }[] }>(
      `query($c: String!) { reevaluationCandidates(caseKey: $c, quantityKey: "kappa", branch: "${BRANCH}") { build { id } stale } }`,
      { c: CASE },
    );
    expect(again.body.data!.reevaluationCandidates.find((c) => c.build.id === build.id)!.stale).toBe(false);
    const record = await gql<{ caseChangeRecord: { subject: string; changes: { before: unknown; after: unknown }[] }[] }>(`query($c: String!) { caseChangeRecord(caseKey: $c) { subject changes { before after } } }`, { c: CASE });
    expect(record.body.data!.caseChangeRecord[0]).toEqual({ subject: "build 0.0.0-library-edit re-judged", changes: [{ before: "within", after: "outside" }] });
  });

  it("judges a quantity that a band added later expects, and the run never produced, missing", async () => {
    const build = await postBuild(0.41);
    const added = await gql(REVISE, { input: { ...kappaBand({ reason: "B expected from now on" }), quantityKey: "log_b", reference: 5.0, lower: 4.1, upper: 6.2 } });
    expect(added.body.errors).toBeUndefined();
    const res = await gql<{ reevaluateBuilds: { id: string; verdict: string; changes: { quantity: string; originalVerdict: string | null; verdict: string }[] }[] }>(
      `mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id verdict changes { quantity originalVerdict verdict } } }`,
      { input: { buildIds: [build.id], reason: "log_b band added to the case" } },
    );
    const [r] = res.body.data!.reevaluateBuilds;
    expect(r.verdict).toBe("missing");
    expect(r.changes).toContainEqual({ quantity: "log_b", originalVerdict: null, verdict: "missing" });
    expect(await countRows("reevaluated_values", { reevaluation_id: Number(r.id), quantity_value_id: null })).toBe(1);
  });

  it("refuses re-judgement from developer and release and stores nothing", async () => {
    const before = await countRows("reevaluations");
    for (const role of ["developer", "release"]) {
      const res = await gql(`mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id } }`, { input: { buildIds: [String(buildIds[0])], reason: `attempt by the ${role} role` } }, await signIn(`${role}@fenwick-hydro.test`));
      expect(res.body.errors![0].extensions!.code).toBe("FORBIDDEN");
    }
    expect(await countRows("reevaluations")).toBe(before);
  });
});
