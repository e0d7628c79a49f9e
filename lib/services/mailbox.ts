import "server-only";
import { getDb } from "@/db";
import { listOutboxMessages } from "@/db/queries/outbox";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { listStoredMail, readStoredMail } from "@/lib/mail/eml-store";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";

// The administrator's view of mail: what the local SMTP fake received (the
// .eml files in MAIL_DIR) and what the outbox still owes. Messages carry other
// people's addresses, so only admins may read them.

export async function listMailbox({ actor, first, offset }: { actor: Actor | null; first: number; offset: number }) {
  requirePerson(actor, "admin");
  const dir = getEnv().MAIL_DIR;
  const page = await listStoredMail({ dir, first: Math.min(Math.max(first, 1), 200), offset: Math.max(offset, 0) });
  return { ...page, directory: dir };
}

export async function getMailboxMessage({ actor, name }: { actor: Actor | null; name: string }) {
  requirePerson(actor, "admin");
  const mail = await readStoredMail({ dir: getEnv().MAIL_DIR, name });
  if (!mail) throw new AppError("not_found", `No stored message named "${name}".`);
  return mail;
}

export async function listMailOutbox({ actor, first, unsentOnly }: { actor: Actor | null; first: number; unsentOnly: boolean }) {
  requirePerson(actor, "admin");
  return listOutboxMessages({ db: getDb(), limit: Math.min(Math.max(first, 1), 200), unsentOnly });
}
