import { spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdirSync, rmSync } from "node:fs";
import { join } from "node:path";
import knexFactory, { type Knex } from "knex";
import { seedLibrary } from "@/db/seeds/library";
import { seedPeople } from "@/db/seeds/people";
import { requireEnv } from "./env";
import { TestCluster } from "./stack-postgres";
import { findFreePort, runCommand, signalService, startService, waitUntil, type Service } from "./stack-process";

// A private stack for one fault-test file: its own PostgreSQL cluster, SMTP
// fake and one or more `next start` instances of the production build in
// $NEXT_DIST_DIR, all on free ports of 127.0.0.1. The fault tests stop and kill
// these parts; the shared cluster and app of the suite are never touched.
// close() tears everything down (process groups, cluster, folder), also after
// a failed test.

export const CI_TOKEN = "fault-stack-ci-token-0123456789";
export const DEMO_PASSWORD = "cormorant-fault";

export interface TestStack {
  dir: string;
  mailDir: string;
  cluster: TestCluster;
  /** A direct pool for count queries (reconnects by itself after a cluster restart). */
  db: Knex;
  appUrl(index: number): string;
  startApp(index: number): Promise<void>;
  /** Waits until the instance's mail worker runs (its /api/health says so). */
  waitForWorker(index: number): Promise<void>;
  /** SIGKILL (or another signal) to one app instance's process group; waits until it is gone. */
  stopApp(index: number, signal?: NodeJS.Signals): Promise<void>;
  startSmtp(): Promise<void>;
  stopSmtp(): Promise<void>;
  close(): Promise<void>;
}

async function answers(url: string, status = 200): Promise<boolean> {
  const res = await fetch(url, { signal: AbortSignal.timeout(3000) });
  await res.arrayBuffer();
  return res.status === status;
}

async function portOpen(port: number): Promise<boolean> {
  const { connect } = await import("node:net");
  return new Promise((resolve) => {
    const socket = connect({ host: "127.0.0.1", port });
    socket.once("connect", () => (socket.destroy(), resolve(true)));
    socket.once("error", () => resolve(false));
  });
}

/** Everything the app reads (lib/env.ts), as scripts/lib/app-env.sh exports it, for this stack. */
function appEnv(stack: { url: string; smtpPort: number; mailDir: string; secret: string }, port: number): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env };
  for (const key of Object.keys(env)) if (key.startsWith("VITEST") || key === "TAULINE_TEST_URL") delete env[key];
  return {
    ...env,
    NODE_ENV: "production",
    NEXT_DIST_DIR: requireEnv("NEXT_DIST_DIR"),
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: stack.url,
    PORT: String(port),
    APP_URL: `http://127.0.0.1:${port}`,
    NEXTAUTH_URL: `http://127.0.0.1:${port}`,
    NEXTAUTH_SECRET: stack.secret,
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(stack.smtpPort),
    SMTP_SECURE: "false",
    MAIL_FROM: "Tauline <tauline@fenwick-hydro.test>",
    MAIL_DIR: stack.mailDir,
    TAULINE_CI_TOKEN: CI_TOKEN,
    TAULINE_DEMO_PASSWORD: DEMO_PASSWORD,
    LOG_LEVEL: "info",
  };
}

export async function startStack({ apps = 1 }: { apps?: number } = {}): Promise<TestStack> {
  const dir = `/tmp/tauline-fault-${process.pid}-${randomBytes(4).toString("hex")}`;
  const mailDir = join(dir, "mail");
  mkdirSync(mailDir, { recursive: true });
  const cluster = new TestCluster(dir, await findFreePort());
  const smtpPort = await findFreePort();
  const appPorts: number[] = [];
  for (let i = 0; i < apps; i++) appPorts.push(await findFreePort());
  const secret = randomBytes(32).toString("base64");
  const services = new Map<string, Service>();
  let db: Knex | undefined;

  // A crashed test worker must not leave servers behind: kill the groups and stop the cluster synchronously on exit.
  const killAllNow = () => {
    for (const s of services.values()) if (s.child.pid && s.child.exitCode === null) spawnSync("kill", ["-KILL", `-${s.child.pid}`]);
    cluster.stopNow();
  };
  process.once("exit", killAllNow);

  const stack: TestStack = {
    dir,
    mailDir,
    cluster,
    get db() {
      db ??= knexFactory({ client: "pg", connection: cluster.url, pool: { min: 0, max: 4 } });
      return db;
    },
    appUrl: (i) => `http://127.0.0.1:${appPorts[i]}`,
    async startApp(i) {
      const port = appPorts[i];
      const service = startService({
        name: `app${i}`,
        command: join(process.cwd(), "node_modules/.bin/next"),
        args: ["start", "-H", "127.0.0.1", "-p", String(port)],
        env: appEnv({ url: cluster.url, smtpPort, mailDir, secret }, port),
        logFile: join(dir, `app${i}.log`),
      });
      services.set(`app${i}`, service);
      await waitUntil(`app ${i} to answer /api/health`, async () => {
        if (service.child.exitCode !== null) throw new Error(`app ${i} exited (${service.child.exitCode}); see ${dir}/app${i}.log`);
        return answers(`${stack.appUrl(i)}/api/health`);
      }, { timeoutMs: 45_000, everyMs: 250 });
    },
    async waitForWorker(i) {
      await waitUntil(`the mail worker of app ${i} to run`, async () => {
        const res = await fetch(`${stack.appUrl(i)}/api/health`, { signal: AbortSignal.timeout(3000) });
        const body = (await res.json()) as { worker?: { state?: string } };
        return body.worker?.state === "running";
      }, { timeoutMs: 30_000, everyMs: 200 });
    },
    async stopApp(i, signal = "SIGKILL") {
      const service = services.get(`app${i}`);
      if (service) await signalService(service, signal);
      services.delete(`app${i}`);
    },
    async startSmtp() {
      const service = startService({
        name: "smtp",
        command: process.execPath,
        args: ["--import", "tsx", "scripts/smtp-fake.ts"],
        env: { ...process.env, SMTP_PORT: String(smtpPort), MAIL_DIR: mailDir },
        logFile: join(dir, "smtp.log"),
      });
      services.set("smtp", service);
      await waitUntil("the SMTP fake to listen", () => portOpen(smtpPort), { timeoutMs: 20_000, everyMs: 100 });
    },
    async stopSmtp() {
      const service = services.get("smtp");
      if (service) await signalService(service, "SIGTERM");
      services.delete("smtp");
      await waitUntil("the SMTP port to close", async () => !(await portOpen(smtpPort)), { timeoutMs: 10_000, everyMs: 100 });
    },
    async close() {
      for (const s of services.values()) await signalService(s, "SIGKILL", 5000).catch(() => undefined);
      services.clear();
      process.removeListener("exit", killAllNow);
      await db?.destroy().catch(() => undefined);
      if (await cluster.isRunning()) await cluster.stop("immediate").catch(() => undefined);
      // TAULINE_KEEP_FAULT_STACK=1 keeps the folder (app, SMTP and PostgreSQL logs) for a post-mortem.
      if (process.env.TAULINE_KEEP_FAULT_STACK === "1") console.log(`fault stack kept in ${dir}`);
      else rmSync(dir, { recursive: true, force: true });
    },
  };

  try {
    await cluster.create();
    await runCommand(join(process.cwd(), "node_modules/.bin/tsx"), ["--conditions=react-server", "db/migrate.ts"], { ...process.env, DATABASE_URL: cluster.url });
    // The case library and the demo people with a CI token; no demo history (not needed, and it costs seconds).
    await seedLibrary({ db: stack.db, validFrom: new Date(Date.now() - 365 * 86_400_000) });
    await seedPeople({ db: stack.db, password: DEMO_PASSWORD, ciToken: CI_TOKEN });
    await stack.startSmtp();
    await Promise.all(appPorts.map(async (_, i) => {
      await stack.startApp(i);
      await stack.waitForWorker(i);
    }));
  } catch (error) {
    await stack.close();
    throw error;
  }
  return stack;
}
