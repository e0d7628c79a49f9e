// Shapes of the canonical case library. The seed code inserts these records;
// keeping them as plain data (no I/O) lets tests read the same bands the
// server judges with.

export type ModelFamily = "one-equation" | "two-equation" | "reynolds-stress";

export interface ModelDefinition {
  key: string;
  name: string;
  family: ModelFamily;
  /** Where the closure and its standard coefficients are published. */
  reference: string;
}

export type QuantitySource = "u_plus" | "k_decay" | "cf" | "residual" | "stresses" | "gridStudy";

export interface QuantityDefinition {
  key: string;
  label: string;
  /** '1' when dimensionless. */
  unit: string;
  meaning: string;
  /** The raw data the server derives it from; null = reported by the solver. */
  derivedFrom: QuantitySource | null;
  /** Set only for one-sided quantities (more residual drop is better, fewer violations are). */
  higherIsBetter?: boolean;
}

export interface LogLawWindowSetting {
  yPlusMin: number;
  yPlusMax: number;
}

/** Fit settings used by the derivations; a band may override them. */
export interface CaseParameters {
  reTau?: number;
  logLawWindow?: LogLawWindowSetting;
  /** Abscissa of the cf series (same unit as its x) where cf_at_x is read. */
  cfStation?: number;
  cfStationLabel?: string;
  /** Divides the cf series' x to give x/H; 1 when the series is already in x/H. */
  stepHeight?: number;
  residualTargetOrders?: number;
}

export interface CaseDefinition {
  key: string;
  title: string;
  description: string;
  /** Model keys this case is run with in CI. */
  models: string[];
  parameters: CaseParameters;
}

export type BandKind = "verification" | "validation";

export interface BandDefinition {
  caseKey: string;
  quantityKey: string;
  /** null = every model of the case; a per-model band overrides it. */
  model: string | null;
  kind: BandKind;
  reference: number | null;
  /** Published source of the reference and limits (author, year, equation/table). */
  source: string;
  /** Either limit may be null for a one-sided band. */
  lower: number | null;
  upper: number | null;
  /** Absolute; inside the band but this close to a limit is "marginal". */
  marginalMargin: number;
  /** Absolute; a change against the baseline smaller than this is noise. */
  noiseFloor: number;
  fitSettings?: Partial<CaseParameters>;
  /** Why this band: shown in the band history. */
  reason: string;
}
