import { formatUtc } from "@/components/builds/format-time";
import type { AccountChange } from "@/graphql/operations/admin";
import { ROLE_NAMES } from "./account-words";
import type { Role } from "@/lib/validation/users";

// An audit entry about a person or a token as one sentence (the actor is shown beside it).

const text = (v: unknown): string => (typeof v === "string" ? v : "");
const role = (v: unknown): string => ROLE_NAMES[v as Role] ?? text(v);

export function describeChange(c: Pick<AccountChange, "action" | "entity" | "entityId" | "details">): string {
  const d = c.details;
  const who = text(d.email) || `account ${c.entityId ?? "?"}`;
  const token = `CI token “${text(d.name) || c.entityId}”`;
  switch (c.action) {
    case "user.created":
      return `added ${who} as ${role(d.role)}, with a first password`;
    case "user.invited":
      return `invited ${who} as ${role(d.role)}`;
    case "user.password_link_issued":
      return `issued a set-password link for ${who}`;
    case "user.role_changed":
      return `changed the role of ${who} from ${role(d.from)} to ${role(d.to)}`;
    case "user.deactivated":
      return `switched off ${who}`;
    case "user.reactivated":
      return d.to === "invited" ? `reactivated ${who} (invited again: no password set yet)` : `reactivated ${who}`;
    case "user.password_set":
      return `set the password of ${who} through a link`;
    case "ci_token.created":
      return d.expiresAt ? `created ${token}, valid until ${formatUtc(text(d.expiresAt))}` : `created ${token}, without expiry`;
    case "ci_token.revoked":
      return `revoked ${token}`;
    default:
      return `${c.action} on ${c.entity} ${c.entityId ?? ""}`.trim();
  }
}
