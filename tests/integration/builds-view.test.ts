import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { VERDICT_ORDER } from "@/lib/analysis";
import { closeTestDb, testDb } from "../helpers/db";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { requireEnv } from "../helpers/env";
import { signIn } from "../helpers/session";

// The builds table, the comparison and the CSV export through real HTTP against
// the running app. Builds are posted on a branch of their own, emptied first, so
// that exact counts hold however often the suite runs against one database.

const branch = "test/builds-view";
let developer: string;

// SemVer 2.0.0 §11.4: "1.0.0-alpha < 1.0.0-alpha.1 < 1.0.0-alpha.beta < 1.0.0-beta <
// 1.0.0-beta.2 < 1.0.0-beta.11 < 1.0.0-rc.1 < 1.0.0"; §2: "1.9.0 -> 1.10.0 -> 1.11.0".
const SEMVER_ORDER = ["1.0.0-alpha", "1.0.0-alpha.1", "1.0.0-alpha.beta", "1.0.0-beta", "1.0.0-beta.2", "1.0.0-beta.11", "1.0.0-rc.1", "1.0.0", "1.9.0", "1.10.0"];
// Posted in another order, so that sorting by version cannot pass by following arrival.
const POST_ORDER = ["1.0.0-beta.11", "1.10.0", "1.0.0-alpha", "1.0.0", "1.0.0-rc.1", "1.0.0-alpha.beta", "1.9.0", "1.0.0-beta.2", "1.0.0-alpha.1", "1.0.0-beta"];
const commits = new Map<string, string>();

/** k–ε decay of isotropic turbulence k = k0 [1 + (Cε2 − 1) ε0 t/k0]^(−1/(Cε2 − 1)) (reference sheet §2.2; Launder & Spalding 1974). */
function decayRun(cEps2: number) {
  const t = Array.from({ length: 60 }, (_, i) => i * 0.5);
  const k = t.map((ti) => 1.5 * Math.pow(1 + ((cEps2 - 1) * 0.9 * ti) / 1.5, -1 / (cEps2 - 1)));
  return { case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [{ key: "k_decay", x: t, y: k }], coefficients: [{ name: "C_eps2", value: cEps2 }] };
}

function runsFor(version: string) {
  // n = 1/(Cε2 − 1): 1.92 gives 1.087 (inside the k–ε verification band), 1.80 gives 1.25 (outside);
  // a completed run that posts no k(t) series leaves its expected decay exponent missing.
  if (version === "1.0.0-rc.1") return [decayRun(1.8)];
  if (version === "1.9.0") return [{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED" }];
  return [decayRun(1.92)];
}

afterAll(closeTestDb);

type Row = { id: string; version: string; commit: string; branch: string; verdict: string; receivedAt: string };
type TableData = { buildTable: { totalCount: number; items: Row[] } };
const TABLE = `query($filter: BuildTableFilter, $sort: BuildTableSort, $first: Int, $offset: Int) {
  buildTable(filter: $filter, sort: $sort, first: $first, offset: $offset) { totalCount items { id version commit branch verdict receivedAt } } }`;

async function table(variables: Record<string, unknown>) {
  const res = await postGraphQL<TableData>({ query: TABLE, variables, cookie: developer });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.buildTable;
}

beforeAll(async () => {
  // Only this suite posts on its branch; runs, values and decisions cascade.
  await testDb()("builds").where({ branch }).delete();
  developer = await signIn("developer@fenwick-hydro.test");
  for (const version of POST_ORDER) {
    const commit = randomCommit();
    commits.set(version, commit);
    const res = await postGraphQL({ query: SUBMIT, token: ciToken(), variables: { input: { build: { solver: "Cormorant", version, commit, branch }, runs: runsFor(version) } } });
    expect(res.body.errors).toBeUndefined();
  }
});

describe("buildTable", () => {
  it("pages through a filtered view without overlap and reports the total", async () => {
    const sort = { column: "received", direction: "desc" };
    const pages = await Promise.all([0, 4, 8].map((offset) => table({ filter: { branch }, sort, first: 4, offset })));
    expect(pages.map((p) => p.items.length)).toEqual([4, 4, 2]);
    expect(pages.every((p) => p.totalCount === 10)).toBe(true);
    const ids = pages.flatMap((p) => p.items.map((b) => b.id));
    expect(new Set(ids).size).toBe(10);
    const times = pages.flatMap((p) => p.items.map((b) => Date.parse(b.receivedAt)));
    for (let i = 1; i < times.length; i++) expect(times[i]).toBeLessThanOrEqual(times[i - 1]);
  });

  it("sorts versions by SemVer precedence: numbers numerically, a release after its pre-releases", async () => {
    const asc = await table({ filter: { branch }, sort: { column: "version", direction: "asc" }, first: 50 });
    expect(asc.items.map((b) => b.version)).toEqual(SEMVER_ORDER);
    const desc = await table({ filter: { branch }, sort: { column: "version", direction: "desc" }, first: 50 });
    expect(desc.items.map((b) => b.version)).toEqual([...SEMVER_ORDER].reverse());
  });

  it("sorts verdicts by severity, not by spelling", async () => {
    const worstFirst = await table({ filter: { branch }, sort: { column: "verdict", direction: "desc" }, first: 50 });
    const ranks = worstFirst.items.map((b) => VERDICT_ORDER.indexOf(b.verdict as (typeof VERDICT_ORDER)[number]));
    for (let i = 1; i < ranks.length; i++) expect(ranks[i]).toBeLessThanOrEqual(ranks[i - 1]);
    expect(worstFirst.items[0]).toMatchObject({ version: "1.0.0-rc.1", verdict: "outside" });
    expect(worstFirst.items[1]).toMatchObject({ version: "1.9.0", verdict: "missing" });
  });

  it("filters by verdict, version substring (any case) and commit prefix (any case)", async () => {
    const outside = await table({ filter: { branch, verdict: "outside" }, first: 50 });
    expect(outside.items.map((b) => b.version)).toEqual(["1.0.0-rc.1"]);
    const beta = await table({ filter: { branch, version: "BETA" }, sort: { column: "version", direction: "asc" }, first: 50 });
    expect(beta.items.map((b) => b.version)).toEqual(["1.0.0-alpha.beta", "1.0.0-beta", "1.0.0-beta.2", "1.0.0-beta.11"]);
    const commit = commits.get("1.0.0-beta.2")!;
    const byPrefix = await table({ filter: { commitPrefix: commit.slice(0, 10).toUpperCase() }, first: 50 });
    expect(byPrefix.items.map((b) => b.commit)).toEqual([commit]);
  });

  it("filters by an inclusive range of UTC days", async () => {
    const today = new Date().toISOString().slice(0, 10);
    const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    expect((await table({ filter: { branch, fromDate: today, toDate: today } })).totalCount).toBe(10);
    expect((await table({ filter: { branch, toDate: yesterday } })).totalCount).toBe(0);
    expect((await table({ filter: { branch, fromDate: tomorrow } })).totalCount).toBe(0);
  });

  it("rejects a commit prefix that is not hexadecimal and a day range that runs backwards", async () => {
    for (const filter of [{ commitPrefix: "c5e-1" }, { fromDate: "2026-11-30", toDate: "2026-11-01" }, { fromDate: "2026-02-30" }]) {
      const res = await postGraphQL({ query: TABLE, variables: { filter }, cookie: developer });
      expect(res.body.errors?.[0].extensions?.code).toBe("BAD_USER_INPUT");
    }
  });

  it("accepts only the whitelisted sort columns", async () => {
    const res = await postGraphQL({ query: TABLE, variables: { sort: { column: "commit", direction: "asc" } }, cookie: developer });
    expect(res.status).toBe(400);
    expect(res.body.data ?? null).toBeNull();
  });

  it("refuses a CI token", async () => {
    const res = await postGraphQL({ query: TABLE, variables: {}, token: ciToken() });
    expect(res.body.errors?.[0].extensions?.code).toBe("FORBIDDEN");
  });
});

type Comparison = {
  buildComparison: {
    build: { id: string };
    against: { id: string; gate: string } | null;
    againstIsBaseline: boolean;
    runs: { case: string; model: string; verdictChanged: boolean; quantities: { key: string; value: number; otherValue: number; verdict: string; otherVerdict: string; verdictChanged: boolean }[]; coefficients: { name: string; value: number; otherValue: number; changed: boolean }[] }[];
  };
};
const COMPARE = `query($buildId: ID!, $againstId: ID) { buildComparison(buildId: $buildId, againstId: $againstId) {
  build { id } against { id gate } againstIsBaseline
  runs { case model verdictChanged quantities { key value otherValue verdict otherVerdict verdictChanged } coefficients { name value otherValue changed } } } }`;

describe("buildComparison", () => {
  it("shows the changed C_eps2 between the newest main build and its baseline, and the decay exponent it moves", async () => {
    const newest = await table({ filter: { branch: "main" }, sort: { column: "received", direction: "desc" }, first: 1 });
    const res = await postGraphQL<Comparison>({ query: COMPARE, variables: { buildId: newest.items[0].id }, cookie: developer });
    expect(res.body.errors).toBeUndefined();
    const cmp = res.body.data!.buildComparison;
    expect(cmp.againstIsBaseline).toBe(true);
    expect(cmp.against?.gate).toBe("approved");
    const kEps = cmp.runs.filter((r) => r.model === "k-epsilon");
    expect(kEps.length).toBeGreaterThan(0);
    for (const r of kEps) expect(r.coefficients.find((c) => c.name === "C_eps2")).toEqual({ name: "C_eps2", value: 1.87, otherValue: 1.92, changed: true });
    // Coefficients of the other closures did not change.
    expect(cmp.runs.filter((r) => r.model !== "k-epsilon").every((r) => r.coefficients.every((c) => !c.changed))).toBe(true);
    // n = 1/(Cε2 − 1) for the k–ε model (reference sheet §2.2; Launder & Spalding 1974): 1.0870 → 1.1494.
    const decay = cmp.runs.find((r) => r.case === "decaying-hit" && r.model === "k-epsilon")!.quantities.find((q) => q.key === "decay_exponent")!;
    expect(decay.otherValue).toBeCloseTo(1 / (1.92 - 1), 3);
    expect(decay.value).toBeCloseTo(1 / (1.87 - 1), 3);
    expect(decay).toMatchObject({ otherVerdict: "within", verdict: "outside", verdictChanged: true });
  });

  it("compares with a chosen build and refuses the build itself or an unknown one", async () => {
    const asc = await table({ filter: { branch }, sort: { column: "version", direction: "asc" }, first: 50 });
    const id = (v: string) => asc.items.find((b) => b.version === v)!.id;
    const res = await postGraphQL<Comparison>({ query: COMPARE, variables: { buildId: id("1.0.0-rc.1"), againstId: id("1.0.0-beta.11") }, cookie: developer });
    expect(res.body.errors).toBeUndefined();
    const run = res.body.data!.buildComparison.runs[0];
    expect(run.coefficients).toEqual([{ name: "C_eps2", value: 1.8, otherValue: 1.92, changed: true }]);
    expect(run.verdictChanged).toBe(true);
    const self = await postGraphQL({ query: COMPARE, variables: { buildId: id("1.0.0"), againstId: id("1.0.0") }, cookie: developer });
    expect(self.body.errors?.[0].extensions?.code).toBe("BAD_USER_INPUT");
    const unknown = await postGraphQL({ query: COMPARE, variables: { buildId: id("1.0.0"), againstId: "999999999" }, cookie: developer });
    expect(unknown.body.errors?.[0].extensions?.code).toBe("NOT_FOUND");
  });
});

describe("CSV export of the builds view", () => {
  const url = (qs: string) => `${requireEnv("TAULINE_TEST_URL")}/builds/export?${qs}`;

  it("requires a session", async () => {
    const res = await fetch(url(`branch=${encodeURIComponent(branch)}`), { redirect: "manual" });
    expect([307, 401]).toContain(res.status);
    expect(res.headers.get("content-type") ?? "").not.toContain("text/csv");
  });

  it("returns the filtered rows in the view's order, as a CSV attachment", async () => {
    const res = await fetch(url(`branch=${encodeURIComponent(branch)}&sort=version.asc&page=3&size=25`), { headers: { cookie: developer } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="tauline-builds-test-builds-view-\d{8}-\d{4}\.csv"$/);
    const parsed = Papa.parse<Record<string, string>>(await res.text(), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    // Paging parameters are ignored: the export holds every page of the view.
    expect(parsed.data.map((r) => r.version)).toEqual(SEMVER_ORDER);
    expect(parsed.data.every((r) => r.branch === branch && r.gate === "pending")).toBe(true);
    expect(parsed.data.find((r) => r.version === "1.0.0-rc.1")).toMatchObject({ verdict: "outside", runs_outside: "1", commit: commits.get("1.0.0-rc.1") });
  });

  it("answers a filter it cannot accept with 400 and the reason", async () => {
    const res = await fetch(url("commit=not-hex"), { headers: { cookie: developer } });
    expect(res.status).toBe(400);
    expect(await res.text()).toMatch(/hexadecimal/);
  });
});
