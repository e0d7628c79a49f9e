import knexFactory, { type Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { generateBenchRuns } from "@/scripts/bench/payload";
import { randomCommit } from "../helpers/graphql";
import { startStack, type TestStack } from "../helpers/stack";
import { getHealth, outsideDecayRun, postAt, submitBody, type Receipt } from "../helpers/stack-http";
import { outboxOfBuilds, waitForEvents } from "../helpers/stack-outbox";
import { DB_NAME } from "../helpers/stack-postgres";
import { waitUntil } from "../helpers/stack-process";

// PostgreSQL stopped hard in the middle of an ingest, on a private stack (own
// cluster, own app): the client gets a clean 503 it can retry, nothing of the
// cut submission survives crash recovery, the app's pools reconnect by
// themselves, and /api/health says what is going on meanwhile.

let stack: TestStack;
const BRANCH = "faults/database";
const TABLES = ["builds", "runs", "run_series", "quantity_values", "submissions"] as const;

beforeAll(async () => {
  stack = await startStack({ apps: 1 });
}, 90_000);

afterAll(async () => {
  await stack?.close();
});

async function count(query: Knex.QueryBuilder): Promise<number> {
  return Number((await query.count<{ n: string }[]>({ n: "*" }))[0].n);
}

async function countAll(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of TABLES) out[t] = await count(stack.db(t));
  return out;
}

describe.sequential("PostgreSQL stopped hard during an ingest", () => {
  // 40 flat-plate runs with three 1,000-point profiles each in full precision: about 4 MB of JSON.
  const commit = randomCommit();
  const runs = generateBenchRuns(40, commit);
  const body = submitBody({ build: { solver: "Cormorant", version: "9.9.0-faults", commit, branch: BRANCH }, runs });

  it("reports the database up with its latency and the mail queue state while all is well", async () => {
    const health = await getHealth(stack.appUrl(0));
    expect(health.status).toBe(200);
    expect(health.body, JSON.stringify(health.body)).toMatchObject({ status: "ok", database: "up", worker: { state: "running" } });
    expect(health.body.latencyMs).toBeGreaterThanOrEqual(0);
    expect(health.body.mail).toMatchObject({ queue: "up", outbox: { unsent: 0, oldestUnsentSeconds: null }, problems: [] });
    expect(Object.keys((health.body.mail as { jobs: object }).jobs).sort()).toEqual(["mail-deliver", "mail-digest", "mail-sweep"]);
  });

  it("stays in service (200) but reports degraded when the job queue cannot be read", async () => {
    // pg-boss's tables out of reach (as after a failed pg-boss migration): mail would pile up, CI posts still work.
    await stack.cluster.sql("alter schema pgboss rename to pgboss_away", DB_NAME);
    try {
      await waitUntil("health to report the queue down", async () => {
        const h = await getHealth(stack.appUrl(0));
        return h.status === 200 && h.body.status === "degraded" && (h.body.mail as { queue: string }).queue === "down";
      }, { timeoutMs: 10_000, everyMs: 250 });
    } finally {
      await stack.cluster.sql("alter schema pgboss_away rename to pgboss", DB_NAME);
    }
    await waitUntil("health to be ok again", async () => (await getHealth(stack.appUrl(0))).body.status === "ok", { timeoutMs: 10_000, everyMs: 250 });
  });

  it("answers 503 with Retry-After when the cluster dies mid-transaction, and keeps nothing of the cut submission", async () => {
    expect(body.length).toBeGreaterThan(3_000_000);
    const before = await countAll();

    // Hold the audit table, the last one the ingest writes: the submission then
    // waits INSIDE its transaction with the build, runs, series, quantity values
    // and submission row already written (uncommitted). That is the moment we stop.
    const holder: Knex = knexFactory({ client: "pg", connection: stack.cluster.url, pool: { min: 0, max: 1 } });
    const hold = holder.transaction();
    const trx = await hold;
    await trx.raw("lock table audit_log in access exclusive mode");

    const started = Date.now();
    const response = postAt<Receipt>(stack.appUrl(0), body).then(
      (r) => ({ ...r, ms: Date.now() - started }),
      (error: Error) => ({ error, ms: Date.now() - started }),
    );
    let blocked: { pid: number; query: string; xid: string | null } | undefined;
    await waitUntil("the ingest to wait on the audit table inside its transaction", async () => {
      const { rows } = await stack.db.raw(
        `select pid, query, backend_xid::text as xid from pg_stat_activity
          where wait_event_type = 'Lock' and query ilike 'insert into "audit_log"%'`,
      );
      blocked = rows[0];
      return blocked !== undefined;
    }, { timeoutMs: 40_000, everyMs: 50 });
    expect(blocked!.xid, "the ingest has written rows in its open transaction").not.toBeNull();

    await stack.cluster.stop("immediate");
    trx.rollback().catch(() => undefined);
    await holder.destroy().catch(() => undefined);

    const answer = await response;
    expect("error" in answer ? answer.error.message : "answered").toBe("answered");
    if ("error" in answer) return;
    expect(answer.ms).toBeLessThan(40_000);
    expect(answer.status).toBe(503);
    expect(Number(answer.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(answer.headers.get("content-type")).toMatch(/json/);
    expect(answer.body.errors?.[0]?.extensions?.code).toBe("SERVICE_UNAVAILABLE");

    // While it is down: health says so at once, and a new post is refused the same clean way.
    const down = await getHealth(stack.appUrl(0));
    expect(down.status).toBe(503);
    expect(down.body).toMatchObject({ status: "down", database: "down" });
    expect(down.ms).toBeLessThan(4_000);
    const refused = await postAt(stack.appUrl(0), body);
    expect(refused.status).toBe(503);
    expect(refused.body.errors?.[0]?.extensions?.code).toBe("SERVICE_UNAVAILABLE");

    await stack.cluster.start(); // crash recovery replays the WAL: only committed work comes back
    await waitUntil("health to recover", async () => (await getHealth(stack.appUrl(0))).status === 200, { timeoutMs: 20_000, everyMs: 250 });

    expect(await count(stack.db("builds").where({ commit }))).toBe(0);
    expect(await countAll()).toEqual(before);
  });

  it("accepts the retried post once the database is back, through the same app (its pool reconnected)", async () => {
    const res = await postAt<Receipt>(stack.appUrl(0), body);
    expect(res.body.errors).toBeUndefined();
    expect(res.status).toBe(200);
    expect(res.body.data!.submitResults.runs).toHaveLength(40);
    const build = await stack.db("builds").where({ commit }).first("id");
    expect(await count(stack.db("runs").where({ build_id: build.id }))).toBe(40);
    expect(await count(stack.db("submissions").where({ build_id: build.id }))).toBe(1);
    expect(await count(stack.db("run_series as s").join("runs as r", "r.id", "s.run_id").where("r.build_id", build.id))).toBe(120);
  });
});

describe("after the outage", () => {
  it("still mails alerts: the instance's pg-boss worker came back with the database", async () => {
    const res = await postAt<Receipt>(stack.appUrl(0), submitBody({ build: { solver: "Cormorant", version: "9.9.0-faults", commit: randomCommit(), branch: BRANCH }, runs: [outsideDecayRun()] }));
    expect(res.body.errors).toBeUndefined();
    const buildId = Number(res.body.data!.submitResults.build.id);
    const rows = await outboxOfBuilds(stack.db, [buildId]);
    expect(rows).toHaveLength(1);
    await waitForEvents(stack.mailDir, [rows[0].event_key], 30_000);
    expect((await getHealth(stack.appUrl(0))).body.worker?.state).toBe("running");
  });
});
