import type { FieldIssue } from "@/lib/errors";
import { readSeriesCsv, type CsvSeries } from "./upload-csv";

// A manual upload is turned into the same raw ResultSubmission a CI post carries,
// then goes through the one ingest path (zod schema, derivation, transaction).
// Pure, so the browser runs exactly the same assembly before it sends anything.

export const UPLOAD_SERIES_KEYS = ["u_plus", "k_decay", "cf", "residual"] as const;
export type UploadSeriesKey = (typeof UPLOAD_SERIES_KEYS)[number];

/** What the two columns of each series file mean (DESIGN.md, series table). */
export const SERIES_COLUMNS: Record<UploadSeriesKey, { x: string; y: string; title: string }> = {
  u_plus: { x: "y+", y: "u+", title: "mean velocity profile u+(y+)" },
  k_decay: { x: "t", y: "k", title: "turbulent kinetic energy decay k(t)" },
  cf: { x: "x/L or Re_x", y: "c_f", title: "skin-friction distribution c_f(x)" },
  residual: { x: "iteration", y: "residual", title: "residual history" },
};

export type Checked<T> = { ok: true; value: T } | { ok: false; issues: FieldIssue[] };
export type UploadKind = "json" | "csv";

export interface UploadFile {
  name: string;
  type: string;
  text: string;
}

export interface AssembledUpload {
  kind: UploadKind;
  /** Raw ResultSubmission, still to be validated by submissionSchema. */
  unsafeInput: unknown;
  /** For a CSV: the parsed series and where it sits in the submission. */
  csv: (CsvSeries & { seriesIndex: number }) | null;
}

/** JSON when the name or type says so; CSV likewise; otherwise a leading "{" means JSON. */
export function detectUploadKind(file: UploadFile): UploadKind {
  const name = file.name.toLowerCase();
  if (name.endsWith(".json") || /json/i.test(file.type)) return "json";
  if (/\.(csv|tsv|txt|dat)$/.test(name) || /csv|tab-separated/i.test(file.type)) return "csv";
  return file.text.trimStart().startsWith("{") ? "json" : "csv";
}

/**
 * Combines the mutation's arguments into one raw submission:
 * a JSON results file alone, or a CSV series plus `input` (build + one run) and `seriesKey`.
 */
export function assembleUpload({ input, seriesKey, file }: { input: unknown; seriesKey: unknown; file: UploadFile }): Checked<AssembledUpload> {
  const kind = detectUploadKind(file);
  if (kind === "json") {
    const issues: FieldIssue[] = [];
    if (input != null) issues.push({ path: "input", message: "must be left out with a JSON results file: the file carries the build and its runs" });
    if (seriesKey != null) issues.push({ path: "seriesKey", message: "only applies to a CSV series file" });
    if (issues.length) return { ok: false, issues };
    const read = readResultsJson(file.text);
    return read.ok ? { ok: true, value: { kind, unsafeInput: read.value, csv: null } } : read;
  }

  const issues = checkCsvArguments(input, seriesKey);
  const series = readSeriesCsv(file.text);
  if (!series.ok) issues.push(...series.issues);
  if (issues.length || !series.ok) return { ok: false, issues };
  const base = input as { runs: Record<string, unknown>[] };
  const run = base.runs[0];
  // The file becomes the run's series of that key; other series the run carries stay.
  const others = Array.isArray(run.series) ? run.series.filter((s: { key?: unknown }) => s?.key !== seriesKey) : [];
  const seriesIndex = others.length;
  const unsafeInput = { ...base, runs: [{ ...run, series: [...others, { key: seriesKey, x: series.value.x, y: series.value.y }] }] };
  return { ok: true, value: { kind, unsafeInput, csv: { ...series.value, seriesIndex } } };
}

function checkCsvArguments(input: unknown, seriesKey: unknown): FieldIssue[] {
  const issues: FieldIssue[] = [];
  if (seriesKey == null || seriesKey === "") {
    issues.push({ path: "seriesKey", message: `is required with a CSV file: one of ${UPLOAD_SERIES_KEYS.join(", ")}` });
  } else if (!UPLOAD_SERIES_KEYS.includes(seriesKey as UploadSeriesKey)) {
    issues.push({ path: "seriesKey", message: `must be one of ${UPLOAD_SERIES_KEYS.join(", ")}, got "${String(seriesKey)}"` });
  }
  if (input == null || typeof input !== "object") {
    issues.push({ path: "input", message: "is required with a CSV file: it names the build and the one run the series belongs to" });
  } else {
    const runs = (input as { runs?: unknown }).runs;
    const count = Array.isArray(runs) ? runs.length : 0;
    if (count !== 1 || typeof (runs as unknown[])[0] !== "object" || (runs as unknown[])[0] === null) {
      issues.push({ path: "input.runs", message: `must hold exactly one run (case, model, grid, status) for the CSV series, got ${count}` });
    }
  }
  return issues;
}

/** A ResultSubmission object, or a whole GraphQL request body {query, variables: {input}} as CI posts it. */
export function readResultsJson(text: string): Checked<unknown> {
  let data: unknown;
  try {
    data = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (error) {
    return { ok: false, issues: [{ path: "file", message: `is not valid JSON (${(error as Error).message})` }] };
  }
  if (data && typeof data === "object" && !Array.isArray(data)) {
    const obj = data as Record<string, unknown>;
    if (typeof obj.query === "string") {
      const variables = obj.variables as Record<string, unknown> | undefined;
      if (!/\bsubmitResults\b/.test(obj.query)) return { ok: false, issues: [{ path: "file", message: "holds a GraphQL request that does not call submitResults" }] };
      if (!variables || typeof variables !== "object" || variables.input == null) {
        return { ok: false, issues: [{ path: "file", message: "holds a GraphQL request without variables.input (the ResultSubmission)" }] };
      }
      return { ok: true, value: variables.input };
    }
    if ("build" in obj || "runs" in obj) return { ok: true, value: obj };
  }
  return {
    ok: false,
    issues: [{ path: "file", message: "is JSON but neither a ResultSubmission {build, runs} nor a GraphQL request body {query, variables: {input}}" }],
  };
}

/**
 * Points a schema issue inside the CSV series (…series[i].x[j]) at the file row it
 * came from, so the engineer can find it in the file they exported.
 */
export function locateCsvIssues(issues: FieldIssue[], csv: AssembledUpload["csv"]): FieldIssue[] {
  if (!csv) return issues;
  const pattern = new RegExp(`^input\\.runs\\[0\\]\\.series\\[${csv.seriesIndex}\\]\\.([xy])\\[(\\d+)\\]$`);
  return issues.map((issue) => {
    const m = pattern.exec(issue.path);
    const row = m ? csv.rows[Number(m[2])] : undefined;
    if (!m || row === undefined) return issue;
    const column = csv.columns[m[1] === "x" ? 0 : 1];
    return { ...issue, message: `${issue.message} (file row ${row}, column ${column})` };
  });
}

/** One line for an error message: the first few issues, "path: message". */
export function describeUploadIssues(issues: FieldIssue[]): string {
  const head = issues.slice(0, 3).map((i) => `${i.path}: ${i.message}`).join("; ");
  return issues.length > 3 ? `${head}; and ${issues.length - 3} more` : head;
}
