import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";
import { createHash } from "node:crypto";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { getDb } from "@/db";
import { getEnv } from "@/lib/env";
import { getLogger } from "@/lib/log";

// Password guessing is slowed per account and per address, with the counts in
// PostgreSQL (table sign_in_throttle, migration 010) so that every app instance
// behind a load balancer sees the same attempts.
//
// Per account (default 5 per 15 min): every attempt is counted *before* the
// password is checked, so parallel guesses cannot slip through between check
// and count; a successful sign-in clears the account's count, so in effect it
// counts failures. Once over, the account is refused even with the right
// password until the window ends.
// Per address (default 30 failures per 15 min): also counted before the check,
// and a success gives its point back, so only failures stay. A whole office
// behind one address (or the test suite on 127.0.0.1) signing in correctly
// never fills it; only guesses do.

const THROTTLE_TABLE = "sign_in_throttle";

interface Limiters {
  account: RateLimiterPostgres;
  address: RateLimiterPostgres;
}

const globalForThrottle = globalThis as unknown as { __taulineSignInLimiters?: Limiters };

function getLimiters(): Limiters {
  if (globalForThrottle.__taulineSignInLimiters) return globalForThrottle.__taulineSignInLimiters;
  const env = getEnv();
  const common = { storeClient: getDb(), storeType: "knex", tableName: THROTTLE_TABLE, tableCreated: true, duration: env.SIGNIN_WINDOW_MINUTES * 60 };
  globalForThrottle.__taulineSignInLimiters = {
    account: new RateLimiterPostgres({ ...common, keyPrefix: "account", points: env.SIGNIN_ACCOUNT_LIMIT }),
    address: new RateLimiterPostgres({ ...common, keyPrefix: "address", points: env.SIGNIN_ADDRESS_LIMIT }),
  };
  return globalForThrottle.__taulineSignInLimiters;
}

/** The e-mail is not kept in clear in the throttle table; its SHA-256 is the key. */
export function accountKey(email: string): string {
  return createHash("sha256").update(email.trim().toLowerCase(), "utf8").digest("hex");
}

/** Set on the request whose attempt was refused, so the route can answer 429 with Retry-After. */
const refusals = new AsyncLocalStorage<{ retryAfterSeconds?: number }>();

export function runWithThrottleNote<T>(fn: () => Promise<T>): Promise<{ result: T; retryAfterSeconds?: number }> {
  const note: { retryAfterSeconds?: number } = {};
  return refusals.run(note, async () => ({ result: await fn(), retryAfterSeconds: note.retryAfterSeconds }));
}

const THROTTLE_MESSAGE_START = "Too many";

function refuse(res: RateLimiterRes, whose: "account" | "address"): never {
  const seconds = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
  const note = refusals.getStore();
  if (note) note.retryAfterSeconds = seconds;
  const minutes = Math.ceil(seconds / 60);
  const what = whose === "account" ? "sign-in attempts for this account" : "failed sign-ins from your network address";
  throw new Error(`${THROTTLE_MESSAGE_START} ${what}; try again in ${minutes} min.`);
}

async function count(limiter: RateLimiterPostgres, key: string, whose: "account" | "address") {
  try {
    await limiter.consume(key, 1);
  } catch (error) {
    if (error instanceof RateLimiterRes) refuse(error, whose);
    getLogger().error({ err: error }, "sign-in throttle store failed");
    // next-auth puts an authorize error's message into the URL: never a driver message.
    throw new Error("Sign-in is unavailable at the moment; try again shortly.");
  }
}

/**
 * Counts one attempt against the address and (when the e-mail parsed) the
 * account, throwing a "too many … try again in N min" error when either is
 * over its limit. Call `succeeded` once the password matched.
 */
export async function countSignInAttempt({ email, address }: { email: string | null; address: string }) {
  const limiters = getLimiters();
  await count(limiters.address, address, "address");
  if (email !== null) await count(limiters.account, accountKey(email), "account");
  return {
    async succeeded() {
      await Promise.all([limiters.address.reward(address, 1), email !== null ? limiters.account.delete(accountKey(email)) : null]);
    },
  };
}
