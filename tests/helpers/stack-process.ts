import { spawn, type ChildProcess } from "node:child_process";
import { closeSync, openSync } from "node:fs";
import { createServer } from "node:net";

// Child processes of a private test stack: each in a process group of its own
// (detached), so a kill reaches the process and everything it started, and
// nothing of the shared suite.

export interface Service {
  name: string;
  child: ChildProcess;
  exited: Promise<number | null>;
}

/** A TCP port on 127.0.0.1 that was free a moment ago (the kernel picks it). */
export function findFreePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** Starts `command` detached with stdout and stderr appended to `logFile`. */
export function startService({ name, command, args, env, logFile }: { name: string; command: string; args: string[]; env: NodeJS.ProcessEnv; logFile: string }): Service {
  const log = openSync(logFile, "a");
  const child = spawn(command, args, { cwd: process.cwd(), detached: true, stdio: ["ignore", log, log], env });
  closeSync(log);
  const exited = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
  child.once("error", () => undefined); // surfaced by the health wait instead
  return { name, child, exited };
}

/** Signals the service's whole process group and waits (up to `timeoutMs`) for it to exit. */
export async function signalService(service: Service, signal: NodeJS.Signals, timeoutMs = 15_000): Promise<void> {
  if (service.child.exitCode !== null || service.child.signalCode !== null) return;
  const pid = service.child.pid;
  if (pid === undefined) return;
  try {
    process.kill(-pid, signal);
  } catch {
    return; // already gone
  }
  const timer = new Promise<"late">((resolve) => setTimeout(() => resolve("late"), timeoutMs).unref());
  if ((await Promise.race([service.exited, timer])) === "late") {
    try {
      process.kill(-pid, "SIGKILL");
    } catch {
      /* gone meanwhile */
    }
    await service.exited;
  }
}

/** Runs a command to completion; rejects with its output when it fails. */
export function runCommand(command: string, args: string[], env: NodeJS.ProcessEnv = process.env, cwd = process.cwd()): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd, env, stdio: ["ignore", "pipe", "pipe"] });
    let out = "";
    child.stdout.on("data", (d: Buffer) => (out += d.toString()));
    child.stderr.on("data", (d: Buffer) => (out += d.toString()));
    child.once("error", reject);
    child.once("exit", (code) => (code === 0 ? resolve(out) : reject(new Error(`${command} ${args.join(" ")} exited ${code}:\n${out.slice(-2000)}`))));
  });
}

/** Polls `check` every `everyMs` until it returns true; throws `what` after `timeoutMs`. */
export async function waitUntil(what: string, check: () => Promise<boolean>, { timeoutMs = 30_000, everyMs = 200 } = {}): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (await check().catch(() => false)) return;
    if (Date.now() > deadline) throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}`);
    await new Promise((r) => setTimeout(r, everyMs));
  }
}
