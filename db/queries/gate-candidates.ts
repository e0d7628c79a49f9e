import "server-only";
import type { Db } from "../index";
import type { BuildRow } from "./builds";

// The release gate's list: every build on a release/* branch with its gate state
// and how much needs a look. A candidate is "awaiting" while it has no decision
// and no later build of its branch has one; an older undecided candidate was
// settled by that later decision (4.2.1-rc.1 needs no answer once 4.2.1 shipped).

export interface GateCandidateRow extends BuildRow {
  state: "pending" | "approved" | "held" | "rejected";
  awaiting: boolean;
  outside_count: number;
  marginal_count: number;
  missing_count: number;
  drift_count: number;
  incomplete_runs: number;
  run_count: number;
}

const STATE_JOINS = `
  left join lateral (
    select d.state from gate_decisions d where d.build_id = b.id order by d.decided_at desc, d.id desc limit 1
  ) ls on true
  left join lateral (
    select max(b2.received_at) as at from builds b2
    where b2.branch = b.branch and exists (select 1 from gate_decisions d2 where d2.build_id = b2.id)
  ) last_decided on true`;

const COUNT_JOINS = `
  left join lateral (
    select count(*) filter (where q.verdict = 'outside') as outside_count,
           count(*) filter (where q.verdict = 'marginal') as marginal_count,
           count(*) filter (where q.verdict = 'missing') as missing_count,
           count(*) filter (where q.drift) as drift_count
    from quantity_values q where q.build_id = b.id
  ) c on true
  left join lateral (
    select count(*) filter (where x.status <> 'COMPLETED') as incomplete_runs, count(*) as run_count
    from runs x where x.build_id = b.id
  ) r on true`;

const WHERE = `where b.branch like 'release/%' and (:branch::text is null or b.branch = :branch::text)`;

/** One page of candidates: awaiting ones first, then newest first. */
export async function listGateCandidates({ db, branch, limit, offset }: { db: Db; branch: string | null; limit: number; offset: number }): Promise<{ rows: GateCandidateRow[]; total: number }> {
  const [rows, count] = await Promise.all([
    db.raw(
      `select b.*, coalesce(ls.state, 'pending') as state,
         (ls.state is null and b.received_at > coalesce(last_decided.at, '-infinity'::timestamptz)) as awaiting,
         c.outside_count, c.marginal_count, c.missing_count, c.drift_count, r.incomplete_runs, r.run_count
       from builds b ${STATE_JOINS} ${COUNT_JOINS}
       ${WHERE}
       order by awaiting desc, b.received_at desc, b.id desc
       limit :limit offset :offset`,
      { branch, limit, offset },
    ),
    db.raw(`select count(*)::int as total from builds b ${WHERE}`, { branch }),
  ]);
  return { rows: rows.rows, total: count.rows[0].total };
}

/** The release branches that have builds, for the list's branch picker. */
export async function getReleaseBranches({ db }: { db: Db }): Promise<string[]> {
  const rows: { branch: string }[] = await db("builds").where("branch", "like", "release/%").distinct("branch").orderBy("branch", "desc");
  return rows.map((r) => r.branch);
}
