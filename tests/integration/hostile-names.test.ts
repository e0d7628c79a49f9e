import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { randomCommit } from "../helpers/graphql";
import { expectNothingStored, expectRefusedAt, hostileSubmission, postRawSubmission, residual, submitBody } from "./hostile-helpers";

// Names in a submission (issue 6, "Bad input"): a megabyte of text is refused
// with the field's maximum length; SQL meta-characters are data and are stored
// verbatim where the field allows them; a NUL byte (which PostgreSQL text
// cannot hold) is refused with the field path instead of failing the INSERT.

afterAll(closeTestDb);

const MEGABYTE = "a".repeat(1024 * 1024);
const run = { case: "channel-re180", model: "sa", status: "COMPLETED", series: [residual()] };

describe("a megabyte of text in a name", () => {
  const fields: { field: string; path: string; max: RegExp; spoil: (commit: string) => unknown }[] = [
    { field: "solver", path: "input.build.solver", max: /at most 100 characters/, spoil: (c) => hostileSubmission(c, [run], { solver: MEGABYTE }) },
    { field: "version", path: "input.build.version", max: /at most 100 characters/, spoil: (c) => hostileSubmission(c, [run], { version: MEGABYTE }) },
    { field: "branch", path: "input.build.branch", max: /at most 200 characters/, spoil: (c) => hostileSubmission(c, [run], { branch: `test/h1/${MEGABYTE}` }) },
    { field: "case", path: "input.runs[0].case", max: /at most 64 characters/, spoil: (c) => hostileSubmission(c, [{ ...run, case: MEGABYTE }]) },
    { field: "model", path: "input.runs[0].model", max: /at most 64 characters/, spoil: (c) => hostileSubmission(c, [{ ...run, model: MEGABYTE }]) },
    { field: "grid", path: "input.runs[0].grid", max: /at most 64 characters/, spoil: (c) => hostileSubmission(c, [{ ...run, grid: MEGABYTE }]) },
    {
      field: "coefficient name",
      path: "input.runs[0].coefficients[0].name",
      max: /at most 64 characters/,
      spoil: (c) => hostileSubmission(c, [{ ...run, coefficients: [{ name: MEGABYTE, value: 1.92 }] }]),
    },
  ];
  for (const f of fields) {
    it(`refuses a 1 MB ${f.field}, naming ${f.path} and its maximum length`, async () => {
      const commit = randomCommit();
      const res = await postRawSubmission(submitBody(f.spoil(commit)));
      expectRefusedAt(res, f.path, f.max);
      await expectNothingStored(commit);
    });
  }

  it("refuses a 1 MB commit as not a commit hash (the build cannot be found by it, so nothing is stored under any hash)", async () => {
    const before = await testDb()("builds").count<{ n: string }[]>({ n: "*" }).where("solver", "Cormorant-1mb-commit");
    const res = await postRawSubmission(submitBody(hostileSubmission("f".repeat(1024 * 1024), [run], { solver: "Cormorant-1mb-commit" })));
    expectRefusedAt(res, "input.build.commit", /commit hash of 7 to 64/);
    const after = await testDb()("builds").count<{ n: string }[]>({ n: "*" }).where("solver", "Cormorant-1mb-commit");
    expect(after).toEqual(before);
  });
});

describe("SQL meta-characters", () => {
  it("stores quotes, a statement terminator, comment dashes, a backslash and $1 verbatim", async () => {
    const commit = randomCommit();
    const solver = `Cormorant'; drop table builds; --`;
    const version = `4.2-rc1 \\ "$1" %_`;
    // Git allows quotes, ';' and '$' in a branch name (git-check-ref-format(1)); not a backslash.
    const branch = `test/h1/o'brien;$1--"x"`;
    const res = await postRawSubmission(submitBody(hostileSubmission(commit, [{ ...run, coefficients: [{ name: `C_eps2'); --`, value: 1.92 }] }], { solver, version, branch })));
    expect(res.status).toBe(200);
    expect(res.body.errors).toBeUndefined();
    const db = testDb();
    const build = await db("builds").where({ commit }).first();
    expect({ solver: build.solver, version: build.version, branch: build.branch }).toEqual({ solver, version, branch });
    const coefficient = await db("run_coefficients as c").join("runs as r", "r.id", "c.run_id").where("r.build_id", build.id).select("c.name").first();
    expect(coefficient?.name).toBe(`C_eps2'); --`);
  });

  for (const [name, branch, problem] of [
    ["a backslash", "test/h1/back\\slash", /"\\"/],
    ['".."', "test/h1/a..b", /"\.\."/],
    ["a space", "test/h1/has space", /" "/],
    ['a component ending in ".lock"', "test/h1/x.lock", /\.lock/],
  ] as const) {
    it(`refuses a branch name with ${name}, as git would`, async () => {
      const commit = randomCommit();
      const res = await postRawSubmission(submitBody(hostileSubmission(commit, [run], { branch })));
      expectRefusedAt(res, "input.build.branch", problem);
      await expectNothingStored(commit);
    });
  }
});

describe("the NUL byte, which PostgreSQL text cannot store", () => {
  for (const [field, path, spoil] of [
    ["solver", "input.build.solver", (c: string) => hostileSubmission(c, [run], { solver: "Corm\u0000orant" })],
    ["version", "input.build.version", (c: string) => hostileSubmission(c, [run], { version: "4.2\u0000" })],
    ["branch", "input.build.branch", (c: string) => hostileSubmission(c, [run], { branch: "test/h1/nul\u0000" })],
    ["coefficient name", "input.runs[0].coefficients[0].name", (c: string) => hostileSubmission(c, [{ ...run, coefficients: [{ name: "C\u0000mu", value: 0.09 }] }])],
    ["series key", "input.runs[0].series[0].key", (c: string) => hostileSubmission(c, [{ ...run, series: [{ ...residual(), key: "resid\u0000ual" }] }])],
  ] as const) {
    it(`refuses a NUL byte in the ${field} with 400 and the field path (not a 500 from the INSERT)`, async () => {
      const commit = randomCommit();
      const res = await postRawSubmission(submitBody(spoil(commit)));
      expectRefusedAt(res, path);
      await expectNothingStored(commit);
    });
  }
});
