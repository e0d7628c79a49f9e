import { describe, expect, it } from "vitest";
import { findNumberArrayIssue } from "@/lib/validation/numbers";

// The one pass over a profile's numbers (IEEE 754 finiteness; monotone x where a fit needs it).

const rules = { maxLength: 10 };

describe("findNumberArrayIssue", () => {
  it("accepts finite numbers, -0 and the extremes of double precision", () => {
    expect(findNumberArrayIssue([0, -0, 5e-324, 1.7976931348623157e308, -1], rules)).toBeNull();
  });

  it.each([
    [Number.NaN, "NaN"],
    [Infinity, "Infinity"],
    [-Infinity, "-Infinity"],
    ["NaN", '"NaN"'],
    [null, "null"],
    [[1], "a list"],
  ])("names the index of %s", (bad, shown) => {
    expect(findNumberArrayIssue([1, 2, bad], rules)).toEqual({ index: 2, message: `must be a finite number, got ${shown}` });
  });

  it("refuses an empty list and one over the limit as a whole", () => {
    expect(findNumberArrayIssue([], rules)?.index).toBeNull();
    expect(findNumberArrayIssue(Array.from({ length: 11 }, () => 1), rules)?.message).toMatch(/limit is 10/);
  });

  it("names the first element that fails to increase, equal values included", () => {
    expect(findNumberArrayIssue([1, 2, 2, 3], { ...rules, strictlyIncreasing: true })).toEqual({ index: 2, message: "must be strictly increasing: 2 follows 2" });
  });

  it("names the first non-positive element where the fit takes a logarithm", () => {
    expect(findNumberArrayIssue([3, 1, -0, 2], { ...rules, positive: true })?.index).toBe(2);
  });
});
