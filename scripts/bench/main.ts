import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { benchBuildView } from "./build-view";
import { signIn } from "./http";
import { benchBareRoute, benchIngest } from "./ingest";
import { benchKernels } from "./kernels";
import { printReport, summariseTargets, type BenchReport } from "./report";
import { benchTrend } from "./trend";

// npm run bench (scripts/bench.sh starts the app and exports its environment).
// `--quick` shrinks every size for a smoke run of the harness itself.

async function main() {
  const quick = process.argv.includes("--quick");
  const started = Date.now();
  const step = (s: string) => console.log(`[bench] ${s} (${((Date.now() - started) / 1000).toFixed(0)} s)`);

  step("bare route");
  const bareRoute = await benchBareRoute(20);
  step("ingest: small submission");
  const small = await benchIngest({ runs: 5, repeats: 7, label: "small" });
  step("ingest: large submission");
  const large = await benchIngest({ runs: quick ? 20 : 200, repeats: quick ? 2 : 6, label: "large" });

  const cookie = await signIn("developer@fenwick-hydro.test");
  step("trend");
  const trend = await benchTrend({ sizes: quick ? [1000, 2000] : [1000, 10_000, 100_000], last: 200, repeats: quick ? 5 : 15, cookie });
  step("build view");
  const buildView = await benchBuildView({ buildId: large.lastBuildId, smallBuildId: small.lastBuildId, repeats: quick ? 3 : 10, cookie });
  step("kernels");
  const kernels = await benchKernels(quick ? 3 : 7);

  const report: BenchReport = {
    ranAt: new Date().toISOString(),
    quick,
    machine: { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? "unknown", memoryGb: os.totalmem() / 2 ** 30, node: process.version, platform: `${os.type()} ${os.release()}` },
    bareRoute,
    ingest: [small, large],
    trend,
    buildView,
    kernels,
    targets: summariseTargets({ bareRoute, small, large, trend, buildView, kernels }),
    totalSeconds: (Date.now() - started) / 1000,
  };
  printReport(report);
  const dir = path.resolve("bench-results");
  mkdirSync(dir, { recursive: true });
  // Samples kept: the medians alone hide a bimodal run.
  writeFileSync(path.join(dir, "latest.json"), `${JSON.stringify(report, null, 2)}\n`);
  console.log(`[bench] wrote ${path.join(dir, "latest.json")}`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
