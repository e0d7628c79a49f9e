import { Panel } from "@/components/ui/panel";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { whyMissing, type RunView } from "./run-data";

// Which data each derived quantity is read from; when the run posted none of
// it, there is no plot to write the failure on, so it is listed here instead.
const SOURCE_OF: Record<string, { data: string; has: (run: RunView) => boolean }> = {
  kappa: { data: "u_plus series", has: (r) => r.plotSeries.some((s) => s.key === "u_plus") },
  log_b: { data: "u_plus series", has: (r) => r.plotSeries.some((s) => s.key === "u_plus") },
  log_fit_r2: { data: "u_plus series", has: (r) => r.plotSeries.some((s) => s.key === "u_plus") },
  decay_exponent: { data: "k_decay series", has: (r) => r.plotSeries.some((s) => s.key === "k_decay") },
  cf_at_x: { data: "cf series", has: (r) => r.plotSeries.some((s) => s.key === "cf") },
  reattachment_xr_h: { data: "cf series", has: (r) => r.plotSeries.some((s) => s.key === "cf") },
  residual_drop_orders: { data: "residual series", has: (r) => r.plotSeries.some((s) => s.key === "residual") },
  realizability_violations: { data: "stress samples", has: (r) => r.stresses.length > 0 },
  observed_order: { data: "grid study", has: (r) => r.gridStudy !== null },
  extrapolated_value: { data: "grid study", has: (r) => r.gridStudy !== null },
  gci_fine_pct: { data: "grid study", has: (r) => r.gridStudy !== null },
};

/** Quantities without a value whose source data this run did not post at all. */
export function MissingDataPanel({ run }: { run: RunView }) {
  const rows = run.quantities
    .filter((q) => q.value === null)
    .map((q) => ({ q, source: SOURCE_OF[q.key] }))
    .filter(({ source }) => !source || !source.has(run));
  if (rows.length === 0) return null;
  return (
    <Panel title="No data to plot" subtitle="quantities this run should have, with nothing posted to derive them from" className="lg:col-span-2">
      <ul className="space-y-1.5 text-sm" data-testid="missing-data">
        {rows.map(({ q, source }) => (
          <li key={q.key} className="flex flex-wrap items-baseline gap-x-2">
            <VerdictBadge verdict={q.verdict} />
            <span className="font-medium">{q.label ?? q.key}</span>
            <span className="font-mono text-xs text-ink-faint">{q.key}</span>
            <span className="text-ink-soft dark:text-white/70">
              — {source ? `no ${source.data} in this run: ${whyMissing(q)}` : whyMissing(q)}
            </span>
          </li>
        ))}
      </ul>
    </Panel>
  );
}
