import { randomBytes } from "node:crypto";
import { afterAll } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { ciToken, postGraphQL, randomCommit, type GraphQLResponse } from "../helpers/graphql";

// The case-library editing operations for the role matrix (roles.test.ts): every
// person reads band history, change records and re-judgements; only the QA lead
// (and the administrator) edits cases, quantity definitions and re-judges builds.
// Cases, quantities and builds made for the matrix are removed afterwards.

type Caller = "anonymous" | "ci" | "developer" | "qa" | "release" | "admin";
type Call = (caller: Caller, query: string, variables?: Record<string, unknown>) => Promise<GraphQLResponse>;

const PEOPLE: Caller[] = ["developer", "qa", "release", "admin"];
const EDITORS: Caller[] = ["qa", "admin"];
const RUN = randomBytes(3).toString("hex");
const CASE_PREFIX = `test-roles-${RUN}-`;
const QUANTITY_PREFIX = `test_roles_${RUN}_`;
const matrixBuilds: number[] = [];

async function matrixCase(what: string): Promise<string> {
  const key = `${CASE_PREFIX}${what}`;
  await testDb()("cases").insert({ key, title: "Role matrix case", description: "Made for the role matrix; removed afterwards.", model_keys: ["sa"] }).onConflict("key").ignore();
  return key;
}

async function matrixQuantity(what: string): Promise<string> {
  const key = `${QUANTITY_PREFIX}${what}`;
  await testDb()("quantity_definitions").insert({ key, label: "Role matrix quantity", unit: "1", meaning: "Made for the role matrix" }).onConflict("key").ignore();
  return key;
}

/** A build of its own on a test branch, so re-judging never touches the demo history. */
async function matrixBuild(): Promise<string> {
  const res = await postGraphQL<{ submitResults: { build: { id: string } } }>({
    query: "mutation($input: ResultSubmission!) { submitResults(input: $input) { build { id } } }",
    token: ciToken(),
    variables: { input: { build: { solver: "Cormorant", version: "0.0.0-roles", commit: randomCommit(), branch: "test/roles" }, runs: [{ case: "backstep", model: "sa", status: "COMPLETED" }] } },
  });
  const id = res.body.data!.submitResults.build.id;
  matrixBuilds.push(Number(id));
  return id;
}

const reason = (c: Caller) => `role matrix check by ${c}`;

export function libraryEditOperations(call: Call) {
  return [
    { name: "bandVersions", allowed: PEOPLE, run: (c: Caller) => call(c, `{ bandVersions(caseKey: "backstep", quantityKey: "reattachment_xr_h") { version } }`) },
    { name: "caseChangeRecord", allowed: PEOPLE, run: (c: Caller) => call(c, `{ caseChangeRecord(caseKey: "backstep", last: 3) { id } }`) },
    { name: "reevaluationCandidates", allowed: PEOPLE, run: (c: Caller) => call(c, `{ reevaluationCandidates(caseKey: "backstep", quantityKey: "reattachment_xr_h", last: 2) { stale } }`) },
    { name: "Build.reevaluations", allowed: PEOPLE, run: (c: Caller) => call(c, `{ build(id: "1") { reevaluations { id } } }`) },
    {
      name: "createCase",
      allowed: EDITORS,
      run: (c: Caller) =>
        call(c, "mutation($input: CaseInput!) { createCase(input: $input) { key } }", {
          input: { key: `${CASE_PREFIX}new-${c}`, title: "Role matrix case", description: "Made for the role matrix; removed afterwards.", models: ["sa"], reason: reason(c) },
        }),
    },
    {
      name: "reviseCase",
      allowed: EDITORS,
      run: async (c: Caller) =>
        call(c, "mutation($key: String!, $input: CaseRevisionInput!) { reviseCase(key: $key, input: $input) { key } }", {
          key: await matrixCase(`edit-${c}`),
          input: { title: "Role matrix case, edited", description: "Made for the role matrix; removed afterwards.", models: ["sa", "sst"], reason: reason(c) },
        }),
    },
    {
      name: "defineQuantity",
      allowed: EDITORS,
      run: (c: Caller) =>
        call(c, "mutation($input: QuantityDefinitionInput!) { defineQuantity(input: $input) { key } }", {
          input: { key: `${QUANTITY_PREFIX}new_${c}`, label: "Role matrix quantity", unit: "1", meaning: "Made for the role matrix", reason: reason(c) },
        }),
    },
    {
      name: "reviseQuantity",
      allowed: EDITORS,
      run: async (c: Caller) =>
        call(c, "mutation($key: String!, $input: QuantityRevisionInput!) { reviseQuantity(key: $key, input: $input) { key } }", {
          key: await matrixQuantity(`edit_${c}`),
          input: { label: "Role matrix quantity, edited", unit: "1", meaning: "Made for the role matrix", reason: reason(c) },
        }),
    },
    {
      name: "reevaluateBuilds",
      allowed: EDITORS,
      run: async (c: Caller) => call(c, "mutation($input: ReevaluationInput!) { reevaluateBuilds(input: $input) { id } }", { input: { buildIds: [await matrixBuild()], reason: reason(c) } }),
    },
  ];
}

afterAll(async () => {
  const db = testDb();
  await db("audit_log").where({ action: "build.reevaluated" }).whereIn("entity_id", matrixBuilds.map(String)).delete();
  await db("builds").whereIn("id", matrixBuilds).delete();
  await db("audit_log").where({ entity: "case" }).where("entity_id", "like", `${CASE_PREFIX}%`).delete();
  await db("audit_log").where({ entity: "quantity" }).where("entity_id", "like", `${QUANTITY_PREFIX}%`).delete();
  await db("cases").where("key", "like", `${CASE_PREFIX}%`).delete();
  await db("quantity_definitions").where("key", "like", `${QUANTITY_PREFIX}%`).delete();
  // Hooks after this file's own run in reverse order, so the shared connection may already be closed and reopened here.
  await closeTestDb();
});
