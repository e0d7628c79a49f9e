import { formatUtc } from "@/components/builds/format-time";
import type { UserAccount } from "@/graphql/operations/admin";
import type { Role } from "@/lib/validation/users";

// How the administration screen words roles and account states.

export const ROLE_NAMES: Record<Role, string> = {
  developer: "solver developer",
  qa: "QA lead",
  release: "release manager",
  admin: "administrator",
};

export const ROLE_DUTIES: Record<Role, string> = {
  developer: "reads everything, compares builds, subscribes to alerts",
  qa: "also edits cases, quantities and tolerance bands",
  release: "also approves, holds or rejects releases and grants waivers",
  admin: "people, roles and CI tokens; may do everything",
};

/** One line that says whether the person can get in, and what waits for them if not. */
export function describeStatus(a: Pick<UserAccount, "status" | "deactivatedAt" | "inviteExpiresAt" | "hasPassword">, now = Date.now()): { mark: string; tone: string; text: string } {
  if (a.status === "active") {
    const link = a.inviteExpiresAt && Date.parse(a.inviteExpiresAt) > now ? `password link open until ${formatUtc(a.inviteExpiresAt)}` : "";
    return { mark: "●", tone: "text-verdict-within", text: link };
  }
  if (a.status === "deactivated") return { mark: "✕", tone: "text-verdict-outside", text: a.deactivatedAt ? `switched off ${formatUtc(a.deactivatedAt)}` : "switched off" };
  if (a.inviteExpiresAt && Date.parse(a.inviteExpiresAt) > now) return { mark: "◌", tone: "text-verdict-marginal", text: `waits for the password, link open until ${formatUtc(a.inviteExpiresAt)}` };
  return { mark: "◌", tone: "text-verdict-marginal", text: "waits for the password; the link has expired, issue a new one" };
}

const dateOnly = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });
export function formatDay(iso: string): string {
  return dateOnly.format(new Date(iso));
}
