import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomCommit } from "../helpers/graphql";
import { startStack, type TestStack } from "../helpers/stack";
import { getHealth, outsideDecayRun, postAt, submitBody, type Receipt } from "../helpers/stack-http";
import { copiesPerEvent, openDeliveryJobs, outboxOfBuilds, waitForEvents } from "../helpers/stack-outbox";
import { waitUntil } from "../helpers/stack-process";

// Tauline scales out as a stateless web tier on one PostgreSQL, every instance
// running pg-boss workers. Two `next start` instances on a private database:
// submissions posted through both at once stay correct, and each alert is
// mailed exactly once although both workers poll the same queue.

let stack: TestStack;
const BRANCH = "faults/instances";
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
  stack = await startStack({ apps: 2 });
}, 120_000);

afterAll(async () => {
  await stack?.close();
});

async function count(query: Knex.QueryBuilder): Promise<number> {
  return Number((await query.count<{ n: string }[]>({ n: "*" }))[0].n);
}

// A backstep run that diverged, beside the decay run that leaves its band: two run keys per build, two findings per alert.
const DIVERGED_RUN = { case: "backstep", model: "sa", status: "DIVERGED", iterations: 400 };

// The commit posted through both instances sits on a branch of its own: with no
// other builds in its history, every re-post reports the same findings (no
// trend drift appearing half-way), hence one alert event.
function post(instance: number, commit: string, cEps2: number, branch = BRANCH) {
  return postAt<Receipt & { submitResults: { build: { commit: string } } }>(
    stack.appUrl(instance),
    submitBody({ build: { solver: "Cormorant", version: "9.9.0-scale", commit, branch }, runs: [outsideDecayRun(cEps2), DIVERGED_RUN] }),
  );
}

describe("two app instances on one database", () => {
  it("both run a mail worker", async () => {
    for (const i of [0, 1]) expect((await getHealth(stack.appUrl(i))).body.worker?.state).toBe("running");
  });

  it("keeps interleaved builds apart, makes one build of a commit posted through both at once, and mails each alert once", async () => {
    // Six different builds alternating between the instances, each with its own Cε2,
    // and one commit posted twice through each instance, all at the same time.
    const distinct = [1.8, 1.82, 1.84, 1.86, 1.88, 1.9].map((cEps2) => ({ commit: randomCommit(), cEps2 }));
    const shared = randomCommit();
    const posts = [
      ...distinct.map((d, i) => post(i % 2, d.commit, d.cEps2).then((r) => ({ ...r, commit: d.commit }))),
      ...[0, 1, 0, 1].map((i) => post(i, shared, 1.87, `${BRANCH}-shared`).then((r) => ({ ...r, commit: shared }))),
    ];
    const answers = await Promise.all(posts);
    for (const a of answers) {
      expect(a.body.errors, `post of ${a.commit}`).toBeUndefined();
      expect(a.status).toBe(200);
      expect(a.body.data!.submitResults.build.commit).toBe(a.commit);
    }

    // Each distinct build holds its own runs and its own decay exponent n = 1/(Cε2 − 1)
    // (k–ε decay law, reference sheet §2.2): no run landed in another build.
    for (const d of distinct) {
      const build = await stack.db("builds").where({ commit: d.commit }).first("id");
      expect(await count(stack.db("runs").where({ build_id: build.id }))).toBe(2);
      const n = await stack.db("quantity_values").where({ build_id: build.id, quantity_key: "decay_exponent" }).first("value");
      expect(n.value).toBeCloseTo(1 / (d.cEps2 - 1), 3);
    }

    // The commit posted four times: one build, one run per case × model × grid, four submissions recorded.
    expect(await count(stack.db("builds").where({ commit: shared }))).toBe(1);
    const sharedBuild = await stack.db("builds").where({ commit: shared }).first("id");
    const keys = await stack.db("runs").where({ build_id: sharedBuild.id }).select("case_key", "model_key", "grid");
    expect(keys).toHaveLength(2);
    expect(await count(stack.db("submissions").where({ build_id: sharedBuild.id }))).toBe(4);

    // Seven builds, seven events (the re-posts of the shared commit report the same findings).
    const buildIds = [...distinct.map((d) => d.commit), shared].map((c) => answers.find((a) => a.commit === c)!.body.data!.submitResults.build.id).map(Number);
    const rows = await outboxOfBuilds(stack.db, buildIds);
    expect(rows).toHaveLength(7);
    const events = rows.map((r) => r.event_key);
    await waitForEvents(stack.mailDir, events);
    await waitUntil("every outbox row sent", async () => (await outboxOfBuilds(stack.db, buildIds)).every((r) => r.status === "sent"), { timeoutMs: 10_000 });
    expect(await openDeliveryJobs(stack.db, rows.map((r) => r.id))).toEqual([]);
    await sleep(2000);
    expect(await copiesPerEvent(stack.mailDir, events)).toEqual(events.map(() => 1));
    expect((await outboxOfBuilds(stack.db, buildIds)).map((r) => r.attempts)).toEqual(events.map(() => 1));
  });
});
