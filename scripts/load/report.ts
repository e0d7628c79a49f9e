import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { LoadSettings } from "./args";
import type { DatabaseCheck } from "./verify";
import type { KindSummary } from "./stats";

// The printed table and load-results/latest.json.

export interface GroupReport {
  group: string;
  connections: number;
  seconds: number;
  drainSeconds: number;
  total: KindSummary;
  kinds: KindSummary[];
  timeouts: number;
  connectionErrors: number;
  /** non-2xx + timeouts + connection errors + errors inside 2xx bodies. */
  errors: number;
}

export interface LoadReport {
  ranAt: string;
  url: string;
  settings: LoadSettings;
  machine: { cpus: number; cpuModel: string; memoryGb: number; node: string };
  payloadBytes: { min: number; max: number };
  groups: GroupReport[];
  errors: number;
  serverPeakRssMb: number | null;
  database: DatabaseCheck;
  passed: boolean;
}

const fmt = (v: number, digits = 0) => (Number.isFinite(v) ? v.toFixed(digits) : "-");

export function printReport(r: LoadReport): void {
  const s = r.settings;
  console.log(`\nload: ${s.ciClients} CI clients + ${s.readers} readers for ${s.durationSeconds} s against ${r.url}`);
  console.log(`      submissions of ${(r.payloadBytes.min / 1e3).toFixed(0)}-${(r.payloadBytes.max / 1e3).toFixed(0)} kB, a new commit each; ${r.machine.cpus} cores, Node ${r.machine.node}`);
  const header = ["group", "kind", "answers", "errors", "p50 ms", "p99 ms", "max ms", "req/s", "answer MB/s"];
  const rows: string[][] = [];
  for (const g of r.groups) {
    for (const k of g.kinds) rows.push([g.group, k.kind, ...cells(k, k.non2xx + k.bodyErrors)]);
    rows.push([g.group, "(all)", ...cells(g.total, g.errors)]);
  }
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
  const line = (row: string[]) => row.map((c, i) => (i < 2 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join("  ");
  console.log(line(header));
  console.log(widths.map((w) => "-".repeat(w)).join("  "));
  for (const row of rows) console.log(line(row));

  for (const g of r.groups) {
    console.log(`${g.group}: non-2xx ${g.total.non2xx}, timeouts ${g.timeouts}, connection errors ${g.connectionErrors}, errors inside 2xx bodies ${g.total.bodyErrors}; drain after the clock ${fmt(g.drainSeconds, 1)} s`);
    const messages = Object.entries(g.total.messages).sort((a, b) => b[1] - a[1]).slice(0, 8);
    for (const [m, n] of messages) console.log(`  ${String(n).padStart(6)} × ${m}`);
  }
  if (r.serverPeakRssMb !== null) console.log(`server peak RSS (next start and its children): ${r.serverPeakRssMb.toFixed(0)} MB`);
  const d = r.database;
  console.log(
    `database: acknowledged ${d.acknowledgedBuilds} builds / ${d.acknowledgedRuns} runs; stored under the load's branches ${d.storedBuilds} builds / ${d.storedRuns} runs; ` +
      `refused posts ${d.refusedPosts}, unanswered ${d.unansweredPosts}, built after the drain began (never sent) ${d.neverSentPosts} — ${d.ok ? "exactly the acknowledged runs" : "MISMATCH"}`,
  );
  for (const p of d.problems.slice(0, 20)) console.log(`  ${p}`);
  if (d.problems.length > 20) console.log(`  … and ${d.problems.length - 20} more`);
  console.log(r.passed ? "load: PASSED (0 errors, database holds exactly the acknowledged runs)" : `load: FAILED (${r.errors} errors${d.ok ? "" : ", database check failed"})`);
}

function cells(k: KindSummary, errors: number): string[] {
  return [String(k.answers), String(errors), fmt(k.latencyMs.p50), fmt(k.latencyMs.p99), fmt(k.latencyMs.max), fmt(k.perSecond, 1), fmt(k.mbPerSecond, 2)];
}

export function writeReport(r: LoadReport): string {
  const dir = path.resolve("load-results");
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, "latest.json");
  writeFileSync(file, `${JSON.stringify(r, null, 2)}\n`);
  return file;
}

export function describeMachine(): LoadReport["machine"] {
  return { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? "unknown", memoryGb: os.totalmem() / 2 ** 30, node: process.version };
}
