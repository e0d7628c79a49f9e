import "server-only";
import type { Db } from "../index";

export interface GateDecisionRow {
  id: number;
  build_id: number;
  state: "approved" | "held" | "rejected";
  comment: string;
  decided_by: number;
  decided_at: Date;
  decided_by_name: string;
  decided_by_email: string;
}

/** The newest decision of each build (a build without one is pending). */
export async function getLatestDecisionsByBuildIds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<GateDecisionRow[]> {
  if (buildIds.length === 0) return [];
  return db("gate_decisions as d")
    .join("users as u", "u.id", "d.decided_by")
    .whereIn("d.build_id", buildIds as number[])
    .distinctOn("d.build_id")
    .orderBy([{ column: "d.build_id" }, { column: "d.decided_at", order: "desc" }, { column: "d.id", order: "desc" }])
    .select("d.*", "u.name as decided_by_name", "u.email as decided_by_email");
}

export async function insertGateDecision({
  db,
  buildId,
  state,
  comment,
  userId,
  decidedAt,
}: {
  db: Db;
  buildId: number;
  state: GateDecisionRow["state"];
  comment: string;
  userId: number;
  decidedAt?: Date;
}): Promise<number> {
  const [{ id }] = await db("gate_decisions")
    .insert({ build_id: buildId, state, comment, decided_by: userId, ...(decidedAt ? { decided_at: decidedAt } : {}) })
    .returning("id");
  return id;
}
