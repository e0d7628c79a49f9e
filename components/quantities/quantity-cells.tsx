import { formatSig } from "@/lib/format/numbers";
import { formatDifference, formatDifferencePct } from "./format-value";
import type { QuantityOrigin } from "./types";

// Units that are "dimensionless" carry no text; long units get a short form so the
// number columns stay narrow.
const SHORT_UNITS: Record<string, string> = { "orders of magnitude": "decades" };

export function displayUnit(unit: string | null): string {
  if (!unit || unit === "1" || unit === "-") return "–";
  return SHORT_UNITS[unit] ?? unit;
}

/** Acceptance limits as an interval; a one-sided band shows only its bound. */
export function formatLimits(lower: number | null, upper: number | null): string {
  if (lower === null && upper === null) return "—";
  if (lower === null) return `≤ ${formatSig(upper)}`;
  if (upper === null) return `≥ ${formatSig(lower)}`;
  return `${formatSig(lower)} … ${formatSig(upper)}`;
}

const ORIGIN_TEXT: Record<QuantityOrigin, { text: string; title: string }> = {
  reported: { text: "reported", title: "The solver run reported this scalar itself" },
  derived: { text: "derived", title: "Tauline derived this from the run's series, stresses or grid study" },
  expected: { text: "expected", title: "A band expects this quantity, but the run gave nothing to compute it from" },
};

export function OriginTag({ origin }: { origin: QuantityOrigin }) {
  const o = ORIGIN_TEXT[origin];
  return (
    <span title={o.title} className="text-xs text-ink-soft dark:text-white/60">
      {o.text}
    </span>
  );
}

export function DeviationCell({ deviation, deviationPct, reference }: { deviation: number | null; deviationPct: number | null; reference: number | null }) {
  if (deviation === null) return <span className="text-ink-faint">—</span>;
  return (
    <span className="whitespace-nowrap" title={`value − reference = ${deviation}`}>
      {formatDifference(deviation, reference)}
      {deviationPct !== null && <span className="ml-1 text-xs text-ink-faint">({formatDifferencePct(deviationPct)})</span>}
    </span>
  );
}

// drift_reason is "baseline" (a step against the last approved build larger than the
// noise floor) or "trend" (Mann–Kendall monotone trend over the recent builds).
const DRIFT_TEXT: Record<string, { mark: string; text: string; title: string }> = {
  baseline: { mark: "Δ", text: "vs baseline", title: "Moved away from the baseline value by more than the quantity's noise floor" },
  trend: { mark: "↗", text: "trend", title: "Monotone trend over the recent builds (Mann–Kendall test)" },
};

export function DriftCell({ drift, reason }: { drift: boolean; reason: string | null }) {
  if (!drift) return <span className="text-ink-faint">—</span>;
  const d = DRIFT_TEXT[reason ?? ""] ?? { mark: "↗", text: "drift", title: "Drift against the baseline or trend" };
  return (
    <span title={d.title} className="inline-flex items-center gap-1 whitespace-nowrap rounded bg-verdict-marginal/15 px-1.5 py-0.5 text-xs text-verdict-marginal ring-1 ring-inset ring-verdict-marginal/40">
      <span aria-hidden>{d.mark}</span> {d.text}
    </span>
  );
}
