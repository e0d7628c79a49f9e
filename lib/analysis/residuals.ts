import { AnalysisError } from "./errors";
import { LineAccumulator } from "./linear-fit";
import { assertPositiveNumber, assertSeries } from "./validate";

export interface ResidualOptions {
  /** Total drop (orders of magnitude) regarded as converged; default 5 (sheet §10). */
  targetOrders?: number;
}

export interface ResidualSummary {
  /** log10(first/last residual); negative when the residual rose (divergence). */
  dropOrders: number;
  /** Drop over the tail of the history, from the log-linear trend there. */
  tailDropOrders: number;
  stalled: boolean;
}

const TAIL_FRACTION = 0.2;
const TAIL_MIN_SAMPLES = 5;
const STALL_ORDERS = 0.1;

/**
 * Iterative-convergence summary of a residual history (sheet §10: a drop of at
 * least 3 orders is the common rule of thumb, >= 5 for verification cases).
 *
 * Stall rule: the tail is the last 20 % of the iteration span, widened to the
 * last 5 samples if it holds fewer. Its drop is the least-squares trend of
 * log10(residual) against iteration times the tail's iteration span — a trend,
 * not an end-point ratio, so the limit-cycle oscillation typical of a stalled
 * steady RANS run cannot fake progress. The run is stalled when that tail drop
 * is below 0.1 orders while the total drop is still below targetOrders (a
 * history that has reached the target may level off at round-off).
 */
export function residualDropOrders(
  iteration: ArrayLike<number>,
  residual: ArrayLike<number>,
  opts: ResidualOptions = {},
): ResidualSummary {
  assertSeries(iteration, residual, "iteration", "residual", { increasing: true });
  const n = residual.length;
  if (n < 2) throw new AnalysisError("residual", `needs at least 2 samples, got ${n}`);
  for (let i = 0; i < n; i++) {
    if (!(residual[i] > 0)) throw new AnalysisError("residual", `element ${i} must be > 0 (${residual[i]})`);
  }
  const targetOrders = opts.targetOrders ?? 5;
  assertPositiveNumber(targetOrders, "targetOrders");

  const dropOrders = Math.log10(residual[0] / residual[n - 1]);
  const last = iteration[n - 1];
  const tailStart = last - TAIL_FRACTION * (last - iteration[0]);
  let first = n - 1;
  while (first > 0 && iteration[first - 1] >= tailStart) first--;
  first = Math.min(first, Math.max(0, n - TAIL_MIN_SAMPLES));

  let tailDropOrders: number;
  if (n - first < 2) {
    tailDropOrders = dropOrders;
  } else {
    const acc = new LineAccumulator();
    for (let i = first; i < n; i++) acc.add(iteration[i], Math.log10(residual[i]));
    tailDropOrders = -acc.finish("iteration").slope * (last - iteration[first]);
  }
  return { dropOrders, tailDropOrders, stalled: tailDropOrders < STALL_ORDERS && dropOrders < targetOrders };
}
