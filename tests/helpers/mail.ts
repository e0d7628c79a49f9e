import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";
import { simpleParser, type AddressObject, type ParsedMail } from "mailparser";
import { requireEnv } from "./env";

// Reading what the SMTP fake stored in MAIL_DIR: one .eml per message, with
// the envelope recipients (Bcc included) in the X-Envelope-To header it adds.

export interface StoredMessage {
  name: string;
  mail: ParsedMail;
}

/** Every stored message whose raw text contains `marker` (cheap filter before parsing). */
export async function findStoredMail(marker: string): Promise<StoredMessage[]> {
  const dir = requireEnv("MAIL_DIR");
  const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith(".eml") && !n.startsWith("."));
  const out: StoredMessage[] = [];
  for (const name of names) {
    const raw = await readFile(join(dir, name)).catch(() => null);
    if (raw && raw.includes(marker)) out.push({ name, mail: await simpleParser(raw) });
  }
  return out.sort((a, b) => a.name.localeCompare(b.name));
}

/** Waits until at least `count` stored messages contain `marker` (and pass `where`), then returns them all. */
export async function waitForStoredMail(
  marker: string,
  { count = 1, timeoutMs = 30_000, where = () => true }: { count?: number; timeoutMs?: number; where?: (m: StoredMessage) => boolean } = {},
): Promise<StoredMessage[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await findStoredMail(marker)).filter(where);
    if (found.length >= count) return found;
    if (Date.now() > deadline) throw new Error(`expected ${count} stored message(s) containing "${marker}", found ${found.length} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export function addressesOf(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((a) => a.value.map((v) => v.address ?? "").filter(Boolean));
}

export function envelopeOf(mail: ParsedMail): string[] {
  const v = mail.headers.get("x-envelope-to");
  return typeof v === "string" ? v.split(",").map((s) => s.trim()).filter(Boolean) : [];
}
