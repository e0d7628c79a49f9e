import type { QuantityView } from "@/components/run/run-data";

/** A quantity as the RunPlots query returns it, with only what a test sets filled in. */
export function quantity(key: string, fields: Partial<QuantityView> = {}): QuantityView {
  return {
    key,
    label: null,
    unit: null,
    value: null,
    origin: "derived",
    verdict: "within",
    reference: null,
    source: null,
    lower: null,
    upper: null,
    deviation: null,
    deviationPct: null,
    baselineValue: null,
    baselineDelta: null,
    drift: false,
    driftReason: null,
    details: {},
    bandKind: null,
    bandModel: null,
    ...fields,
  };
}

export function noteText(notes: { text: unknown }[]): string {
  return notes.map((n) => String(n.text)).join("\n");
}
