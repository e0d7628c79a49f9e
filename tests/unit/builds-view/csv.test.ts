import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { escapeCsvCell, toCsv } from "@/lib/services/builds-view-csv";

// Reference: RFC 4180 (Shafranovich 2005), §2 rules 5–7 (quoting, doubled quotes,
// CRLF); papaparse (an independent CSV parser from the registry) must read back
// exactly what was written. Formula guard: OWASP "CSV Injection" guidance — cells
// beginning with = + - @ tab or CR are prefixed so spreadsheets do not evaluate them.

describe("CSV export cells", () => {
  it("quotes a field holding a comma, a quote or a line break and doubles inner quotes (RFC 4180 §2.6–2.7)", () => {
    expect(escapeCsvCell("a,b")).toBe('"a,b"');
    expect(escapeCsvCell('say "hi"')).toBe('"say ""hi"""');
    expect(escapeCsvCell("two\nlines")).toBe('"two\nlines"');
    expect(escapeCsvCell("plain")).toBe("plain");
  });

  it("prefixes text that a spreadsheet would run as a formula (OWASP CSV injection)", () => {
    for (const bad of ["=HYPERLINK(\"x\")", "+1", "-2+3", "@SUM(A1)", "\tx", "\rx"]) expect(escapeCsvCell(bad).replace(/^"/, "").startsWith("'")).toBe(true);
    expect(escapeCsvCell("=1,2")).toBe(`"'=1,2"`);
  });

  it("keeps numbers as numbers, including negative ones, and writes null as an empty field", () => {
    expect(escapeCsvCell(-0.5)).toBe("-0.5");
    expect(escapeCsvCell(24)).toBe("24");
    expect(escapeCsvCell(null)).toBe("");
    expect(escapeCsvCell(Number.NaN)).toBe("");
  });

  it("writes a document that an independent parser reads back cell for cell", () => {
    const header = ["version", "branch", "note"];
    const rows = [
      ["4.2.2-rc.7", "release/4.2", 'quoted "word", comma'],
      ["4.3.0-dev.40", "main", "line\r\nbreak"],
    ];
    const parsed = Papa.parse<string[]>(toCsv(header, rows), { newline: "\r\n", skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toEqual([header, ...rows]);
  });
});
