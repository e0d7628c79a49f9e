import "server-only";
import type { Db } from "../index";
import type { BuildRow } from "./builds";
import type { Verdict } from "@/lib/analysis";

// Reads of the morning view. Every widget starts from the same "branch heads":
// the newest build of each of the most recently active branches, with the
// baseline it is compared against (the last approved build received before it).

const LATEST_STATE = `(select d.state from gate_decisions d where d.build_id = b.id order by d.decided_at desc, d.id desc limit 1)`;

/** SQL of the heads CTE: id, branch, received_at, baseline_id and display rank of up to :branches branches. */
const HEADS_CTE = `
  with latest as (
    select distinct on (branch) id, branch, received_at
    from builds order by branch, received_at desc, id desc
  ), heads as (
    select l.id, l.branch, l.received_at,
      (select b.id from builds b
        where b.branch = l.branch and b.id <> l.id and b.received_at <= l.received_at and ${LATEST_STATE} = 'approved'
        order by b.received_at desc, b.id desc limit 1) as baseline_id,
      -- main and the release lines first, then other branches by their newest activity
      row_number() over (order by (l.branch = 'main') desc, (l.branch like 'release/%') desc, l.received_at desc, l.branch) as rank
    from latest l
    order by rank limit :branches
  )`;

export interface BranchBuildRow extends BuildRow {
  /** The baseline of the branch's newest build (same on every row of the branch). */
  baseline_id: number | null;
}

/** The newest `perBranch` builds of each active branch, branches by newest activity. */
export async function getNewestBuildsPerBranch({ db, branches, perBranch }: { db: Db; branches: number; perBranch: number }): Promise<BranchBuildRow[]> {
  const result = await db.raw(
    `${HEADS_CTE}
    select b.*, h.baseline_id
    from heads h
    cross join lateral (
      select * from builds x where x.branch = h.branch order by x.received_at desc, x.id desc limit :perBranch
    ) b
    order by h.rank, b.received_at desc, b.id desc`,
    { branches, perBranch },
  );
  return result.rows;
}

/** What every morning-view finding names: the branch head, the run's key and the quantity's value now. */
export interface HeadQuantityRow {
  head_id: number;
  branch: string;
  case_key: string;
  model_key: string;
  grid: string;
  quantity_key: string;
  value: number | null;
  verdict: Verdict;
}

export interface BandExitRow extends HeadQuantityRow {
  baseline_id: number;
  baseline_value: number | null;
  baseline_verdict: Verdict;
  run_id: number | null;
  run_status: string | null;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  band_version: number | null;
}

/**
 * Quantities that were within or marginal in the baseline and are now outside or
 * missing in the branch head. Starting from the baseline side also catches a
 * quantity (or a whole run) the head no longer reports at all.
 */
export async function getBandExits({ db, branches }: { db: Db; branches: number }): Promise<BandExitRow[]> {
  const result = await db.raw(
    `${HEADS_CTE}
    select h.id as head_id, h.branch, h.baseline_id,
      bq.case_key, bq.model_key, bq.grid, bq.quantity_key,
      bq.value as baseline_value, bq.verdict as baseline_verdict,
      nq.value, coalesce(nq.verdict, 'missing') as verdict,
      nr.id as run_id, nr.status as run_status,
      d.reference, d.lower, d.upper, d.version as band_version
    from heads h
    join quantity_values bq on bq.build_id = h.baseline_id and bq.verdict in ('within', 'marginal')
    left join quantity_values nq on nq.build_id = h.id and nq.case_key = bq.case_key and nq.model_key = bq.model_key
      and nq.grid = bq.grid and nq.quantity_key = bq.quantity_key
    left join runs nr on nr.build_id = h.id and nr.case_key = bq.case_key and nr.model_key = bq.model_key and nr.grid = bq.grid
    left join bands d on d.id = coalesce(nq.band_id, bq.band_id)
    where nq.id is null or nq.verdict in ('outside', 'missing')
    order by h.rank, bq.case_key, bq.model_key, bq.grid, bq.quantity_key`,
    { branches },
  );
  return result.rows;
}

export interface OpenDriftRow extends HeadQuantityRow {
  run_id: number;
  drift_reason: "baseline" | "trend" | null;
  drift_p_value: number | null;
  drift_slope: number | null;
  baseline_value: number | null;
  baseline_delta: number | null;
  noise_floor: number | null;
}

/** Quantities flagged as drifting in each branch head. */
export async function getOpenDrifts({ db, branches }: { db: Db; branches: number }): Promise<OpenDriftRow[]> {
  const result = await db.raw(
    `${HEADS_CTE}
    select h.id as head_id, h.branch, q.run_id, q.case_key, q.model_key, q.grid, q.quantity_key, q.value, q.verdict,
      q.drift_reason, q.drift_p_value, q.drift_slope, q.baseline_value, q.baseline_delta, d.noise_floor
    from heads h
    join quantity_values q on q.build_id = h.id and q.drift
    left join bands d on d.id = q.band_id
    order by h.rank, q.case_key, q.model_key, q.grid, q.quantity_key`,
    { branches },
  );
  return result.rows;
}
