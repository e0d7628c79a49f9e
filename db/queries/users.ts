import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";
import type { Role } from "./identities";

export type AccountStatus = "active" | "invited" | "deactivated";

export interface AccountRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  status: AccountStatus;
  created_at: Date;
  deactivated_at: Date | null;
  /** Expiry of the newest unused set-password link, if one is open. */
  invite_expires_at: Date | null;
  /** False for someone invited who never set a password (reactivating them re-invites). */
  has_password: boolean;
}

// Status is derived, not stored twice: `active` says whether sign-in works,
// `deactivated_at` tells a switched-off account from one still waiting for its invite.
const STATUS_SQL = "case when u.active then 'active' when u.deactivated_at is not null then 'deactivated' else 'invited' end";
// A user who has invites but never used one was created by invitation and has no password of their own.
const HAS_PASSWORD_SQL =
  "(not exists (select 1 from user_invites i where i.user_id = u.id) or exists (select 1 from user_invites i where i.user_id = u.id and i.used_at is not null))";
const OPEN_INVITE_SQL = "(select max(i.expires_at) from user_invites i where i.user_id = u.id and i.used_at is null and i.expires_at > now())";

function selectAccounts(db: Db) {
  return db("users as u").select(
    "u.id",
    "u.email",
    "u.name",
    "u.role",
    "u.created_at",
    "u.deactivated_at",
    db.raw(`${STATUS_SQL} as status`),
    db.raw(`${OPEN_INVITE_SQL} as invite_expires_at`),
    db.raw(`${HAS_PASSWORD_SQL} as has_password`),
  );
}

export async function listAccounts({ db }: { db: Db }): Promise<AccountRow[]> {
  return selectAccounts(db).orderByRaw("u.active desc, u.deactivated_at nulls first, lower(u.name), u.id");
}

export async function getAccountById({ db, id }: { db: Db; id: number }): Promise<AccountRow | undefined> {
  return selectAccounts(db).where("u.id", id).first();
}

/**
 * Serialises every change to accounts (roles, activation, new accounts) in one
 * transaction-scoped lock: two admins demoting or deactivating each other at the
 * same moment would otherwise both see "another admin is left" and leave none.
 * Account changes are rare, so one queue for all of them costs nothing.
 */
export async function lockAccountChanges({ db }: { db: Db }) {
  await db.raw("select pg_advisory_xact_lock(hashtext('tauline:account-changes'))");
}

export async function countActiveAdmins({ db }: { db: Db }): Promise<number> {
  const [{ count }] = await db("users").where({ role: "admin", active: true }).count<{ count: number }[]>({ count: "*" });
  return Number(count);
}

export async function insertAccount({
  db,
  account,
}: {
  db: Db;
  account: { email: string; name: string; role: Role; passwordHash: string; active: boolean };
}): Promise<number> {
  const [row] = await db("users")
    .insert({ email: account.email, name: account.name, role: account.role, password_hash: account.passwordHash, active: account.active })
    .onConflict("email")
    .ignore()
    .returning("id");
  return row?.id ?? 0;
}

export async function updateAccountRole({ db, id, role }: { db: Db; id: number; role: Role }) {
  await db("users").where({ id }).update({ role });
}

/** Switching off also cuts off every session signed in so far, so switching back on does not revive them. */
export async function updateAccountActive({ db, id, active, deactivatedAt }: { db: Db; id: number; active: boolean; deactivatedAt: Date | null }) {
  await db("users")
    .where({ id })
    .update({ active, deactivated_at: deactivatedAt, ...(deactivatedAt ? { sessions_valid_from: deactivatedAt } : {}) });
}

/** A new password ends every session opened with the old one. */
export async function updateAccountPassword({ db, id, passwordHash, at }: { db: Db; id: number; passwordHash: string; at: Date }) {
  await db("users").where({ id }).update({ password_hash: passwordHash, active: true, deactivated_at: null, sessions_valid_from: at });
}

/** What a session needs to know on every request: is the person still allowed in, and with which role. */
export interface SessionAccount {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** Sessions signed in before this are refused (set on deactivation and on a password set through a link). */
  sessions_valid_from: Date | null;
}

const SESSION_ACCOUNT = "select id, email, name, role, active, sessions_valid_from from users where id = ?";

/** Read on every signed-in request (lib/auth/session.ts), hence prepared, and fixed text (no builder to compile each time). */
export async function getSessionAccount({ db, id }: { db: Db; id: number }): Promise<SessionAccount | undefined> {
  const result: { rows: SessionAccount[] } = await db.raw(SESSION_ACCOUNT, [id]).options(prepared(SESSION_ACCOUNT));
  return result.rows[0];
}

export interface InviteRow {
  id: number;
  user_id: number;
  expires_at: Date;
  used_at: Date | null;
}

export async function insertInvite({ db, userId, tokenHash, createdBy, expiresAt }: { db: Db; userId: number; tokenHash: string; createdBy: number | null; expiresAt: Date }): Promise<number> {
  const [row] = await db("user_invites").insert({ user_id: userId, token_hash: tokenHash, created_by: createdBy, expires_at: expiresAt }).returning("id");
  return row.id;
}

/** Closes every open link of a person (a new link replaces them; a deactivation voids them). */
export async function expireOpenInvites({ db, userId, at }: { db: Db; userId: number; at: Date }) {
  await db("user_invites").where({ user_id: userId }).whereNull("used_at").andWhere("expires_at", ">", at).update({ expires_at: at });
}

/** The invite behind a link, locked so the same link cannot set two passwords at once. */
export async function lockInviteByHash({ db, tokenHash }: { db: Db; tokenHash: string }): Promise<InviteRow | undefined> {
  return db("user_invites").where({ token_hash: tokenHash }).forUpdate().first("id", "user_id", "expires_at", "used_at");
}

export async function getInviteByHash({ db, tokenHash }: { db: Db; tokenHash: string }): Promise<InviteRow | undefined> {
  return db("user_invites").where({ token_hash: tokenHash }).first("id", "user_id", "expires_at", "used_at");
}

export async function markInviteUsed({ db, id, at }: { db: Db; id: number; at: Date }) {
  await db("user_invites").where({ id }).update({ used_at: at });
}
