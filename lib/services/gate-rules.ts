import type { Verdict } from "@/lib/analysis";
import { formatSig, withUnit } from "@/lib/format/numbers";

// The release-gate rules, pure so they can be tested without a database:
// what stands in the way of approving a build, and which waiver lets it through.

export type RunStatus = "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";

export interface WaiverScope {
  id: number;
  caseKey: string;
  quantityKey: string;
  /** Null: every model of the case. */
  modelKey: string | null;
  /** Null: every branch. */
  branch: string | null;
  grantedAt: Date;
  expiresAt: Date;
  revokedAt: Date | null;
}

/** One quantity of one run of the build, or a run without any quantity (quantityKey null). */
export interface GateItem {
  runId: number;
  caseKey: string;
  modelKey: string;
  grid: string;
  runStatus: RunStatus;
  quantityKey: string | null;
  verdict: Verdict | null;
  value: number | null;
  unit?: string | null;
  lower?: number | null;
  upper?: number | null;
}

/** A waiver counts from its grant until it expires or is withdrawn, whichever comes first. */
export function isWaiverInForce(w: WaiverScope, at: Date): boolean {
  const t = at.getTime();
  return w.grantedAt.getTime() <= t && t < w.expiresAt.getTime() && (w.revokedAt === null || t < w.revokedAt.getTime());
}

/** Whether a waiver names this quantity of this run on this branch (its model and branch are optional). */
export function waiverCovers(w: WaiverScope, item: GateItem, branch: string): boolean {
  return (
    item.quantityKey !== null &&
    w.caseKey === item.caseKey &&
    w.quantityKey === item.quantityKey &&
    (w.modelKey === null || w.modelKey === item.modelKey) &&
    (w.branch === null || w.branch === branch)
  );
}

/**
 * Why an item blocks approval, or null when it does not. A quantity outside its
 * band blocks; so does every quantity of a run that did not complete, because
 * nothing a diverged, crashed or timed-out run reports can be trusted, even
 * when it happens to sit inside its band.
 */
export function blockingReason(item: GateItem): string | null {
  if (item.runStatus !== "COMPLETED") {
    const status = `run ${item.runStatus.toLowerCase()}`;
    if (item.quantityKey === null) return `${status}; it reports no quantity a waiver could name`;
    return item.value === null
      ? `${status}; ${item.quantityKey} not delivered`
      : `${status}, so ${item.quantityKey} = ${withUnit(formatSig(item.value), item.unit)} is not a converged result`;
  }
  if (item.verdict === "outside") return `${item.quantityKey} = ${item.value === null ? "no value" : withUnit(formatSig(item.value), item.unit)} is outside its band ${formatLimits(item)}`;
  return null;
}

export function formatLimits({ lower, upper }: { lower?: number | null; upper?: number | null }): string {
  const lo = lower === null || lower === undefined ? "−∞" : formatSig(lower);
  const hi = upper === null || upper === undefined ? "+∞" : formatSig(upper);
  return `[${lo}, ${hi}]`;
}

export interface SortedItems<T extends GateItem, W extends WaiverScope> {
  /** Items that block approval: no waiver in force names them. */
  blockers: { item: T; reason: string }[];
  /** Items that would block, let through by a waiver in force. */
  waived: { item: T; reason: string; waiver: W }[];
}

/**
 * Splits a build's items into what blocks approval and what a waiver in force
 * lets through at `at`. When several waivers apply, the one that runs longest is
 * named, since it is the one that still counts after the others end.
 */
export function sortOutBlockers<T extends GateItem, W extends WaiverScope>(items: readonly T[], waivers: readonly W[], { branch, at }: { branch: string; at: Date }): SortedItems<T, W> {
  const inForce = waivers.filter((w) => isWaiverInForce(w, at));
  const out: SortedItems<T, W> = { blockers: [], waived: [] };
  for (const item of items) {
    const reason = blockingReason(item);
    if (reason === null) continue;
    const covering = inForce
      .filter((w) => waiverCovers(w, item, branch))
      .sort((a, b) => b.expiresAt.getTime() - a.expiresAt.getTime() || a.id - b.id)[0];
    if (covering) out.waived.push({ item, reason, waiver: covering });
    else out.blockers.push({ item, reason });
  }
  return out;
}

/** "backstep/k-epsilon/default" — how CI logs and the refusal message name a run. */
export function runLabel(item: Pick<GateItem, "caseKey" | "modelKey" | "grid">): string {
  return `${item.caseKey}/${item.modelKey}/${item.grid}`;
}
