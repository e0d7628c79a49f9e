import { describe, expect, it } from "vitest";
import { BAND_FIELDS, CASE_FIELDS, describeChange, diffFields, labelOfField } from "@/lib/format/field-changes";

// The readable diff of band, case and quantity versions in the history.

const v1 = {
  kind: "verification",
  reference: 1 / 0.92,
  source: "Launder & Spalding 1974",
  lower: (1 / 0.92) * 0.99,
  upper: (1 / 0.92) * 1.01,
  marginalMargin: 0.002,
  noiseFloor: 0.001,
  fitSettings: {},
  id: 7,
  version: 1,
};

describe("diffFields", () => {
  it("lists only the changed fields, in the declared order, ignoring id and version", () => {
    const v2 = { ...v1, id: 8, version: 2, upper: 1.095, marginalMargin: 0.001 };
    expect(diffFields(v1, v2, BAND_FIELDS)).toEqual([
      { field: "upper", before: v1.upper, after: 1.095 },
      { field: "marginalMargin", before: 0.002, after: 0.001 },
    ]);
  });

  it("compares fit settings leaf by leaf and reports an opened limit as null", () => {
    const before = { ...v1, fitSettings: { logLawWindow: { yPlusMin: 30, yPlusMax: 100 } } };
    const after = { ...v1, lower: null, fitSettings: { logLawWindow: { yPlusMin: 30, yPlusMax: 150 }, reTau: 180 } };
    expect(diffFields(before, after, BAND_FIELDS)).toEqual([
      { field: "lower", before: v1.lower, after: null },
      { field: "fitSettings.logLawWindow.yPlusMax", before: 100, after: 150 },
      { field: "fitSettings.reTau", before: null, after: 180 },
    ]);
  });

  it("has no changes for a first version and sees a changed model list of a case", () => {
    expect(diffFields(null, v1, BAND_FIELDS)).toEqual([]);
    const c = { title: "Channel", description: "d", models: ["sa", "sst"], parameters: {} };
    expect(diffFields(c, { ...c, models: ["sa", "sst", "ssg"] }, CASE_FIELDS)).toEqual([{ field: "models", before: ["sa", "sst"], after: ["sa", "sst", "ssg"] }]);
  });
});

describe("describeChange", () => {
  it("writes a tightened upper limit with the digits that tell the two apart", () => {
    expect(describeChange({ field: "upper", before: (1 / 0.92) * 1.01, after: 1.095 })).toEqual({ label: "upper limit", before: "1.098", after: "1.095" });
    expect(describeChange({ field: "reference", before: 0.41, after: 0.4100001 })).toEqual({ label: "reference value", before: "0.41", after: "0.4100001" });
  });

  it("says what an absent limit means and names fit overrides", () => {
    expect(describeChange({ field: "upper", before: 0.44, after: null }).after).toBe("none (open above)");
    expect(labelOfField("fitSettings.logLawWindow.yPlusMax")).toBe("fit override: log-law window, upper y+");
    expect(labelOfField("parameters.cfStation")).toBe("fit setting: c_f station");
  });
});
