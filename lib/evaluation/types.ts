// Shapes shared by the pure evaluation steps (derive → judge) and the services around them.
import type { Verdict } from "@/lib/analysis";

export interface FitSettings {
  reTau?: number;
  logLawWindow?: { yPlusMin: number; yPlusMax: number };
  cfStation?: number;
  cfStationLabel?: string;
  stepHeight?: number;
  residualTargetOrders?: number;
}

export interface DerivedQuantity {
  key: string;
  value: number | null;
  origin: "reported" | "derived";
  /** What the derivation used and found (window, fit r², virtual origin, …) or why it failed. */
  details: Record<string, unknown>;
}

export interface BandInForce {
  id: number;
  caseKey: string;
  quantityKey: string;
  modelKey: string | null;
  version: number;
  kind: "verification" | "validation";
  reference: number | null;
  source: string;
  lower: number | null;
  upper: number | null;
  marginalMargin: number;
  noiseFloor: number;
  fitSettings: FitSettings;
}

export interface JudgedQuantity {
  key: string;
  value: number | null;
  origin: "reported" | "derived" | "expected";
  band: BandInForce | null;
  verdict: Verdict;
  baselineBuildId: number | null;
  baselineValue: number | null;
  baselineDelta: number | null;
  drift: boolean;
  driftReason: "baseline" | "trend" | null;
  driftPValue: number | null;
  driftSlope: number | null;
  details: Record<string, unknown>;
}
