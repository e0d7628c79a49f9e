import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";
import { VERDICT_ORDER, type Verdict } from "@/lib/analysis";

export interface BuildRow {
  id: number;
  solver: string;
  version: string;
  commit: string;
  branch: string;
  pipeline_url: string | null;
  received_at: Date;
  updated_at: Date;
  verdict: Verdict;
}

/** BuildRow's columns, named where a statement is prepared (db/prepared.ts: no `*` there). */
const BUILD_COLUMNS = ["id", "solver", "version", "commit", "branch", "pipeline_url", "received_at", "updated_at", "verdict"] as const;

const UPSERT_BUILD = `insert into builds (solver, version, commit, branch, pipeline_url, received_at, updated_at)
     values (?, ?, ?, ?, ?, coalesce(?::timestamptz, now()), coalesce(?::timestamptz, now()))
     on conflict (commit) do update
       set updated_at = now(), version = excluded.version, pipeline_url = coalesce(excluded.pipeline_url, builds.pipeline_url)
     returning ${BUILD_COLUMNS.join(", ")}, (xmax = 0) as created`;

/**
 * Finds the build of this commit or creates it, in one statement, and locks its
 * row for the rest of the transaction (INSERT … ON CONFLICT DO UPDATE locks the
 * existing row as FOR UPDATE would) so that concurrent re-posts of one build are
 * applied one after the other instead of racing on its runs. A re-post updates
 * the version and pipeline URL and stamps updated_at; the branch is never
 * changed here (the caller refuses a re-post on another branch).
 */
export async function upsertBuildForUpdate({
  db,
  build,
  receivedAt,
}: {
  db: Db;
  build: { solver: string; version: string; commit: string; branch: string; pipelineUrl?: string | null };
  receivedAt?: Date;
}): Promise<{ row: BuildRow; created: boolean }> {
  const result: { rows: (BuildRow & { created: boolean })[] } = await db
    .raw(UPSERT_BUILD, [build.solver, build.version, build.commit, build.branch, build.pipelineUrl ?? null, receivedAt ?? null, receivedAt ?? null])
    .options(prepared(UPSERT_BUILD));
  // xmax is 0 on a freshly inserted row version and set on one written by the DO UPDATE branch.
  const { created, ...row } = result.rows[0];
  return { row, created };
}

export async function getBuildsByIds({ db, ids }: { db: Db; ids: readonly number[] }): Promise<BuildRow[]> {
  if (ids.length === 0) return [];
  return db("builds").whereIn("id", ids as number[]).select("*");
}

export async function getBuildByCommit({ db, commit }: { db: Db; commit: string }): Promise<BuildRow | undefined> {
  return db("builds").where({ commit: commit.toLowerCase() }).first();
}

const SET_BUILD_VERDICT = `update builds set verdict = coalesce(
       (select r.verdict from runs r where r.build_id = builds.id order by array_position(?::text[], r.verdict) desc limit 1), 'missing')
     where id = ? returning verdict`;

/** Sets the build's verdict to its worst run's (VERDICT_ORDER; no runs: 'missing') in one statement. */
export async function setBuildVerdict({ db, buildId }: { db: Db; buildId: number }): Promise<Verdict> {
  const result: { rows: { verdict: Verdict }[] } = await db.raw(SET_BUILD_VERDICT, [[...VERDICT_ORDER], buildId]).options(prepared(SET_BUILD_VERDICT));
  return result.rows[0].verdict;
}

export interface BuildListFilter {
  branch?: string | null;
  verdict?: Verdict | null;
  limit: number;
  offset: number;
}

export async function listBuilds({ db, filter }: { db: Db; filter: BuildListFilter }): Promise<{ rows: BuildRow[]; total: number }> {
  const base = db("builds");
  if (filter.branch) base.where("branch", filter.branch);
  if (filter.verdict) base.where("verdict", filter.verdict);
  const [rows, [{ count }]] = await Promise.all([
    base.clone().select("*").orderBy([{ column: "received_at", order: "desc" }, { column: "id", order: "desc" }]).limit(filter.limit).offset(filter.offset),
    base.clone().count<{ count: number }[]>({ count: "*" }),
  ]);
  return { rows, total: Number(count) };
}

/**
 * The last approved build on a branch (the baseline), received before `before`
 * and not `excludeId`. Every submission asks this. Only builds that were ever
 * approved are candidates (the IN list): without it the newest-first walk of
 * the branch tried every build back to the last approval, so a branch with
 * many posts since its last release made each further post slower (397
 * unapproved builds: 1.8 ms, against 0.4 ms with the list). Decisions are
 * people's: few beside the builds.
 */
export async function getBaselineBuild({
  db,
  branch,
  before,
  excludeId,
}: {
  db: Db;
  branch: string;
  before?: Date;
  excludeId?: number;
}): Promise<BuildRow | undefined> {
  const q = db("builds as b")
    .where("b.branch", branch)
    .whereIn("b.id", db("gate_decisions").select("build_id").where("state", "approved"))
    .whereRaw(
      `(select d.state from gate_decisions d where d.build_id = b.id order by d.decided_at desc, d.id desc limit 1) = 'approved'`,
    )
    .orderBy([{ column: "b.received_at", order: "desc" }, { column: "b.id", order: "desc" }])
    .select(BUILD_COLUMNS.map((c) => `b.${c}`))
    .first();
  if (before) q.where("b.received_at", "<", before);
  if (excludeId !== undefined) q.whereNot("b.id", excludeId);
  return q.options(prepared(q.toSQL().sql));
}

export async function getBranches({ db }: { db: Db }): Promise<string[]> {
  const rows: { branch: string }[] = await db("builds").distinct("branch").orderBy("branch");
  return rows.map((r) => r.branch);
}
