import "server-only";
import type { Db } from "@/db";
import { getGateFindings, getIncompleteRunsWithoutValues, type BareRunRow, type GateFindingRow } from "@/db/queries/gate";
import { getWaiversInForce, type WaiverRow } from "@/db/queries/waivers";
import { isWaiverInForce, sortOutBlockers, type GateItem, type WaiverScope } from "./gate-rules";

// What the gate knows about a build: the quantities to look at, and which of
// them block approval or are let through by a waiver in force.

export interface WaiverView {
  id: number;
  case: string;
  quantity: string;
  model: string | null;
  branch: string | null;
  reason: string;
  grantedBy: string;
  grantedAt: Date;
  expiresAt: Date;
  revokedAt: Date | null;
  revokedBy: string | null;
  revokeReason: string | null;
  inForce: boolean;
}

export interface GateFinding extends GateItem {
  id: string;
  buildId: number;
  label: string | null;
  origin: GateFindingRow["origin"] | null;
  reference: number | null;
  marginalMargin: number | null;
  noiseFloor: number | null;
  bandVersion: number | null;
  bandKind: GateFindingRow["band_kind"];
  source: string | null;
  baselineBuildId: number | null;
  baselineValue: number | null;
  baselineDelta: number | null;
  drift: boolean;
  driftReason: GateFindingRow["drift_reason"];
  driftPValue: number | null;
  driftSlope: number | null;
  /** Why it would block approval; null when it does not. */
  blockReason: string | null;
  /** The waiver in force that lets it through. */
  waiver: WaiverView | null;
}

export interface GateAssessment {
  findings: GateFinding[];
  blockers: GateFinding[];
  waived: GateFinding[];
}

export const waiverScopeOf = (w: WaiverRow): WaiverScope => ({ id: w.id, caseKey: w.case_key, quantityKey: w.quantity_key, modelKey: w.model_key, branch: w.branch, grantedAt: w.granted_at, expiresAt: w.expires_at, revokedAt: w.revoked_at });

export function toWaiverView(w: WaiverRow, at: Date): WaiverView {
  return {
    id: w.id,
    case: w.case_key,
    quantity: w.quantity_key,
    model: w.model_key,
    branch: w.branch,
    reason: w.reason,
    grantedBy: w.granted_by_name,
    grantedAt: w.granted_at,
    expiresAt: w.expires_at,
    revokedAt: w.revoked_at,
    revokedBy: w.revoked_by_name,
    revokeReason: w.revoke_reason,
    inForce: isWaiverInForce(waiverScopeOf(w), at),
  };
}

const NO_BAND = { reference: null, lower: null, upper: null, marginalMargin: null, noiseFloor: null, bandVersion: null, bandKind: null, source: null } as const;
const NO_BASELINE = { baselineBuildId: null, baselineValue: null, baselineDelta: null, drift: false, driftReason: null, driftPValue: null, driftSlope: null } as const;

/** A run that did not complete and left no quantity: it blocks as a whole. */
function bareRunFinding(r: BareRunRow): GateFinding {
  return {
    id: `r${r.id}`,
    buildId: r.build_id,
    runId: r.id,
    caseKey: r.case_key,
    modelKey: r.model_key,
    grid: r.grid,
    runStatus: r.status,
    quantityKey: null,
    label: null,
    unit: null,
    value: null,
    origin: null,
    verdict: null,
    ...NO_BAND,
    ...NO_BASELINE,
    blockReason: null,
    waiver: null,
  };
}

function findingOf(r: GateFindingRow): GateFinding {
  return {
    id: `q${r.id}`,
    buildId: r.build_id,
    runId: r.run_id,
    caseKey: r.case_key,
    modelKey: r.model_key,
    grid: r.grid,
    runStatus: r.run_status,
    quantityKey: r.quantity_key,
    label: r.label,
    unit: r.unit,
    value: r.value,
    origin: r.origin,
    verdict: r.verdict,
    reference: r.reference,
    lower: r.lower,
    upper: r.upper,
    marginalMargin: r.marginal_margin,
    noiseFloor: r.noise_floor,
    bandVersion: r.band_version,
    bandKind: r.band_kind,
    source: r.source,
    baselineBuildId: r.baseline_build_id,
    baselineValue: r.baseline_value,
    baselineDelta: r.baseline_delta,
    drift: r.drift,
    driftReason: r.drift_reason,
    driftPValue: r.drift_p_value,
    driftSlope: r.drift_slope,
    blockReason: null,
    waiver: null,
  };
}

/**
 * Assesses builds at instant `at`. With `lock`, the waivers relied on are share-
 * locked until the transaction ends, so none can be withdrawn under a decision.
 */
export async function assessBuilds({ db, builds, at, lock = false }: { db: Db; builds: readonly { id: number; branch: string }[]; at: Date; lock?: boolean }): Promise<Map<number, GateAssessment>> {
  const ids = builds.map((b) => b.id);
  const [rows, bareRuns] = await Promise.all([getGateFindings({ db, buildIds: ids }), getIncompleteRunsWithoutValues({ db, buildIds: ids })]);
  const findings = [...rows.map(findingOf), ...bareRuns.map(bareRunFinding)];
  const branches = new Set(builds.map((b) => b.branch));
  const caseKeys = [...new Set(findings.map((f) => f.caseKey))];
  const waiverRows = await getWaiversInForce({ db, caseKeys, branch: branches.size === 1 ? [...branches][0] : null, at, lock });
  const views = new Map(waiverRows.map((w) => [w.id, toWaiverView(w, at)]));
  const scopes = waiverRows.map(waiverScopeOf);

  const out = new Map<number, GateAssessment>();
  for (const build of builds) {
    const own = findings.filter((f) => f.buildId === build.id);
    const sorted = sortOutBlockers(own, scopes, { branch: build.branch, at });
    for (const { item, reason } of sorted.blockers) item.blockReason = reason;
    for (const { item, reason, waiver } of sorted.waived) {
      item.blockReason = reason;
      item.waiver = views.get(waiver.id) ?? null;
    }
    out.set(build.id, { findings: own, blockers: sorted.blockers.map((b) => b.item), waived: sorted.waived.map((w) => w.item) });
  }
  return out;
}
