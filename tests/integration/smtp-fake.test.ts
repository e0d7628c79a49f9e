import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";
import { simpleParser } from "mailparser";
import nodemailer from "nodemailer";
import { describe, expect, it } from "vitest";
import { requireEnv } from "../helpers/env";

// The local SMTP fake that development and tests send mail to: a message sent
// with nodemailer arrives as one .eml file that parses back to what was sent.

async function waitForMessage(dir: string, subject: string, timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    for (const name of (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith(".eml"))) {
      const parsed = await simpleParser(await readFile(join(dir, name)));
      if (parsed.subject === subject) return parsed;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no message "${subject}" in ${dir} after ${timeoutMs} ms`);
}

describe("SMTP fake", () => {
  it("stores a message with its recipients, plain text and HTML as an .eml file", async () => {
    const transport = nodemailer.createTransport({ host: "127.0.0.1", port: Number(requireEnv("SMTP_PORT")), secure: false, ignoreTLS: true });
    const subject = `fake check ${Date.now()}`;
    await transport.sendMail({
      from: "Tauline <tauline@fenwick-hydro.test>",
      to: "release@fenwick-hydro.test",
      subject,
      text: "decay_exponent 1.149 is outside 1.076–1.098",
      html: "<p>decay_exponent <b>1.149</b> is outside 1.076–1.098</p>",
    });
    const mail = await waitForMessage(requireEnv("MAIL_DIR"), subject);
    expect(mail.text?.trim()).toBe("decay_exponent 1.149 is outside 1.076–1.098");
    expect(mail.html).toContain("<b>1.149</b>");
    const to = Array.isArray(mail.to) ? mail.to[0] : mail.to;
    expect(to?.value[0].address).toBe("release@fenwick-hydro.test");
  });
});
