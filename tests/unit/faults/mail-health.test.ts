import { describe, expect, it } from "vitest";
import { listMailProblems, MAIL_BACKLOG_SECONDS, type MailFacts } from "@/lib/jobs/health";
import type { MailWorkerState } from "@/lib/jobs/worker";

// When /api/health calls the mail side degraded (still HTTP 200; only a
// database outage answers 503). The thresholds are Tauline's own design.

const running: MailWorkerState = { state: "running", since: "2026-12-02T00:00:00Z", lastError: null };

function facts(over: Partial<MailFacts> = {}): MailFacts {
  return {
    queue: "up",
    jobs: { "mail-deliver": { waiting: 0, active: 0, failed: 0 } },
    outbox: { unsent: 0, failedAttempts: 0, oldestUnsentSeconds: null },
    checkedAt: "2026-12-02T00:00:00Z",
    ...over,
  };
}

describe("listMailProblems", () => {
  it("finds nothing wrong with a readable queue, a running worker and no old mail", () => {
    expect(listMailProblems(facts(), running)).toEqual([]);
  });

  it("tolerates young unsent mail and failed attempts (SMTP briefly away), but not a backlog older than the limit", () => {
    const young = facts({ outbox: { unsent: 3, failedAttempts: 3, oldestUnsentSeconds: MAIL_BACKLOG_SECONDS - 1 } });
    expect(listMailProblems(young, running)).toEqual([]);
    const old = facts({ outbox: { unsent: 3, failedAttempts: 3, oldestUnsentSeconds: MAIL_BACKLOG_SECONDS + 60 } });
    expect(listMailProblems(old, running)).toEqual(["mail waits for 16 min"]);
  });

  it("names an unreadable queue and a worker that is not running in this instance", () => {
    expect(listMailProblems(facts({ queue: "down" }), running)).toEqual(["the job queue could not be read"]);
    expect(listMailProblems(facts(), { ...running, state: "retrying", lastError: "deadlock detected" })).toEqual(["the mail worker of this instance is retrying"]);
    expect(listMailProblems(facts(), null)).toEqual(["the mail worker of this instance is not started"]);
  });

  it("does not count jobs that ran out of retries as a problem of their own (the sweep re-queues their rows)", () => {
    expect(listMailProblems(facts({ jobs: { "mail-deliver": { waiting: 0, active: 0, failed: 4 } } }), running)).toEqual([]);
  });
});
