import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";

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

const USE_CI_TOKEN = `with usable as (
       select id, name, expires_at, revoked_at, last_used_at from ci_tokens
        where token_hash = ? and revoked_at is null and (expires_at is null or expires_at > now())
     ), touched as (
       update ci_tokens set last_used_at = now() from usable
        where ci_tokens.id = usable.id and (usable.last_used_at is null or usable.last_used_at < now() - interval '1 minute')
       returning ci_tokens.id
     )
     select id, name, expires_at, revoked_at from usable`;

/**
 * A usable token by its hash: not revoked, not expired. Records its use, at most
 * once a minute: every CI request would otherwise write (and row-lock) the same
 * token row, which serialises concurrent submissions behind one another.
 */
export async function useCiTokenByHash({ db, tokenHash }: { db: Db; tokenHash: string }): Promise<CiTokenRow | undefined> {
  const result = await db.raw<{ rows: CiTokenRow[] }>(USE_CI_TOKEN, [tokenHash]).options(prepared(USE_CI_TOKEN));
  return result.rows[0];
}

