import { describe, expect, it } from "vitest";
import { findBranchNameProblem, label } from "@/lib/validation/names";

// Branch names follow git-check-ref-format(1) (git documentation, "git check-ref-format",
// rules 1–10 for a ref under refs/heads/); the cases below are that page's rules.

describe("branch names", () => {
  it.each(["main", "release/4.2", "feature/o'brien", "ci/$1;--", "user/x_y-z.1", "fix/😀"])("accepts %s, which git accepts", (name) => {
    expect(findBranchNameProblem(name)).toBeNull();
  });

  it.each([
    ["a..b", ".."],
    ["a b", '" "'],
    ["a~1", "~"],
    ["a^", "^"],
    ["a:b", ":"],
    ["a?", "?"],
    ["a*", "*"],
    ["a[b", "["],
    ["a\\b", "\\"],
    ["a@{b", "@{"],
    ["@", '"@"'],
    ["-x", '"-"'],
    ["/x", "empty component"],
    ["x/", "empty component"],
    ["x//y", "empty component"],
    ["x.", 'ends with "."'],
    ["x/.hidden", 'starts with "."'],
    ["x/y.lock", ".lock"],
    ["x\u0000y", "control character"],
    ["x\u007fy", "control character"],
  ])("refuses %s, naming %s", (name, problem) => {
    expect(findBranchNameProblem(name)).toContain(problem);
  });
});

describe("labels", () => {
  const solver = label(100);

  it("keeps quotes, backslashes and $1 as given", () => {
    expect(solver.parse(`Cormorant'; drop table builds; -- \\ $1`)).toBe(`Cormorant'; drop table builds; -- \\ $1`);
  });

  it("refuses a NUL byte, which PostgreSQL text cannot store", () => {
    const r = solver.safeParse("Corm\u0000orant");
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toMatch(/control characters/);
  });

  it("refuses a megabyte with the maximum length", () => {
    const r = solver.safeParse("a".repeat(2 ** 20));
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.message)).toContain("must be at most 100 characters");
  });
});
