import { spawn } from "node:child_process";
import { createServer } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../helpers/db";
import { requireEnv } from "../helpers/env";
import { ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { DECIDE, XR_OUTSIDE, XR_WITHIN, postStepBuild } from "./gate-helpers";

// `npm run gate` as CI runs it: the script spawned against the running server
// with real commits. Exit 0 approved, 1 held/rejected/pending, 2 on any error.

const BRANCH = `release/9.8-test-${randomCommit().slice(0, 6)}`;
const url = requireEnv("TAULINE_TEST_URL");
let release = "";

beforeAll(async () => {
  release = await signIn("release@fenwick-hydro.test");
});
afterAll(closeTestDb);

/** Runs the script as `tsx scripts/gate.ts` (what `npm run gate` runs), or through npm itself with `viaNpm`. */
function runGate(args: string[], env: Record<string, string | undefined> = {}, viaNpm = false): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    const command = viaNpm ? "npm" : process.execPath;
    const prefix = viaNpm ? ["run", "--silent", "gate", "--"] : ["--import", "tsx", "scripts/gate.ts"];
    const child = spawn(command, [...prefix, ...args], {
      // The test runner's environment without its CI token: each test says where the token comes from.
      env: { ...process.env, TAULINE_CI_TOKEN: undefined, ...env },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("error", reject);
    child.on("close", (code) => resolve({ code, stdout, stderr }));
  });
}

async function decide(buildId: string, state: string, comment: string) {
  const res = await postGraphQL({ query: DECIDE, variables: { input: { buildId, state, comment } }, cookie: release });
  if (res.body.errors) throw new Error(JSON.stringify(res.body.errors));
}

/** A local port with nothing listening on it. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const { port } = server.address() as { port: number };
  await new Promise((r) => server.close(r));
  return port;
}

describe("npm run gate", () => {
  it("exits 0 for an approved commit and says who approved it and why", async () => {
    const build = await postStepBuild({ branch: BRANCH, xr: XR_WITHIN });
    await decide(build.id, "approved", "Release candidate approved for the CLI test.");
    const r = await runGate(["--url", url, "--commit", build.commit, "--token", ciToken()], {}, true);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/gate: approved/);
    expect(r.stdout).toMatch(/approved by .+: Release candidate approved for the CLI test\./);
    expect(r.stdout).toMatch(/nothing blocks approval/);
  });

  it("exits 1 for a pending commit and prints what blocks it, taking the token from TAULINE_CI_TOKEN", async () => {
    const build = await postStepBuild({ branch: BRANCH, xr: XR_OUTSIDE });
    const r = await runGate(["--url", url, "--commit", build.commit.slice(0, 10)], { TAULINE_CI_TOKEN: ciToken() });
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/gate: pending/);
    expect(r.stdout).toMatch(/blocking approval \(1\):\n {2}x backstep\/sa\/default: reattachment_xr_h = 7\.4 is outside its band \[5\.97, 6\.92\]/);
  });

  it("exits 1 for a held and for a rejected commit", async () => {
    const held = await postStepBuild({ branch: BRANCH, xr: XR_WITHIN });
    await decide(held.id, "held", "Holding until the fine-grid rerun is in.");
    const rejected = await postStepBuild({ branch: BRANCH, xr: XR_WITHIN });
    await decide(rejected.id, "rejected", "Tagged from the wrong branch point.");
    const h = await runGate(["--url", url, "--commit", held.commit, "--token", ciToken()]);
    const j = await runGate(["--url", url, "--commit", rejected.commit, "--token", ciToken(), "--json"]);
    expect([h.code, j.code]).toEqual([1, 1]);
    expect(h.stdout).toMatch(/held by .+: Holding until the fine-grid rerun is in\./);
    expect(JSON.parse(j.stdout)).toMatchObject({ state: "rejected", decision: { comment: "Tagged from the wrong branch point." } });
  });

  it("exits 1 for a commit nobody posted", async () => {
    const r = await runGate(["--url", url, "--commit", randomCommit(), "--token", ciToken()]);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/no results have been posted for this commit/);
  });

  it("exits 2 on bad arguments, a refused token, an unreachable server and a URL that is not Tauline", async () => {
    const commit = randomCommit();
    const noCommit = await runGate(["--url", url, "--token", ciToken()]);
    expect(noCommit.code).toBe(2);
    expect(noCommit.stderr).toMatch(/--commit is required/);
    const badHash = await runGate(["--url", url, "--commit", "not-a-hash", "--token", ciToken()]);
    expect(badHash.stderr).toMatch(/7 to 64 hexadecimal digits/);
    const noToken = await runGate(["--url", url, "--commit", commit]);
    expect(noToken.stderr).toMatch(/no CI token/);
    const unknownFlag = await runGate(["--url", url, "--commit", commit, "--token", ciToken(), "--force"]);
    expect(unknownFlag.code).toBe(2);
    const wrongToken = await runGate(["--url", url, "--commit", commit, "--token", "not-a-real-ci-token-0000"]);
    expect(wrongToken.stderr).toMatch(/UNAUTHENTICATED.*HTTP 401/);
    const unreachable = await runGate(["--url", `http://127.0.0.1:${await closedPort()}`, "--commit", commit, "--token", ciToken()]);
    expect(unreachable.stderr).toMatch(/cannot reach/);
    const notTauline = await runGate(["--url", `${url}/api/health`, "--commit", commit, "--token", ciToken()]);
    expect(notTauline.stderr).toMatch(/is this a Tauline server\?|without a gate state/);
    for (const r of [badHash, noToken, wrongToken, unreachable, notTauline]) expect(r.code).toBe(2);
  });
});
