import "server-only";
import { z } from "zod";
import { getDb } from "@/db";
import { getBuildsByIds, type BuildRow } from "@/db/queries/builds";
import { getBandExits, getNewestBuildsPerBranch, getOpenDrifts, type HeadQuantityRow } from "@/db/queries/overview";
import { countSettledUndecidedCandidates, getAwaitingReleaseCandidates } from "@/db/queries/release-candidates";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./overview-input";

// The morning view: what a developer or release manager reads first. Each widget
// has its own service so that the page can load them independently.

export const morningViewSchema = z.object({
  branches: z.number().int().min(1).max(50).default(8),
});
export const branchActivitySchema = z.object({ perBranch: z.number().int().min(1).max(20).default(5) });
export const candidatesSchema = z.object({ first: z.number().int().min(1).max(100).default(20) });

export interface BranchActivity {
  branch: string;
  builds: BuildRow[];
  baseline: BuildRow | null;
}

/** The newest builds of each active branch, and the baseline the head is judged against. */
export async function findBranchActivity({ actor, branches, unsafeInput }: { actor: Actor | null; branches: number; unsafeInput: unknown }): Promise<BranchActivity[]> {
  requirePerson(actor);
  const { perBranch } = parseInput(branchActivitySchema, unsafeInput);
  const db = getDb();
  const rows = await getNewestBuildsPerBranch({ db, branches, perBranch });
  const baselineIds = [...new Set(rows.map((r) => r.baseline_id).filter((id): id is number => id !== null))];
  const baselines = new Map((await getBuildsByIds({ db, ids: baselineIds })).map((b) => [b.id, b]));
  const out: BranchActivity[] = [];
  for (const { baseline_id, ...build } of rows) {
    let entry = out.find((e) => e.branch === build.branch);
    if (!entry) {
      entry = { branch: build.branch, builds: [], baseline: baseline_id === null ? null : baselines.get(baseline_id) ?? null };
      out.push(entry);
    }
    entry.builds.push(build);
  }
  return out;
}

/** The fields every morning-view finding shares, in the API's names. */
function headQuantityFields(r: HeadQuantityRow) {
  return {
    branch: r.branch,
    buildId: r.head_id,
    case: r.case_key,
    model: r.model_key,
    grid: r.grid,
    quantity: r.quantity_key,
    value: r.value,
    verdict: r.verdict,
  };
}

/** Quantities of each branch head that left their band since the branch baseline. */
export async function findBandExits({ actor, branches }: { actor: Actor | null; branches: number }) {
  requirePerson(actor);
  const rows = await getBandExits({ db: getDb(), branches });
  return rows.map((r) => ({
    ...headQuantityFields(r),
    baselineBuildId: r.baseline_id,
    runId: r.run_id,
    runStatus: r.run_status,
    baselineValue: r.baseline_value,
    baselineVerdict: r.baseline_verdict,
    reference: r.reference,
    lower: r.lower,
    upper: r.upper,
    bandVersion: r.band_version,
  }));
}

/** Quantities of each branch head flagged as drifting (baseline change or monotone trend). */
export async function findOpenDrifts({ actor, branches }: { actor: Actor | null; branches: number }) {
  requirePerson(actor);
  const rows = await getOpenDrifts({ db: getDb(), branches });
  return rows.map((r) => ({
    ...headQuantityFields(r),
    runId: r.run_id,
    reason: r.drift_reason,
    pValue: r.drift_p_value,
    slopePerBuild: r.drift_slope,
    baselineValue: r.baseline_value,
    baselineDelta: r.baseline_delta,
    noiseFloor: r.noise_floor,
  }));
}

/** Release candidates awaiting a decision, newest first, and how many older ones a later decision settled. */
export async function findAwaitingCandidates({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const { first } = parseInput(candidatesSchema, unsafeInput);
  const db = getDb();
  const [awaiting, settledUndecided] = await Promise.all([getAwaitingReleaseCandidates({ db, limit: first }), countSettledUndecidedCandidates({ db })]);
  return { awaiting, settledUndecided };
}

/** Validates the morning view's own arguments (how many branches to show). */
export function parseMorningView({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  return parseInput(morningViewSchema, unsafeInput);
}
