import "server-only";
import type { Db } from "../index";

export interface AdminChangeRow {
  id: number;
  at: Date;
  actor_label: string;
  action: string;
  entity: string;
  entity_id: string | null;
  details: Record<string, unknown>;
}

/** The newest audit entries about people and CI tokens (the administration page's change record). */
export async function listAdminChanges({ db, limit }: { db: Db; limit: number }): Promise<AdminChangeRow[]> {
  return db("audit_log")
    .whereIn("entity", ["user", "ci_token"])
    .orderBy([{ column: "at", order: "desc" }, { column: "id", order: "desc" }])
    .limit(limit)
    .select("id", "at", "actor_label", "action", "entity", "entity_id", "details");
}
