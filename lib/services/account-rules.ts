import type { Role } from "@/db/queries/identities";
import { AppError } from "@/lib/errors";

// The rules that keep the service administrable, apart from the I/O so that
// each one is unit-tested: nobody locks themselves out, and some active
// administrator always remains.

export type AccountStatus = "active" | "invited" | "deactivated";
export type AccountChange = { kind: "role"; role: Role } | { kind: "deactivate" };

export interface AccountChangeFacts {
  /** Null when the system (a script) acts rather than a person. */
  actorUserId: number | null;
  target: { id: number; role: Role; status: AccountStatus };
  change: AccountChange;
  /** Active administrators counted inside the same locked transaction. */
  activeAdmins: number;
}

/** Why the change is refused, or null when it may go ahead. */
export function refuseAccountChange({ actorUserId, target, change, activeAdmins }: AccountChangeFacts): AppError | null {
  const self = actorUserId !== null && actorUserId === target.id;
  if (change.kind === "deactivate" && self) return new AppError("forbidden", "You cannot deactivate your own account.");
  if (change.kind === "role" && self && change.role !== target.role) return new AppError("forbidden", "You cannot change your own role; ask another administrator.");
  const losesAdmin = target.role === "admin" && target.status === "active" && (change.kind === "deactivate" || change.role !== "admin");
  if (losesAdmin && activeAdmins <= 1) {
    const verb = change.kind === "deactivate" ? "deactivate" : "take the admin role from";
    return new AppError("conflict", `You cannot ${verb} the last active administrator; make someone else admin first.`);
  }
  return null;
}
