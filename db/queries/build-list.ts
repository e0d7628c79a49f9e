import "server-only";
import type { Knex } from "knex";
import type { Db } from "../index";
import type { Verdict } from "@/lib/analysis";
import type { BuildRow } from "./builds";

export type BuildTableColumn = "received" | "version" | "branch" | "verdict";
export type SortDirection = "asc" | "desc";

export interface BuildTableFilter {
  branch?: string | null;
  verdict?: Verdict | null;
  /** Case-insensitive substring of the version string. */
  version?: string | null;
  /** Lower-case hex prefix of the commit hash. */
  commitPrefix?: string | null;
  /** Inclusive lower bound on received_at. */
  receivedFrom?: Date | null;
  /** Exclusive upper bound on received_at. */
  receivedBefore?: Date | null;
}

// Verdicts sort by severity (lib/analysis VERDICT_ORDER), not alphabetically.
const VERDICT_RANK_SQL = `case verdict when 'within' then 0 when 'unbanded' then 1 when 'marginal' then 2 when 'missing' then 3 else 4 end`;

// Versions sort as release engineers read them: every run of digits is left-padded
// to 12 places ("dev.9" before "dev.10"), and a release sorts after its own
// pre-releases ("4.2.0-rc.7" before "4.2.0", as in SemVer 2.0.0 §11) because the
// core without a pre-release part is followed by "~", which is above "-" in "C" order.
const naturalKey = (expr: string) => `coalesce((select string_agg(case when t.m[1] ~ '^[0-9]+$' then lpad(t.m[1], 12, '0') else t.m[1] end, '' order by t.n)
  from regexp_matches(${expr}, '([0-9]+|[^0-9]+)', 'g') with ordinality as t(m, n)), '')`;
const VERSION_KEY_SQL = `(${naturalKey("split_part(version, '-', 1)")} || case when position('-' in version) > 0
  then '-' || ${naturalKey("substr(version, position('-' in version) + 1)")} else '~' end) collate "C"`;

const ORDER_SQL: Record<BuildTableColumn, string> = {
  received: "received_at",
  version: VERSION_KEY_SQL,
  branch: `branch collate "C"`,
  verdict: VERDICT_RANK_SQL,
};

function applyFilter(q: Knex.QueryBuilder, f: BuildTableFilter): Knex.QueryBuilder {
  if (f.branch) q.where("branch", f.branch);
  if (f.verdict) q.where("verdict", f.verdict);
  if (f.version) q.whereRaw(`version ilike ? escape '\\'`, [`%${escapeLike(f.version)}%`]);
  if (f.commitPrefix) q.whereRaw(`commit like ? escape '\\'`, [`${escapeLike(f.commitPrefix.toLowerCase())}%`]);
  if (f.receivedFrom) q.where("received_at", ">=", f.receivedFrom);
  if (f.receivedBefore) q.where("received_at", "<", f.receivedBefore);
  return q;
}

/**
 * One page of builds under a filter and a sort of whitelisted columns; ties fall
 * back to newest first so that paging is stable.
 */
export async function listBuildTable({
  db,
  filter,
  sort,
  limit,
  offset,
}: {
  db: Db;
  filter: BuildTableFilter;
  sort: { column: BuildTableColumn; direction: SortDirection };
  limit: number;
  offset: number;
}): Promise<{ rows: BuildRow[]; total: number }> {
  const dir = sort.direction === "asc" ? "asc" : "desc";
  const page = applyFilter(db("builds"), filter)
    .select("*")
    .orderByRaw(`${ORDER_SQL[sort.column]} ${dir}, received_at desc, id desc`)
    .limit(limit)
    .offset(offset);
  const count = applyFilter(db("builds"), filter).count<{ count: number }[]>({ count: "*" });
  const [rows, [{ count: total }]] = await Promise.all([page, count]);
  return { rows, total: Number(total) };
}

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export type VerdictCounts = Record<Verdict, number>;

/** Runs per verdict for each build, in one grouped statement. */
export async function countRunVerdictsByBuildIds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<Map<number, VerdictCounts>> {
  const out = new Map<number, VerdictCounts>();
  if (buildIds.length === 0) return out;
  const rows: { build_id: number; verdict: Verdict; count: number }[] = await db("runs")
    .whereIn("build_id", buildIds as number[])
    .groupBy("build_id", "verdict")
    .select("build_id", "verdict")
    .count({ count: "*" });
  for (const r of rows) {
    const counts = out.get(r.build_id) ?? { within: 0, marginal: 0, outside: 0, unbanded: 0, missing: 0 };
    counts[r.verdict] = Number(r.count);
    out.set(r.build_id, counts);
  }
  return out;
}
