import { describe, expect, it } from "vitest";
import {
  AnalysisError,
  cfAtX,
  detectDrift,
  diagnosticFunction,
  findReattachment,
  fitDecayExponent,
  fitLogLaw,
  mannKendall,
  residualDropOrders,
  theilSen,
} from "@/lib/analysis";

// Unusable input must fail loudly with AnalysisError (and a subject naming the
// input), never come back as NaN that a band would then judge. Property of the
// product, no external source.

type SeriesFn = (x: ArrayLike<number>, y: ArrayLike<number>) => unknown;

const WINDOW = { yPlusMin: 1, yPlusMax: 1e6 };
const SERIES_FUNCTIONS: Array<[string, SeriesFn]> = [
  ["fitLogLaw", (x, y) => fitLogLaw(x, y, WINDOW)],
  ["diagnosticFunction", diagnosticFunction],
  ["fitDecayExponent", fitDecayExponent],
  ["cfAtX", (x, y) => cfAtX(x, y, 2.5)],
  ["findReattachment", findReattachment],
  ["residualDropOrders", residualDropOrders],
  ["theilSen", theilSen],
];

const X = [1, 2, 3, 4, 5, 6];
const Y = [1, 0.5, 0.3, 0.2, 0.15, 0.12];

function expectAnalysisError(f: () => unknown, subject?: string): void {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(AnalysisError);
    if (subject !== undefined) expect((e as AnalysisError).subject).toBe(subject);
    return;
  }
  throw new Error("expected an AnalysisError, got a result");
}

describe.each(SERIES_FUNCTIONS)("%s rejects unusable series", (_name, f) => {
  it("accepts the clean series it is given (so the rejections below are meaningful)", () => {
    expect(() => f(X, Y)).not.toThrow();
    expect(() => f(Float64Array.from(X), Float64Array.from(Y))).not.toThrow();
  });

  it("rejects NaN in either series", () => {
    expectAnalysisError(() => f([1, 2, Number.NaN, 4, 5, 6], Y));
    expectAnalysisError(() => f(X, [1, 0.5, Number.NaN, 0.2, 0.15, 0.12]));
  });

  it("rejects +-Infinity in either series", () => {
    expectAnalysisError(() => f([1, 2, 3, Number.POSITIVE_INFINITY, 5, 6], Y));
    expectAnalysisError(() => f(X, [1, 0.5, 0.3, Number.NEGATIVE_INFINITY, 0.15, 0.12]));
  });

  it("rejects empty arrays", () => {
    expectAnalysisError(() => f([], []));
    expectAnalysisError(() => f(new Float64Array(0), new Float64Array(0)));
  });

  it("rejects a series whose x and y lengths differ", () => {
    expectAnalysisError(() => f(X, Y.slice(1)));
    expectAnalysisError(() => f(X.slice(1), Y));
  });
});

describe("single-series functions reject unusable input", () => {
  it("mannKendall rejects NaN, Infinity and an empty series", () => {
    expectAnalysisError(() => mannKendall([1, Number.NaN, 2]), "values");
    expectAnalysisError(() => mannKendall([1, Number.POSITIVE_INFINITY, 2]), "values");
    expectAnalysisError(() => mannKendall([]), "values");
  });

  it("detectDrift rejects NaN and Infinity in the history and a non-finite baseline", () => {
    expectAnalysisError(() => detectDrift({ values: [1, Number.NaN], baseline: null, noiseFloor: 0 }), "values");
    expectAnalysisError(() => detectDrift({ values: [1, Number.POSITIVE_INFINITY], baseline: null, noiseFloor: 0 }), "values");
    expectAnalysisError(() => detectDrift({ values: [1, 2], baseline: Number.NaN, noiseFloor: 0 }), "baseline");
  });
});
