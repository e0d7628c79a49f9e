import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import { parseSubmission } from "@/lib/services/ingest";

// The boundary check of the CI contract: every rejection names the field path.

const build = { solver: "Cormorant", version: "4.3.0", commit: "ABCDEF0123", branch: "main" };
const run = (over: Record<string, unknown> = {}) => ({ case: "channel-re180", model: "sa", status: "COMPLETED", ...over });

function issuesOf(input: unknown): { path: string; message: string }[] {
  try {
    parseSubmission(input);
  } catch (error) {
    if (error instanceof AppError) return error.issues;
    throw error;
  }
  throw new Error("expected a rejection");
}

describe("parseSubmission", () => {
  it("defaults the grid to \"default\" and lower-cases the commit", () => {
    const s = parseSubmission({ build, runs: [run()] });
    expect(s.runs[0].grid).toBe("default");
    expect(s.build.commit).toBe("abcdef0123");
  });

  it("names the index of the first non-finite number in a series", () => {
    const issues = issuesOf({ build, runs: [run({ series: [{ key: "u_plus", x: [1, 2, 3], y: [1, Number.NaN, 3] }] })] });
    expect(issues[0].path).toBe("input.runs[0].series[0].y[1]");
  });

  it("rejects a u+ profile with y+ <= 0 (the log-law fit takes ln y+)", () => {
    const issues = issuesOf({ build, runs: [run({ series: [{ key: "u_plus", x: [0, 1, 2], y: [0, 1, 2] }] })] });
    expect(issues[0].path).toBe("input.runs[0].series[0].x[0]");
  });

  it("rejects a residual history with a non-positive residual (log10 needs > 0)", () => {
    const issues = issuesOf({ build, runs: [run({ series: [{ key: "residual", x: [1, 2], y: [1, 0] }] })] });
    expect(issues[0].path).toBe("input.runs[0].series[0].y[1]");
  });

  it("rejects a grid study ordered coarse to fine", () => {
    const issues = issuesOf({ build, runs: [run({ gridStudy: { quantity: "cf", cells: [10, 20, 40], values: [1, 2, 3], dimension: 2 } })] });
    expect(issues[0].path).toBe("input.runs[0].gridStudy.cells");
  });

  it("rejects a commit that is not a hexadecimal hash and a pipeline URL that is not http(s)", () => {
    const issues = issuesOf({ build: { ...build, commit: "main; drop table builds", pipelineUrl: "javascript:alert(1)" }, runs: [run()] });
    expect(issues.map((i) => i.path)).toEqual(expect.arrayContaining(["input.build.commit", "input.build.pipelineUrl"]));
  });

  it("rejects repeated quantity keys and an empty run list", () => {
    expect(issuesOf({ build, runs: [run({ quantities: [{ key: "a", value: 1 }, { key: "a", value: 2 }] })] })[0].path).toBe("input.runs[0].quantities[1].key");
    expect(issuesOf({ build, runs: [] })[0].path).toBe("input.runs");
  });
});
