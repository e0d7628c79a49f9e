import { spawn } from "node:child_process";
import { openSync, readFileSync, writeFileSync } from "node:fs";
import { connect } from "node:net";
import { requireEnv } from "./env";

// Stops and restarts the SMTP fake that `npm test` started, to test delivery
// while mail is down. The restarted fake's pid goes back into the same pid
// file, so the clean-up of scripts/test.sh stops it as before.

function portOpen(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect({ host: "127.0.0.1", port });
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}

async function waitForPort(port: number, open: boolean, timeoutMs = 15_000) {
  const deadline = Date.now() + timeoutMs;
  while ((await portOpen(port)) !== open) {
    if (Date.now() > deadline) throw new Error(`SMTP port ${port} did not ${open ? "open" : "close"} in ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

export async function stopSmtpFake(): Promise<void> {
  const pid = Number(readFileSync(requireEnv("TAULINE_SMTP_PID_FILE"), "utf8").trim());
  try {
    process.kill(-pid, "SIGTERM"); // its own process group (started with setsid)
  } catch {
    process.kill(pid, "SIGTERM");
  }
  await waitForPort(Number(requireEnv("SMTP_PORT")), false);
}

export async function startSmtpFake(): Promise<void> {
  const pidFile = requireEnv("TAULINE_SMTP_PID_FILE");
  const log = openSync(`${pidFile}.log`, "a");
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/smtp-fake.ts"], {
    cwd: process.cwd(),
    detached: true,
    stdio: ["ignore", log, log],
    env: { ...process.env, SMTP_PORT: requireEnv("SMTP_PORT"), MAIL_DIR: requireEnv("MAIL_DIR") },
  });
  child.unref();
  writeFileSync(pidFile, String(child.pid));
  await waitForPort(Number(requireEnv("SMTP_PORT")), true);
}
