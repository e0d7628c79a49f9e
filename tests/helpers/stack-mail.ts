import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";

// Reading the .eml files a private stack's SMTP fake wrote (tests/helpers/mail.ts
// does the same for the suite's shared fake, through MAIL_DIR of the process env,
// which a fault-test file must not repoint).

export interface RawMail {
  name: string;
  raw: string;
}

export async function readMailDir(dir: string): Promise<RawMail[]> {
  const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith(".eml") && !n.startsWith("."));
  const out: RawMail[] = [];
  for (const name of names.sort()) {
    const raw = await readFile(join(dir, name), "utf8").catch(() => null);
    if (raw !== null) out.push({ name, raw });
  }
  return out;
}

/** The X-Tauline-Event header of each stored message (the outbox event it delivers), unfolded. */
export function eventKeyOf(raw: string): string | null {
  const match = /^X-Tauline-Event:[ \t]*((?:.*)(?:\r?\n[ \t].*)*)/im.exec(raw);
  return match ? match[1].replace(/\r?\n(?=[ \t])/g, "").trim() : null;
}

/** How many stored messages carry each event key. */
export async function countMailByEvent(dir: string): Promise<Map<string, number>> {
  const counts = new Map<string, number>();
  for (const { raw } of await readMailDir(dir)) {
    const key = eventKeyOf(raw);
    if (key) counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return counts;
}
