import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";

export interface AuditEntry {
  actorUserId: number | null;
  actorLabel: string;
  action: string;
  entity: string;
  entityId: string | number | null;
  details?: Record<string, unknown>;
  at?: Date;
}

export async function insertAuditEntry({ db, entry }: { db: Db; entry: AuditEntry }) {
  const insert = db("audit_log").insert({
    actor_user_id: entry.actorUserId,
    actor_label: entry.actorLabel,
    action: entry.action,
    entity: entry.entity,
    entity_id: entry.entityId === null ? null : String(entry.entityId),
    details: JSON.stringify(entry.details ?? {}),
    ...(entry.at ? { at: entry.at } : {}),
  });
  await insert.options(prepared(insert.toSQL().sql));
}
