import { openSync, readSync, closeSync, statSync } from "node:fs";
import { Client } from "pg";
import { requireEnv } from "./http";

// Counting the SQL statements one HTTP request issues. pg_stat_statements needs
// a server restart with shared_preload_libraries, so instead statement logging
// is switched on for the bench database only (a superuser setting, hence the
// admin connection over the cluster's socket), the app's pooled connections are
// ended so new ones pick it up, and the server log lines written during one
// request are counted. Mail-worker (pg-boss) connections are told apart by the
// pgboss schema in their statements and left out.

const ENTRY_START = /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d[.\d]* \S+ \[(\d+)\] (\w+):\s+(.*)$/;

export class StatementLog {
  private constructor(private admin: Client, private adminPid: number, private logFile: string) {}

  static async open(): Promise<StatementLog> {
    const admin = new Client({ connectionString: requireEnv("BENCH_ADMIN_DATABASE_URL") });
    await admin.connect();
    const pid = (await admin.query<{ pid: number }>("select pg_backend_pid() as pid")).rows[0].pid;
    return new StatementLog(admin, pid, requireEnv("BENCH_PG_LOG"));
  }

  /** Turns statement logging on (or off) for the bench database and ends the app's idle connections. */
  async setLogging(on: boolean): Promise<void> {
    const db = (await this.admin.query<{ db: string }>("select current_database() as db")).rows[0].db;
    if (on) {
      await this.admin.query(`alter database "${db}" set log_statement = 'all'`);
      // Bind values of a 22 MB insert would flood the log; the statement text suffices.
      await this.admin.query(`alter database "${db}" set log_parameter_max_length = 0`);
    } else {
      await this.admin.query(`alter database "${db}" reset log_statement`);
      await this.admin.query(`alter database "${db}" reset log_parameter_max_length`);
    }
    await this.admin.query(
      "select pg_terminate_backend(pid) from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid() and state = 'idle'",
    );
  }

  /** Statements the app (not the mail worker, not this bench) ran while `fn` ran. */
  async countDuring(fn: () => Promise<unknown>): Promise<number> {
    const from = statSync(this.logFile).size;
    await fn();
    // The logging collector writes asynchronously; give it a moment.
    await new Promise((r) => setTimeout(r, 300));
    const text = readFrom(this.logFile, from);
    const entries: { pid: number; kind: string; text: string }[] = [];
    for (const line of text.split("\n")) {
      const m = ENTRY_START.exec(line);
      if (m) entries.push({ pid: Number(m[1]), kind: m[2], text: m[3] });
      else if (entries.length) entries[entries.length - 1].text += `\n${line}`;
    }
    const workerPids = new Set(entries.filter((e) => /pgboss/i.test(e.text)).map((e) => e.pid));
    return entries.filter(
      (e) => e.kind === "LOG" && /^(statement|execute [^:]*):/.test(e.text) && e.pid !== this.adminPid && !workerPids.has(e.pid),
    ).length;
  }

  async close(): Promise<void> {
    await this.admin.end();
  }
}

function readFrom(file: string, offset: number): string {
  const size = statSync(file).size;
  if (size <= offset) return "";
  const buf = Buffer.alloc(size - offset);
  const fd = openSync(file, "r");
  try {
    readSync(fd, buf, 0, buf.length, offset);
  } finally {
    closeSync(fd);
  }
  return buf.toString("utf8");
}
