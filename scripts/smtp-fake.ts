// Local SMTP fake for development and tests: accepts every message on
// 127.0.0.1:$SMTP_PORT and writes it to $MAIL_DIR/<timestamp>-<id>.eml, so the
// app's real mail path (nodemailer over SMTP) runs end to end and tests can
// read what was sent. Not a relay: nothing leaves the machine.
//
// A development tool started by scripts/start.sh and scripts/test.sh; it reads
// its two settings straight from the environment (the app's lib/env.ts is for
// the app).
import { randomUUID } from "node:crypto";
import { mkdirSync, renameSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from "smtp-server";

const port = Number(process.env.SMTP_PORT ?? "2525");
if (!Number.isInteger(port) || port <= 0 || port > 65535) {
  throw new Error(`SMTP_PORT must be a TCP port number, got "${process.env.SMTP_PORT}"`);
}
const mailDir = resolve(process.env.MAIL_DIR ?? ".data/mail");
mkdirSync(mailDir, { recursive: true });
process.title = "tauline-smtp-fake";

// The envelope is not part of the message (Bcc recipients appear nowhere else),
// so it is kept the way a mail server does: Return-Path plus an envelope header.
function buildEnvelopeHeaders(session: SMTPServerSession): string {
  const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
  const to = session.envelope.rcptTo.map((recipient) => recipient.address).join(", ");
  return `Return-Path: <${from}>\r\nX-Envelope-To: ${to}\r\n`;
}

// Write to a dot-file first and rename: a reader polling MAIL_DIR for *.eml
// never sees a half-written message.
function storeMessage(raw: Buffer, session: SMTPServerSession): string {
  const stamp = new Date().toISOString().replace(/[:.]/g, "-");
  const name = `${stamp}-${randomUUID().slice(0, 8)}.eml`;
  const temporary = join(mailDir, `.${name}.tmp`);
  writeFileSync(temporary, Buffer.concat([Buffer.from(buildEnvelopeHeaders(session)), raw]));
  renameSync(temporary, join(mailDir, name));
  return name;
}

function receiveMessage(
  stream: SMTPServerDataStream,
  session: SMTPServerSession,
  callback: (error?: Error | null) => void,
): void {
  const chunks: Buffer[] = [];
  stream.on("data", (chunk: Buffer) => chunks.push(chunk));
  stream.on("error", callback);
  stream.on("end", () => {
    if (stream.sizeExceeded) {
      callback(Object.assign(new Error("Message exceeds the fake's 25 MB limit"), { responseCode: 552 }));
      return;
    }
    try {
      const name = storeMessage(Buffer.concat(chunks), session);
      const to = session.envelope.rcptTo.map((recipient) => recipient.address).join(", ");
      console.log(`${new Date().toISOString()} stored ${name} for ${to}`);
      callback();
    } catch (error) {
      callback(error instanceof Error ? error : new Error(String(error)));
    }
  });
}

const server = new SMTPServer({
  secure: false,
  disabledCommands: ["STARTTLS"],
  hideSTARTTLS: true,
  authOptional: true,
  // Accept AUTH over plain TCP with any credentials, so an app configured with
  // SMTP_USER/SMTP_PASS works against the fake as well.
  allowInsecureAuth: true,
  onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? "anonymous" }),
  disableReverseLookup: true,
  size: 25 * 1024 * 1024,
  logger: false,
  onData: receiveMessage,
});

let listening = false;
server.on("error", (error) => {
  console.error(`${new Date().toISOString()} SMTP error: ${error.message}`);
  // Before listen succeeds an error (port taken) is fatal; afterwards it
  // concerns one client connection and the fake keeps serving.
  if (!listening) process.exit(1);
});

server.listen(port, "127.0.0.1", () => {
  listening = true;
  console.log(`${new Date().toISOString()} SMTP fake on 127.0.0.1:${port}, writing to ${mailDir}`);
});

function shutDown(signal: string): void {
  console.log(`${new Date().toISOString()} ${signal}: closing`);
  // close() waits for open sessions; a client that never says QUIT must not
  // keep `npm stop` waiting.
  setTimeout(() => process.exit(0), 3000).unref();
  server.close(() => process.exit(0));
}
process.on("SIGTERM", () => shutDown("SIGTERM"));
process.on("SIGINT", () => shutDown("SIGINT"));
