import { fieldErrorsOf } from "@/lib/validation/case";
import { bandRevisionSchema, type BandRevision } from "@/lib/validation/band";
import { parseNumberText } from "./number-text";

// The band form's state is text (what the person typed); this turns it into the
// reviseBand input and checks it with the server's own schema, so the form shows
// the same complaints, per field, before anything is sent.

export const FIT_KEYS = ["yPlusMin", "yPlusMax", "reTau", "cfStation", "cfStationLabel", "stepHeight", "residualTargetOrders"] as const;
export type FitKey = (typeof FIT_KEYS)[number];

export interface BandDraft {
  kind: "verification" | "validation";
  reference: string;
  source: string;
  lower: string;
  upper: string;
  marginalMargin: string;
  noiseFloor: string;
  fit: Record<FitKey, string>;
  reason: string;
}

export interface BandLike {
  kind: "verification" | "validation";
  reference: number | null;
  source: string;
  lower: number | null;
  upper: number | null;
  marginalMargin: number;
  noiseFloor: number;
  fitSettings: Record<string, unknown>;
}

// Every digit is kept, so an untouched field saves the stored value exactly (a
// rounded echo would show up as a change in the history). Very large and small
// magnitudes are written as engineers type them, 4.8504e6 rather than 4850400;
// toExponential() without digits is the shortest form that reads back the same.
function numText(v: unknown): string {
  if (typeof v !== "number" || !Number.isFinite(v)) return "";
  const abs = Math.abs(v);
  return abs !== 0 && (abs >= 1e5 || abs < 1e-3) ? v.toExponential().replace("e+", "e") : String(v);
}

/** Fit settings (a band's override or a case's defaults) as the text of their fields. */
export function fitTextFrom(fs: Record<string, unknown>): Record<FitKey, string> {
  const w = (fs.logLawWindow ?? {}) as { yPlusMin?: number; yPlusMax?: number };
  return {
    reTau: numText(fs.reTau),
    yPlusMin: numText(w.yPlusMin),
    yPlusMax: numText(w.yPlusMax),
    cfStation: numText(fs.cfStation),
    cfStationLabel: typeof fs.cfStationLabel === "string" ? fs.cfStationLabel : "",
    stepHeight: numText(fs.stepHeight),
    residualTargetOrders: numText(fs.residualTargetOrders),
  };
}

export function draftFromBand(band: BandLike | null): BandDraft {
  return {
    kind: band?.kind ?? "verification",
    reference: numText(band?.reference),
    source: band?.source ?? "",
    lower: numText(band?.lower),
    upper: numText(band?.upper),
    marginalMargin: band ? numText(band.marginalMargin) : "0",
    noiseFloor: band ? numText(band.noiseFloor) : "0",
    fit: fitTextFrom(band?.fitSettings ?? {}),
    reason: "",
  };
}

/** Fit settings from their text fields; an empty field leaves the setting out (the case default applies). */
export function fitSettingsFromText(fit: Record<FitKey, string>, errors: Record<string, string>, prefix: string): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  const num = (key: FitKey, path: string) => {
    const parsed = parseNumberText(fit[key]);
    if (!parsed.ok) errors[`${prefix}.${path}`] = parsed.message;
    return parsed.ok ? parsed.value : Number.NaN;
  };
  for (const key of ["reTau", "cfStation", "stepHeight", "residualTargetOrders"] as const) {
    const v = num(key, key);
    if (v !== null) out[key] = v;
  }
  if (fit.cfStationLabel.trim()) out.cfStationLabel = fit.cfStationLabel.trim();
  const lo = num("yPlusMin", "logLawWindow.yPlusMin");
  const hi = num("yPlusMax", "logLawWindow.yPlusMax");
  if (lo !== null && hi !== null) out.logLawWindow = { yPlusMin: lo, yPlusMax: hi };
  else if (lo !== null) errors[`${prefix}.logLawWindow.yPlusMax`] ??= "give both ends of the window, or neither";
  else if (hi !== null) errors[`${prefix}.logLawWindow.yPlusMin`] ??= "give both ends of the window, or neither";
  return out;
}

/**
 * The reviseBand input for a draft, or the errors by field path ("upper",
 * "fitSettings.logLawWindow.yPlusMax", "reason"). Text that is not a number gets
 * its own message; everything else is the schema's.
 */
export function bandInputFromDraft(draft: BandDraft, scope: { caseKey: string; quantityKey: string; model: string | null }): { input: BandRevision | null; errors: Record<string, string> } {
  const textErrors: Record<string, string> = {};
  // Text that is not a number is reported by its own message; the schema then sees
  // a neutral value there (null, or 0 where a number is required) so that its other
  // checks still run.
  const num = (field: "reference" | "lower" | "upper" | "marginalMargin" | "noiseFloor", required: boolean) => {
    const parsed = parseNumberText(draft[field]);
    if (!parsed.ok) textErrors[field] = parsed.message;
    else if (required && parsed.value === null) textErrors[field] = "must be a number (0 for none)";
    return parsed.ok && parsed.value !== null ? parsed.value : required ? 0 : null;
  };
  const candidate = {
    ...scope,
    kind: draft.kind,
    reference: num("reference", false),
    source: draft.source,
    lower: num("lower", false),
    upper: num("upper", false),
    marginalMargin: num("marginalMargin", true) as number,
    noiseFloor: num("noiseFloor", true) as number,
    fitSettings: fitSettingsFromText(draft.fit, textErrors, "fitSettings"),
    reason: draft.reason,
  };
  const first = bandRevisionSchema.safeParse(candidate);
  let errors: Record<string, string> = first.success ? {} : fieldErrorsOf(first.error.issues);
  if (!first.success) {
    // Zod runs the band-wide checks (limit order, at least one limit) only when every
    // field passed; run them again with the failing fields neutralised so the form
    // shows all its errors at once.
    const bad = (prefix: string) => Object.keys(errors).some((k) => k === prefix || k.startsWith(`${prefix}.`));
    const neutral = {
      ...candidate,
      source: bad("source") ? "placeholder source" : candidate.source,
      reason: bad("reason") ? "placeholder reason" : candidate.reason,
      marginalMargin: bad("marginalMargin") ? 0 : candidate.marginalMargin,
      noiseFloor: bad("noiseFloor") ? 0 : candidate.noiseFloor,
      fitSettings: bad("fitSettings") ? {} : candidate.fitSettings,
    };
    const second = bandRevisionSchema.safeParse(neutral);
    if (!second.success) errors = { ...fieldErrorsOf(second.error.issues), ...errors };
  }
  errors = { ...errors, ...textErrors };
  return Object.keys(errors).length === 0 && first.success ? { input: first.data, errors: {} } : { input: null, errors };
}
