import { findReattachment, fitDecayExponent, fitLogLaw, residualDropOrders } from "@/lib/analysis";
import { mannKendall } from "@/lib/analysis/mann-kendall";
import { theilSen } from "@/lib/analysis/theil-sen";
import { createNoise } from "@/fixtures/generate/random";
import { bareLogLaw, bareDecayFit, bareMannKendallS, bareReattachment, bareResidualDrop, bareTheilSenSlope } from "./kernels-bare";
import { ratio, timeRepeated } from "./stats";

// Section 4: each lib/analysis fit against a bare Float64Array loop in the same
// process. The O(n^2) window statistics (Mann–Kendall, Theil–Sen) run on the
// largest n that fits the time box instead of 10^6.

export interface KernelResult {
  name: string;
  points: number;
  libraryMs: number;
  bareMs: number;
  kernelRatio: number;
  /** Relative difference of the main result between the two (checks they compute the same thing). */
  agreement: number;
  note?: string;
}

const N = 1_000_000;
const noise = createNoise("bench-kernels");

function series(n: number, fx: (i: number) => number, fy: (x: number, i: number) => number) {
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = fx(i);
    y[i] = fy(x[i], i);
  }
  return { x, y };
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-300);

async function compare(name: string, points: number, lib: () => number, bare: () => number, repeats: number, note?: string): Promise<KernelResult> {
  let a = 0;
  let b = 0;
  const l = await timeRepeated(() => { a = lib(); }, repeats, 1);
  const r = await timeRepeated(() => { b = bare(); }, repeats, 1);
  return { name, points, libraryMs: l.median, bareMs: r.median, kernelRatio: ratio(l.median, r.median), agreement: rel(a, b), note };
}

export async function benchKernels(repeats = 7): Promise<KernelResult[]> {
  const out: KernelResult[] = [];
  // Log law u+ = ln(y+)/0.41 + 5 over 30 <= y+ <= 3e4, with scatter (values recalled: common practice).
  const wall = series(N, (i) => 30 * Math.exp((i / (N - 1)) * Math.log(1000)), (y) => Math.log(y) / 0.41 + 5 + 1e-3 * noise.gaussian());
  out.push(await compare("fitLogLaw", N, () => fitLogLaw(wall.x, wall.y, { yPlusMin: 30, yPlusMax: 3e4 }).kappa, () => bareLogLaw(wall.x, wall.y, 30 * (1 - 1e-9), 3e4 * (1 + 1e-9)).kappa, repeats));

  const res = series(N, (i) => i + 1, (it) => Math.pow(10, -6 * (it / N)) * (1 + 0.01 * noise.gaussian()));
  out.push(await compare("residualDropOrders", N, () => residualDropOrders(res.x, res.y).tailDropOrders, () => bareResidualDrop(res.x, res.y).tailDropOrders, repeats));

  const cf = series(N, (i) => i / (N - 1) * 20, (x) => 3e-3 * Math.tanh(x - 6.3) + 1e-9);
  out.push(await compare("findReattachment", N, () => findReattachment(cf.x, cf.y).xr ?? Number.NaN, () => bareReattachment(cf.x, cf.y) ?? Number.NaN, repeats));

  // k ∝ (t − t0)^−n with n = 1.3, t0 = 0.2 (decay exponent in the usual range, from memory).
  const decay = series(N, (i) => 1 + (i / (N - 1)) * 99, (t) => Math.pow(t - 0.2, -1.3));
  out.push(await compare("fitDecayExponent", N, () => fitDecayExponent(decay.x, decay.y).n, () => bareDecayFit(decay.x, decay.y), Math.min(repeats, 3)));

  const mkN = 10_000;
  const mk = new Float64Array(mkN).map((_, i) => 1e-4 * i + noise.gaussian());
  out.push(await compare("mannKendall", mkN, () => mannKendall(mk).s, () => bareMannKendallS(mk), 3, "O(n^2): n = 10^4"));

  const tsN = 2_000;
  const ts = series(tsN, (i) => i, (x) => 0.5 * x + noise.gaussian());
  out.push(await compare("theilSen", tsN, () => theilSen(ts.x, ts.y).slope, () => bareTheilSenSlope(ts.x, ts.y), 3, "O(n^2) memory: n = 2,000 (2·10^6 slopes)"));
  return out;
}
