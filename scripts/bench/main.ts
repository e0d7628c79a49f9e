import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { benchBuildView, postViewBuilds } from "./build-view";
import { closeConnections, signIn } from "./http";
import { benchBareRoute, benchIngest } from "./ingest";
import { benchKernels } from "./kernels";
import { printReport, summariseTargets, type BenchReport } from "./report";
import { benchTrend } from "./trend";

// npm run bench (scripts/bench.sh starts the app and exports its environment).
// `--quick` shrinks every size for a smoke run of the harness itself.
// `--only trend,build` runs some sections (ingest, trend, build, kernels); a
// partial run writes bench-results/only-<sections>.json and leaves latest.json,
// the last full run, alone.

const SECTIONS = ["ingest", "trend", "build", "kernels"] as const;
type Section = (typeof SECTIONS)[number];

function readSections(argv: string[]): Section[] {
  const at = argv.findIndex((a) => a === "--only" || a.startsWith("--only="));
  if (at < 0) return [...SECTIONS];
  const list = argv[at].includes("=") ? argv[at].slice("--only=".length) : (argv[at + 1] ?? "");
  const names = list.split(",").map((s) => s.trim()).filter(Boolean);
  const unknown = names.filter((n) => !(SECTIONS as readonly string[]).includes(n));
  if (names.length === 0 || unknown.length > 0) {
    throw new Error(`--only takes a comma-separated list of ${SECTIONS.join(", ")}${unknown.length ? `; unknown: ${unknown.join(", ")}` : ""}`);
  }
  return SECTIONS.filter((s) => names.includes(s));
}

async function main() {
  const quick = process.argv.includes("--quick");
  const sections = readSections(process.argv.slice(2));
  const runs = (s: Section) => sections.includes(s);
  const started = Date.now();
  const step = (s: string) => console.log(`[bench] ${s} (${((Date.now() - started) / 1000).toFixed(0)} s)`);
  const largeRuns = quick ? 20 : 200;

  const report: BenchReport = {
    ranAt: new Date().toISOString(),
    quick,
    sections,
    machine: { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? "unknown", memoryGb: os.totalmem() / 2 ** 30, node: process.version, platform: `${os.type()} ${os.release()}` },
    targets: [],
    totalSeconds: 0,
  };

  if (runs("ingest")) {
    step("bare route");
    report.bareRoute = await benchBareRoute(20);
    step("ingest: small submission");
    const small = await benchIngest({ runs: 5, repeats: quick ? 7 : 21, label: "small" });
    step("ingest: large submission");
    const large = await benchIngest({ runs: largeRuns, repeats: quick ? 2 : 6, label: "large" });
    report.ingest = [small, large];
  }
  const cookie = runs("trend") || runs("build") ? await signIn("developer@fenwick-hydro.test") : "";
  if (runs("trend")) {
    step("trend");
    report.trend = await benchTrend({ sizes: quick ? [1000, 2000] : [1000, 10_000, 100_000], last: 200, repeats: quick ? 5 : 15, cookie });
  }
  if (runs("build")) {
    step("build view");
    // The ingest section's last builds when it ran; else builds posted for this section.
    const ids = report.ingest ? { buildId: report.ingest[1].lastBuildId, smallBuildId: report.ingest[0].lastBuildId } : await postViewBuilds(largeRuns);
    report.buildView = await benchBuildView({ ...ids, repeats: quick ? 3 : 20, cookie });
  }
  if (runs("kernels")) {
    step("kernels");
    report.kernels = await benchKernels(quick ? 3 : 7);
  }

  report.targets = summariseTargets(report);
  report.totalSeconds = (Date.now() - started) / 1000;
  printReport(report);
  const dir = path.resolve("bench-results");
  mkdirSync(dir, { recursive: true });
  const file = sections.length === SECTIONS.length ? "latest.json" : `only-${sections.join("-")}.json`;
  // Samples kept: the medians alone hide a bimodal run.
  writeFileSync(path.join(dir, file), `${JSON.stringify(report, null, 2)}\n`);
  console.log(`[bench] wrote ${path.join(dir, file)}`);
  closeConnections();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
