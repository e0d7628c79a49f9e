import "server-only";
import type { Knex } from "knex";
import { seriesKey } from "@/db/queries/quantity-values";
import { insertRunData } from "@/db/queries/run-data";
import { insertRunsWithValues } from "@/db/queries/run-insert";
import { deleteRunsByKeys } from "@/db/queries/runs";
import type { RunDerivation } from "@/lib/evaluation/derive";
import { judgeRun } from "@/lib/evaluation/judge";
import type { BandInForce, JudgedQuantity } from "@/lib/evaluation/types";
import type { RunSubmission } from "@/lib/validation/submission";

export interface StoreRunsContext {
  build: { id: number; branch: string; received_at: Date };
  /** The build was created by this submission: it has no earlier runs to replace. */
  created: boolean;
  runs: readonly RunSubmission[];
  derived: readonly RunDerivation[];
  bandsFor: (run: RunSubmission) => Map<string, BandInForce>;
  baseline: { buildId: number; values: Map<string, number | null> } | null;
  history: Map<string, number[]>;
}

/**
 * Judges every run of a submission (pure, in memory) and then stores them all
 * with a fixed number of statements: a DELETE of earlier posts of the same keys
 * (re-posts only), ONE statement for the runs with their coefficients and judged
 * quantities, one binary COPY of the series, and an INSERT each for stress
 * samples and grid studies when there are any. A 200-run build costs the same
 * handful of round trips as a 5-run one.
 */
export async function storeRuns(trx: Knex.Transaction, ctx: StoreRunsContext): Promise<{ runIds: number[]; alarming: boolean }> {
  const { build, runs, derived } = ctx;
  const judged = runs.map((run, i) => judgeOne(run, derived[i], ctx));

  if (!ctx.created) await deleteRunsByKeys({ db: trx, buildId: build.id, runs });
  const runIds = await insertRunsWithValues({
    db: trx,
    build: { id: build.id, branch: build.branch, receivedAt: build.received_at },
    runs: runs.map((run, i) => ({
      run: {
        case: run.case,
        model: run.model,
        grid: run.grid,
        status: run.status,
        iterations: run.iterations ?? null,
        wallSeconds: run.wallSeconds ?? null,
        verdict: judged[i].verdict,
      },
      coefficients: run.coefficients ?? [],
      quantities: judged[i].quantities,
    })),
  });
  await insertRunData({
    trx,
    rows: runs.map((run, i) => ({ runId: runIds[i], run, stresses: derived[i].stresses, gridStudy: derived[i].gridStudy })),
  });
  return { runIds, alarming: runs.some((run, i) => isAlarming(run, judged[i].quantities)) };
}

/**
 * Whether a run gives the release manager something to hear about: it did not
 * complete, a quantity left its band, or a value drifts. The same three facts
 * lib/mail/alert-facts.ts needsAlert() reads back from the stored build.
 */
function isAlarming(run: RunSubmission, quantities: readonly JudgedQuantity[]): boolean {
  return run.status !== "COMPLETED" || quantities.some((q) => q.verdict === "outside" || (q.drift && q.driftReason !== null));
}

function judgeOne(run: RunSubmission, derivation: RunDerivation, ctx: StoreRunsContext) {
  const bands = ctx.bandsFor(run);
  const key = (q: string) => seriesKey(run.case, run.model, run.grid, q);
  const { baseline, history } = ctx;
  return judgeRun({
    status: run.status,
    quantities: derivation.quantities,
    bandFor: (q) => bands.get(q) ?? null,
    expectedKeys: [...bands.keys()],
    baseline: baseline && {
      buildId: baseline.buildId,
      values: new Map([...bands.keys(), ...derivation.quantities.map((q) => q.key)].map((q) => [q, baseline.values.get(key(q)) ?? null])),
    },
    history: (q) => history.get(key(q)) ?? [],
  });
}
