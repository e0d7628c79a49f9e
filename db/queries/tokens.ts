import "server-only";
import type { Db } from "../index";

export type TokenStatus = "usable" | "expired" | "revoked";

export interface TokenRow {
  id: number;
  name: string;
  created_at: Date;
  created_by_name: string | null;
  expires_at: Date | null;
  revoked_at: Date | null;
  last_used_at: Date | null;
  status: TokenStatus;
}

// The same rule graphql/context.ts applies when a token arrives (useCiTokenByHash),
// written once more here only to label the list.
const STATUS_SQL = "case when t.revoked_at is not null then 'revoked' when t.expires_at is not null and t.expires_at <= now() then 'expired' else 'usable' end";

function selectTokens(db: Db) {
  return db("ci_tokens as t")
    .leftJoin("users as u", "u.id", "t.created_by")
    .select("t.id", "t.name", "t.created_at", "t.expires_at", "t.revoked_at", "t.last_used_at", "u.name as created_by_name", db.raw(`${STATUS_SQL} as status`));
}

/** Usable tokens first, then the newest; the secret is never stored, so never listed. */
export async function listTokens({ db }: { db: Db }): Promise<TokenRow[]> {
  return selectTokens(db).orderByRaw(`(${STATUS_SQL}) = 'usable' desc, t.created_at desc, t.id desc`);
}

export async function getTokenById({ db, id }: { db: Db; id: number }): Promise<TokenRow | undefined> {
  return selectTokens(db).where("t.id", id).first();
}

export async function insertToken({ db, name, tokenHash, createdBy, expiresAt }: { db: Db; name: string; tokenHash: string; createdBy: number | null; expiresAt: Date | null }): Promise<number> {
  const [row] = await db("ci_tokens").insert({ name, token_hash: tokenHash, created_by: createdBy, expires_at: expiresAt }).returning("id");
  return row.id;
}

/** Revokes a token that is not revoked yet; returns false when there was nothing to revoke. */
export async function revokeToken({ db, id, at }: { db: Db; id: number; at: Date }): Promise<boolean> {
  const count = await db("ci_tokens").where({ id }).whereNull("revoked_at").update({ revoked_at: at });
  return count > 0;
}
