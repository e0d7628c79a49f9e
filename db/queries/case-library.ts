import "server-only";
import type { Db } from "../index";
import type { BandRow } from "./library";

// Reads of the case library screens beyond the shared library queries.

/**
 * Quantity keys each case has: those some build reported or derived, plus those a
 * band exists for. The recursive query hops from one distinct (case, quantity) to
 * the next on the trend index, so it costs one index probe per quantity rather
 * than a scan of the case's whole history.
 */
export async function getQuantityKeysByCase({ db, caseKeys }: { db: Db; caseKeys: readonly string[] }): Promise<{ case_key: string; quantity_key: string }[]> {
  if (caseKeys.length === 0) return [];
  const result = await db.raw(
    `with recursive seen as (
      (select case_key, quantity_key from quantity_values where case_key = any(:cases) order by case_key, quantity_key limit 1)
      union all
      select n.case_key, n.quantity_key from seen s cross join lateral (
        select q.case_key, q.quantity_key from quantity_values q
        where q.case_key = any(:cases) and (q.case_key, q.quantity_key) > (s.case_key, s.quantity_key)
        order by q.case_key, q.quantity_key limit 1
      ) n
    )
    select case_key, quantity_key from seen
    union
    select case_key, quantity_key from bands where case_key = any(:cases)
    order by case_key, quantity_key`,
    { cases: caseKeys as string[] },
  );
  return result.rows;
}

/** Grids each case was run on in the newest `recentBuilds` builds (grids of long-gone studies drop out). */
export async function getRecentGridsByCase({ db, caseKeys, recentBuilds }: { db: Db; caseKeys: readonly string[]; recentBuilds: number }): Promise<{ case_key: string; grid: string }[]> {
  if (caseKeys.length === 0) return [];
  return db("runs as r")
    .whereIn("r.case_key", caseKeys as string[])
    .whereIn("r.build_id", db("builds").select("id").orderBy([{ column: "received_at", order: "desc" }, { column: "id", order: "desc" }]).limit(recentBuilds))
    .distinct("r.case_key", "r.grid")
    .orderBy(["r.case_key", "r.grid"]);
}

export interface BandRecordRow extends Omit<BandRow, "fit_settings"> {
  fit_settings: Record<string, unknown> | null;
  author_label: string;
  reason: string;
  valid_from: Date;
  superseded_at: Date | null;
}

/** Every band version of the cases, oldest version first within each scope. */
export async function getBandRecordsByCase({ db, caseKeys }: { db: Db; caseKeys: readonly string[] }): Promise<BandRecordRow[]> {
  if (caseKeys.length === 0) return [];
  return db("bands")
    .whereIn("case_key", caseKeys as string[])
    .orderBy([{ column: "case_key" }, { column: "quantity_key" }, { column: "model_key", order: "asc", nulls: "first" }, { column: "version" }])
    .select(
      "id", "case_key", "quantity_key", "model_key", "version", "kind", "reference", "source", "lower", "upper",
      "marginal_margin", "noise_floor", "fit_settings", "author_label", "reason", "valid_from", "superseded_at",
    );
}
