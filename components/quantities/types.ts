import type { Verdict } from "@/lib/analysis";

export type QuantityOrigin = "reported" | "derived" | "expected";

/** One quantity of one run, shaped like the GraphQL QuantityValue (nullable where it is). */
export type QuantityRow = {
  key: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  origin: QuantityOrigin;
  verdict: Verdict;
  reference: number | null;
  source: string | null;
  lower: number | null;
  upper: number | null;
  deviation: number | null;
  deviationPct: number | null;
  baselineValue: number | null;
  baselineDelta: number | null;
  drift: boolean;
  driftReason: string | null;
};
