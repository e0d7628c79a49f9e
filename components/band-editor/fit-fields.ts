import type { FitKey } from "./band-draft";

// Which fit settings a band of a quantity can override, as the derivations read
// them (lib/evaluation/derive.ts): one log-law fit gives κ, B and R² and reads its
// window from the κ band; c_f at the station, the reattachment length and the
// residual drop each read their own band's setting.

export const FIT_FIELDS_BY_QUANTITY: Record<string, FitKey[]> = {
  kappa: ["yPlusMin", "yPlusMax", "reTau"],
  cf_at_x: ["cfStation", "cfStationLabel"],
  reattachment_xr_h: ["stepHeight"],
  residual_drop_orders: ["residualTargetOrders"],
};

/** Where a quantity's fit settings live when its own band cannot hold them. */
export const FIT_SETTINGS_ELSEWHERE: Record<string, string> = {
  log_b: "The log-law fit window is set on the κ (kappa) band: one fit gives κ, B and R² together.",
  log_fit_r2: "The log-law fit window is set on the κ (kappa) band: one fit gives κ, B and R² together.",
};

export const FIT_LABELS: Record<FitKey, { label: string; unit?: string; hint: string }> = {
  yPlusMin: { label: "Log-law window, lower y+", hint: "Inner end of the least-squares fit of u+ on ln y+." },
  yPlusMax: { label: "Log-law window, upper y+", hint: "Outer end; keep it below about 0.15–0.2 δ+ (reference sheet §1.1)." },
  reTau: { label: "Re_τ", hint: "Only used for the default window when no window is given." },
  cfStation: { label: "c_f station", hint: "Abscissa of the cf series where c_f is read (Re_x for the flat plate)." },
  cfStationLabel: { label: "Station label", hint: "How the station is written on plots, e.g. Re_x = 4.8504e6 (TMR x = 0.97008)." },
  stepHeight: { label: "Step height H", hint: "x_r/H divides the reattachment abscissa by this (same length unit as the cf series)." },
  residualTargetOrders: { label: "Residual drop expected", unit: "orders of magnitude", hint: "Drop the steady solve must reach before it counts as stalled." },
};

/** The fit fields to show: the ones the quantity's derivation reads, plus any the current version already sets. */
export function fitFieldsFor(quantityKey: string, present: Record<FitKey, string>): FitKey[] {
  const own = FIT_FIELDS_BY_QUANTITY[quantityKey] ?? [];
  const extra = (Object.keys(present) as FitKey[]).filter((k) => present[k].trim() !== "" && !own.includes(k));
  return [...own, ...extra];
}
