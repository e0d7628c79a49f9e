import { formatSig } from "./numbers";

// What changed between two versions of a library record (band, case, quantity
// definition), as data for the API and as text for a reader: "upper limit
// 1.0978 → 1.095". Pure, so the server's history query and the client share it.

export interface FieldChange {
  /** Dotted path, e.g. "upper" or "fitSettings.logLawWindow.yPlusMax". */
  field: string;
  before: unknown;
  after: unknown;
}

type Plain = Record<string, unknown>;

const isPlain = (v: unknown): v is Plain => typeof v === "object" && v !== null && !Array.isArray(v);

function flatten(value: Plain, prefix = "", out: Plain = {}): Plain {
  for (const [key, v] of Object.entries(value)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (isPlain(v)) flatten(v, path, out);
    else out[path] = v;
  }
  return out;
}

const same = (a: unknown, b: unknown) => (a ?? null) === (b ?? null) || JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/**
 * The fields that differ between two records, nested objects compared leaf by
 * leaf. `fields` names the top-level keys that count (ids, versions and dates of
 * the record itself are not changes). A record without a predecessor has none.
 */
export function diffFields(before: object | null, after: object, fields: readonly string[]): FieldChange[] {
  if (before === null) return [];
  const pick = (r: object) => flatten(Object.fromEntries(fields.map((f) => [f, (r as Plain)[f]])));
  const a = pick(before);
  const b = pick(after);
  const paths = [...new Set([...Object.keys(a), ...Object.keys(b)])];
  // Keep the declared field order so every history reads the same way.
  const rank = (p: string) => fields.indexOf(p.split(".")[0]);
  return paths
    .filter((p) => !same(a[p], b[p]))
    .sort((x, y) => rank(x) - rank(y) || x.localeCompare(y))
    .map((p) => ({ field: p, before: a[p] ?? null, after: b[p] ?? null }));
}

export const BAND_FIELDS = ["kind", "reference", "source", "lower", "upper", "marginalMargin", "noiseFloor", "fitSettings"] as const;
export const CASE_FIELDS = ["title", "description", "models", "parameters"] as const;
export const QUANTITY_FIELDS = ["label", "unit", "meaning"] as const;

const SETTING_LABELS: Record<string, string> = {
  reTau: "Re_τ",
  "logLawWindow.yPlusMin": "log-law window, lower y+",
  "logLawWindow.yPlusMax": "log-law window, upper y+",
  logLawWindow: "log-law window",
  cfStation: "c_f station",
  cfStationLabel: "c_f station label",
  stepHeight: "step height H",
  residualTargetOrders: "residual drop expected (orders)",
};

const LABELS: Record<string, string> = {
  kind: "kind",
  reference: "reference value",
  source: "source",
  lower: "lower limit",
  upper: "upper limit",
  marginalMargin: "marginal margin",
  noiseFloor: "noise floor",
  title: "title",
  description: "description",
  models: "models",
  label: "label",
  unit: "unit",
  meaning: "meaning",
};

/** A reader's name for a changed field ("fitSettings.logLawWindow.yPlusMax" → "fit override: log-law window, upper y+"). */
export function labelOfField(field: string): string {
  const [head, ...rest] = field.split(".");
  if (head === "fitSettings" || head === "parameters") {
    const setting = rest.join(".");
    const name = SETTING_LABELS[setting] ?? setting;
    return head === "fitSettings" ? `fit override: ${name}` : `fit setting: ${name}`;
  }
  return LABELS[field] ?? field;
}

/** What a limit's absence means: an open side of a one-sided band. */
function absent(field: string): string {
  if (field === "lower") return "none (open below)";
  if (field === "upper") return "none (open above)";
  if (field === "reference") return "none";
  return "not set";
}

function text(field: string, v: unknown, digits: number): string {
  if (v === null || v === undefined) return absent(field);
  if (typeof v === "number") return formatSig(v, digits);
  if (Array.isArray(v)) return v.length === 0 ? "none" : v.map(String).join(", ");
  if (typeof v === "string") return v;
  return JSON.stringify(v);
}

/**
 * Both sides as text, numbers with just enough significant figures (4 to 12) to
 * tell them apart: 1.09783 → 1.095 would read "1.098 → 1.095", and 0.41 → 0.4100001
 * does not collapse into "0.41 → 0.41".
 */
export function describeChange(change: FieldChange): { label: string; before: string; after: string } {
  let digits = 4;
  if (typeof change.before === "number" && typeof change.after === "number") {
    while (digits < 12 && formatSig(change.before, digits) === formatSig(change.after, digits)) digits += 1;
  }
  return { label: labelOfField(change.field), before: text(change.field, change.before, digits), after: text(change.field, change.after, digits) };
}
