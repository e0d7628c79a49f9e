import { formatSig } from "@/lib/format/numbers";

// How a case's fit settings and a quantity's origin are written for a CFD engineer.

export interface SettingLine {
  label: string;
  value: string;
}

/** Fit settings (case parameters or a band's override) as labelled lines; unknown keys shown as they are. */
export function describeSettings(settings: Record<string, unknown>): SettingLine[] {
  const lines: SettingLine[] = [];
  for (const [key, raw] of Object.entries(settings)) {
    if (key === "cfStationLabel") continue; // written together with cfStation
    const line = describeSetting(key, raw, settings);
    if (line) lines.push(line);
  }
  return lines;
}

function describeSetting(key: string, raw: unknown, all: Record<string, unknown>): SettingLine | null {
  switch (key) {
    case "reTau":
      return { label: "Friction Reynolds number Re_τ", value: formatSig(Number(raw), 4) };
    case "logLawWindow": {
      const w = raw as { yPlusMin?: number; yPlusMax?: number };
      return { label: "Log-law fit window", value: `${formatSig(w.yPlusMin, 4)} ≤ y+ ≤ ${formatSig(w.yPlusMax, 4)}` };
    }
    case "cfStation": {
      // The seeded label already states the value with its meaning (e.g. "Re_x = 4.8504e6 (TMR x = 0.97008)").
      const label = typeof all.cfStationLabel === "string" ? all.cfStationLabel : `x = ${formatSig(Number(raw), 5)}`;
      return { label: "c_f read at the station", value: label };
    }
    case "stepHeight":
      return { label: "Step height H", value: `${formatSig(Number(raw), 4)} (the c_f abscissa ÷ H gives x/H)` };
    case "residualTargetOrders":
      return { label: "Residual drop expected", value: `≥ ${formatSig(Number(raw), 3)} orders of magnitude` };
    default:
      return { label: key, value: typeof raw === "number" ? formatSig(raw, 4) : JSON.stringify(raw) };
  }
}

const ORIGINS: Record<string, string> = {
  u_plus: "u_plus series (u+ against y+): least-squares log-law fit",
  k_decay: "k_decay series (k against t): power-law fit with a virtual origin",
  cf: "cf series (c_f against x)",
  residual: "residual series (residual against iteration)",
  stresses: "Reynolds-stress samples",
  gridStudy: "three-grid study (Celik et al. 2008 procedure)",
};

/** Where a quantity comes from: the series it is derived from, or reported by the run. */
export function describeOrigin(derivedFrom: string | null): string {
  return derivedFrom === null ? "reported by the run" : `derived from the ${ORIGINS[derivedFrom] ?? derivedFrom}`;
}

/** Acceptance limits relative to the reference, "−1.0 % / +1.0 %", or "" when that has no meaning. */
export function relativeLimits(reference: number | null, lower: number | null, upper: number | null): string {
  if (reference === null || reference === 0) return "";
  const pct = (v: number | null) => (v === null ? null : (100 * (v - reference)) / Math.abs(reference));
  const fmt = (p: number | null, open: string) => (p === null ? open : `${p < 0 ? "−" : "+"}${Math.abs(p).toFixed(Math.abs(p) < 10 ? 1 : 0)} %`);
  return `${fmt(pct(lower), "−∞")} / ${fmt(pct(upper), "+∞")} of the reference`;
}

export function formatLimit(v: number | null, side: "lower" | "upper"): string {
  return v === null ? (side === "lower" ? "−∞" : "+∞") : formatSig(v, 4);
}
