import { getHealthDb } from "@/db";
import { getMailHealth } from "@/lib/jobs/health";
import { getMailWorkerState } from "@/lib/jobs/worker";

export const dynamic = "force-dynamic";

// Health for start scripts, load balancers and people.
//
//   200 {status:"ok"}        database answers, mail side fine
//   200 {status:"degraded"}  database answers, but mail is stuck or this
//                            instance's worker is not running (see mail.problems)
//   503 {status:"down"}      the database does not answer (Retry-After set)
//
// A mail backlog keeps 200 on purpose: every instance shares the same queue, so
// dropping a web node from the balancer would not send one more message, only
// stop CI posts and dashboards. Only the database decides availability.
// The database probe has its own two-connection pool and a 3 s limit; the mail
// facts are cached for 5 s (lib/jobs/health.ts), so a poll costs one `select 1`.

const PROBE_TIMEOUT_MS = 3_000;

async function probeDatabase(): Promise<{ up: true; latencyMs: number } | { up: false; error: string }> {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${PROBE_TIMEOUT_MS} ms`)), PROBE_TIMEOUT_MS);
  });
  try {
    await Promise.race([getHealthDb().raw("select 1"), timeout]);
    return { up: true, latencyMs: Math.round((performance.now() - started) * 10) / 10 };
  } catch (error) {
    return { up: false, error: (error as Error).message.slice(0, 200) };
  } finally {
    clearTimeout(timer);
  }
}

export async function GET() {
  const db = await probeDatabase();
  if (!db.up) {
    return Response.json({ status: "down", database: "down", error: db.error }, { status: 503, headers: { "Retry-After": "5", "Cache-Control": "no-store" } });
  }
  const mail = await getMailHealth(getHealthDb()).catch((error: unknown) => ({ error: (error as Error).message.slice(0, 200), problems: ["the mail state could not be read"] }));
  const status = mail.problems.length ? "degraded" : "ok";
  const worker = getMailWorkerState() ?? { state: "not started", since: null, lastError: null };
  return Response.json({ status, database: "up", latencyMs: db.latencyMs, mail, worker }, { headers: { "Cache-Control": "no-store" } });
}
