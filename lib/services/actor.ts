import type { Role } from "@/db/queries/identities";

// Who is calling: a CI pipeline by token, a signed-in person, or the system itself
// (seed, migrations). Every service takes one and checks it before doing anything.
export type Actor =
  | { kind: "ci"; tokenId: number; label: string }
  | { kind: "user"; userId: number; role: Role; label: string }
  | { kind: "system"; label: string };

export const ROLE_RANK: Record<Role, number> = { developer: 1, qa: 2, release: 2, admin: 3 };

/** Whether a person's role allows an action that needs `needed` (admin implies all). */
export function roleAllows(role: Role, needed: Role): boolean {
  if (role === "admin") return true;
  if (needed === "developer") return true;
  return role === needed;
}

export function actorUserId(actor: Actor): number | null {
  return actor.kind === "user" ? actor.userId : null;
}
