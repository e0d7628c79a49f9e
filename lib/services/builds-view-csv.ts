// CSV as RFC 4180 writes it (comma separator, CRLF line ends, a field with a comma,
// quote, CR or LF is quoted and its quotes doubled), plus the spreadsheet-formula
// guard OWASP recommends for exported text: a text cell that begins with = + - @,
// tab or CR gets a leading apostrophe so a spreadsheet shows it instead of running it.

export type CsvCell = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

export function escapeCsvCell(cell: CsvCell): string {
  if (cell === null || cell === undefined) return "";
  // Numbers are data, not text a person typed: "-0.5" stays a number.
  let text = typeof cell === "number" ? (Number.isFinite(cell) ? String(cell) : "") : String(cell);
  if (typeof cell === "string" && FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(header: string[], rows: CsvCell[][]): string {
  return [header, ...rows].map((r) => r.map(escapeCsvCell).join(",")).join("\r\n") + "\r\n";
}
