import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import { parseSubmission } from "@/lib/services/ingest";
import { assembleUpload, describeUploadIssues, detectUploadKind, locateCsvIssues, readResultsJson } from "@/lib/validation/upload";
import { readSeriesCsv } from "@/lib/validation/upload-csv";
import { checkChosenFile, csvInputOf, type RunFields } from "@/components/upload/check-upload";

// Manual uploads become the raw CI-contract submission; these check the file
// formats and that every refusal names the field or the file row and column.

const build = { solver: "Cormorant", version: "4.3.0-manual", commit: "abcdef0123", branch: "test/upload" };
const oneRun = (over: Record<string, unknown> = {}) => ({ build, runs: [{ case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", ...over }] });
const csvFile = (text: string, name = "decay.csv") => ({ name, type: "text/csv", text });
const jsonFile = (value: unknown, name = "results.json") => ({ name, type: "application/json", text: JSON.stringify(value) });

function issuesOf(result: ReturnType<typeof assembleUpload>) {
  if (result.ok) throw new Error("expected a refusal");
  return result.issues;
}

describe("readSeriesCsv", () => {
  it("reads a header with free-text names and the x,y values below it", () => {
    const r = readSeriesCsv("y+,u+\n1,1\n2,2.0\n30,13.7\n");
    expect(r).toEqual({ ok: true, value: { columns: ["y+", "u+"], x: [1, 2, 30], y: [1, 2, 13.7], rows: [2, 3, 4] } });
  });

  it("names the file row and column of a cell that is not a number", () => {
    const lines = ["y+,u+", ...Array.from({ length: 15 }, (_, i) => `${i + 1},${i + 1}`), "16,abc"];
    const r = readSeriesCsv(lines.join("\n"));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(describeUploadIssues(r.issues)).toBe("file row 17, column u+: 'abc' is not a number");
  });

  it("accepts exponent notation, tabs and semicolons, a byte-order mark and CRLF line ends", () => {
    expect(readSeriesCsv("\uFEFFt\tk\r\n0\t1.5E+0\r\n0.5\t1.2e-1\r\n")).toMatchObject({ ok: true, value: { x: [0, 0.5], y: [1.5, 0.12] } });
    expect(readSeriesCsv("t;k\n0;1\n1;0.5\n")).toMatchObject({ ok: true, value: { x: [0, 1], y: [1, 0.5] } });
  });

  it("keeps file row numbers right across blank lines and ignores trailing empty cells", () => {
    const r = readSeriesCsv("x,y,\n\n1,2,\n\n3,4\n");
    expect(r).toMatchObject({ ok: true, value: { rows: [3, 5], x: [1, 3] } });
  });

  it("refuses empty cells, hexadecimal and Infinity that Number() would accept", () => {
    const r = readSeriesCsv("x,y\n1,\n0x10,2\nInfinity,3\n");
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.issues.map((i) => i.path)).toEqual(["file row 2, column y", "file row 3, column x", "file row 4, column x"]);
      expect(r.issues[0].message).toMatch(/empty/);
    }
  });

  it("refuses a file whose first row holds numbers instead of column names", () => {
    const r = readSeriesCsv("1,2\n3,4\n");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toBe("file row 1");
  });

  it("refuses rows with three values and a one-column file", () => {
    const three = readSeriesCsv("x,y\n1,2\n3,4,5\n");
    expect(!three.ok && three.issues[0]).toMatchObject({ path: "file row 3", message: expect.stringMatching(/found 3/) });
    const one = readSeriesCsv("x\n1\n2\n");
    expect(!one.ok && one.issues[0]).toMatchObject({ path: "file row 1" });
  });

  it("stops listing bad cells after twenty and says how many more there are", () => {
    const r = readSeriesCsv(["x,y", ...Array.from({ length: 30 }, () => "a,1")].join("\n"));
    expect(!r.ok && r.issues.length).toBe(21);
    expect(!r.ok && r.issues[20]).toMatchObject({ path: "file", message: expect.stringMatching(/10 more/) });
  });
});

describe("readResultsJson", () => {
  it("accepts a ResultSubmission object as it is", () => {
    expect(readResultsJson(JSON.stringify(oneRun()))).toEqual({ ok: true, value: oneRun() });
  });

  it("takes variables.input from a whole GraphQL request body", () => {
    const body = { query: "mutation S($input: ResultSubmission!) { submitResults(input: $input) { created } }", variables: { input: oneRun() } };
    expect(readResultsJson(JSON.stringify(body))).toEqual({ ok: true, value: oneRun() });
  });

  it("refuses text that is not JSON, and JSON of another shape, naming the file", () => {
    const bad = readResultsJson("{ build: ");
    expect(!bad.ok && bad.issues[0]).toMatchObject({ path: "file", message: expect.stringMatching(/not valid JSON/) });
    const other = readResultsJson("[1, 2]");
    expect(!other.ok && other.issues[0].path).toBe("file");
  });
});

describe("assembleUpload", () => {
  it("detects the kind from name, type, then content", () => {
    expect(detectUploadKind({ name: "a.JSON", type: "", text: "" })).toBe("json");
    expect(detectUploadKind({ name: "a.csv", type: "", text: "{" })).toBe("csv");
    expect(detectUploadKind({ name: "blob", type: "", text: '  {"build":1}' })).toBe("json");
  });

  it("makes the CSV the run's series under the given key and keeps its other series", () => {
    const input = oneRun({ series: [{ key: "residual", x: [1, 2], y: [1, 0.1] }, { key: "k_decay", x: [9], y: [9] }] });
    const r = assembleUpload({ input, seriesKey: "k_decay", file: csvFile("t,k\n0,1.5\n0.5,1.1\n") });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const submission = parseSubmission(r.value.unsafeInput);
    expect(submission.runs[0].series).toEqual([
      { key: "residual", x: [1, 2], y: [1, 0.1] },
      { key: "k_decay", x: [0, 0.5], y: [1.5, 1.1] },
    ]);
    expect(r.value.csv?.seriesIndex).toBe(1);
  });

  it("requires input with exactly one run and a known series key for a CSV", () => {
    expect(issuesOf(assembleUpload({ input: null, seriesKey: null, file: csvFile("t,k\n0,1\n1,0.5") })).map((i) => i.path)).toEqual(["seriesKey", "input"]);
    const two = { build, runs: [oneRun().runs[0], oneRun().runs[0]] };
    expect(issuesOf(assembleUpload({ input: two, seriesKey: "k_decay", file: csvFile("t,k\n0,1\n1,0.5") }))[0]).toMatchObject({ path: "input.runs" });
    expect(issuesOf(assembleUpload({ input: oneRun(), seriesKey: "velocity", file: csvFile("t,k\n0,1\n1,0.5") }))[0]).toMatchObject({ path: "seriesKey" });
  });

  it("refuses input or seriesKey next to a JSON results file", () => {
    const issues = issuesOf(assembleUpload({ input: oneRun(), seriesKey: "cf", file: jsonFile(oneRun()) }));
    expect(issues.map((i) => i.path)).toEqual(["input", "seriesKey"]);
  });

  it("points a schema issue inside the CSV series at its file row", () => {
    const r = assembleUpload({ input: oneRun(), seriesKey: "k_decay", file: csvFile("t,k\n0,1.5\n\n1,1.0\n1,0.8\n") });
    if (!r.ok) throw new Error("assembly should pass; the schema catches the repeated t");
    let issues: { path: string; message: string }[] = [];
    try {
      parseSubmission(r.value.unsafeInput);
    } catch (error) {
      if (!(error instanceof AppError)) throw error;
      issues = locateCsvIssues(error.issues, r.value.csv);
    }
    expect(issues[0].path).toBe("input.runs[0].series[0].x[2]");
    expect(issues[0].message).toMatch(/strictly increasing.*\(file row 5, column t\)$/);
  });
});

describe("the browser's check before sending", () => {
  const fields: RunFields = { solver: "Cormorant", version: "4.3.0", commit: "not-hex", branch: "test/upload", pipelineUrl: "", case: "decaying-hit", model: "k-epsilon", grid: "", status: "COMPLETED" };
  const text = "t,k\n0,1.5\n1,1.0\n1,0.8\n";
  const file = { name: "k.csv", type: "text/csv", size: text.length, text } as unknown as File;

  it("reports the same field paths the server's ingest does", () => {
    const check = checkChosenFile({ file, text, kind: "csv", fields, seriesKey: "k_decay", maxBytes: 1e6 });
    const assembled = assembleUpload({ input: csvInputOf(fields), seriesKey: "k_decay", file: { name: "k.csv", type: "text/csv", text } });
    if (!assembled.ok) throw new Error("assembly should pass");
    let server: { path: string; message: string }[] = [];
    try {
      parseSubmission(assembled.value.unsafeInput);
    } catch (error) {
      if (!(error instanceof AppError)) throw error;
      server = locateCsvIssues(error.issues, assembled.value.csv);
    }
    expect(check?.issues).toEqual(server);
    expect(check?.issues.map((i) => i.path)).toEqual(["input.build.commit", "input.runs[0].series[0].x[2]"]);
  });

  it("refuses a file over the size limit without reading it, and a file of the other kind", () => {
    expect(checkChosenFile({ file, text: null, kind: "csv", fields, seriesKey: "k_decay", maxBytes: 10 })?.issues[0]).toMatchObject({ path: "file", message: expect.stringMatching(/limit/) });
    expect(checkChosenFile({ file, text, kind: "json", fields, seriesKey: null, maxBytes: 1e6 })?.issues[0]).toMatchObject({ path: "file", message: expect.stringMatching(/looks like a CSV/) });
  });

  it("leaves the grid to the server's default when the field is empty", () => {
    expect(csvInputOf(fields)).toMatchObject({ runs: [{ grid: null }] });
  });
});
