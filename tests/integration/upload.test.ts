import { readFile } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, countRows, testDb } from "../helpers/db";
import { requireEnv } from "../helpers/env";
import { RECEIPT_FIELDS, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";

// Manual upload end to end: real HTTP multipart requests (GraphQL multipart request
// spec: operations, map, file parts) to the running app and real PostgreSQL.

const UPLOAD = /* GraphQL */ `
  mutation Upload($input: ResultSubmission, $file: File!, $seriesKey: String) {
    submitResults(input: $input, file: $file, seriesKey: $seriesKey) { ${RECEIPT_FIELDS} }
  }
`;
const CSRF = { "x-tauline-request": "upload" };
const BRANCH = "test/upload";

type Receipt = {
  submitResults: {
    created: boolean;
    build: { id: string; commit: string; branch: string; verdict: string };
    runs: { case: string; model: string; verdict: string; quantities: { key: string; value: number | null; origin: string; verdict: string; reference: number | null }[] }[];
  } | null;
};
type Answer = { status: number; body: { data?: Receipt | null; errors?: { message: string; extensions?: { code?: string; issues?: { path: string; message: string }[] } }[] } };

async function upload({ file, input, seriesKey, headers = {} }: { file: File; input?: unknown; seriesKey?: string; headers?: Record<string, string> }): Promise<Answer> {
  const form = new FormData();
  form.set("operations", JSON.stringify({ query: UPLOAD, variables: { input: input ?? null, file: null, seriesKey: seriesKey ?? null } }));
  form.set("map", JSON.stringify({ 0: ["variables.file"] }));
  form.set("0", file);
  const res = await fetch(`${requireEnv("TAULINE_TEST_URL")}/api/graphql`, { method: "POST", body: form, headers: { accept: "application/graphql-response+json, application/json", ...headers } });
  const text = await res.text();
  try {
    return { status: res.status, body: JSON.parse(text) };
  } catch {
    throw new Error(`non-JSON answer (${res.status}): ${text.slice(0, 300)}`);
  }
}

const buildInput = (commit: string) => ({ solver: "Cormorant", version: "4.3.0-manual", commit, branch: BRANCH });
const decayRun = { case: "decaying-hit", model: "k-epsilon", grid: "default", status: "COMPLETED" };

/** k–ε decay k = k0 [1 + (Cε2 − 1) ε0 t / k0]^(−1/(Cε2 − 1)) (reference sheet §2.2; Launder & Spalding 1974, Cε2 = 1.92), as CSV. */
function kEpsilonDecayCsv(cEps2: number): string {
  const k0 = 1.5;
  const eps0 = 0.9;
  const lines = ["t [s],k [m^2/s^2]"];
  for (let i = 0; i < 60; i++) {
    const t = i * 0.5;
    lines.push(`${t},${(k0 * Math.pow(1 + ((cEps2 - 1) * eps0 * t) / k0, -1 / (cEps2 - 1))).toPrecision(12)}`);
  }
  return lines.join("\n") + "\n";
}

let developer = "";
beforeAll(async () => {
  developer = await signIn("developer@fenwick-hydro.test");
});
afterAll(closeTestDb);

describe("manual upload through submitResults (multipart)", () => {
  it("stores a JSON results file given as a whole GraphQL request body and returns the receipt", async () => {
    const body = JSON.parse(await readFile("fixtures/payloads/sample-build.json", "utf8"));
    const commit = randomCommit();
    body.variables.input.build = { ...body.variables.input.build, commit, branch: BRANCH };
    const res = await upload({ file: new File([JSON.stringify(body)], "sample-build.json", { type: "application/json" }), headers: { ...CSRF, cookie: developer } });
    expect(res.body.errors).toBeUndefined();
    const receipt = res.body.data!.submitResults!;
    expect(receipt.created).toBe(true);
    expect(receipt.build).toMatchObject({ commit, branch: BRANCH });
    expect(receipt.runs).toHaveLength(body.variables.input.runs.length);
    // The manual run is recorded as the signed-in developer's, not a CI token's.
    const [row] = await testDb()("submissions as s").join("builds as b", "b.id", "s.build_id").join("users as u", "u.id", "s.user_id").where("b.commit", commit).select("u.email", "s.ci_token_id");
    expect(row).toEqual({ email: "developer@fenwick-hydro.test", ci_token_id: null });
  });

  it("derives the k–ε decay exponent 1/(Cε2 − 1) = 1.087 from a k(t) CSV attached to one run", async () => {
    const commit = randomCommit();
    const res = await upload({
      file: new File([kEpsilonDecayCsv(1.92)], "k-decay.csv", { type: "text/csv" }),
      input: { build: buildInput(commit), runs: [decayRun] },
      seriesKey: "k_decay",
      headers: { ...CSRF, cookie: developer },
    });
    expect(res.body.errors).toBeUndefined();
    const run = res.body.data!.submitResults!.runs[0];
    const n = run.quantities.find((q) => q.key === "decay_exponent")!;
    // n = 1/(1.92 − 1) = 1.0869565 (reference sheet §2.2; Launder & Spalding 1974 constants).
    expect(n.origin).toBe("derived");
    expect(n.value).toBeCloseTo(1 / 0.92, 5);
    expect(n.verdict).toBe("within");
    const stored = await testDb()("run_series as s").join("runs as r", "r.id", "s.run_id").join("builds as b", "b.id", "r.build_id").where({ "b.commit": commit, "s.key": "k_decay" }).count<{ count: string }[]>({ count: "*" });
    expect(Number(stored[0].count)).toBe(1);
  });

  it("refuses a CSV with a non-numeric cell, naming file row and column, and stores nothing", async () => {
    const commit = randomCommit();
    const lines = kEpsilonDecayCsv(1.92).split("\n");
    lines[16] = "7.5,abc"; // the 17th line of the file
    const before = await countRows("builds", { branch: BRANCH });
    const res = await upload({
      file: new File([lines.join("\n")], "k-decay.csv", { type: "text/csv" }),
      input: { build: buildInput(commit), runs: [decayRun] },
      seriesKey: "k_decay",
      headers: { ...CSRF, cookie: developer },
    });
    expect(res.status).toBe(400);
    expect(res.body.errors![0].message).toBe("file row 17, column k [m^2/s^2]: 'abc' is not a number");
    expect(res.body.errors![0].extensions?.code).toBe("BAD_USER_INPUT");
    expect(await countRows("builds", { commit })).toBe(0);
    expect(await countRows("builds", { branch: BRANCH })).toBe(before);
  });

  it("refuses a CSV whose times are not increasing, pointing the schema's index back at the file row", async () => {
    const commit = randomCommit();
    const lines = kEpsilonDecayCsv(1.92).split("\n");
    lines[10] = lines[9]; // file row 11 repeats the time of row 10
    const res = await upload({
      file: new File([lines.join("\n")], "k-decay.csv", { type: "text/csv" }),
      input: { build: buildInput(commit), runs: [decayRun] },
      seriesKey: "k_decay",
      headers: { ...CSRF, cookie: developer },
    });
    expect(res.body.errors![0].extensions?.issues?.[0]).toEqual({
      path: "input.runs[0].series[0].x[9]",
      message: expect.stringMatching(/strictly increasing.*\(file row 11, column t \[s\]\)$/),
    });
    expect(await countRows("builds", { commit })).toBe(0);
  });

  it("refuses a multipart POST without the CSRF header (403) even with a valid session, and stores nothing", async () => {
    const commit = randomCommit();
    const res = await upload({
      file: new File([kEpsilonDecayCsv(1.92)], "k-decay.csv", { type: "text/csv" }),
      input: { build: buildInput(commit), runs: [decayRun] },
      seriesKey: "k_decay",
      headers: { cookie: developer },
    });
    expect(res.status).toBe(403);
    expect(await countRows("builds", { commit })).toBe(0);
  });

  it("answers 401 to an upload without a session or CI token", async () => {
    const commit = randomCommit();
    const res = await upload({
      file: new File([kEpsilonDecayCsv(1.92)], "k-decay.csv", { type: "text/csv" }),
      input: { build: buildInput(commit), runs: [decayRun] },
      seriesKey: "k_decay",
      headers: CSRF,
    });
    expect(res.status).toBe(401);
    expect(res.body.errors![0].extensions?.code).toBe("UNAUTHENTICATED");
    expect(await countRows("builds", { commit })).toBe(0);
  });

  it("lets a CI token upload a file too, and keeps plain JSON posts working without the header", async () => {
    const commit = randomCommit();
    const res = await upload({
      file: new File([JSON.stringify({ build: buildInput(commit), runs: [decayRun] })], "results.json", { type: "application/json" }),
      headers: { ...CSRF, authorization: `Bearer ${ciToken()}` },
    });
    expect(res.body.errors).toBeUndefined();
    const plain = await postGraphQL({ query: "query { releaseGate(commit: \"" + commit + "\") { state } }", token: ciToken() });
    expect(plain.status).toBe(200);
    expect(plain.body.data).toEqual({ releaseGate: { state: "pending" } });
  });

  it("refuses input next to a JSON results file and a CSV without seriesKey, naming the argument", async () => {
    const json = await upload({ file: new File(["{}"], "r.json", { type: "application/json" }), input: { build: buildInput(randomCommit()), runs: [decayRun] }, headers: { ...CSRF, cookie: developer } });
    expect(json.body.errors![0].extensions?.issues?.[0].path).toBe("input");
    const csv = await upload({ file: new File(["t,k\n0,1\n1,0.5\n"], "k.csv", { type: "text/csv" }), input: { build: buildInput(randomCommit()), runs: [decayRun] }, headers: { ...CSRF, cookie: developer } });
    expect(csv.body.errors![0].extensions?.issues?.[0].path).toBe("seriesKey");
  });
});
