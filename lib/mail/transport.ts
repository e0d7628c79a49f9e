import "server-only";
import { createHash } from "node:crypto";
import nodemailer, { type Transporter } from "nodemailer";
import type { OutboxRow } from "@/db/queries/outbox";
import { getEnv } from "@/lib/env";

// SMTP as configured in lib/env.ts: the local fake in development and tests,
// any relay in production. Timeouts are short so that a dead relay fails the
// attempt (and the queue retries later) instead of holding a worker.

const globalForMail = globalThis as unknown as { taulineMailTransport?: Transporter };

export function getMailTransport(): Transporter {
  if (globalForMail.taulineMailTransport) return globalForMail.taulineMailTransport;
  const env = getEnv();
  globalForMail.taulineMailTransport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS ?? "" } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return globalForMail.taulineMailTransport;
}

/**
 * The same Message-ID for every attempt of one outbox row: if a sender dies
 * after the relay accepted a message but before the row was marked sent, the
 * retry carries the same id and mail clients show it once.
 */
export function messageIdFor(eventKey: string, from: string): string {
  const domain = /@([^>\s]+)>?\s*$/.exec(from)?.[1] ?? "tauline.invalid";
  return `<${createHash("sha256").update(eventKey, "utf8").digest("hex").slice(0, 32)}@${domain}>`;
}

export async function sendOutboxRow(row: OutboxRow): Promise<void> {
  const from = getEnv().MAIL_FROM;
  const hidden = new Set(row.bcc);
  const visible = row.recipients.filter((r) => !hidden.has(r));
  await getMailTransport().sendMail({
    from,
    // With only hidden recipients the To line is an empty group (RFC 5322 §3.4).
    to: visible.length ? visible : "undisclosed-recipients:;",
    bcc: row.bcc.length ? row.bcc : undefined,
    subject: row.subject,
    text: row.text_body,
    html: row.html_body,
    messageId: messageIdFor(row.event_key, from),
    headers: { "X-Tauline-Event": row.event_key, "X-Tauline-Kind": row.kind },
  });
}
