import type { Role } from "@/db/queries/identities";
import { AppError } from "@/lib/errors";
import { roleAllows, type Actor } from "./actor";

// The guards every service starts with. Roles are enforced here, on the server,
// never only by what the interface shows.
export function requireSignedIn(actor: Actor | null): asserts actor is Actor {
  if (!actor) throw new AppError("unauthorized", "Sign in or send a valid CI token.");
}

export function requirePerson(actor: Actor | null, needed: Role = "developer"): asserts actor is Actor {
  requireSignedIn(actor);
  if (actor.kind === "system") return;
  if (actor.kind !== "user") throw new AppError("forbidden", "A CI token may only submit results and read the release gate.");
  if (!roleAllows(actor.role, needed)) throw new AppError("forbidden", `This needs the ${needed} role; you have ${actor.role}.`);
}

export function requireSubmitter(actor: Actor | null): asserts actor is Actor {
  requireSignedIn(actor);
  if (actor.kind === "ci" || actor.kind === "system") return;
  // People may upload manual runs through the same contract (developer and up).
  if (!roleAllows(actor.role, "developer")) throw new AppError("forbidden", "Submitting results needs the developer role.");
}
