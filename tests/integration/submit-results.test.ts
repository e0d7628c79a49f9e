import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, countRows, testDb } from "../helpers/db";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";

// The CI contract end to end: real HTTP to the GraphQL route, real PostgreSQL.
// Inputs are built here from published formulas, not from the project's own code.

type Quantity = { key: string; value: number | null; origin: string; verdict: string; reference: number | null; lower: number | null; upper: number | null; details: Record<string, unknown> };
type Receipt = {
  submitResults: {
    created: boolean;
    build: { id: string; verdict: string; commit: string };
    runs: { id: string; case: string; model: string; grid: string; status: string; verdict: string; quantities: Quantity[] }[];
  };
};

const logspace = (a: number, b: number, n: number) => Array.from({ length: n }, (_, i) => a * Math.pow(b / a, i / (n - 1)));

/** k–ε decay of isotropic turbulence: k = k0 [1 + (Cε2 − 1) ε0 t / k0]^(−1/(Cε2 − 1)) (reference sheet §2.2; Launder & Spalding 1974 constants). */
function kEpsilonDecaySeries(cEps2: number) {
  const k0 = 1.5;
  const eps0 = 0.9;
  const t = Array.from({ length: 60 }, (_, i) => i * 0.5);
  return { key: "k_decay", x: t, y: t.map((ti) => k0 * Math.pow(1 + ((cEps2 - 1) * eps0 * ti) / k0, -1 / (cEps2 - 1))) };
}

/** A residual history falling geometrically by exactly `orders` decades. */
function residualSeries(orders: number, n = 50) {
  const it = Array.from({ length: n }, (_, i) => (i + 1) * 20);
  return { key: "residual", x: it, y: it.map((_, i) => Math.pow(10, (-orders * i) / (n - 1))) };
}

function submission(commit: string, runs: unknown[]) {
  return { build: { solver: "Cormorant", version: "9.9.0-test", commit, branch: "test/ingest", pipelineUrl: "https://ci.fenwick-hydro.test/p/1" }, runs };
}

const quantity = (r: Receipt["submitResults"]["runs"][number], key: string) => {
  const q = r.quantities.find((x) => x.key === key);
  if (!q) throw new Error(`quantity ${key} missing from receipt: ${r.quantities.map((x) => x.key).join(", ")}`);
  return q;
};

afterAll(closeTestDb);

describe("submitResults over HTTP", () => {
  it("derives the k–ε decay exponent 1/(Cε2 − 1) and judges it against the model's verification band", async () => {
    const commit = randomCommit();
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: {
        input: submission(commit, [
          {
            case: "decaying-hit",
            model: "k-epsilon",
            status: "COMPLETED",
            iterations: 500,
            series: [kEpsilonDecaySeries(1.92), residualSeries(6)],
            coefficients: [{ name: "C_eps2", value: 1.92 }],
          },
        ]),
      },
    });
    expect(res.status).toBe(200);
    expect(res.body.errors).toBeUndefined();
    const run = res.body.data!.submitResults.runs[0];
    // n = 1/(1.92 − 1) = 1.0869565 (reference sheet §2.2; Launder & Spalding 1974, Cε2 = 1.92).
    const n = quantity(run, "decay_exponent");
    expect(n.origin).toBe("derived");
    expect(n.value).toBeCloseTo(1 / 0.92, 6);
    expect(n.verdict).toBe("within");
    expect(n.reference).toBeCloseTo(1.087, 3);
    // log10(first/last) of a history falling 6 decades (definition, common practice).
    expect(quantity(run, "residual_drop_orders").value).toBeCloseTo(6, 9);
    expect(res.body.data!.submitResults.created).toBe(true);
  });

  it("judges a changed closure coefficient (Cε2 = 1.87 gives n = 1.149) outside the k–ε band", async () => {
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: { input: submission(randomCommit(), [{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [kEpsilonDecaySeries(1.87), residualSeries(6)] }]) },
    });
    expect(res.body.errors).toBeUndefined();
    const { build, runs } = res.body.data!.submitResults;
    expect(quantity(runs[0], "decay_exponent").value).toBeCloseTo(1 / 0.87, 6);
    expect(quantity(runs[0], "decay_exponent").verdict).toBe("outside");
    expect(runs[0].verdict).toBe("outside");
    expect(build.verdict).toBe("outside");
  });

  it("reproduces Celik et al. (2008) Table 1, column 1, for a grid study", async () => {
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: {
        input: submission(randomCommit(), [
          {
            case: "grid-study",
            model: "sa",
            status: "COMPLETED",
            // 2-D, N = 18000, 8000, 4500; reattachment length 6.063, 5.972, 5.863 (reference sheet §8.2).
            gridStudy: { quantity: "reattachment_xr_h", cells: [18000, 8000, 4500], values: [6.063, 5.972, 5.863], dimension: 2 },
          },
        ]),
      },
    });
    expect(res.body.errors).toBeUndefined();
    const run = res.body.data!.submitResults.runs[0];
    expect(quantity(run, "observed_order").value).toBeCloseTo(1.53397, 4); // p = 1.53 (Celik 2008 Table 1)
    expect(quantity(run, "extrapolated_value").value).toBeCloseTo(6.1685, 3); // φ_ext = 6.1685
    expect(quantity(run, "gci_fine_pct").value).toBeCloseTo(2.17499, 3); // GCI_fine = 2.2 %
  });

  it("finds the reattachment point where c_f turns from negative to positive, past a corner bubble", async () => {
    // c_f > 0 in a corner eddy (x/H < 1), < 0 in the main bubble, > 0 after reattachment at x/H = 6.2.
    const x = Array.from({ length: 121 }, (_, i) => i * 0.1);
    const cf = x.map((xi) => (xi < 1 ? 2e-4 * (1 - xi) : -1e-3 * Math.sin((Math.PI * (xi - 1)) / 5.2)) + (xi > 6.2 ? 8e-4 * (xi - 6.2) : 0));
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: { input: submission(randomCommit(), [{ case: "backstep", model: "sst", status: "COMPLETED", series: [{ key: "cf", x, y: cf }, residualSeries(5)] }]) },
    });
    expect(res.body.errors).toBeUndefined();
    const xr = quantity(res.body.data!.submitResults.runs[0], "reattachment_xr_h");
    // Between samples 6.2 and 6.3 the interpolated zero is 6.2 exactly (sin term is zero there, ramp starts there).
    expect(xr.value).toBeCloseTo(6.2, 6);
  });

  it("counts a Reynolds-stress sample with |uv| > sqrt(uu vv) as a realizability violation (Schumann 1977)", async () => {
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: {
        input: submission(randomCommit(), [
          {
            case: "homogeneous-shear",
            model: "ssg",
            status: "COMPLETED",
            stresses: [
              { at: 1, uu: 1, vv: 1, ww: 1, uv: 0, uw: 0, vw: 0 }, // isotropic: realizable
              { at: 2, uu: 1, vv: 1, ww: 1, uv: 1.2, uw: 0, vw: 0 }, // reference sheet §9.4: det R = −0.44
            ],
          },
        ]),
      },
    });
    expect(res.body.errors).toBeUndefined();
    const run = res.body.data!.submitResults.runs[0];
    expect(quantity(run, "realizability_violations").value).toBe(1);
    expect(quantity(run, "realizability_violations").verdict).toBe("outside");
  });

  it("stores a quantity key nobody defined yet and judges it unbanded", async () => {
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: { input: submission(randomCommit(), [{ case: "channel-re180", model: "sa", status: "COMPLETED", quantities: [{ key: "shape_factor_new", value: 1.41 }] }]) },
    });
    expect(res.body.errors).toBeUndefined();
    const q = quantity(res.body.data!.submitResults.runs[0], "shape_factor_new");
    expect(q).toMatchObject({ value: 1.41, origin: "reported", verdict: "unbanded" });
    // The case's banded quantities that this run did not deliver are judged missing.
    expect(quantity(res.body.data!.submitResults.runs[0], "kappa").verdict).toBe("missing");
  });

  it("replaces a re-posted run instead of duplicating it, keeping the build id", async () => {
    const commit = randomCommit();
    const post = (cEps2: number) =>
      postGraphQL<Receipt>({
        query: SUBMIT,
        token: ciToken(),
        // Decay of isotropic turbulence is transient: no residual band applies, so the decay exponent decides.
        variables: { input: submission(commit, [{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [kEpsilonDecaySeries(cEps2)] }]) },
      });
    const first = await post(1.87);
    const second = await post(1.92);
    expect(second.body.errors).toBeUndefined();
    expect(second.body.data!.submitResults.build.id).toBe(first.body.data!.submitResults.build.id);
    expect(second.body.data!.submitResults.created).toBe(false);
    const build = await testDb()("builds").where({ commit }).first();
    expect(await countRows("builds", { commit })).toBe(1);
    expect(await countRows("runs", { build_id: build.id })).toBe(1);
    // The verdict follows the replacement: outside (1.87) → within (1.92).
    expect(second.body.data!.submitResults.build.verdict).toBe("within");
  });

  it("judges a diverged run outside even when it delivers no quantities", async () => {
    const res = await postGraphQL<Receipt>({
      query: SUBMIT,
      token: ciToken(),
      variables: { input: submission(randomCommit(), [{ case: "backstep", model: "k-epsilon", status: "DIVERGED", iterations: 812 }]) },
    });
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data!.submitResults.runs[0].verdict).toBe("outside");
  });
});

describe("submitResults refuses bad input and stores nothing of it", () => {
  const cases: { name: string; run: Record<string, unknown>; path: string | RegExp }[] = [
    { name: "an unknown case key", run: { case: "no-such-case", model: "sa", status: "COMPLETED" }, path: "input.runs[0].case" },
    { name: "an unknown model key", run: { case: "channel-re180", model: "v2f-custom", status: "COMPLETED" }, path: "input.runs[0].model" },
    {
      name: "a series whose x and y lengths differ",
      run: { case: "channel-re180", model: "sa", status: "COMPLETED", series: [{ key: "u_plus", x: [1, 2, 3], y: [1, 2] }] },
      path: "input.runs[0].series[0].y",
    },
    {
      name: "a non-monotone x where the derivation needs it",
      run: { case: "backstep", model: "sa", status: "COMPLETED", series: [{ key: "cf", x: [0, 2, 1], y: [1, 2, 3] }] },
      path: "input.runs[0].series[0].x[2]",
    },
    {
      name: "a grid study with a zero cell count",
      run: { case: "grid-study", model: "sa", status: "COMPLETED", gridStudy: { quantity: "cf", cells: [100, 0, 10], values: [1, 2, 3], dimension: 2 } },
      path: "input.runs[0].gridStudy.cells[1]",
    },
    { name: "negative iterations", run: { case: "channel-re180", model: "sa", status: "COMPLETED", iterations: -5 }, path: "input.runs[0].iterations" },
  ];

  for (const c of cases) {
    it(`rejects ${c.name}, naming ${c.path}`, async () => {
      const commit = randomCommit();
      const res = await postGraphQL({ query: SUBMIT, token: ciToken(), variables: { input: submission(commit, [c.run]) } });
      expect(res.status).toBe(400);
      const error = res.body.errors?.[0];
      expect(error?.extensions?.code).toBe("BAD_USER_INPUT");
      expect(error?.extensions?.issues?.map((i) => i.path)).toContain(c.path);
      expect(await countRows("builds", { commit })).toBe(0);
    });
  }

  it("rejects a whole submission when one run is bad, keeping the good runs out too", async () => {
    const commit = randomCommit();
    const res = await postGraphQL({
      query: SUBMIT,
      token: ciToken(),
      variables: { input: submission(commit, [{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [kEpsilonDecaySeries(1.92)] }, { case: "nope", model: "sa", status: "COMPLETED" }]) },
    });
    expect(res.body.errors?.[0].extensions?.issues?.[0].path).toBe("input.runs[1].case");
    expect(await countRows("builds", { commit })).toBe(0);
  });

  it("rejects duplicate runs inside one submission", async () => {
    const commit = randomCommit();
    const run = { case: "channel-re180", model: "sa", status: "COMPLETED" };
    const res = await postGraphQL({ query: SUBMIT, token: ciToken(), variables: { input: submission(commit, [run, { ...run, grid: "default" }]) } });
    expect(res.body.errors?.[0].extensions?.issues?.[0].path).toBe("input.runs[1]");
    expect(await countRows("builds", { commit })).toBe(0);
  });

  it("rejects a non-finite number (1e400 parses to Infinity)", async () => {
    const commit = randomCommit();
    const body = JSON.stringify({ query: SUBMIT, variables: { input: submission(commit, [{ case: "channel-re180", model: "sa", status: "COMPLETED", quantities: [{ key: "kappa", value: 0.41 }] }]) } }).replace('"value":0.41', '"value":1e400');
    const res = await fetch(`${process.env.TAULINE_TEST_URL}/api/graphql`, {
      method: "POST",
      headers: { "content-type": "application/json", authorization: `Bearer ${ciToken()}` },
      body,
    });
    const json = (await res.json()) as { errors?: { message: string }[] };
    expect(json.errors?.[0].message).toMatch(/input\.runs\[0\]\.quantities\[0\]\.value|Float cannot represent/);
    expect(await countRows("builds", { commit })).toBe(0);
  });

  it("answers 401 without a token, with a malformed header and with an unknown token", async () => {
    const input = submission(randomCommit(), [{ case: "channel-re180", model: "sa", status: "COMPLETED" }]);
    const none = await postGraphQL({ query: SUBMIT, variables: { input } });
    expect(none.status).toBe(401);
    expect(none.body.errors?.[0].extensions?.code).toBe("UNAUTHENTICATED");
    const malformed = await postGraphQL({ query: SUBMIT, variables: { input }, headers: { authorization: "Token abc" } });
    expect(malformed.status).toBe(401);
    const unknown = await postGraphQL({ query: SUBMIT, variables: { input }, token: "not-a-real-token-0123456789" });
    expect(unknown.status).toBe(401);
  });
});
