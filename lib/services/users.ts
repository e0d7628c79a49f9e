import "server-only";
import { randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { getDb, type Db } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import {
  countActiveAdmins,
  expireOpenInvites,
  getAccountById,
  insertAccount,
  listAccounts,
  lockAccountChanges,
  updateAccountActive,
  updateAccountRole,
  type AccountRow,
} from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { createUserSchema, idSchema, setRoleSchema } from "@/lib/validation/users";
import { refuseAccountChange, type AccountChange } from "./account-rules";
import { actorUserId, type Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./builds-view";

// bcrypt cost 11 (2^11 rounds, about 0.1 s per check on this hardware): above the
// common minimum of 10, the same cost the demo seed uses.
export const PASSWORD_COST = 11;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, PASSWORD_COST);
}

/** A hash of a random secret nobody knows: the account exists but no password opens it yet. */
export function hashUnusablePassword(): Promise<string> {
  return bcrypt.hash(randomBytes(32).toString("base64url"), PASSWORD_COST);
}

export function toAccount(row: AccountRow) {
  return {
    id: String(row.id),
    name: row.name,
    email: row.email,
    role: row.role,
    status: row.status,
    createdAt: row.created_at,
    deactivatedAt: row.deactivated_at,
    inviteExpiresAt: row.invite_expires_at,
    hasPassword: row.has_password,
  };
}
export type Account = ReturnType<typeof toAccount>;

export async function listUserAccounts({ actor }: { actor: Actor | null }): Promise<Account[]> {
  requirePerson(actor, "admin");
  return (await listAccounts({ db: getDb() })).map(toAccount);
}

/** Loads the person an admin acts on, or says there is no such account. */
export async function requireAccount(db: Db, id: number): Promise<AccountRow> {
  const row = await getAccountById({ db, id });
  if (!row) throw new AppError("not_found", `There is no account with id ${id}.`);
  return row;
}

export function auditAccount(db: Db, actor: Actor, action: string, account: AccountRow, details: Record<string, unknown>) {
  return insertAuditEntry({
    db,
    entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action, entity: "user", entityId: account.id, details: { email: account.email, ...details } },
  });
}

/** An account that can sign in at once with the password the admin chose (never stored or returned in clear). */
export async function createUserAccount({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }): Promise<Account> {
  requirePerson(actor, "admin");
  const input = parseInput(createUserSchema, unsafeInput, "input");
  const passwordHash = await hashPassword(input.password);
  return getDb().transaction(async (trx) => {
    await lockAccountChanges({ db: trx });
    const id = await insertAccount({ db: trx, account: { email: input.email, name: input.name, role: input.role, passwordHash, active: true } });
    if (!id) throw emailTaken(input.email);
    const row = await requireAccount(trx, id);
    await auditAccount(trx, actor, "user.created", row, { name: row.name, role: row.role });
    return toAccount(row);
  });
}

export function emailTaken(email: string) {
  return new AppError("conflict", `${email} already has an account.`, [{ path: "input.email", message: "already has an account" }]);
}

export async function setUserRole({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }): Promise<Account> {
  requirePerson(actor, "admin");
  const input = parseInput(setRoleSchema, unsafeInput);
  return getDb().transaction(async (trx) => {
    await lockAccountChanges({ db: trx });
    const before = await requireAccount(trx, input.userId);
    await requireChangeAllowed(trx, actor, before, { kind: "role", role: input.role });
    if (before.role === input.role) return toAccount(before);
    await updateAccountRole({ db: trx, id: before.id, role: input.role });
    await auditAccount(trx, actor, "user.role_changed", before, { from: before.role, to: input.role });
    return toAccount(await requireAccount(trx, before.id));
  });
}

async function requireChangeAllowed(db: Db, actor: Actor, target: AccountRow, change: AccountChange) {
  const refusal = refuseAccountChange({ actorUserId: actorUserId(actor), target, change, activeAdmins: await countActiveAdmins({ db }) });
  if (refusal) throw refusal;
}

/** Switches an account off. Its session cookies stop working on the next request (lib/auth/session.ts). */
export async function deactivateUserAccount({ actor, unsafeUserId }: { actor: Actor | null; unsafeUserId: unknown }): Promise<Account> {
  requirePerson(actor, "admin");
  const id = parseInput(idSchema, unsafeUserId, "userId");
  return getDb().transaction(async (trx) => {
    await lockAccountChanges({ db: trx });
    const before = await requireAccount(trx, id);
    await requireChangeAllowed(trx, actor, before, { kind: "deactivate" });
    if (before.status === "deactivated") return toAccount(before);
    const at = new Date();
    await updateAccountActive({ db: trx, id, active: false, deactivatedAt: at });
    await expireOpenInvites({ db: trx, userId: id, at });
    await auditAccount(trx, actor, "user.deactivated", before, { from: before.status });
    return toAccount(await requireAccount(trx, id));
  });
}

/**
 * Switches an account back on. Someone who was invited but never set a password
 * goes back to "invited" (they need a new set-password link), not to "active".
 */
export async function reactivateUserAccount({ actor, unsafeUserId }: { actor: Actor | null; unsafeUserId: unknown }): Promise<Account> {
  requirePerson(actor, "admin");
  const id = parseInput(idSchema, unsafeUserId, "userId");
  return getDb().transaction(async (trx) => {
    await lockAccountChanges({ db: trx });
    const before = await requireAccount(trx, id);
    if (before.status !== "deactivated") return toAccount(before);
    await updateAccountActive({ db: trx, id, active: before.has_password, deactivatedAt: null });
    const after = await requireAccount(trx, id);
    await auditAccount(trx, actor, "user.reactivated", before, { to: after.status });
    return toAccount(after);
  });
}
