import "server-only";
import { cache } from "react";
import { getServerSession, type Session } from "next-auth";
import { getDb } from "@/db";
import { getSessionAccount } from "@/db/queries/users";
import type { Actor } from "@/lib/services/actor";
import { authOptions } from "./options";

/**
 * The signed-in person, checked against the database on every request. Sessions
 * are JWTs that live for hours, so the token alone would keep a deactivated
 * person in and keep an old role; here a deactivated account counts as signed
 * out at once, so does a session older than the account's cut-off (a switch-off
 * or a password set through a link), and the role, name and e-mail are the
 * current ones. React's cache
 * makes this one query per server render; a route handler (GraphQL) calls it
 * once per request through its context.
 */
export const getCurrentSession = cache(async (): Promise<Session | null> => {
  const session = await getServerSession(authOptions);
  const userId = session?.user?.id;
  if (!session?.user || typeof userId !== "number") return null;
  const account = await getSessionAccount({ db: getDb(), id: userId });
  if (!account || !account.active) return null;
  if (account.sessions_valid_from && (session.signedInAt ?? 0) < account.sessions_valid_from.getTime()) return null;
  return { ...session, user: { ...session.user, id: account.id, role: account.role, name: account.name, email: account.email } };
});

/** The signed-in person as an Actor for the services, or null. */
export async function getSessionActor(): Promise<Actor | null> {
  const session = await getCurrentSession();
  if (!session?.user?.id || !session.user.role) return null;
  return { kind: "user", userId: session.user.id, role: session.user.role, label: session.user.email ?? `user ${session.user.id}` };
}
