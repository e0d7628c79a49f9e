import "server-only";
import { cache } from "react";
import { getServerSession, type Session } from "next-auth";
import { getToken } from "next-auth/jwt";
import { cookies } from "next/headers";
import { getDb } from "@/db";
import { getSessionAccount, type SessionAccount } from "@/db/queries/users";
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
  const account = await getCurrentAccount(userId, session.signedInAt ?? 0);
  if (!account) return null;
  return { ...session, user: { ...session.user, id: account.id, role: account.role, name: account.name, email: account.email } };
});

/** The signed-in person as an Actor for the services, or null. */
export async function getSessionActor(): Promise<Actor | null> {
  const session = await getCurrentSession();
  if (!session?.user?.id || !session.user.role) return null;
  return { kind: "user", userId: session.user.id, role: session.user.role, label: session.user.email ?? `user ${session.user.id}` };
}

/** The account behind a session, or undefined when it is switched off or the session predates its cut-off. */
async function getCurrentAccount(userId: number, signedInAt: number): Promise<SessionAccount | undefined> {
  const account = await getSessionAccount({ db: getDb(), id: userId });
  if (!account || !account.active) return undefined;
  if (account.sessions_valid_from && signedInAt < account.sessions_valid_from.getTime()) return undefined;
  return account;
}

/**
 * The signed-in person behind an API request (GraphQL). Same checks as
 * getSessionActor, but the session JWT is decrypted directly from the cookie:
 * next-auth's getServerSession runs its whole session endpoint (callbacks, a
 * re-encrypted token) on every call, a fixed cost each small query paid.
 */
export async function getRequestActor(): Promise<Actor | null> {
  // getToken reads only the session cookie and, failing that, an Authorization
  // header; the headers are left empty on purpose: a bearer header is a CI
  // token (graphql/context.ts) and must never be taken for a session.
  const request = { cookies: await cookies(), headers: {} } as unknown as Parameters<typeof getToken>[0]["req"];
  const token = await getToken({ req: request, secret: authOptions.secret });
  const userId = token?.userId;
  if (typeof userId !== "number") return null;
  const account = await getCurrentAccount(userId, typeof token?.signedInAt === "number" ? token.signedInAt : 0);
  if (!account) return null;
  return { kind: "user", userId: account.id, role: account.role, label: account.email };
}
