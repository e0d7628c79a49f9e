import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../helpers/db";
import { randomCommit } from "../helpers/graphql";
import { countStored, expectNothingStored, expectRefusedAt, hostileSubmission, postRawSubmission, residual, submitBody } from "./hostile-helpers";

// Submissions whose numbers are finite but whose shape the derivations cannot
// use (issue 6, "Bad input"): empty lists, mismatched lengths, x that does not
// increase where a fit needs it, impossible grid studies, negative counts,
// unknown keys, duplicate runs. Each: 400, the field path, nothing stored.

afterAll(closeTestDb);

const logspace = (a: number, b: number, n: number) => Array.from({ length: n }, (_, i) => a * (b / a) ** (i / (n - 1)));

async function expectRefused(runs: unknown[], path: string, message?: RegExp) {
  const commit = randomCommit();
  const res = await postRawSubmission(submitBody(hostileSubmission(commit, runs)));
  expectRefusedAt(res, path, message);
  await expectNothingStored(commit);
}

describe("empty and mismatched lists", () => {
  it("rejects a submission without runs", () => expectRefused([], "input.runs", /at least one run/));

  it("rejects a profile with empty x and y", () =>
    expectRefused([{ case: "backstep", model: "sst", status: "COMPLETED", series: [{ key: "cf", x: [], y: [] }] }], "input.runs[0].series[0].x", /at least 1 value/));

  it("rejects a series whose x and y lengths differ", () =>
    expectRefused(
      [{ case: "channel-re180", model: "sa", status: "COMPLETED", series: [{ key: "u_plus", x: [1, 2, 3, 4], y: [1, 2, 3] }] }],
      "input.runs[0].series[0].y",
      /3 values but x has 4/,
    ));
});

describe("x that must increase for the fit", () => {
  // Log-law fit over y+ (reference sheet §1; common practice: the profile is ordered from the wall out).
  it("rejects a wall profile whose y+ steps back", () => {
    const x = logspace(1, 180, 40);
    x[23] = x[21];
    return expectRefused([{ case: "channel-re180", model: "sa", status: "COMPLETED", series: [{ key: "u_plus", x, y: x.map((v) => Math.log(v) / 0.41 + 5) }] }], "input.runs[0].series[0].x[23]", /strictly increasing/);
  });

  it("rejects a decay history whose time runs backwards", () => {
    const t = Array.from({ length: 30 }, (_, i) => i * 0.5);
    t[12] = 1;
    return expectRefused([{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [{ key: "k_decay", x: t, y: t.map((ti) => (1 + ti) ** -1.1) }] }], "input.runs[0].series[0].x[12]", /strictly increasing/);
  });

  it("rejects a c_f profile whose stations repeat", () =>
    expectRefused([{ case: "backstep", model: "sst", status: "COMPLETED", series: [{ key: "cf", x: [1, 2, 2, 3], y: [-1e-3, 1e-3, 2e-3, 2e-3] }] }], "input.runs[0].series[0].x[2]", /strictly increasing/));

  it("rejects a decay history with a non-positive k (the fit takes its logarithm)", () =>
    expectRefused([{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [{ key: "k_decay", x: [0, 1, 2], y: [1, 0, 0.5] }] }], "input.runs[0].series[0].y[1]", /greater than 0/));
});

describe("grid studies", () => {
  const study = (cells: number[], values: number[]) => [{ case: "grid-study", model: "sa", status: "COMPLETED", gridStudy: { quantity: "cf", cells, values, dimension: 2 } }];

  it("rejects a zero cell count", () => expectRefused(study([4000, 0, 250], [1, 2, 3]), "input.runs[0].gridStudy.cells[1]", /positive cell count/));

  it("rejects equal cell counts (refinement ratio 1: Richardson extrapolation divides by r^p − 1 = 0)", () =>
    expectRefused(study([4000, 4000, 1000], [1.01, 1.02, 1.05]), "input.runs[0].gridStudy.cells", /strictly decreasing/));

  it("accepts equal values on all three grids as a converged study with no observed order", async () => {
    // Celik et al. 2008 (reference sheet §4): ε21 = ε32 = 0 leaves p undefined; the
    // fine-grid value is then its own extrapolation and the GCI is 0 (lib/analysis rule).
    const commit = randomCommit();
    const res = await postRawSubmission(
      JSON.stringify({
        query: `mutation S($input: ResultSubmission!) { submitResults(input: $input) { runs { quantities { key value } } } }`,
        variables: { input: hostileSubmission(commit, study([16000, 4000, 1000], [0.0042, 0.0042, 0.0042])) },
      }),
    );
    expect(res.status).toBe(200);
    const quantities = (res.body.data as unknown as { submitResults: { runs: { quantities: { key: string; value: number | null }[] }[] } }).submitResults.runs[0].quantities;
    const value = (key: string) => quantities.find((q) => q.key === key)?.value;
    expect(value("observed_order")).toBeNull();
    expect(value("gci_fine_pct")).toBe(0);
    expect(value("extrapolated_value")).toBe(0.0042);
    expect((await countStored(commit)).runs).toBe(1);
  });
});

describe("counts and keys", () => {
  it("rejects negative iterations", () => expectRefused([{ case: "channel-re180", model: "sa", status: "COMPLETED", iterations: -1 }], "input.runs[0].iterations", /negative/));

  it("rejects a negative wall time", () => expectRefused([{ case: "channel-re180", model: "sa", status: "COMPLETED", wallSeconds: -3 }], "input.runs[0].wallSeconds", /negative/));

  it("rejects an unknown case key", () => expectRefused([{ case: "channel-re9999", model: "sa", status: "COMPLETED", series: [residual()] }], "input.runs[0].case", /not a known case/));

  it("rejects an unknown model key", () => expectRefused([{ case: "channel-re180", model: "v2f-private", status: "COMPLETED" }], "input.runs[0].model", /not a known turbulence model/));

  it("rejects the same case × model × grid twice in one submission", () =>
    expectRefused(
      [
        { case: "channel-re180", model: "sa", grid: "fine", status: "COMPLETED", series: [residual()] },
        { case: "channel-re180", model: "sst", grid: "fine", status: "COMPLETED" },
        { case: "channel-re180", model: "sa", grid: "fine", status: "DIVERGED" },
      ],
      "input.runs[2]",
      /already given in runs\[0\]/,
    ));

  it("rejects a repeated series key within one run", () =>
    expectRefused([{ case: "channel-re180", model: "sa", status: "COMPLETED", series: [residual(), residual(12)] }], "input.runs[0].series[1].key", /repeats/));
});
