import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { getDb, type Db } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import {
  expireOpenInvites,
  getAccountById,
  getInviteByHash,
  insertAccount,
  insertInvite,
  lockAccountChanges,
  lockInviteByHash,
  markInviteUsed,
  updateAccountPassword,
  type AccountRow,
} from "@/db/queries/users";
import { getEnv } from "@/lib/env";
import { nudgeMailDelivery } from "@/lib/jobs/nudge";
import { AppError } from "@/lib/errors";
import { acceptInviteSchema, idSchema, INVITE_TOKEN_PATTERN, inviteUserSchema } from "@/lib/validation/users";
import { actorUserId, type Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./builds-view";
import { queuePasswordLinkMail } from "./invite-mail";
import { auditAccount, emailTaken, hashPassword, hashUnusablePassword, requireAccount, toAccount, type Account } from "./users";

// A set-password link is good for a week: long enough to outlast a weekend,
// short enough that a forgotten mail does not stay a way in.
export const INVITE_LIFETIME_MS = 7 * 24 * 3600 * 1000;

export interface PasswordLink {
  account: Account;
  /** Shown to the admin once; only its SHA-256 is stored. */
  url: string;
  expiresAt: Date;
  /** The address the link was also mailed to (through the outbox). */
  mailedTo: string;
}

function hashSecret(secret: string): string {
  return createHash("sha256").update(secret, "utf8").digest("hex");
}

type IssuedLink = { url: string; expiresAt: Date; mailedTo: string; outboxId: number | null };

async function issueLink(db: Db, actor: Actor, account: AccountRow, purpose: "invite" | "reset"): Promise<IssuedLink> {
  const secret = randomBytes(32).toString("base64url");
  const now = new Date();
  const expiresAt = new Date(now.getTime() + INVITE_LIFETIME_MS);
  // One open link per person: a new link voids the older ones.
  await expireOpenInvites({ db, userId: account.id, at: now });
  const inviteId = await insertInvite({ db, userId: account.id, tokenHash: hashSecret(secret), createdBy: actorUserId(actor), expiresAt });
  const url = `${getEnv().APP_URL.replace(/\/$/, "")}/invite/${secret}`;
  const sender = actorUserId(actor) === null ? null : await getAccountById({ db, id: actorUserId(actor)! });
  const outboxId = await queuePasswordLinkMail(db, { inviteId, purpose, to: account, from: sender?.name ?? "A Tauline administrator", url, expiresAt });
  return { url, expiresAt, mailedTo: account.email, outboxId };
}

/** Sends the queued mail once the transaction that queued it has committed. */
async function afterCommit(link: IssuedLink & { account: Account }): Promise<PasswordLink> {
  if (link.outboxId !== null) await nudgeMailDelivery([link.outboxId]);
  return { account: link.account, url: link.url, expiresAt: link.expiresAt, mailedTo: link.mailedTo };
}

/** Creates an account that cannot sign in until its owner sets a password through the link. */
export async function inviteUser({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }): Promise<PasswordLink> {
  requirePerson(actor, "admin");
  const input = parseInput(inviteUserSchema, unsafeInput, "input");
  const placeholder = await hashUnusablePassword();
  const issued = await getDb().transaction(async (trx) => {
    await lockAccountChanges({ db: trx });
    const id = await insertAccount({ db: trx, account: { email: input.email, name: input.name, role: input.role, passwordHash: placeholder, active: false } });
    if (!id) throw emailTaken(input.email);
    const created = await requireAccount(trx, id);
    const link = await issueLink(trx, actor, created, "invite");
    await auditAccount(trx, actor, "user.invited", created, { name: created.name, role: created.role, linkExpiresAt: link.expiresAt.toISOString() });
    return { account: toAccount(await requireAccount(trx, id)), ...link };
  });
  return afterCommit(issued);
}

/**
 * A fresh set-password link for someone still invited (the first link expired or
 * got lost) or for an active person who forgot their password. The old password
 * keeps working until the link is used.
 */
export async function issuePasswordLink({ actor, unsafeUserId }: { actor: Actor | null; unsafeUserId: unknown }): Promise<PasswordLink> {
  requirePerson(actor, "admin");
  const id = parseInput(idSchema, unsafeUserId, "userId");
  const issued = await getDb().transaction(async (trx) => {
    await lockAccountChanges({ db: trx });
    const account = await requireAccount(trx, id);
    if (account.status === "deactivated") throw new AppError("conflict", `${account.email} is deactivated; reactivate the account first.`);
    const link = await issueLink(trx, actor, account, account.status === "invited" ? "invite" : "reset");
    await auditAccount(trx, actor, "user.password_link_issued", account, { status: account.status, linkExpiresAt: link.expiresAt.toISOString() });
    return { account: toAccount(await requireAccount(trx, id)), ...link };
  });
  return afterCommit(issued);
}

export type LinkState = { state: "open"; name: string; email: string; expiresAt: Date } | { state: "used" | "expired" | "unknown" };

/** What the set-password page shows for a link; only the link's holder sees the name it was made for. */
export async function describePasswordLink({ token }: { token: string }): Promise<LinkState> {
  if (!INVITE_TOKEN_PATTERN.test(token)) return { state: "unknown" };
  const db = getDb();
  const invite = await getInviteByHash({ db, tokenHash: hashSecret(token) });
  if (!invite) return { state: "unknown" };
  if (invite.used_at) return { state: "used" };
  const account = await getAccountById({ db, id: invite.user_id });
  if (!account || account.status === "deactivated" || invite.expires_at.getTime() <= Date.now()) return { state: "expired" };
  return { state: "open", name: account.name, email: account.email, expiresAt: invite.expires_at };
}

/**
 * Sets the password through a one-time link and switches the account on. Needs
 * no session: holding the link is the proof. The link is locked while it is used,
 * so a double submit cannot use it twice.
 */
export async function acceptPasswordLink({ unsafeInput }: { unsafeInput: unknown }): Promise<{ email: string }> {
  const input = parseInput(acceptInviteSchema, unsafeInput, "input");
  const passwordHash = await hashPassword(input.password);
  return getDb().transaction(async (trx) => {
    // Account lock first, as every other account change takes it first: no lock-order deadlock.
    await lockAccountChanges({ db: trx });
    const invite = await lockInviteByHash({ db: trx, tokenHash: hashSecret(input.token) });
    const refuse = (message: string) => new AppError("invalid_input", message, [{ path: "input.token", message }]);
    if (!invite) throw refuse("This link is not a set-password link of this server.");
    if (invite.used_at) throw refuse("This link has already been used; sign in with the password you set, or ask an administrator for a new link.");
    const now = new Date();
    if (invite.expires_at.getTime() <= now.getTime()) throw refuse("This link has expired; ask an administrator for a new one.");
    const account = await requireAccount(trx, invite.user_id);
    if (account.status === "deactivated") throw refuse("This account is deactivated; ask an administrator.");
    await updateAccountPassword({ db: trx, id: account.id, passwordHash, at: now });
    await markInviteUsed({ db: trx, id: invite.id, at: now });
    await expireOpenInvites({ db: trx, userId: account.id, at: now });
    await insertAuditEntry({
      db: trx,
      entry: { actorUserId: account.id, actorLabel: account.email, action: "user.password_set", entity: "user", entityId: account.id, details: { email: account.email, from: account.status } },
    });
    return { email: account.email };
  });
}
