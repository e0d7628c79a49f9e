import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { print } from "graphql";
import { RUN_PLOTS_QUERY } from "@/graphql/operations/run";
import { closeTestDb } from "../helpers/db";
import { ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { requireEnv } from "../helpers/env";
import { buildEdgeCaseSubmission, LONG_PROFILE_POINTS } from "./run-view-edge-cases";

// The run page's data over real HTTP: the plot series are thinned on the
// server while the derivations keep every sample, failed derivations arrive
// with their reasons, and the page answers 404 for a run of another build.

type Run = { id: string; case: string; model: string };
type Plots = {
  run: {
    plotSeries: { key: string; x: number[]; y: number[]; totalPoints: number }[];
    stresses: { realizable: boolean; violations: string[]; xi: number | null; eta: number | null }[];
    gridStudy: { convergence: string } | null;
    quantities: { key: string; value: number | null; verdict: string; details: Record<string, unknown>; bandKind: string | null; bandModel: string | null }[];
  } | null;
  case: { key: string; parameters: Record<string, unknown> } | null;
};

const submission = buildEdgeCaseSubmission(randomCommit());
let buildId = "";
let runs: Run[] = [];
let cookie = "";

const runOf = (caseKey: string, model: string) => {
  const r = runs.find((x) => x.case === caseKey && x.model === model);
  if (!r) throw new Error(`no ${caseKey}/${model} run in the receipt`);
  return r;
};

async function plots(caseKey: string, model: string, maxPoints = 1000) {
  const res = await postGraphQL<Plots>({ query: print(RUN_PLOTS_QUERY), variables: { runId: runOf(caseKey, model).id, caseKey, maxPoints }, cookie });
  expect(res.body.errors).toBeUndefined();
  return res.body.data as Plots;
}

beforeAll(async () => {
  const res = await postGraphQL<{ submitResults: { build: { id: string }; runs: Run[] } }>({
    query: "mutation($input: ResultSubmission!) { submitResults(input: $input) { build { id } runs { id case model } } }",
    variables: { input: submission },
    token: ciToken(),
  });
  expect(res.body.errors).toBeUndefined();
  buildId = res.body.data!.submitResults.build.id;
  runs = res.body.data!.submitResults.runs;
  cookie = await signIn("developer@fenwick-hydro.test");
});

afterAll(closeTestDb);

describe("plot series", () => {
  it("thins a 20 000-sample profile to maxPoints for drawing but derives κ from every sample", async () => {
    const data = await plots("channel-re180", "sa", 1000);
    const uPlus = data.run!.plotSeries.find((s) => s.key === "u_plus")!;
    expect(uPlus.totalPoints).toBe(LONG_PROFILE_POINTS);
    expect(uPlus.x.length).toBeLessThanOrEqual(1000);
    const posted = submission.runs[0].series![0];
    expect(uPlus.x[0]).toBe(posted.x[0]);
    expect(uPlus.x[uPlus.x.length - 1]).toBe(posted.x[posted.x.length - 1]);
    const inWindow = posted.x.filter((y) => y >= 30 && y <= 100).length;
    const kappa = data.run!.quantities.find((q) => q.key === "kappa")!;
    expect(kappa.details.points).toBe(inWindow);
    expect(inWindow).toBeGreaterThan(1000);
  });

  it("refuses a maxPoints outside 100..20000", async () => {
    const res = await postGraphQL({ query: print(RUN_PLOTS_QUERY), variables: { runId: runOf("channel-re180", "sa").id, caseKey: "channel-re180", maxPoints: 5 }, cookie });
    expect(res.body.errors?.[0].extensions?.code).toBe("BAD_USER_INPUT");
  });

  it("is not readable with a CI token", async () => {
    const res = await postGraphQL({ query: print(RUN_PLOTS_QUERY), variables: { runId: runOf("channel-re180", "sa").id, caseKey: "channel-re180", maxPoints: 1000 }, token: ciToken() });
    expect(res.body.errors?.[0].extensions?.code).toBe("FORBIDDEN");
  });
});

describe("what the plots write on themselves", () => {
  it("carries the reason of each failed derivation", async () => {
    const plate = await plots("flat-plate-zpg", "sst");
    const q = (key: string) => plate.run!.quantities.find((x) => x.key === key)!;
    expect(q("kappa").value).toBeNull();
    expect(String(q("kappa").details.error)).toMatch(/window/);
    expect(String(q("cf_at_x").details.error)).toMatch(/outside the series range/);
    expect(plate.case?.parameters.cfStation).toBe(4.8504e6);
    const decay = await plots("decaying-hit", "k-epsilon");
    expect(String(decay.run!.quantities[0].details.error)).toMatch(/power law/);
  });

  it("says which kind of band judged a value", async () => {
    const step = await plots("backstep", "k-omega");
    const xr = step.run!.quantities.find((q) => q.key === "reattachment_xr_h")!;
    expect(xr.bandKind).toBe("validation");
    // The downstream-most of two − to + crossings (x/H ≈ 0.65 and 6.3) is the reattachment.
    expect(xr.details.crossings).toHaveLength(2);
    expect(xr.value).toBeCloseTo(6.3, 1);
  });

  it("marks the reference sheet §9.4 non-realizable samples and the oscillatory grid study", async () => {
    const shear = await plots("homogeneous-shear", "lrr");
    expect(shear.run!.stresses.map((s) => s.realizable)).toEqual([true, true, false, false, false]);
    // Sheet §9.4: R = [[1,1.2,0],[1.2,1,0],[0,0,1]] has η = 0.230940, ξ = 0.
    expect(shear.run!.stresses[2].eta).toBeCloseTo(0.23094, 5);
    expect(shear.run!.stresses[4].eta).toBeNull();
    const grid = await plots("grid-study", "sa");
    expect(grid.run!.gridStudy?.convergence).toBe("oscillatory");
  });
});

describe("run page", () => {
  const base = () => requireEnv("TAULINE_TEST_URL");

  it("renders the run of its own build", async () => {
    const run = runOf("backstep", "k-omega");
    const res = await fetch(`${base()}/builds/${buildId}/runs/${run.id}`, { headers: { cookie } });
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain("Backward-facing step");
    expect(html).toContain("test/run-view");
  });

  // /builds has a loading.tsx, so the response is already streaming (status 200)
  // when the run page calls notFound(); Next then renders the not-found page
  // with a noindex tag instead of changing the status (Next 16 docs, "The HTTP
  // contract" in the streaming guide). Either way no run is shown.
  async function expectNotFound(path: string) {
    const res = await fetch(`${base()}${path}`, { headers: { cookie } });
    expect([200, 404]).toContain(res.status);
    const html = await res.text();
    expect(html).toContain("Nothing here");
    expect(html).toMatch(/<meta name="robots" content="noindex"/);
    expect(html).not.toContain("Backward-facing step");
  }

  it("shows the not-found page for a run addressed under another build, and for a malformed id", async () => {
    const run = runOf("backstep", "k-omega");
    await expectNotFound(`/builds/1/runs/${run.id}`);
    await expectNotFound(`/builds/${buildId}/runs/abc`);
    await expectNotFound(`/builds/${buildId}/runs/99999999999`);
  });
});
