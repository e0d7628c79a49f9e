import { mkdtemp, rm, utimes, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import nodemailer from "nodemailer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { isStoredMailName, listStoredMail, readStoredMail } from "@/lib/mail/eml-store";

// The admin mailbox reads what the SMTP fake wrote: the envelope headers the
// fake prepends (Return-Path, X-Envelope-To) followed by the message as sent.
let dir = "";

async function store(name: string, mail: nodemailer.SendMailOptions, envelopeTo: string[], at: Date) {
  const raw = await nodemailer.createTransport({ streamTransport: true, buffer: true }).sendMail(mail);
  await writeFile(join(dir, name), Buffer.concat([Buffer.from(`Return-Path: <tauline@fenwick-hydro.test>\r\nX-Envelope-To: ${envelopeTo.join(", ")}\r\n`), raw.message as Buffer]));
  await utimes(join(dir, name), at, at);
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), "tauline-eml-"));
  const from = "Tauline <tauline@fenwick-hydro.test>";
  await store("2026-03-02T09-00-00-000Z-aaaa1111.eml", { from, to: "release@fenwick-hydro.test", bcc: "developer@fenwick-hydro.test", subject: "older", text: "one", html: "<p>one</p>", headers: { "X-Tauline-Event": "alert:build:1:abc" } }, ["release@fenwick-hydro.test", "developer@fenwick-hydro.test"], new Date("2026-03-02T09:00:00Z"));
  await store("2026-03-02T10-00-00-000Z-bbbb2222.eml", { from, to: "undisclosed-recipients:;", bcc: "qa@fenwick-hydro.test", subject: "newer — ü", text: "two" }, ["qa@fenwick-hydro.test"], new Date("2026-03-02T10:00:00Z"));
  await writeFile(join(dir, ".2026-03-02T11-00-00-000Z-cccc.eml.tmp"), "half-written");
});
afterAll(() => rm(dir, { recursive: true, force: true }));

describe("stored mail", () => {
  it("lists newest first with subject, To, and the envelope recipients (Bcc included)", async () => {
    const { total, entries } = await listStoredMail({ dir, first: 10, offset: 0 });
    expect(total).toBe(2);
    expect(entries.map((e) => e.subject)).toEqual(["newer — ü", "older"]);
    expect(entries[1].to).toEqual(["release@fenwick-hydro.test"]);
    expect(entries[1].envelopeTo).toEqual(["release@fenwick-hydro.test", "developer@fenwick-hydro.test"]);
    expect(entries[0].to).toEqual([]);
  });

  it("pages with first and offset", async () => {
    const { entries } = await listStoredMail({ dir, first: 1, offset: 1 });
    expect(entries.map((e) => e.subject)).toEqual(["older"]);
  });

  it("reads one message with its text, HTML and event key", async () => {
    const mail = await readStoredMail({ dir, name: "2026-03-02T09-00-00-000Z-aaaa1111.eml" });
    expect(mail?.text?.trim()).toBe("one");
    expect(mail?.html).toContain("<p>one</p>");
    expect(mail?.eventKey).toBe("alert:build:1:abc");
  });

  it("refuses names that could leave the mail folder or are not stored messages", async () => {
    for (const name of ["../secret.eml", "a/b.eml", ".hidden.eml", "x.txt", "..eml", "%2e%2e%2fx.eml"]) expect(isStoredMailName(name), name).toBe(false);
    expect(await readStoredMail({ dir, name: "../etc.eml" })).toBeUndefined();
    expect(await readStoredMail({ dir, name: "missing.eml" })).toBeUndefined();
  });

  it("answers an empty list for a folder that does not exist yet", async () => {
    expect(await listStoredMail({ dir: join(dir, "nope"), first: 5, offset: 0 })).toEqual({ total: 0, entries: [] });
  });
});
