import { AnalysisError } from "./errors";
import { assertPositiveNumber } from "./validate";

// Local skin-friction correlations for the zero-pressure-gradient turbulent flat
// plate, c_f = tau_w/(0.5 rho U^2) against Re_x = U x/nu with the flow turbulent
// from the leading edge (reference sheet §6). They are used as references, so a
// Re_x where a formula is singular or meaningless is an error, not a number.

/** 1/7 power law with Blasius friction: c_f = 0.0576 Re_x^-0.2. */
export function cfPowerLawSeventh(reX: number): number {
  assertPositiveNumber(reX, "reX");
  return 0.0576 * Math.pow(reX, -0.2);
}

/** Experimentally calibrated 1/7 power law (Schlichting Eq. 21.12): 0.0592 Re_x^-0.2. */
export function cfPowerLawSeventhCalibrated(reX: number): number {
  assertPositiveNumber(reX, "reX");
  return 0.0592 * Math.pow(reX, -0.2);
}

/** Schlichting: c_f = (2 log10 Re_x - 0.65)^-2.3, stated for Re_x < 10^9. */
export function cfSchlichting(reX: number): number {
  assertPositiveNumber(reX, "reX");
  const base = 2 * Math.log10(reX) - 0.65;
  if (base <= 0) throw new AnalysisError("reX", `too small for Schlichting's formula: ${reX}`);
  return Math.pow(base, -2.3);
}

/** White (Viscous Fluid Flow): c_f = 0.455/ln^2(0.06 Re_x) — the sheet marks it "from memory". */
export function cfWhite(reX: number): number {
  assertPositiveNumber(reX, "reX");
  const l = Math.log(0.06 * reX);
  if (l <= 0) throw new AnalysisError("reX", `too small for White's formula: ${reX}`);
  return 0.455 / (l * l);
}

/** Schultz-Grunow (Schlichting Eq. 21.19a): c_f = 0.370 (log10 Re_x)^-2.584. */
export function cfSchultzGrunow(reX: number): number {
  assertPositiveNumber(reX, "reX");
  const l = Math.log10(reX);
  if (l <= 0) throw new AnalysisError("reX", `too small for Schultz-Grunow's formula: ${reX}`);
  return 0.37 * Math.pow(l, -2.584);
}

/**
 * von Kármán (1934) local form 1/sqrt(c_f) = 4.15 log10(Re_x c_f) + 1.7, solved for
 * g = 1/sqrt(c_f): h(g) = g + 8.3 log10 g - 4.15 log10 Re_x - 1.7 = 0 is strictly
 * increasing in g > 0, so Newton from a power-law guess converges to the unique root.
 */
export function cfVonKarman(reX: number): number {
  assertPositiveNumber(reX, "reX");
  const rhs = 4.15 * Math.log10(reX) + 1.7;
  const slope = 8.3 / Math.LN10;
  let g = Math.max(1, 1 / Math.sqrt(cfPowerLawSeventh(reX)));
  for (let iter = 0; iter < 100; iter++) {
    const h = g + slope * Math.log(g) - rhs;
    let next = g - h / (1 + slope / g);
    if (next <= 0) next = g / 2; // stay in the domain of the logarithm
    if (Math.abs(next - g) <= 1e-15 * g) {
      g = next;
      break;
    }
    g = next;
  }
  if (!(g > 1)) throw new AnalysisError("reX", `too small for von Kármán's formula: ${reX}`);
  return 1 / (g * g);
}
