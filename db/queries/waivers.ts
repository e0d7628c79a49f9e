import "server-only";
import type { Db } from "../index";

export interface WaiverRow {
  id: number;
  case_key: string;
  quantity_key: string;
  model_key: string | null;
  branch: string | null;
  reason: string;
  granted_by: number;
  granted_at: Date;
  expires_at: Date;
  revoked_at: Date | null;
  revoked_by: number | null;
  revoke_reason: string | null;
  granted_by_name: string;
  revoked_by_name: string | null;
}

const COLUMNS = ["w.*", "g.name as granted_by_name", "r.name as revoked_by_name"];

function withPeople(db: Db) {
  return db("waivers as w").join("users as g", "g.id", "w.granted_by").leftJoin("users as r", "r.id", "w.revoked_by");
}

/**
 * Waivers not withdrawn and not expired at `at` for these cases that hold on
 * `branch` (theirs, or every branch). `lock` takes a share lock so that a concurrent revocation
 * waits for the decision that relies on the waiver (and vice versa).
 */
export async function getWaiversInForce({ db, caseKeys, branch, at, lock = false }: { db: Db; caseKeys: readonly string[]; branch: string | null; at: Date; lock?: boolean }): Promise<WaiverRow[]> {
  if (caseKeys.length === 0) return [];
  const q = withPeople(db)
    .whereIn("w.case_key", caseKeys as string[])
    .whereNull("w.revoked_at")
    .where("w.granted_at", "<=", at)
    .where("w.expires_at", ">", at)
    .orderBy([{ column: "w.expires_at", order: "desc" }, { column: "w.id" }])
    .select(COLUMNS);
  // null: the waivers of every branch (a list of candidates spans several).
  if (branch !== null) q.where((b) => b.whereNull("w.branch").orWhere("w.branch", branch));
  if (lock) q.forShare("w");
  return q;
}

/** Every waiver of a scope, newest grant first; ended ones (expired or withdrawn) only when asked. */
export async function listWaivers({ db, caseKey, branch, includeEnded, at, limit }: { db: Db; caseKey?: string | null; branch?: string | null; includeEnded: boolean; at: Date; limit: number }): Promise<WaiverRow[]> {
  const q = withPeople(db)
    .orderBy([{ column: "w.granted_at", order: "desc" }, { column: "w.id", order: "desc" }])
    .limit(limit)
    .select(COLUMNS);
  if (caseKey) q.where("w.case_key", caseKey);
  if (branch) q.where((b) => b.whereNull("w.branch").orWhere("w.branch", branch));
  if (!includeEnded) q.whereNull("w.revoked_at").where("w.expires_at", ">", at);
  return q;
}

export async function getWaiverById({ db, id, lock = false }: { db: Db; id: number; lock?: boolean }): Promise<WaiverRow | undefined> {
  const q = withPeople(db).where("w.id", id).first(COLUMNS);
  if (lock) q.forUpdate("w");
  return q;
}

export async function insertWaiver({
  db,
  waiver,
  userId,
  at,
}: {
  db: Db;
  waiver: { caseKey: string; quantityKey: string; modelKey: string | null; branch: string | null; reason: string; expiresAt: Date };
  userId: number;
  at: Date;
}): Promise<number> {
  const [{ id }] = await db("waivers")
    .insert({
      case_key: waiver.caseKey,
      quantity_key: waiver.quantityKey,
      model_key: waiver.modelKey,
      branch: waiver.branch,
      reason: waiver.reason,
      granted_by: userId,
      granted_at: at,
      expires_at: waiver.expiresAt,
    })
    .returning("id");
  return Number(id);
}

export async function markWaiverRevoked({ db, id, userId, reason, at }: { db: Db; id: number; userId: number; reason: string; at: Date }) {
  await db("waivers").where({ id }).whereNull("revoked_at").update({ revoked_at: at, revoked_by: userId, revoke_reason: reason });
}
