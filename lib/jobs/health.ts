import "server-only";
import type { Knex } from "knex";
import { countQueueJobs, getOutboxBacklog } from "@/db/queries/mail-health";
import { BOSS_SCHEMA } from "./boss";
import { DELIVER_QUEUE, DIGEST_QUEUE, SWEEP_QUEUE } from "./queues";
import { getMailWorkerState, type MailWorkerState } from "./worker";

// The mail side of /api/health: is the queue (pg-boss's tables in our own
// database) readable, how many jobs wait or gave up, how old the oldest unsent
// outbox row is, and whether this instance's worker runs. Two small queries,
// cached for a few seconds per process so that a load balancer polling every
// second, or the bench using /api/health as its bare round trip, costs almost
// nothing.

const QUEUES = [DELIVER_QUEUE, SWEEP_QUEUE, DIGEST_QUEUE];
const CACHE_MS = 5_000;
/** Unsent mail older than this is a backlog worth a look (SMTP down, no worker anywhere). */
export const MAIL_BACKLOG_SECONDS = 15 * 60;

/** Jobs of one queue: waiting (created or waiting for a retry), running, and given up after the last retry (kept by pg-boss until its clean-up). */
export interface QueueCounts {
  waiting: number;
  active: number;
  failed: number;
}

export interface MailHealth {
  queue: "up" | "down";
  queueError?: string;
  jobs: Record<string, QueueCounts>;
  outbox: { unsent: number; failedAttempts: number; oldestUnsentSeconds: number | null };
  /** Why the mail side is degraded (empty when it is not). */
  problems: string[];
  checkedAt: string;
}

export type MailFacts = Omit<MailHealth, "problems">;

const globalForHealth = globalThis as unknown as { taulineMailHealth?: { at: number; value: Promise<MailFacts> } };

async function readJobCounts(db: Knex): Promise<Record<string, QueueCounts>> {
  const jobs = Object.fromEntries(QUEUES.map((q) => [q, { waiting: 0, active: 0, failed: 0 }]));
  for (const r of await countQueueJobs({ db, schema: BOSS_SCHEMA, queues: QUEUES })) {
    const counts = jobs[r.name];
    if (r.state === "active") counts.active += r.n;
    else if (r.state === "failed") counts.failed += r.n;
    else counts.waiting += r.n;
  }
  return jobs;
}

/** Why the mail side is degraded; empty when it is fine. */
export function listMailProblems(h: MailFacts, worker: MailWorkerState | null): string[] {
  const problems: string[] = [];
  if (h.queue === "down") problems.push("the job queue could not be read");
  if (worker?.state !== "running") problems.push(`the mail worker of this instance is ${worker ? worker.state : "not started"}`);
  if (h.outbox.oldestUnsentSeconds !== null && h.outbox.oldestUnsentSeconds > MAIL_BACKLOG_SECONDS) problems.push(`mail waits for ${Math.round(h.outbox.oldestUnsentSeconds / 60)} min`);
  // Jobs that ran out of retries are counted in `jobs` but are not a problem of
  // their own: pg-boss keeps them for days, and the sweep hands their outbox
  // rows to the queue again; a real backlog shows in the outbox's oldest age.
  return problems;
}

async function checkMail(db: Knex): Promise<MailFacts> {
  const checkedAt = new Date().toISOString();
  const outbox = await getOutboxBacklog({ db });
  let jobs: Record<string, QueueCounts> = {};
  let queue: MailHealth["queue"] = "up";
  let queueError: string | undefined;
  try {
    jobs = await readJobCounts(db);
  } catch (error) {
    // The pgboss schema is missing or unreadable: mail stays in the outbox, but nothing sends it.
    queue = "down";
    queueError = (error as Error).message.slice(0, 200);
  }
  return { queue, ...(queueError ? { queueError } : {}), jobs, outbox, checkedAt };
}

function readCachedFacts(db: Knex): Promise<MailFacts> {
  const cached = globalForHealth.taulineMailHealth;
  if (cached && Date.now() - cached.at < CACHE_MS) return cached.value;
  const value = checkMail(db);
  globalForHealth.taulineMailHealth = { at: Date.now(), value };
  // A failed check, or one that found the queue unreadable (pg-boss still
  // creating its schema at start-up), is not kept: the next call asks again.
  const forget = () => {
    if (globalForHealth.taulineMailHealth?.value === value) globalForHealth.taulineMailHealth = undefined;
  };
  value.then((facts) => facts.queue === "down" && forget(), forget);
  return value;
}

/** The mail health: database facts at most CACHE_MS old, this instance's worker state as of now. */
export async function getMailHealth(db: Knex): Promise<MailHealth> {
  const facts = await readCachedFacts(db);
  return { ...facts, problems: listMailProblems(facts, getMailWorkerState()) };
}
