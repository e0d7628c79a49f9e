// The pg-boss queues of the mail path and their retry policy.

export const DELIVER_QUEUE = "mail-deliver";
export const SWEEP_QUEUE = "mail-sweep";
export const DIGEST_QUEUE = "mail-digest";

/** Hourly digest, and a sweep each minute for outbox rows whose job was lost or gave up. */
export const DIGEST_CRON = "0 * * * *";
export const SWEEP_CRON = "* * * * *";

/**
 * Delivery retries: pg-boss waits retryDelay·2^k·(1+U)/2 before retry k+1
 * (k ≥ 1), i.e. about 2–4 s, 4–8 s, 8–16 s … capped by retryLimit; after that
 * the sweep queues the row again. Nothing is dropped: the outbox row stays
 * until a send succeeds.
 */
export const DELIVER_RETRY = { retryLimit: 12, retryDelay: 2, retryBackoff: true } as const;

/** How long one send may hold an outbox row before another sender may take it. */
export const SEND_LEASE_SECONDS = 120;

/**
 * When the outbox row's next attempt is due after a failed try that pg-boss
 * ran as retry number `retryCount`: after pg-boss's own next retry at the
 * latest (retryDelay·2^(retryCount+1)), plus a minute of grace, so the sweep
 * only steps in for a job that is truly gone. After the last retry the sweep
 * starts a fresh round in a quarter of an hour.
 */
export function sweepAfterSeconds(retryCount: number): number {
  if (retryCount >= DELIVER_RETRY.retryLimit) return 15 * 60;
  return DELIVER_RETRY.retryDelay * 2 ** Math.min(16, retryCount + 1) + 60;
}
