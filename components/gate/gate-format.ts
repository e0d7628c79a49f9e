import { formatUtc } from "@/components/builds/format-time";
import { formatSig, withUnit } from "@/lib/format/numbers";
import type { GateFindingItem, WaiverItem } from "@/graphql/operations/gate";

// Wording shared by the gate screens. Times are UTC everywhere in Tauline.

const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

export const formatDay = (iso: string) => day.format(new Date(iso));
/** Day and time in UTC, as on every screen (components/builds/format-time.ts). */
export const formatDayTime = (iso: string) => formatUtc(iso);

/** A waiver ends at an instant; "until 14 Dec 2026" names the last day it counts. */
export function formatUntil(expiresAtIso: string): string {
  return formatDay(new Date(new Date(expiresAtIso).getTime() - 1).toISOString());
}

export function runLabel(f: Pick<GateFindingItem, "case" | "model" | "grid">): string {
  return f.grid === "default" ? `${f.case} · ${f.model}` : `${f.case} · ${f.model} · ${f.grid}`;
}

export function runHref(buildId: string, runId: string): string {
  return `/builds/${buildId}/runs/${runId}`;
}

/** The band as an interval; a one-sided band shows its open end. */
export function formatBand(f: Pick<GateFindingItem, "lower" | "upper" | "unit">): string {
  if (f.lower === null && f.upper === null) return "no band";
  if (f.upper === null) return withUnit(`≥ ${formatSig(f.lower)}`, f.unit);
  if (f.lower === null) return withUnit(`≤ ${formatSig(f.upper)}`, f.unit);
  return withUnit(`${formatSig(f.lower)} – ${formatSig(f.upper)}`, f.unit);
}

export function waiverScope(w: Pick<WaiverItem, "case" | "quantity" | "model" | "branch">): string {
  return `${w.quantity} of ${w.case}, ${w.model ? `model ${w.model}` : "every model"}, ${w.branch ? `branch ${w.branch}` : "every branch"}`;
}

export const STATUS_WORD: Record<GateFindingItem["runStatus"], string> = { COMPLETED: "completed", DIVERGED: "diverged", CRASHED: "crashed", TIMEOUT: "timed out" };
