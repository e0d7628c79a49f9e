import type { CaseDefinition } from "./types";

// The canonical cases every Cormorant build must keep reproducing. Parameters
// are the fit settings the derivations use unless a band overrides them.

/** TMR 2DZP monitoring station x = 0.970084071 at Re = 5e6 per unit length (reference sheet §7.2). */
export const FLAT_PLATE_STATION_RE_X = 4.8504e6;

/**
 * Boundary-layer thickness in wall units at that station: the 1/7-law
 * δ99/x = 0.37 Re_x^-1/5 with c_f ≈ 0.0027 gives Re_δ ≈ 8.26e4 and
 * δ+ = Re_δ sqrt(c_f/2) ≈ 3.0e3 (reference sheet §6). The log-law window ends
 * at 0.15 δ+ (Marusic et al. 2013 outer limit, sheet §1.1, from memory).
 */
export const FLAT_PLATE_DELTA_PLUS = 3000;

export const CASES: CaseDefinition[] = [
  {
    key: "channel-re180",
    title: "Turbulent channel flow, Re_τ = 180",
    description:
      "Fully developed plane channel at the Reynolds number of the Kim, Moin & Moser (1987) DNS " +
      "(Re_τ ≈ 180). The u_plus profile runs from the wall to the centreline (y+ = Re_τ). " +
      "Checks the law of the wall at low Reynolds number.",
    models: ["sa", "k-epsilon", "k-omega", "sst", "ssg"],
    parameters: { reTau: 180, logLawWindow: { yPlusMin: 30, yPlusMax: 100 }, residualTargetOrders: 3 },
  },
  {
    key: "flat-plate-zpg",
    title: "Zero-pressure-gradient flat plate (TMR 2DZP)",
    description:
      "NASA TMR verification case 2DZP: Re = 5e6 per unit length, plate 0 ≤ x ≤ 2, default grid " +
      "137x97 (13056 cells). The cf series has x = Re_x; the u_plus profile is taken at the " +
      "monitoring station Re_x = 4.8504e6 (x = 0.97008), where δ+ ≈ 3000. TMR runs it at M = 0.2 " +
      "(compressible); an incompressible solver may differ slightly.",
    models: ["sa", "k-omega", "sst"],
    parameters: {
      logLawWindow: { yPlusMin: 30, yPlusMax: 0.15 * FLAT_PLATE_DELTA_PLUS },
      cfStation: FLAT_PLATE_STATION_RE_X,
      cfStationLabel: "Re_x = 4.8504e6 (TMR x = 0.97008)",
      residualTargetOrders: 5,
    },
  },
  {
    key: "decaying-hit",
    title: "Decaying homogeneous isotropic turbulence",
    description:
      "Free decay of homogeneous isotropic turbulence with no mean strain, the model counterpart " +
      "of grid turbulence. Each closure has an analytic solution k ∝ (t − t0)^−n (reference sheet " +
      "§2.2–2.3); k_decay is k against t from t = 0. Time-accurate, so no residual history.",
    models: ["k-epsilon", "k-omega", "sst", "lrr", "ssg"],
    parameters: {},
  },
  {
    key: "homogeneous-shear",
    title: "Homogeneous shear flow, U = S y",
    description:
      "Uniformly sheared homogeneous turbulence run to its asymptotic state (constant S k/ε, k and ε " +
      "growing exponentially). The run reports P/ε, S k/ε and the anisotropies b_ij of that state and " +
      "a few Reynolds-stress samples on the way (at = S t).",
    models: ["k-epsilon", "k-omega", "sst", "lrr", "ssg"],
    parameters: {},
  },
  {
    key: "backstep",
    title: "Backward-facing step (Driver & Seegmiller 1985)",
    description:
      "2-D backward-facing step, Re_H ≈ 36 000, expansion ratio 1.125, straight top wall (TMR 2DBFS, " +
      "ERCOFTAC C.30). The cf series is the lower wall behind the step with x already in step " +
      "heights; a small corner eddy makes c_f positive just behind the step, so the primary " +
      "reattachment is the last change from negative to positive.",
    models: ["sa", "k-epsilon", "k-omega", "sst"],
    parameters: { stepHeight: 1, residualTargetOrders: 3 },
  },
  {
    key: "grid-study",
    title: "Grid-convergence study: flat-plate c_f at the TMR station",
    description:
      "The flat-plate c_f at Re_x = 4.8504e6 on the three finest TMR 2DZP grids (545x385, 273x193, " +
      "137x97: 208896, 52224, 13056 cells; 2-D, refinement ratio r = 2). The run posts the triple " +
      "as gridStudy; the server applies the Celik et al. (2008) procedure.",
    models: ["sa", "sst"],
    parameters: { cfStation: FLAT_PLATE_STATION_RE_X, cfStationLabel: "Re_x = 4.8504e6", residualTargetOrders: 5 },
  },
];
