import { spawnSync } from "node:child_process";
import { appendFileSync, chmodSync, existsSync, mkdirSync, readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { runCommand } from "./stack-process";

// A throwaway PostgreSQL cluster for one fault-test file, made the way
// scripts/lib/postgres-cluster.sh makes the project's: initdb as the `postgres`
// OS user when we are root (PostgreSQL refuses to run as root), 127.0.0.1 only,
// the unix socket inside the 0700 data folder, trust for the role `tauline`
// over TCP. Unlike the development cluster it keeps synchronous_commit on: the
// tests stop it with `-m immediate` and must see exactly what was committed.

export const DB_ROLE = "tauline";
export const DB_NAME = "tauline";

const isRoot = typeof process.getuid === "function" && process.getuid() === 0;

/** The newest Debian-packaged PostgreSQL's bin folder (as scripts/lib/postgres.sh picks it). */
export function findPgBin(): string {
  const root = "/usr/lib/postgresql";
  const versions = existsSync(root) ? readdirSync(root).filter((v) => existsSync(join(root, v, "bin", "pg_ctl"))) : [];
  versions.sort((a, b) => Number(b) - Number(a));
  if (versions.length === 0) throw new Error("no PostgreSQL under /usr/lib/postgresql/*/bin (npm test installs it)");
  return join(root, versions[0], "bin");
}

/** Runs a PostgreSQL tool as the cluster's OS user, from / (the checkout may be closed to that user). */
function asPg(tool: string, args: string[]): Promise<string> {
  return isRoot ? runCommand("runuser", ["-u", "postgres", "--", tool, ...args], process.env, "/") : runCommand(tool, args, process.env, "/");
}

export class TestCluster {
  readonly data: string;
  private readonly bin = findPgBin();

  constructor(
    readonly dir: string,
    readonly port: number,
  ) {
    this.data = join(dir, "pg");
  }

  get url(): string {
    return `postgres://${DB_ROLE}@127.0.0.1:${this.port}/${DB_NAME}`;
  }

  async create(): Promise<void> {
    mkdirSync(this.data, { recursive: true });
    chmodSync(this.dir, 0o755);
    if (isRoot) await runCommand("chown", ["postgres:postgres", this.data]);
    chmodSync(this.data, 0o700);
    await asPg(join(this.bin, "initdb"), ["-D", this.data, "-U", "postgres", "-E", "UTF8", "--locale=C", "--auth-local=trust", "--auth-host=reject", "--no-instructions"]);
    const hba = `local all all trust\nhost all ${DB_ROLE} 127.0.0.1/32 trust\n`;
    const conf = `listen_addresses = '127.0.0.1'\nport = ${this.port}\nunix_socket_directories = '${this.data}'\nmax_connections = 60\nfsync = on\nsynchronous_commit = on\n`;
    await this.writeAsPg("pg_hba.conf", hba);
    await this.writeAsPg("tauline.conf", conf);
    appendFileSync(join(this.data, "postgresql.conf"), "include_if_exists = 'tauline.conf'\n"); // the file exists: its owner stays
    await this.start();
    await this.sql(`create role ${DB_ROLE} login createdb`);
    await this.sql(`create database ${DB_NAME} owner ${DB_ROLE}`);
  }

  private async writeAsPg(name: string, text: string): Promise<void> {
    const path = join(this.data, name);
    writeFileSync(path, text);
    if (isRoot) await runCommand("chown", ["postgres:postgres", path]);
  }

  /** Superuser SQL over the socket in the data folder (in the `postgres` database unless told). */
  sql(statement: string, database = "postgres"): Promise<string> {
    return asPg(join(this.bin, "psql"), ["-h", this.data, "-p", String(this.port), "-U", "postgres", "-d", database, "-X", "-q", "-t", "-A", "-v", "ON_ERROR_STOP=1", "-c", statement]);
  }

  async start(): Promise<void> {
    await asPg(join(this.bin, "pg_ctl"), ["start", "-D", this.data, "-l", join(this.data, "server.log"), "-w", "-t", "60", "-s"]);
  }

  /** `immediate`: every backend is killed at once, no checkpoint; crash recovery runs at the next start. */
  async stop(mode: "fast" | "immediate" = "fast"): Promise<void> {
    await asPg(join(this.bin, "pg_ctl"), ["stop", "-D", this.data, "-m", mode, "-w", "-t", "60", "-s"]);
  }

  /** Synchronous immediate stop, for a process-exit hook (no event loop left there). */
  stopNow(): void {
    if (!existsSync(join(this.data, "postmaster.pid"))) return;
    const args = ["stop", "-D", this.data, "-m", "immediate", "-w", "-t", "20", "-s"];
    if (isRoot) spawnSync("runuser", ["-u", "postgres", "--", join(this.bin, "pg_ctl"), ...args], { cwd: "/" });
    else spawnSync(join(this.bin, "pg_ctl"), args, { cwd: "/" });
  }

  async isRunning(): Promise<boolean> {
    return asPg(join(this.bin, "pg_ctl"), ["status", "-D", this.data]).then(
      () => true,
      () => false,
    );
  }
}
