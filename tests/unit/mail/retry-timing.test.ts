import { describe, expect, it } from "vitest";
import { DELIVER_RETRY, sweepAfterSeconds } from "@/lib/jobs/queues";

// pg-boss 10 schedules retry k+1 of a job with backoff at
//   retryDelay · 2^min(16, k+1) / 2 · (1 + U),  U uniform in [0, 1)
// (read in node_modules/pg-boss/src/plans.js, failJobs, version 10.4.2).
// The sweep must not step in before that.
function latestPgBossRetry(retryCount: number): number {
  return (DELIVER_RETRY.retryDelay * 2 ** Math.min(16, retryCount + 1)) / 2 * 2;
}

describe("sweepAfterSeconds", () => {
  it("waits past pg-boss's latest possible retry for every retry the queue allows", () => {
    for (let k = 0; k < DELIVER_RETRY.retryLimit; k++) expect(sweepAfterSeconds(k)).toBeGreaterThan(latestPgBossRetry(k));
  });

  it("lets the sweep start a new round a quarter of an hour after pg-boss gave up", () => {
    expect(sweepAfterSeconds(DELIVER_RETRY.retryLimit)).toBe(900);
  });

  it("keeps the first retries short enough that an SMTP outage of seconds delays mail by seconds", () => {
    expect(latestPgBossRetry(0)).toBeLessThanOrEqual(4);
    expect(latestPgBossRetry(1)).toBeLessThanOrEqual(8);
  });
});
