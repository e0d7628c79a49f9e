import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { randomCommit } from "../helpers/graphql";
import { countStored, hostileSubmission, postRawSubmission, residual, submitBody } from "./hostile-helpers";

// Concurrent CI posts (issue 6, "Faults"): retries and parallel jobs post the
// same build at once. The build row is created once (ON CONFLICT) and locked for
// the rest of each transaction, so re-posts apply one after the other: exactly
// one build and one run per case × model × grid, every client answered with a
// receipt or a retryable error, never a 500 or a deadlock.

afterAll(closeTestDb);

const RETRYABLE = new Set([409, 429, 503]);

/** k–ε decay of isotropic turbulence, n = 1/(Cε2 − 1) (reference sheet §2.2; Launder & Spalding 1974). */
function decay(cEps2: number) {
  const t = Array.from({ length: 40 }, (_, i) => i * 0.5);
  return { key: "k_decay", x: t, y: t.map((ti) => 1.5 * (1 + ((cEps2 - 1) * 0.9 * ti) / 1.5) ** (-1 / (cEps2 - 1))) };
}

function runsOf(cEps2: number) {
  return [
    { case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [decay(cEps2), residual()], coefficients: [{ name: "C_eps2", value: cEps2 }] },
    { case: "channel-re180", model: "sa", status: "COMPLETED", series: [residual()] },
    { case: "backstep", model: "sst", grid: "coarse", status: "DIVERGED", iterations: 812 },
  ];
}

async function runsPerKey(commit: string) {
  return testDb()("runs as r")
    .join("builds as b", "b.id", "r.build_id")
    .where("b.commit", commit)
    .groupBy("r.case_key", "r.model_key", "r.grid")
    .select("r.case_key", "r.model_key", "r.grid", testDb().raw("count(*)::int as n"))
    .orderBy(["r.case_key", "r.model_key", "r.grid"]);
}

describe("concurrent submissions", () => {
  it("stores 20 identical concurrent posts as one build with one run per key, answering each with a receipt or a retryable error", async () => {
    const commit = randomCommit();
    const body = submitBody(hostileSubmission(commit, runsOf(1.92), { branch: "test/h1/concurrent" }));
    const answers = await Promise.all(Array.from({ length: 20 }, () => postRawSubmission(body)));

    const statuses = answers.map((a) => a.status);
    for (const a of answers) {
      if (a.status === 200) expect(a.body.errors).toBeUndefined();
      else expect(RETRYABLE.has(a.status), `status ${a.status}: ${JSON.stringify(a.body.errors)}`).toBe(true);
    }
    const receipts = answers.filter((a) => a.status === 200);
    expect(receipts.length).toBeGreaterThan(0);
    // Exactly one post created the build; the others replaced its runs.
    const created = receipts.map((a) => (a.body.data as { submitResults: { created: boolean } }).submitResults.created);
    expect(created.filter(Boolean)).toHaveLength(1);
    expect(statuses.filter((s) => s === 200)).toHaveLength(receipts.length);

    const stored = await countStored(commit);
    expect(stored.builds).toBe(1);
    expect(stored.runs).toBe(3);
    expect(stored.submissions).toBe(receipts.length);
    expect((await runsPerKey(commit)).map((r) => r.n)).toEqual([1, 1, 1]);
  }, 60_000);

  it("keeps two builds posted alternately (and re-posted with new values) apart and correct", async () => {
    const [a, b] = [randomCommit(), randomCommit()];
    const post = (commit: string, cEps2: number) => postRawSubmission(submitBody(hostileSubmission(commit, runsOf(cEps2), { branch: "test/h1/interleaved" })));
    // A, B, A again (new Cε2), B again (new Cε2), two at a time in flight.
    const first = await Promise.all([post(a, 1.92), post(b, 1.87)]);
    const second = await Promise.all([post(a, 1.90), post(b, 1.95)]);
    for (const res of [...first, ...second]) expect(res.status, JSON.stringify(res.body.errors)).toBe(200);

    for (const [commit, cEps2] of [
      [a, 1.9],
      [b, 1.95],
    ] as const) {
      expect(await runsPerKey(commit)).toHaveLength(3);
      const stored = await countStored(commit);
      expect(stored.runs).toBe(3);
      expect(stored.submissions).toBe(2);
      const n = await testDb()("quantity_values as v")
        .join("builds as bb", "bb.id", "v.build_id")
        .where({ "bb.commit": commit, "v.quantity_key": "decay_exponent" })
        .select("v.value");
      // Only the re-post's value remains: n = 1/(Cε2 − 1) (reference sheet §2.2).
      expect(n).toHaveLength(1);
      expect(n[0].value).toBeCloseTo(1 / (cEps2 - 1), 6);
    }
  }, 60_000);
});
