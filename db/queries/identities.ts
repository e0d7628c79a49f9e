import "server-only";
import type { Db } from "../index";

export type Role = "developer" | "qa" | "release" | "admin";

export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  password_hash: string;
  active: boolean;
}

export async function getUserByEmail({ db, email }: { db: Db; email: string }): Promise<UserRow | undefined> {
  return db("users").where({ email: email.trim().toLowerCase() }).first();
}

export async function getUserById({ db, id }: { db: Db; id: number }): Promise<UserRow | undefined> {
  return db("users").where({ id }).first();
}

export interface CiTokenRow {
  id: number;
  name: string;
  expires_at: Date | null;
  revoked_at: Date | null;
}

/** A usable token by its hash: not revoked, not expired. Records its use. */
export async function useCiTokenByHash({ db, tokenHash }: { db: Db; tokenHash: string }): Promise<CiTokenRow | undefined> {
  const rows: CiTokenRow[] = await db("ci_tokens")
    .where({ token_hash: tokenHash })
    .whereNull("revoked_at")
    .andWhere((w) => w.whereNull("expires_at").orWhere("expires_at", ">", db.fn.now()))
    .update({ last_used_at: db.fn.now() })
    .returning(["id", "name", "expires_at", "revoked_at"]);
  return rows[0];
}
