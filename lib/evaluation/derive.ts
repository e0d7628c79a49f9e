import {
  AnalysisError,
  analyseGridStudy,
  analyseStressSample,
  cfAtX,
  defaultLogLawWindow,
  findReattachment,
  fitDecayExponent,
  fitLogLaw,
  residualDropOrders,
} from "@/lib/analysis";
import type { RunSubmission } from "@/lib/validation/submission";
import type { DerivedQuantity, FitSettings } from "./types";

/** What is stored per stress sample; invariants are null when k <= 0 leaves b undefined. */
export interface StressAnalysis {
  k: number;
  ii: number | null;
  iii: number | null;
  eta: number | null;
  xi: number | null;
  f: number | null;
  barycentric: { x: number; y: number } | null;
  realizable: boolean;
  violations: string[];
}
export type GridStudyAnalysis = ReturnType<typeof analyseGridStudy>;

export interface RunDerivation {
  quantities: DerivedQuantity[];
  stresses: StressAnalysis[];
  gridStudy: GridStudyAnalysis | null;
}

/**
 * Derives the physical quantities of one run from the series it reported (pure).
 * `settingsFor(key)` gives the fit settings in force for that quantity: the case
 * defaults overlaid with the band's own (e.g. a case-specific log-law window).
 * A derivation that cannot run on the data (too few points in the window, no
 * sign change, …) yields the quantity with value null and the reason in details,
 * so the verdict says `missing` instead of the submission being refused.
 */
export function deriveRunQuantities(run: RunSubmission, settingsFor: (key: string) => FitSettings): RunDerivation {
  const out: DerivedQuantity[] = [];
  const series = new Map((run.series ?? []).map((s) => [s.key, s]));

  const uPlus = series.get("u_plus");
  if (uPlus) {
    const s = settingsFor("kappa");
    const window = s.logLawWindow ?? defaultLogLawWindow(s.reTau ?? null);
    attempt(out, ["kappa", "log_b", "log_fit_r2"], () => {
      const fit = fitLogLaw(uPlus.x, uPlus.y, window);
      const details = { window: { yPlusMin: fit.yPlusMin, yPlusMax: fit.yPlusMax }, points: fit.points, r2: fit.r2 };
      return [fit.kappa, fit.b, fit.r2].map((value) => ({ value, details }));
    });
  }

  const decay = series.get("k_decay");
  if (decay) {
    attempt(out, ["decay_exponent"], () => {
      const fit = fitDecayExponent(decay.x, decay.y);
      return [{ value: fit.n, details: { t0: fit.t0, a: fit.a, r2: fit.r2, points: fit.points } }];
    });
  }

  const cf = series.get("cf");
  if (cf) {
    const station = settingsFor("cf_at_x").cfStation;
    if (station !== undefined) {
      attempt(out, ["cf_at_x"], () => [
        { value: cfAtX(cf.x, cf.y, station), details: { station, stationLabel: settingsFor("cf_at_x").cfStationLabel ?? null } },
      ]);
    }
    const stepHeight = settingsFor("reattachment_xr_h").stepHeight;
    if (stepHeight !== undefined) {
      attempt(out, ["reattachment_xr_h"], () => {
        const found = findReattachment(cf.x, cf.y);
        if (found.xr === null) throw new AnalysisError("cf", "c_f never changes sign from negative to positive: no reattachment");
        return [{ value: found.xr / stepHeight, details: { xr: found.xr, stepHeight, crossings: found.crossings } }];
      });
    }
  }

  const residual = series.get("residual");
  if (residual) {
    const target = settingsFor("residual_drop_orders").residualTargetOrders;
    attempt(out, ["residual_drop_orders"], () => {
      const r = residualDropOrders(residual.x, residual.y, target === undefined ? undefined : { targetOrders: target });
      return [{ value: r.dropOrders, details: { stalled: r.stalled, tailDropOrders: r.tailDropOrders } }];
    });
  }

  const stresses = (run.stresses ?? []).map(analyseStress);
  if (run.stresses && run.stresses.length > 0) {
    const bad = stresses.filter((s) => !s.realizable).length;
    out.push({
      key: "realizability_violations",
      value: bad,
      origin: "derived",
      details: { samples: stresses.length, violations: summariseViolations(stresses) },
    });
  }

  let gridStudy: GridStudyAnalysis | null = null;
  if (run.gridStudy) {
    const g = run.gridStudy;
    gridStudy = analyseGridStudy({ cells: [g.cells[0], g.cells[1], g.cells[2]], values: [g.values[0], g.values[1], g.values[2]], dimension: g.dimension as 1 | 2 | 3 });
    const details = {
      studied: g.quantity,
      convergence: gridStudy.convergence,
      r21: gridStudy.r21,
      r32: gridStudy.r32,
      eaPct: gridStudy.eaPct,
      eextPct: gridStudy.eextPct,
      asymptoticRatio: gridStudy.asymptoticRatio,
    };
    out.push({ key: "observed_order", value: finiteOrNull(gridStudy.p), origin: "derived", details });
    out.push({ key: "extrapolated_value", value: finiteOrNull(gridStudy.extrapolated), origin: "derived", details });
    out.push({ key: "gci_fine_pct", value: finiteOrNull(gridStudy.gciFinePct), origin: "derived", details });
  }

  return { quantities: mergeReported(run, out), stresses, gridStudy };
}

// A sample whose trace is not positive cannot be normalised into b_ij. The zero
// tensor is positive semi-definite (no turbulence: realizable, no invariants);
// any other tensor with tr R <= 0 has a negative eigenvalue and is not realizable.
function analyseStress(sample: { uu: number; vv: number; ww: number; uv: number; uw: number; vw: number }): StressAnalysis {
  const trace = sample.uu + sample.vv + sample.ww;
  if (!(trace > 0)) {
    const zero = [sample.uu, sample.vv, sample.ww, sample.uv, sample.uw, sample.vw].every((v) => v === 0);
    const violations = zero ? [] : ["non-positive trace: tr R <= 0 with a non-zero tensor"];
    return { k: trace / 2, ii: null, iii: null, eta: null, xi: null, f: null, barycentric: null, realizable: zero, violations };
  }
  return analyseStressSample(sample);
}

function attempt(out: DerivedQuantity[], keys: string[], compute: () => { value: number; details: Record<string, unknown> }[]) {
  try {
    const results = compute();
    keys.forEach((key, i) => out.push({ key, value: finiteOrNull(results[i].value), origin: "derived", details: results[i].details }));
  } catch (error) {
    if (!(error instanceof AnalysisError)) throw error;
    for (const key of keys) out.push({ key, value: null, origin: "derived", details: { error: error.message } });
  }
}

// A solver may also report a quantity the server derives; the derived value wins
// (it is computed the same way for every build) and the reported one is kept beside it.
function mergeReported(run: RunSubmission, derived: DerivedQuantity[]): DerivedQuantity[] {
  const byKey = new Map(derived.map((d) => [d.key, d]));
  for (const q of run.quantities ?? []) {
    const d = byKey.get(q.key);
    if (d) d.details = { ...d.details, reportedValue: q.value };
    else byKey.set(q.key, { key: q.key, value: q.value, origin: "reported", details: {} });
  }
  return [...byKey.values()];
}

function summariseViolations(samples: StressAnalysis[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const s of samples) for (const v of s.violations) counts[v] = (counts[v] ?? 0) + 1;
  return counts;
}

function finiteOrNull(v: number | null | undefined): number | null {
  return typeof v === "number" && Number.isFinite(v) ? v : null;
}
