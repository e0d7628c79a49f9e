import type { BandDefinition } from "../types";
import { aroundReference, aroundReferenceAbsolute } from "./shape";

// Homogeneous shear (reference sheet §4). Per model: the closure's exact
// asymptotic state [derived in the sheet], ±1 %. For everyone else: the
// experimental/DNS ranges (Tavoularis & Corrsin 1981, Tavoularis & Karnik 1989,
// Rogers & Moin 1987), which the sheet gives only as ranges from memory.

const NOISE = { production_to_dissipation: 0.002, shear_parameter: 0.005, anisotropy: 0.0005 };

interface AsymptoticState {
  model: string;
  source: string;
  productionToDissipation: number;
  shearParameter: number;
  b12: number;
}

const MODEL_STATES: AsymptoticState[] = [
  {
    model: "k-epsilon",
    source: "Launder & Spalding 1974 constants: P/ε = (C_ε2−1)/(C_ε1−1), S k/ε = sqrt((P/ε)/C_μ), b12 = −(C_μ/2) S k/ε (reference sheet §4, derived)",
    productionToDissipation: 2.0909, shearParameter: 4.82, b12: -0.2169,
  },
  {
    model: "k-omega",
    source: "Wilcox 2006 with χ_ω = 0 and the C_lim stress limiter active: b12 = −sqrt(β*)/(2 C_lim) (reference sheet §4, derived)",
    productionToDissipation: 1.5128, shearParameter: 4.4124, b12: -0.17143,
  },
  {
    model: "sst",
    source: "Menter 1994 with F1 = 0 (free shear; a1 limiter inactive because F2 = 0) (reference sheet §4, derived)",
    productionToDissipation: 2.0892, shearParameter: 4.8181, b12: -0.21681,
  },
];

const STATE_REASON =
  "Verification: a linear eddy-viscosity model has an exact asymptotic state in homogeneous shear; " +
  "±1 % leaves room for a finite run time, not for a changed closure.";

function modelStateBands(s: AsymptoticState): BandDefinition[] {
  const common = { caseKey: "homogeneous-shear", model: s.model, kind: "verification" as const, source: s.source, reason: STATE_REASON };
  const zeroNormal = (quantityKey: string): BandDefinition => ({
    ...common, quantityKey, ...aroundReferenceAbsolute(0, 0.002), noiseFloor: NOISE.anisotropy,
    reason: "A linear eddy-viscosity model gives b_ii = 0 exactly in simple shear (S_ii = 0; reference sheet §4); ±0.002 absorbs round-off and post-processing only.",
  });
  return [
    { ...common, quantityKey: "production_to_dissipation", ...aroundReference(s.productionToDissipation, 0.01), noiseFloor: NOISE.production_to_dissipation },
    { ...common, quantityKey: "shear_parameter", ...aroundReference(s.shearParameter, 0.01), noiseFloor: NOISE.shear_parameter },
    { ...common, quantityKey: "b12", ...aroundReference(s.b12, 0.01), noiseFloor: NOISE.anisotropy },
    zeroNormal("b11"),
    zeroNormal("b22"),
    zeroNormal("b33"),
  ];
}

const EXPERIMENT_SOURCE =
  "Tavoularis & Corrsin 1981 (JFM 104:311), Tavoularis & Karnik 1989 (JFM 204:457), Rogers & Moin 1987 (JFM 176:33 DNS): " +
  "'Suggested band' column of reference sheet §4 (from memory; ranges only, so no single reference value)";
const EXPERIMENT_REASON =
  "Validation for the Reynolds-stress models, which have no closed-form state: the asymptotic anisotropy " +
  "and time-scale ratio must fall inside the spread of the experiments and DNS.";

const EXPERIMENT_RANGES: { quantityKey: string; lower: number; upper: number; noiseFloor: number }[] = [
  { quantityKey: "b11", lower: 0.19, upper: 0.22, noiseFloor: NOISE.anisotropy },
  { quantityKey: "b22", lower: -0.16, upper: -0.13, noiseFloor: NOISE.anisotropy },
  { quantityKey: "b33", lower: -0.08, upper: -0.05, noiseFloor: NOISE.anisotropy },
  { quantityKey: "b12", lower: -0.17, upper: -0.14, noiseFloor: NOISE.anisotropy },
  { quantityKey: "shear_parameter", lower: 4.5, upper: 6.5, noiseFloor: NOISE.shear_parameter },
  { quantityKey: "production_to_dissipation", lower: 1.4, upper: 1.9, noiseFloor: NOISE.production_to_dissipation },
];

export const HOMOGENEOUS_SHEAR_BANDS: BandDefinition[] = [
  ...MODEL_STATES.flatMap(modelStateBands),
  ...EXPERIMENT_RANGES.map((r): BandDefinition => ({
    caseKey: "homogeneous-shear", quantityKey: r.quantityKey, model: null, kind: "validation",
    reference: null, lower: r.lower, upper: r.upper,
    // The outer tenth of the range counts as marginal.
    marginalMargin: 0.1 * (r.upper - r.lower), noiseFloor: r.noiseFloor,
    source: EXPERIMENT_SOURCE, reason: EXPERIMENT_REASON,
  })),
  {
    caseKey: "homogeneous-shear", quantityKey: "realizability_violations", model: null, kind: "verification",
    reference: 0, lower: null, upper: 0, marginalMargin: 0, noiseFloor: 0.5,
    source: "Schumann 1977 (Phys. Fluids 20:721, from memory); Lumley 1978 (Adv. Appl. Mech. 18:123): R_ij must be positive semi-definite (reference sheet §9.1)",
    reason: "Any non-realizable Reynolds-stress sample is a defect of the closure or its implementation; no tolerance.",
  },
];
