import "server-only";
import type { Db } from "@/db";
import { insertOutboxMessage } from "@/db/queries/outbox";
import { getEnv } from "@/lib/env";
import { html, link } from "@/lib/mail/html";
import { MAIL_STYLE, mailPage } from "@/lib/mail/layout";
import type { Role } from "@/lib/validation/users";

// The set-password link as mail, queued in the same transaction as the link
// (the outbox sends it once, retrying while SMTP is down). The link is a secret:
// the message goes to the account's own address only.

const ROLE_WORDS: Record<Role, string> = {
  developer: "solver developer (read everything, compare builds, subscribe to alerts)",
  qa: "QA lead (cases, quantities and tolerance bands)",
  release: "release manager (release decisions and waivers)",
  admin: "administrator (people, roles and CI tokens)",
};

const utc = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export interface PasswordLinkMail {
  inviteId: number;
  purpose: "invite" | "reset";
  to: { name: string; email: string; role: Role };
  from: string;
  url: string;
  expiresAt: Date;
}

export function composePasswordLinkMail(m: PasswordLinkMail, appUrl: string) {
  const until = `${utc.format(m.expiresAt)} UTC`;
  const what =
    m.purpose === "invite"
      ? `${m.from} has made you a Tauline account as ${ROLE_WORDS[m.to.role]}. Tauline keeps the canonical-case results of every Cormorant build, their tolerance bands and the release decisions.`
      : `${m.from} has sent you a link to set a new Tauline password. Your current password keeps working until you use the link; then sessions opened with the old password end.`;
  const subject = m.purpose === "invite" ? "Your Tauline account: set your password" : "Tauline: set a new password";
  const text = [
    `Hello ${m.to.name},`,
    "",
    what,
    "",
    `Set your password here (the link works once, until ${until}):`,
    m.url,
    "",
    "If you did not expect this message, ignore it: without a password the link opens nothing.",
    "",
    `Tauline · ${appUrl}`,
  ].join("\n");
  const body = html`<p>Hello ${m.to.name},</p>
<p>${what}</p>
<p>${link(m.url, "Set your password")}<br><span style="${MAIL_STYLE.faint}">The link works once, until ${until}: <span style="${MAIL_STYLE.mono}">${m.url}</span></span></p>
<p style="${MAIL_STYLE.faint}">If you did not expect this message, ignore it: without a password the link opens nothing.</p>`;
  return { subject, text, html: mailPage({ title: subject, body, footer: html`Tauline · ${appUrl}` }).toString() };
}

/** Queues the mail; returns the outbox id to nudge after commit. */
export async function queuePasswordLinkMail(db: Db, m: PasswordLinkMail): Promise<number | null> {
  const mail = composePasswordLinkMail(m, getEnv().APP_URL);
  const { id } = await insertOutboxMessage({ db, message: { eventKey: `password-link:${m.inviteId}`, kind: "invite", recipients: [m.to.email], ...mail } });
  return id;
}
