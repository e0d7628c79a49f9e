import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { getDb, type Db } from "@/db";
import { listAdminChanges } from "@/db/queries/admin-changes";
import { insertAuditEntry } from "@/db/queries/audit";
import { getTokenById, insertToken, listTokens, revokeToken, type TokenRow } from "@/db/queries/tokens";
import { AppError } from "@/lib/errors";
import { ciTokenSchema, idSchema } from "@/lib/validation/users";
import { actorUserId, type Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./builds-view";

// CI tokens: the secret is made here, shown once, and only its SHA-256 is kept
// (graphql/context.ts hashes each Bearer header the same way to find the token).

export function toCiToken(row: TokenRow) {
  return {
    id: String(row.id),
    name: row.name,
    createdAt: row.created_at,
    createdBy: row.created_by_name,
    expiresAt: row.expires_at,
    lastUsedAt: row.last_used_at,
    revokedAt: row.revoked_at,
    status: row.status,
  };
}

/** 32 random bytes (256 bits) in base64url behind a recognisable prefix. */
export function generateTokenSecret(): string {
  return `tl_${randomBytes(32).toString("base64url")}`;
}

async function requireToken(db: Db, id: number): Promise<TokenRow> {
  const row = await getTokenById({ db, id });
  if (!row) throw new AppError("not_found", `There is no CI token with id ${id}.`);
  return row;
}

export async function listCiTokens({ actor }: { actor: Actor | null }) {
  requirePerson(actor, "admin");
  return (await listTokens({ db: getDb() })).map(toCiToken);
}

export async function createCiToken({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "admin");
  const input = parseInput(ciTokenSchema, unsafeInput, "input");
  const secret = generateTokenSecret();
  return getDb().transaction(async (trx) => {
    const id = await insertToken({ db: trx, name: input.name, tokenHash: createHash("sha256").update(secret, "utf8").digest("hex"), createdBy: actorUserId(actor), expiresAt: input.expiresAt });
    await insertAuditEntry({
      db: trx,
      entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action: "ci_token.created", entity: "ci_token", entityId: id, details: { name: input.name, expiresAt: input.expiresAt?.toISOString() ?? null } },
    });
    return { token: toCiToken(await requireToken(trx, id)), secret };
  });
}

/** Revokes at once: the next request with this token gets 401 (the context checks revoked_at on every request). */
export async function revokeCiToken({ actor, unsafeId }: { actor: Actor | null; unsafeId: unknown }) {
  requirePerson(actor, "admin");
  const id = parseInput(idSchema, unsafeId, "id");
  return getDb().transaction(async (trx) => {
    const before = await requireToken(trx, id);
    const at = new Date();
    if (!(await revokeToken({ db: trx, id, at }))) throw new AppError("conflict", `The token "${before.name}" was already revoked.`);
    await insertAuditEntry({
      db: trx,
      entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action: "ci_token.revoked", entity: "ci_token", entityId: id, details: { name: before.name, wasStatus: before.status } },
    });
    return toCiToken(await requireToken(trx, id));
  });
}

/** The change record of the administration page: who changed which person or token, newest first. */
export async function listAccountChanges({ actor, unsafeLimit }: { actor: Actor | null; unsafeLimit: unknown }) {
  requirePerson(actor, "admin");
  const limit = parseInput(idSchema.max(200, "must not exceed 200"), unsafeLimit ?? 25, "last");
  const rows = await listAdminChanges({ db: getDb(), limit });
  return rows.map((r) => ({ id: String(r.id), at: r.at, actor: r.actor_label, action: r.action, entity: r.entity, entityId: r.entity_id, details: r.details }));
}
