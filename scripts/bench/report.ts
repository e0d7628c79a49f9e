import type { BuildViewResult } from "./build-view";
import type { IngestSize } from "./ingest";
import type { KernelResult } from "./kernels";
import type { Timing } from "./stats";
import type { TrendSize } from "./trend";

// The printed table and the target check of issue 5 (read by people, never asserted).

export interface TargetCheck {
  name: string;
  value: number;
  target: string;
  met: boolean;
}

/** A section left out by `--only` is absent. */
export interface BenchReport {
  ranAt: string;
  quick: boolean;
  sections: string[];
  machine: { cpus: number; cpuModel: string; memoryGb: number; node: string; platform: string };
  bareRoute?: Timing;
  ingest?: IngestSize[];
  trend?: TrendSize[];
  buildView?: BuildViewResult;
  kernels?: KernelResult[];
  targets: TargetCheck[];
  totalSeconds: number;
}

export function summariseTargets(r: Pick<BenchReport, "bareRoute" | "ingest" | "trend" | "buildView" | "kernels">): TargetCheck[] {
  const out: TargetCheck[] = [];
  if (r.ingest && r.bareRoute) {
    const [small, large] = r.ingest;
    // The bare route timed interleaved with the small posts (same CPU conditions) when the ingest section has it.
    const smallVsBare = small.smallVsBare ?? small.endpoint.median / r.bareRoute.median;
    out.push(
      { name: "ingest_ratio (large)", value: large.ingestRatio, target: "<= 1.5", met: large.ingestRatio <= 1.5 },
      { name: "server peak RSS MB", value: large.serverPeakRssMb, target: "< 600", met: large.serverPeakRssMb < 600 },
      { name: "small ingest / bare route", value: smallVsBare, target: "< 3", met: smallVsBare < 3 },
    );
  }
  if (r.trend?.length) {
    const first = r.trend[0];
    const lastSize = r.trend[r.trend.length - 1];
    const worstTrend = Math.max(...r.trend.map((t) => t.trendRatio));
    const growth = lastSize.httpPerPointMs / first.httpPerPointMs;
    out.push(
      { name: "trend_ratio (worst size)", value: worstTrend, target: "<= 2", met: worstTrend <= 2 },
      { name: `trend_growth (${lastSize.history}/${first.history})`, value: growth, target: "<= 1.5", met: growth <= 1.5 },
    );
  }
  if (r.buildView) {
    const counts = r.buildView.statements.map((s) => s.count);
    out.push(
      { name: "build_ratio", value: r.buildView.buildRatio, target: "<= 2", met: r.buildView.buildRatio <= 2 },
      { name: `statements per build(id) (${r.buildView.statements.map((s) => `${s.runs} runs: ${s.count}`).join(", ")})`, value: Math.max(...counts), target: "constant", met: counts.every((c) => c === counts[0]) },
    );
  }
  if (r.kernels) {
    const worstKernel = Math.max(...r.kernels.map((k) => k.kernelRatio));
    out.push({ name: "kernel_ratio (worst)", value: worstKernel, target: "<= 2", met: worstKernel <= 2 });
  }
  return out;
}

const ms = (v: number) => (v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toFixed(2));
const pad = (s: string, n: number) => s.padEnd(n);

export function printReport(r: BenchReport): void {
  const m = r.machine;
  console.log(`\nTauline bench ${r.ranAt}${r.quick ? " (QUICK: reduced sizes)" : ""} — ${m.cpus} × ${m.cpuModel}, ${m.memoryGb.toFixed(1)} GB, Node ${m.node}`);
  if (r.bareRoute) console.log(`\nbare route (the small submission's body posted asking only { _version }): median ${ms(r.bareRoute.median)} ms`);
  if (r.ingest) printIngest(r.ingest);
  if (r.trend) printTrend(r.trend);
  if (r.buildView) printBuildView(r.buildView);
  if (r.kernels) printKernels(r.kernels);
  console.log("\nTargets (issue 5)");
  for (const t of r.targets) console.log(`  ${t.met ? "met   " : "MISSED"} ${pad(t.name, 60)} ${t.value.toFixed(2)} (${t.target})`);
  console.log(`\ntotal ${r.totalSeconds.toFixed(0)} s`);
}

function printIngest(ingest: IngestSize[]): void {
  console.log("\nIngest              runs  MB      endpoint med/p95 ms   floor med/p95 ms   ratio  peak RSS MB");
  for (const i of ingest) {
    console.log(`  ${pad(i.label, 16)} ${pad(String(i.runs), 5)} ${pad(i.payloadMb.toFixed(1), 7)} ${pad(`${ms(i.endpoint.median)} / ${ms(i.endpoint.p95)}`, 21)} ${pad(`${ms(i.floor.median)} / ${ms(i.floor.p95)}`, 18)} ${pad(i.ingestRatio.toFixed(2), 6)} ${i.serverPeakRssMb.toFixed(0)}`);
  }
}

function printTrend(trend: TrendSize[]): void {
  console.log("\nTrend  history  points  http med ms  bare med ms  ratio  http ms/point  seed s  statements  empty query ms");
  for (const t of trend) {
    console.log(`       ${pad(String(t.history), 8)} ${pad(String(t.last), 7)} ${pad(ms(t.http.median), 12)} ${pad(ms(t.bare.median), 12)} ${pad(t.trendRatio.toFixed(2), 6)} ${pad(t.httpPerPointMs.toFixed(4), 14)} ${pad(t.seedSeconds.toFixed(1), 7)} ${pad(String(t.statements), 11)} ${ms(t.emptyQuery.median)}`);
  }
  console.log("       (http: request's first byte to the answer's last byte; empty query: the same signed-in POST asking { _version }, no data: the round trip's fixed part)");
  for (const t of trend) console.log(`       plan at ${t.history}: ${t.plan.join(" > ")}`);
}

function printBuildView(b: BuildViewResult): void {
  console.log(`\nBuild view: ${b.runs} runs, ${b.quantityValues} values; http ${ms(b.http.median)} ms, bare SQL ${ms(b.bare.median)} ms, ratio ${b.buildRatio.toFixed(2)}`);
  console.log(`  answer ${(b.answerBytes / 1e6).toFixed(2)} MB of JSON, ${(b.wireBytes / 1e3).toFixed(0)} kB on the wire (${b.encoding}); the client's decoding and JSON.parse after the last byte: ${ms(b.clientDecode.median)} ms (not in http)`);
  console.log(`  SQL statements per request: ${b.statements.map((s) => `${s.count} (${s.runs} runs)`).join(", ")}`);
}

function printKernels(kernels: KernelResult[]): void {
  console.log("\nKernel              points     library ms  bare ms   ratio  agreement");
  for (const k of kernels) {
    console.log(`  ${pad(k.name, 18)} ${pad(String(k.points), 10)} ${pad(ms(k.libraryMs), 11)} ${pad(ms(k.bareMs), 9)} ${pad(k.kernelRatio.toFixed(2), 6)} ${k.agreement.toExponential(1)}${k.note ? `  (${k.note})` : ""}`);
  }
}
