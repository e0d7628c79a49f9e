import Papa from "papaparse";
import type { FieldIssue } from "@/lib/errors";

// One series as a two-column text table with a header row, as spreadsheets and
// post-processing scripts export it. Row numbers are the file's line numbers
// (header = row 1), so an error can be found in any text editor.

export interface CsvSeries {
  /** The header's two names, free text ("y+", "u+"). */
  columns: [string, string];
  x: number[];
  y: number[];
  /** The file row of each point. */
  rows: number[];
}

type Checked<T> = { ok: true; value: T } | { ok: false; issues: FieldIssue[] };

// A plain decimal or exponent number; rejects what Number() would quietly accept
// ("", " ", "0x1f", "Infinity").
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const MAX_ISSUES = 20;

export function readSeriesCsv(text: string): Checked<CsvSeries> {
  const body = text.replace(/^\uFEFF/, "");
  const parsed = Papa.parse<string[]>(body, { skipEmptyLines: false, delimiter: chooseDelimiter(body) });
  const issues: FieldIssue[] = [];
  for (const e of parsed.errors) {
    issues.push({ path: e.row === undefined ? "file" : `file row ${e.row + 1}`, message: e.message });
  }
  const table = parsed.data.map(trimTrailingEmpty);
  const headerIndex = table.findIndex((r) => r.length > 0);
  if (headerIndex < 0) return { ok: false, issues: [{ path: "file", message: "is empty: expected a header row and at least two rows of x,y values" }] };

  const header = table[headerIndex].map((c) => c.trim());
  if (header.length !== 2 || header.some((c) => c === "")) {
    issues.push({ path: `file row ${headerIndex + 1}`, message: `must be a header naming exactly two columns (x, y), found ${header.length}: ${JSON.stringify(header)}` });
    return { ok: false, issues };
  }
  if (header.every((c) => NUMBER.test(c))) {
    issues.push({ path: `file row ${headerIndex + 1}`, message: `must be a header naming the two columns (e.g. "y+,u+"), found numbers ${header.join(", ")}` });
    return { ok: false, issues };
  }
  const columns: [string, string] = [header[0], header[1]];

  const x: number[] = [];
  const y: number[] = [];
  const rows: number[] = [];
  let skipped = 0;
  for (let i = headerIndex + 1; i < table.length; i++) {
    const cells = table[i];
    if (cells.length === 0) continue;
    const row = i + 1;
    if (cells.length !== 2) {
      if (issues.length < MAX_ISSUES) issues.push({ path: `file row ${row}`, message: `must hold 2 values (${columns.join(", ")}), found ${cells.length}` });
      else skipped++;
      continue;
    }
    const values = cells.map((cell, c) => {
      const v = readNumber(cell);
      if (typeof v === "string") {
        if (issues.length < MAX_ISSUES) issues.push({ path: `file row ${row}, column ${columns[c]}`, message: v });
        else skipped++;
        return Number.NaN;
      }
      return v;
    });
    x.push(values[0]);
    y.push(values[1]);
    rows.push(row);
  }
  if (skipped > 0) issues.push({ path: "file", message: `has ${skipped} more bad cells or rows after these` });
  if (issues.length) return { ok: false, issues };
  if (x.length < 2) return { ok: false, issues: [{ path: "file", message: `holds ${x.length} data row${x.length === 1 ? "" : "s"} below the header; a series needs at least 2` }] };
  return { ok: true, value: { columns, x, y, rows } };
}

// The header decides: papaparse's own guess needs ten rows of evidence and gives
// up on short files; a header "t;k" is unambiguous.
function chooseDelimiter(body: string): string {
  const header = body.split(/\r?\n/).find((line) => line.trim() !== "") ?? "";
  return [",", "\t", ";", "|"].find((d) => header.includes(d)) ?? ",";
}

/** The number in a cell, or why it is not one. */
function readNumber(raw: string): number | string {
  const cell = raw.trim();
  if (cell === "") return "is empty; expected a number";
  if (!NUMBER.test(cell)) return `'${cell.length > 40 ? `${cell.slice(0, 40)}…` : cell}' is not a number`;
  const v = Number(cell);
  return Number.isFinite(v) ? v : `'${cell}' is beyond the range of a double-precision number`;
}

// Spreadsheets often end lines with extra delimiters ("1.0,2.0,"); those empty cells
// carry nothing. A line of nothing but delimiters is blank; "1.0," keeps its empty y.
function trimTrailingEmpty(cells: string[]): string[] {
  if (cells.every((c) => c.trim() === "")) return [];
  let end = cells.length;
  while (end > 2 && cells[end - 1].trim() === "") end--;
  return end === cells.length ? cells : cells.slice(0, end);
}
