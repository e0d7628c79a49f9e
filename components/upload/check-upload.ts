import { formatPath, type FieldIssue } from "@/lib/errors";
import { submissionSchema } from "@/lib/validation/submission";
import { assembleUpload, detectUploadKind, locateCsvIssues, type UploadKind, type UploadSeriesKey } from "@/lib/validation/upload";
import type { CsvSeries } from "@/lib/validation/upload-csv";

// The browser's check before anything is sent: the same assembly and the same
// zod schema the server runs, so what passes here fails on the server only for
// reasons the browser cannot know (an unknown case or model, a branch clash).

export interface RunFields {
  solver: string;
  version: string;
  commit: string;
  branch: string;
  pipelineUrl: string;
  case: string;
  model: string;
  grid: string;
  status: string;
}

export interface RunSummary {
  case: string;
  model: string;
  grid: string;
  status: string;
  seriesKeys: string[];
}

export interface UploadCheck {
  kind: UploadKind;
  issues: FieldIssue[];
  build: { solver: string; version: string; commit: string; branch: string } | null;
  runs: RunSummary[];
  csv: CsvSeries | null;
}

/** The `input` argument a CSV upload sends: the build and its one run, from the form. */
export function csvInputOf(f: RunFields): unknown {
  const build = { solver: f.solver, version: f.version, commit: f.commit.trim(), branch: f.branch.trim(), ...(f.pipelineUrl.trim() ? { pipelineUrl: f.pipelineUrl.trim() } : {}) };
  return { build, runs: [{ case: f.case, model: f.model, grid: f.grid.trim() || null, status: f.status }] };
}

export function checkUpload({
  file,
  fields,
  seriesKey,
  maxBytes,
}: {
  file: { name: string; type: string; size: number; text: string };
  fields: RunFields | null;
  seriesKey: UploadSeriesKey | null;
  maxBytes: number;
}): UploadCheck {
  const empty = { build: null, runs: [], csv: null };
  if (file.size > maxBytes) {
    return { kind: "json", ...empty, issues: [{ path: "file", message: `is ${megabytes(file.size)}; the limit is ${megabytes(maxBytes)}` }] };
  }
  const assembled = assembleUpload({ input: fields ? csvInputOf(fields) : null, seriesKey, file });
  if (!assembled.ok) return { kind: fields ? "csv" : "json", ...empty, issues: assembled.issues };
  const { kind, unsafeInput, csv } = assembled.value;
  const parsed = submissionSchema.safeParse(unsafeInput);
  if (!parsed.success) {
    const issues = parsed.error.issues.slice(0, 50).map((i) => ({ path: formatPath(i.path, "input"), message: i.message }));
    return { kind, ...empty, csv, issues: locateCsvIssues(issues, csv) };
  }
  const { build, runs } = parsed.data;
  return {
    kind,
    issues: [],
    csv,
    build,
    runs: runs.map((r) => ({ case: r.case, model: r.model, grid: r.grid, status: r.status, seriesKeys: (r.series ?? []).map((s) => s.key) })),
  };
}

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

export interface CheckArgs {
  file: File | null;
  text: string | null;
  kind: UploadKind;
  fields: RunFields;
  seriesKey: UploadSeriesKey | null;
  maxBytes: number;
}

/** The check of the file the page holds: size first (unread), then kind, then checkUpload. */
export function checkChosenFile({ file, text, kind, fields, seriesKey, maxBytes }: CheckArgs): UploadCheck | null {
  if (!file) return null;
  const fileInfo = { name: file.name, type: file.type, size: file.size, text: text ?? "" };
  // Too large: say so without reading it (the server would refuse it anyway).
  if (file.size > maxBytes) return checkUpload({ file: fileInfo, fields: null, seriesKey: null, maxBytes });
  if (text === null) return null;
  const detected = detectUploadKind(fileInfo);
  if (detected !== kind) {
    const message = `looks like a ${detected.toUpperCase()} file (by its name or first character), but ${kind.toUpperCase()} is chosen above`;
    return { kind, issues: [{ path: "file", message }], build: null, runs: [], csv: null };
  }
  return checkUpload({ file: fileInfo, fields: kind === "csv" ? fields : null, seriesKey: kind === "csv" ? seriesKey : null, maxBytes });
}
