import { describe, expect, it } from "vitest";
import { bandInputFromDraft, draftFromBand, fitSettingsFromText, fitTextFrom } from "@/components/band-editor/band-draft";
import { parseNumberText } from "@/components/band-editor/number-text";

// The band form: typed text to the reviseBand input, checked with the server's
// own schema. Band numbers: κ = 0.41 with the modern spread 0.37–0.44 (reference
// sheet §1.2, Coles & Hirst 1969 via NASA TMR; spread from the table), and the
// k–ε decay band n = 1/0.92 ± 1 % (reference sheet §2.2).

const scope = { caseKey: "channel-re180", quantityKey: "kappa", model: null };
const kappaBand = {
  kind: "validation" as const,
  reference: 0.41,
  source: "Coles & Hirst 1969 (reference sheet §1.2)",
  lower: 0.37,
  upper: 0.44,
  marginalMargin: 0.005,
  noiseFloor: 0.002,
  fitSettings: { logLawWindow: { yPlusMin: 30, yPlusMax: 100 }, reTau: 180 },
};

describe("parseNumberText", () => {
  it("reads decimal, exponent and true-minus forms and treats an empty box as no value", () => {
    expect(parseNumberText("0.41")).toEqual({ ok: true, value: 0.41 });
    expect(parseNumberText(" 4.8504E6 ")).toEqual({ ok: true, value: 4.8504e6 });
    expect(parseNumberText("−1.5e-3")).toEqual({ ok: true, value: -0.0015 });
    expect(parseNumberText("")).toEqual({ ok: true, value: null });
  });

  it("rejects a decimal comma, words and overflow with a message", () => {
    expect(parseNumberText("0,41")).toEqual({ ok: false, message: "use a point as the decimal separator" });
    expect(parseNumberText("abc").ok).toBe(false);
    expect(parseNumberText("1e400")).toEqual({ ok: false, message: "is too large to store" });
  });
});

describe("bandInputFromDraft", () => {
  it("writes tiny and huge magnitudes in exponent form that reads back exactly", () => {
    const draft = draftFromBand({ ...kappaBand, reference: 0.0026556, lower: 0.00026556 * 0.97, upper: 1 / 3, fitSettings: {} });
    expect(draft.lower).toBe((0.00026556 * 0.97).toExponential());
    expect(parseNumberText(draft.lower)).toEqual({ ok: true, value: 0.00026556 * 0.97 });
    expect(parseNumberText(draft.upper)).toEqual({ ok: true, value: 1 / 3 });
  });

  it("saves an untouched stored value exactly (no rounding through the text field)", () => {
    const n = 1 / 0.92;
    const draft = { ...draftFromBand({ ...kappaBand, reference: n, lower: n * 0.99, upper: n * 1.01, fitSettings: {} }), reason: "re-check of the decay band" };
    const { input } = bandInputFromDraft(draft, scope);
    expect(input?.reference).toBe(n);
    expect(input?.lower).toBe(n * 0.99);
    expect(input?.upper).toBe(n * 1.01);
  });

  it("turns a tightened upper limit and a reason into the reviseBand input with the fit window kept", () => {
    const draft = { ...draftFromBand(kappaBand), upper: "0.43", reason: "tightened after the closure review" };
    const { input, errors } = bandInputFromDraft(draft, scope);
    expect(errors).toEqual({});
    expect(input).toMatchObject({ ...scope, upper: 0.43, lower: 0.37, fitSettings: { logLawWindow: { yPlusMin: 30, yPlusMax: 100 }, reTau: 180 } });
  });

  it("allows a one-sided band: an empty upper limit is open above", () => {
    const draft = { ...draftFromBand({ ...kappaBand, reference: null, lower: 3, upper: null, fitSettings: {} }), reason: "at least three orders of residual drop" };
    expect(bandInputFromDraft(draft, { ...scope, quantityKey: "residual_drop_orders" }).input).toMatchObject({ lower: 3, upper: null, reference: null });
  });

  it("names each bad field: limits in the wrong order, text that is not a number, no reason", () => {
    const draft = { ...draftFromBand(kappaBand), lower: "0.45", upper: "0.40", noiseFloor: "0,002", reason: "short" };
    const { input, errors } = bandInputFromDraft(draft, scope);
    expect(input).toBeNull();
    expect(errors.upper).toBe("must not be below the lower limit");
    expect(errors.noiseFloor).toBe("use a point as the decimal separator");
    expect(errors.reason).toMatch(/at least 10 characters/);
  });

  it("refuses a band with neither limit and a window given at one end only", () => {
    const draft = { ...draftFromBand(kappaBand), lower: "", upper: "", reason: "a band without limits" };
    draft.fit = { ...draft.fit, yPlusMax: "" };
    const { errors } = bandInputFromDraft(draft, scope);
    expect(errors.lower).toBe("a band needs a lower or an upper limit");
    expect(errors["fitSettings.logLawWindow.yPlusMax"]).toBe("give both ends of the window, or neither");
  });

  it("needs the marginal margin and noise floor as numbers (0 for none) and refuses negative ones", () => {
    const { errors } = bandInputFromDraft({ ...draftFromBand(kappaBand), marginalMargin: "", noiseFloor: "-0.1", reason: "margins for the review" }, scope);
    expect(errors.marginalMargin).toBe("must be a number (0 for none)");
    expect(errors.noiseFloor).toBe("must not be negative");
  });
});

describe("fit settings text", () => {
  it("round-trips the TMR flat-plate station and leaves empty fields out", () => {
    // TMR 2DZP station Re_x = 4.8504e6 (x = 0.97008 at Re = 5e6 per unit length; reference sheet §7.2).
    const text = fitTextFrom({ cfStation: 4.8504e6, cfStationLabel: "Re_x = 4.8504e6 (TMR x = 0.97008)" });
    expect(text.cfStation).toBe("4.8504e6");
    const errors: Record<string, string> = {};
    expect(fitSettingsFromText(text, errors, "parameters")).toEqual({ cfStation: 4.8504e6, cfStationLabel: "Re_x = 4.8504e6 (TMR x = 0.97008)" });
    expect(errors).toEqual({});
  });
});
