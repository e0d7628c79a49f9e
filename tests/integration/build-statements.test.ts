import { existsSync, readFileSync } from "node:fs";
import { randomBytes } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { requireEnv } from "../helpers/env";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { listeningPid, serverLogPath } from "./http-server-process";

// build(id) must cost the same number of SQL statements whatever its run count
// (issue 5: no per-run or per-value queries; loaders batch, joins shape). A
// property, not a timing, so it is asserted here; the bench reports the time.
//
// How the statements of ONE request are counted while other test files hit
// the same server and database in parallel: PostgreSQL's statement log cannot
// say which HTTP request a pooled connection served, so the app counts instead.
// graphql/plugins/statement-count.ts opens an async context per GraphQL request
// and counts every query Knex sends inside it (Knex's 'query' event fires in
// the caller's context), then writes one JSON log line "graphql statements"
// carrying the request's id (lib/http/request-log.ts takes it from our
// x-request-id header). The test sends a random request id and reads that
// line from the server's log: other requests' statements never land in it.
// The log is the file the server listening on TAULINE_TEST_URL's port writes
// its standard output to (found through /proc, as http-request-log.test.ts
// does); TAULINE_WEB_LOG overrides it.

const branch = "test/build-statements";

const QUERY = /* GraphQL */ `
  query BuildStatements($id: ID!) {
    build(id: $id) {
      id verdict gate receivedAt
      decision { state }
      runCounts { within marginal outside unbanded missing }
      runs {
        id case model grid status verdict
        quantities { key label unit value verdict reference source lower upper deviation baselineDelta drift bandKind band { id version } }
      }
    }
  }
`;

async function webLogPath(): Promise<string> {
  if (process.env.TAULINE_WEB_LOG) return process.env.TAULINE_WEB_LOG;
  const pid = await listeningPid(new URL(requireEnv("TAULINE_TEST_URL")).port);
  const log = serverLogPath(pid);
  if (!log) throw new Error(`the server (pid ${pid}) does not write its log to a file; set TAULINE_WEB_LOG`);
  return log;
}

/** Flat-plate runs on distinct grids, each reporting two scalars (one banded, one not). */
function runs(count: number) {
  return Array.from({ length: count }, (_, i) => ({
    case: "flat-plate-zpg",
    model: "sa",
    grid: `s${String(i + 1).padStart(3, "0")}`,
    status: "COMPLETED",
    iterations: 4000,
    quantities: [
      { key: "kappa", value: 0.41 + 0.001 * (i % 5) },
      { key: "probe_statements", value: i },
    ],
  }));
}

async function postBuild(runCount: number): Promise<string> {
  const res = await postGraphQL<{ submitResults: { build: { id: string } } }>({
    query: SUBMIT,
    token: ciToken(),
    variables: { input: { build: { solver: "Cormorant", version: `9.9.${runCount}`, commit: randomCommit(), branch }, runs: runs(runCount) } },
  });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.submitResults.build.id;
}

/** Asks for build(id) under a fresh request id and returns the statement count the server logged for it. */
async function countStatements(buildId: string, cookie: string, expectedRuns: number): Promise<number> {
  const requestId = `build-statements-${randomBytes(8).toString("hex")}`;
  const res = await postGraphQL<{ build: { runs: { quantities: unknown[] }[] } }>({ query: QUERY, variables: { id: buildId }, cookie, headers: { "x-request-id": requestId } });
  expect(res.body.errors).toBeUndefined();
  expect(res.body.data!.build.runs).toHaveLength(expectedRuns);
  const log = await webLogPath();
  // pino writes as the request ends; allow the line a moment to reach the file.
  for (let attempt = 0; attempt < 50; attempt++) {
    const found = existsSync(log) ? findCount(readFileSync(log, "utf8"), requestId) : null;
    if (found !== null) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no "graphql statements" line for request ${requestId} in ${log} (set TAULINE_WEB_LOG to the server's log)`);
}

function findCount(text: string, requestId: string): number | null {
  for (const line of text.split("\n")) {
    if (!line.includes(requestId) || !line.includes("graphql statements")) continue;
    const entry = JSON.parse(line) as { requestId?: string; msg?: string; statements?: number };
    if (entry.requestId === requestId && entry.msg === "graphql statements" && typeof entry.statements === "number") return entry.statements;
  }
  return null;
}

let developer: string;
let fewRuns: string;
let manyRuns: string;

beforeAll(async () => {
  developer = await signIn("developer@fenwick-hydro.test");
  fewRuns = await postBuild(2);
  manyRuns = await postBuild(40);
});

describe("SQL statements of one build(id) request", () => {
  it("are as many for a build of 40 runs as for one of 2", async () => {
    const few = await countStatements(fewRuns, developer, 2);
    const many = await countStatements(manyRuns, developer, 40);
    expect(few).toBeGreaterThan(0);
    expect(many).toBe(few);
  });

  it("stay a handful however many quantities are shown (batched loaders, no per-row query)", async () => {
    // 40 runs × 2 values: a query per run or per value would add 40 or 80.
    const many = await countStatements(manyRuns, developer, 40);
    expect(many).toBeLessThanOrEqual(8);
  });
});
