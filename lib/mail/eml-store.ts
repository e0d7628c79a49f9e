import "server-only";
import { readdir, readFile, stat } from "node:fs/promises";
import { join, resolve, sep } from "node:path";
import { simpleParser, type AddressObject, type ParsedMail } from "mailparser";

// Reads the messages the local SMTP fake stored in MAIL_DIR (one .eml per
// message, envelope recipients in X-Envelope-To). For the admin mailbox only.

export interface StoredMailSummary {
  name: string;
  date: Date | null;
  from: string;
  to: string[];
  envelopeTo: string[];
  subject: string;
  size: number;
  storedAt: Date;
}

export interface StoredMail extends StoredMailSummary {
  cc: string[];
  text: string | null;
  html: string | null;
  eventKey: string | null;
}

// The fake's names (<ISO time>-<id>.eml); no path separators, no leading dot.
const NAME = /^[A-Za-z0-9][A-Za-z0-9._-]{0,200}\.eml$/;

export function isStoredMailName(name: string): boolean {
  return NAME.test(name) && !name.includes("..");
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((a) => a.value.flatMap((v) => (v.address ? [v.address] : v.group ? v.group.flatMap((g) => (g.address ? [g.address] : [])) : [])));
}

function header(mail: ParsedMail, key: string): string | null {
  const v = mail.headers.get(key);
  return typeof v === "string" ? v : null;
}

function summarise(name: string, mail: ParsedMail, size: number, storedAt: Date): StoredMailSummary {
  return {
    name,
    date: mail.date ?? null,
    from: mail.from?.text ?? "",
    to: addresses(mail.to),
    envelopeTo: (header(mail, "x-envelope-to") ?? "").split(",").map((s) => s.trim()).filter(Boolean),
    subject: mail.subject ?? "(no subject)",
    size,
    storedAt,
  };
}

/** The newest messages first (by the time the fake stored them), one page. */
export async function listStoredMail({ dir, first, offset }: { dir: string; first: number; offset: number }): Promise<{ total: number; entries: StoredMailSummary[] }> {
  const root = resolve(dir);
  const names = (await readdir(root).catch(() => [] as string[])).filter(isStoredMailName);
  const stats = await Promise.all(names.map(async (name) => ({ name, info: await stat(join(root, name)).catch(() => null) })));
  const files = stats.filter((s) => s.info !== null).sort((a, b) => b.info!.mtimeMs - a.info!.mtimeMs || b.name.localeCompare(a.name));
  const page = files.slice(offset, offset + first);
  const entries = await Promise.all(
    page.map(async ({ name, info }) => {
      const mail = await simpleParser(await readFile(join(root, name)), { skipHtmlToText: true, skipTextToHtml: true, skipImageLinks: true });
      return summarise(name, mail, info!.size, info!.mtime);
    }),
  );
  return { total: files.length, entries };
}

/** One message with its text and HTML parts; undefined when there is no such file. */
export async function readStoredMail({ dir, name }: { dir: string; name: string }): Promise<StoredMail | undefined> {
  if (!isStoredMailName(name)) return undefined;
  const root = resolve(dir);
  const path = resolve(root, name);
  if (!path.startsWith(root + sep)) return undefined;
  const info = await stat(path).catch(() => null);
  if (!info?.isFile()) return undefined;
  const mail = await simpleParser(await readFile(path), { skipImageLinks: true, skipTextToHtml: true });
  return {
    ...summarise(name, mail, info.size, info.mtime),
    cc: addresses(mail.cc),
    text: mail.text ?? null,
    html: typeof mail.html === "string" ? mail.html : null,
    eventKey: header(mail, "x-tauline-event"),
  };
}
