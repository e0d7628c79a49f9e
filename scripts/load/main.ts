import { signInAt } from "../../tests/helpers/session";
import { parseLoadSettings, USAGE } from "./args";
import { CI_KIND, createCiOptions } from "./ci-clients";
import { runDrained, type CannonOutcome, type LoadPhase } from "./drain";
import { createRandomCommit, generateBodyPool } from "./payload";
import { createReaderOptions, readReaderTargets } from "./readers";
import { createRecorder, type Recorder } from "./recorder";
import { describeMachine, printReport, writeReport, type GroupReport, type LoadReport } from "./report";
import { readServerPeakRssMb } from "./server-memory";
import { summariseKinds } from "./stats";
import { checkDatabase } from "./verify";

// npm run load (scripts/load.sh starts the app on a throwaway database and
// exports its environment): CI clients posting submissions and signed-in
// readers at the same time, then a database check of every receipt.
// Exit code 1 when any request failed or the database check failed.

function requireEnv(name: string): string {
  const v = process.env[name];
  if (!v) throw new Error(`${name} is not set: run the load through npm run load`);
  return v;
}

async function main(): Promise<number> {
  if (process.argv.includes("--help")) {
    console.log(USAGE);
    return 0;
  }
  const settings = parseLoadSettings(process.argv.slice(2), process.env);
  const url = requireEnv("APP_URL");
  const token = requireEnv("TAULINE_CI_TOKEN");
  const started = Date.now();
  const step = (s: string) => console.log(`[load] ${s} (${((Date.now() - started) / 1000).toFixed(0)} s)`);

  // Every run posts under branches of its own, so the check below can count exactly its builds.
  // LOAD_BRANCH_ROOT lets a trial against a shared database keep to a test/ branch.
  const branchPrefix = `${process.env.LOAD_BRANCH_ROOT || "load"}/${new Date().toISOString().replace(/[-:.TZ]/g, "").slice(0, 14)}-${process.pid}`;
  step(`generating ${settings.poolSize} submission bodies under ${branchPrefix}/`);
  const pool = generateBodyPool({ size: settings.poolSize, branchPrefix, branches: settings.branches });

  step("signing in the readers and reading what they will ask for");
  const cookie = await signInAt(url, "developer@fenwick-hydro.test", requireEnv("TAULINE_DEMO_PASSWORD"));
  const targets = await readReaderTargets(url, cookie);
  await warmUp(url, token, generateBodyPool({ size: 1, branchPrefix: `${branchPrefix}-warmup`, branches: 1 })[0].fill(createRandomCommit()));

  const phase: LoadPhase = { draining: false };
  const ciRecorder = createRecorder();
  const readerRecorder = createRecorder();
  const ci = createCiOptions({ url, token, pool, connections: settings.ciClients, timeoutSeconds: settings.timeoutSeconds, phase, recorder: ciRecorder });
  const readers = createReaderOptions({ url, cookie, targets, connections: settings.readers, timeoutSeconds: settings.timeoutSeconds, recorder: readerRecorder });
  const drain = { loadSeconds: settings.durationSeconds, maxDrainSeconds: settings.timeoutSeconds + 5, phase };

  step(`load: ${settings.ciClients} CI clients and ${settings.readers} readers for ${settings.durationSeconds} s`);
  const [ciOutcome, readerOutcome] = await Promise.all([
    runDrained({ ...drain, options: ci.options, recorder: ciRecorder, lastKind: () => CI_KIND, group: "ci" }),
    settings.readers > 0
      ? runDrained({ ...drain, options: readers.options, recorder: readerRecorder, lastKind: readers.lastKind, group: "readers" })
      : Promise.resolve(null),
  ]);

  step("checking the database against every receipt");
  const database = await checkDatabase(requireEnv("DATABASE_URL"), branchPrefix, ci.ledger);

  const groups = [summariseGroup("ci", settings.ciClients, ciOutcome, ciRecorder)];
  if (readerOutcome) groups.push(summariseGroup("readers", settings.readers, readerOutcome, readerRecorder));
  const errors = groups.reduce((s, g) => s + g.errors, 0);
  const sizes = pool.map((p) => p.bytes);
  const report: LoadReport = {
    ranAt: new Date().toISOString(),
    url,
    settings,
    machine: describeMachine(),
    payloadBytes: { min: Math.min(...sizes), max: Math.max(...sizes) },
    groups,
    errors,
    serverPeakRssMb: readServerPeakRssMb(),
    database,
    passed: errors === 0 && database.ok,
  };
  printReport(report);
  console.log(`[load] wrote ${writeReport(report)}`);
  return report.passed ? 0 : 1;
}

function summariseGroup(group: string, connections: number, outcome: CannonOutcome, recorder: Recorder): GroupReport {
  const records = [...recorder.kinds.values()];
  const total = summariseKinds("(all)", records, outcome.seconds);
  return {
    group,
    connections,
    seconds: outcome.seconds,
    drainSeconds: outcome.drainSeconds,
    total,
    kinds: records.filter((r) => r.statuses.size > 0).map((r) => summariseKinds(r.kind, [r], outcome.seconds)),
    timeouts: outcome.result.timeouts,
    connectionErrors: outcome.result.errors - outcome.result.timeouts,
    errors: total.non2xx + total.bodyErrors + outcome.result.errors,
  };
}

/** One submission before the clock starts, under a branch the check ignores, so the first timed posts find the server warm. */
async function warmUp(url: string, token: string, body: Buffer): Promise<void> {
  const res = await fetch(`${url}/api/graphql`, { method: "POST", headers: { "content-type": "application/json", authorization: `Bearer ${token}` }, body: body.toString("utf8") });
  if (!res.ok) throw new Error(`the warm-up submission was refused (${res.status}): ${(await res.text()).slice(0, 300)}`);
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(2);
  },
);
