import { openSync, readSync, closeSync, statSync } from "node:fs";
import { Client } from "pg";
import { statementName } from "@/db/prepared";
import { requireEnv } from "./http";

// The SQL statements one HTTP request issues, read from PostgreSQL's own log.
// pg_stat_statements needs a server restart with shared_preload_libraries, so
// instead statement logging is switched on for the bench database only (a
// superuser setting, hence the admin connection over the cluster's socket), the
// app's pooled connections are ended so new ones pick it up, and the server log
// lines written during one request are read. Mail-worker (pg-boss) connections
// are told apart by the pgboss schema in their statements and left out. The
// bench runs alone on its database, so every other statement in that window is
// the request's. With parameters logged too, the statements can be replayed
// with pg as the request's bare SQL: exactly what the server ran, nothing else.

const ENTRY_START = /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d[.\d]* \S+ \[(\d+)\] (\w+):\s+(.*)$/;
const STATEMENT = /^(?:statement|execute [^:]*): ([\s\S]*)$/;

/** The bench's own connections name themselves so that ending the app's idle ones spares them. */
export const BENCH_APPLICATION_NAME = "tauline-bench";

/** One statement as the server logged it, ready to send again with pg. */
export interface LoggedStatement {
  text: string;
  params: (string | null)[];
}

interface LogEntry {
  pid: number;
  kind: string;
  text: string;
}

export class StatementLog {
  private constructor(private admin: Client, private adminPid: number, private logFile: string) {}

  static async open(): Promise<StatementLog> {
    const admin = new Client({ connectionString: requireEnv("BENCH_ADMIN_DATABASE_URL") });
    await admin.connect();
    const pid = (await admin.query<{ pid: number }>("select pg_backend_pid() as pid")).rows[0].pid;
    return new StatementLog(admin, pid, requireEnv("BENCH_PG_LOG"));
  }

  /**
   * Turns statement logging on (or off) for the bench database and ends the
   * app's idle connections. `withParameters` logs bind values in full, for
   * replaying reads; leave it off around ingest, whose 20 MB of values would
   * flood the log.
   */
  async setLogging(on: boolean, { withParameters = false } = {}): Promise<void> {
    const db = (await this.admin.query<{ db: string }>("select current_database() as db")).rows[0].db;
    if (on) {
      await this.admin.query(`alter database "${db}" set log_statement = 'all'`);
      await this.admin.query(`alter database "${db}" set log_parameter_max_length = ${withParameters ? -1 : 0}`);
    } else {
      await this.admin.query(`alter database "${db}" reset log_statement`);
      await this.admin.query(`alter database "${db}" reset log_parameter_max_length`);
    }
    await this.admin.query(
      "select pg_terminate_backend(pid) from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid() and state = 'idle' and application_name <> $1",
      [BENCH_APPLICATION_NAME],
    );
  }

  /** Statements the app (not the mail worker, not this bench) ran while `fn` ran. */
  async countDuring(fn: () => Promise<unknown>): Promise<number> {
    return (await this.captureDuring(fn)).length;
  }

  /** The statements the app ran while `fn` ran, in order, with their bind values (when logged). */
  async captureDuring(fn: () => Promise<unknown>): Promise<LoggedStatement[]> {
    const from = statSync(this.logFile).size;
    await fn();
    // The logging collector writes asynchronously; give it a moment.
    await new Promise((r) => setTimeout(r, 300));
    const entries = parseEntries(readFrom(this.logFile, from));
    const workerPids = new Set(entries.filter((e) => /pgboss/i.test(e.text)).map((e) => e.pid));
    const out: LoggedStatement[] = [];
    entries.forEach((e, i) => {
      const m = e.kind === "LOG" ? STATEMENT.exec(e.text) : null;
      if (!m || e.pid === this.adminPid || workerPids.has(e.pid)) return;
      // Bind values follow as a DETAIL entry of the same backend.
      const detail = entries.slice(i + 1).find((d) => d.pid === e.pid);
      const params = detail?.kind === "DETAIL" && detail.text.startsWith("parameters:") ? parseParameters(detail.text) : [];
      out.push({ text: m[1], params });
    });
    return out;
  }

  async close(): Promise<void> {
    await this.admin.end();
  }
}

function parseEntries(text: string): LogEntry[] {
  const entries: LogEntry[] = [];
  for (const line of text.split("\n")) {
    const m = ENTRY_START.exec(line);
    if (m) entries.push({ pid: Number(m[1]), kind: m[2], text: m[3] });
    else if (entries.length && line !== "") entries[entries.length - 1].text += `\n${line}`;
  }
  return entries;
}

/** `parameters: $1 = '5', $2 = NULL, $3 = 'it''s'` → ["5", null, "it's"] (values as text; the server casts them as it did). */
function parseParameters(detail: string): (string | null)[] {
  const params: (string | null)[] = [];
  for (const m of detail.matchAll(/\$(\d+) = (NULL|'((?:[^']|'')*)')/g)) {
    params[Number(m[1]) - 1] = m[2] === "NULL" ? null : m[3].replaceAll("''", "'");
  }
  return params;
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

/** Sends the logged statements again, one after the other, as the request's bare SQL. */
/**
 * Runs the logged statements again, one after another, each as a prepared
 * statement (named after its text, like the server's hot statements,
 * db/prepared.ts): the bare side gets the fastest path pg offers for every
 * statement, whether or not the server prepares it.
 */
export async function replayStatements(client: Client, statements: LoggedStatement[]): Promise<void> {
  for (const s of statements) await client.query({ name: statementName(s.text), text: s.text, values: s.params });
}

/**
 * Logs one request's statements with their bind values (logging on only
 * around it), so that a section can time exactly that SQL directly with pg.
 */
export async function captureRequestStatements(request: () => Promise<unknown>): Promise<LoggedStatement[]> {
  const log = await StatementLog.open();
  try {
    await log.setLogging(true, { withParameters: true });
    await request(); // a fresh pool connection may log its own set-up; not part of a steady request
    return await log.captureDuring(request);
  } finally {
    await log.setLogging(false).catch(() => undefined);
    await log.close();
  }
}
