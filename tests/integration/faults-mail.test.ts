import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomCommit } from "../helpers/graphql";
import { startStack, type TestStack } from "../helpers/stack";
import { getHealth, outsideDecayRun, postAt, submitBody, type Receipt } from "../helpers/stack-http";
import { insertOutboxMessage } from "@/db/queries/outbox";
import { copiesPerEvent, openDeliveryJobs, outboxByIds, outboxOfBuilds, waitForEvents } from "../helpers/stack-outbox";
import { countMailByEvent } from "../helpers/stack-mail";
import { waitUntil } from "../helpers/stack-process";

// Mail faults on a private stack: the SMTP relay away for a while, and the app
// killed with SIGKILL while alert jobs wait in the queue. Each alert must reach
// the SMTP fake exactly once. "Once" is proven by state, not only by waiting:
// one stored copy per event, the outbox row `sent` (a sender can claim only
// queued, failed or lease-expired rows) and no delivery job left open for it.

let stack: TestStack;
const BRANCH = "faults/mail";
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
  stack = await startStack({ apps: 1 });
  // An immediate subscriber besides the release manager, so each alert has a To and a Bcc recipient.
  const developer = await stack.db("users").where({ email: "developer@fenwick-hydro.test" }).first("id");
  await stack.db("subscriptions").insert({ user_id: developer.id, case_key: "decaying-hit", branch: BRANCH, mode: "immediate" });
}, 90_000);

afterAll(async () => {
  await stack?.close();
});

async function postOutsideBuild(commit: string, cEps2 = 1.87): Promise<number> {
  const res = await postAt<Receipt>(stack.appUrl(0), submitBody({ build: { solver: "Cormorant", version: "9.9.0-mail", commit, branch: BRANCH }, runs: [outsideDecayRun(cEps2)] }));
  expect(res.body.errors).toBeUndefined();
  expect(res.body.data!.submitResults.build.verdict).toBe("outside");
  return Number(res.body.data!.submitResults.build.id);
}

async function expectSentOnce(buildIds: number[]): Promise<void> {
  const rows = await outboxOfBuilds(stack.db, buildIds);
  expect(rows).toHaveLength(buildIds.length);
  await expectRowsSentOnce(rows.map((r) => r.id));
}

async function expectRowsSentOnce(ids: number[], timeoutMs = 40_000): Promise<void> {
  const rows = await outboxByIds(stack.db, ids);
  const keys = rows.map((r) => r.event_key);
  await waitForEvents(stack.mailDir, keys, timeoutMs);
  await waitUntil("the outbox rows to be marked sent", async () => (await outboxByIds(stack.db, ids)).every((r) => r.status === "sent"), { timeoutMs: 10_000 });
  expect(await openDeliveryJobs(stack.db, ids)).toEqual([]);
  await sleep(2000); // a late duplicate would be on disk by now
  expect(await copiesPerEvent(stack.mailDir, keys)).toEqual(keys.map(() => 1));
}

describe.sequential("mail faults", () => {
  it("keeps an alert through several failed attempts while SMTP is down, shows the backlog in health, and delivers it once when SMTP returns", async () => {
    await stack.stopSmtp();
    const buildId = await postOutsideBuild(randomCommit());
    // Let pg-boss retry with backoff: two refused attempts (about 2–4 s apart).
    await waitUntil("two failed attempts", async () => {
      const [row] = await outboxOfBuilds(stack.db, [buildId]);
      return row?.status === "failed" && row.attempts >= 2;
    }, { timeoutMs: 30_000 });
    const [row] = await outboxOfBuilds(stack.db, [buildId]);
    expect((await countMailByEvent(stack.mailDir)).get(row.event_key)).toBeUndefined();

    // The backlog is visible, but the node stays in service (200): mail waiting is not an outage.
    await waitUntil("health to count the unsent row", async () => {
      const h = await getHealth(stack.appUrl(0));
      const outbox = (h.body.mail as { outbox: { unsent: number; failedAttempts: number } }).outbox;
      return h.status === 200 && outbox.unsent >= 1 && outbox.failedAttempts >= 1;
    }, { timeoutMs: 10_000, everyMs: 500 });

    await stack.startSmtp();
    await expectSentOnce([buildId]);
    expect((await outboxOfBuilds(stack.db, [buildId]))[0].attempts).toBeGreaterThanOrEqual(3);
  });

  it("delivers every queued alert exactly once after the app is killed with SIGKILL and started again", async () => {
    await stack.stopSmtp();
    // Three alerts at once, each a different build (and a different decay exponent).
    const buildIds = await Promise.all([1.85, 1.86, 1.87].map((c) => postOutsideBuild(randomCommit(), c)));
    // Kill while every row has failed once and its job waits for the retry (none mid-send).
    await waitUntil("all three rows failed, their jobs waiting", async () => {
      const rows = await outboxOfBuilds(stack.db, buildIds);
      if (rows.length !== 3 || rows.some((r) => r.status !== "failed")) return false;
      const jobs = await openDeliveryJobs(stack.db, rows.map((r) => r.id));
      return jobs.length === 3 && jobs.every((j) => j.state !== "active");
    }, { timeoutMs: 30_000, everyMs: 100 });
    await stack.stopApp(0, "SIGKILL");

    const rows = await outboxOfBuilds(stack.db, buildIds);
    expect(rows.map((r) => r.status)).toEqual(["failed", "failed", "failed"]);
    expect(await openDeliveryJobs(stack.db, rows.map((r) => r.id))).toHaveLength(3);

    await stack.startSmtp();
    await stack.startApp(0);
    await stack.waitForWorker(0);
    await expectSentOnce(buildIds);
  });

  it("sends mail committed just before a crash, whose nudge never ran, as soon as an instance starts (not at the row's due minute)", async () => {
    await stack.stopApp(0, "SIGKILL");
    // The row exactly as a submission's transaction writes it (due in one minute, no job yet).
    const eventKey = `notice:lost-nudge:${randomCommit().slice(0, 12)}`;
    const { id } = await insertOutboxMessage({
      db: stack.db,
      message: { eventKey, kind: "notice", recipients: ["release@fenwick-hydro.test"], subject: "queued before the crash", text: "x", html: "<p>x</p>" },
    });
    expect(id).not.toBeNull();
    expect(await openDeliveryJobs(stack.db, [id!])).toEqual([]);
    await stack.startApp(0);
    // Well inside the minute: the starting worker picked the row up itself.
    await expectRowsSentOnce([id!], 30_000);
  });
});
