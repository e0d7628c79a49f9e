import "server-only";
import type { Db } from "../index";
import { worstVerdict, type Verdict } from "@/lib/analysis";

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

/**
 * Finds the build of this commit or creates it, and locks its row for the rest of
 * the transaction so that concurrent re-posts of one build are applied one after
 * the other instead of racing on its runs.
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
  const inserted = await db("builds")
    .insert({
      solver: build.solver,
      version: build.version,
      commit: build.commit,
      branch: build.branch,
      pipeline_url: build.pipelineUrl ?? null,
      ...(receivedAt ? { received_at: receivedAt, updated_at: receivedAt } : {}),
    })
    .onConflict("commit")
    .ignore()
    .returning("id");
  const row: BuildRow = await db("builds").where({ commit: build.commit }).forUpdate().first();
  if (inserted.length === 0) {
    await db("builds")
      .where({ id: row.id })
      .update({ updated_at: db.fn.now(), pipeline_url: build.pipelineUrl ?? row.pipeline_url, version: build.version });
  }
  return { row, created: inserted.length > 0 };
}

export async function getBuildsByIds({ db, ids }: { db: Db; ids: readonly number[] }): Promise<BuildRow[]> {
  if (ids.length === 0) return [];
  return db("builds").whereIn("id", ids as number[]).select("*");
}

export async function getBuildByCommit({ db, commit }: { db: Db; commit: string }): Promise<BuildRow | undefined> {
  return db("builds").where({ commit: commit.toLowerCase() }).first();
}

export async function setBuildVerdict({ db, buildId }: { db: Db; buildId: number }): Promise<Verdict> {
  const rows: { verdict: Verdict }[] = await db("runs").where({ build_id: buildId }).select("verdict");
  const verdict = worstVerdict(rows.map((r) => r.verdict));
  await db("builds").where({ id: buildId }).update({ verdict });
  return verdict;
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

/** The last approved build on a branch (the baseline), received before `before` and not `excludeId`. */
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
    .whereRaw(
      `(select d.state from gate_decisions d where d.build_id = b.id order by d.decided_at desc, d.id desc limit 1) = 'approved'`,
    )
    .orderBy([{ column: "b.received_at", order: "desc" }, { column: "b.id", order: "desc" }])
    .select("b.*")
    .first();
  if (before) q.where("b.received_at", "<", before);
  if (excludeId !== undefined) q.whereNot("b.id", excludeId);
  return q;
}

export async function getBranches({ db }: { db: Db }): Promise<string[]> {
  const rows: { branch: string }[] = await db("builds").distinct("branch").orderBy("branch");
  return rows.map((r) => r.branch);
}
