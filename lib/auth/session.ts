import "server-only";
import { cache } from "react";
import { getServerSession } from "next-auth";
import type { Actor } from "@/lib/services/actor";
import { authOptions } from "./options";

export const getCurrentSession = cache(() => getServerSession(authOptions));

/** The signed-in person as an Actor for the services, or null. */
export async function getSessionActor(): Promise<Actor | null> {
  const session = await getCurrentSession();
  if (!session?.user?.id || !session.user.role) return null;
  return { kind: "user", userId: session.user.id, role: session.user.role, label: session.user.email ?? `user ${session.user.id}` };
}
