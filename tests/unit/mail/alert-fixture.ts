import type { AlertFacts } from "@/lib/mail/alert-facts";

// One alert as the ingest would read it: a k–ε decay run whose closure
// coefficient was changed to Cε2 = 1.87, so its decay exponent is
// n = 1/(Cε2 − 1) = 1/0.87 = 1.1494 (reference sheet §2.2, derived there),
// against the seeded verification band 1.076 – 1.098 around 1/(1.92 − 1) = 1.0870
// (Launder & Spalding 1974, Cε2 = 1.92; reference sheet §3.1).
export const N_CHANGED = 1 / (1.87 - 1);
export const N_STANDARD = 1 / (1.92 - 1);

export function decayAlert(overrides: Partial<AlertFacts> = {}): AlertFacts {
  return {
    build: { id: 42, solver: "Cormorant", version: "4.3.0-dev.40", commit: "0123456789abcdef0123456789abcdef01234567", branch: "main", verdict: "outside", pipelineUrl: null },
    exits: [
      {
        runId: 7,
        caseKey: "decaying-hit",
        model: "k-epsilon",
        grid: "default",
        quantity: "decay_exponent",
        label: "Decay exponent n",
        unit: "1",
        value: N_CHANGED,
        lower: 1.076,
        upper: 1.098,
        reference: 1.087,
        bandKind: "verification",
        bandVersion: 1,
      },
    ],
    incompleteRuns: [],
    drifts: [],
    ...overrides,
  };
}
