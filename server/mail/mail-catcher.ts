import { randomBytes } from "node:crypto";
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import nodemailer from "nodemailer";

/** A message as the catcher keeps it: the RFC 5322 text an SMTP server would have received. */
export interface CaughtMail {
  from: string;
  to: string[];
  /** The raw RFC 5322 message. */
  raw: string;
  /** The raw message with quoted-printable soft breaks and escapes undone, for searching. */
  decoded: string;
  receivedAt: Date;
}

/** Undoes quoted-printable (RFC 2045 §6.7) well enough to read links in the text part. */
function decodeQuotedPrintable(raw: string): string {
  return raw
    .replace(/=\r?\n/g, "")
    .replace(/=([0-9A-F]{2})/g, (_match, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

/**
 * Mail that is composed but never delivered, for when no SMTP_HOST is set (development, the
 * browser tests, server tests). Nodemailer's own stream transport builds the same message its
 * SMTP transport would send, so nothing listens on a port and nothing waits on a socket.
 * Each message goes to `dropDir` as an .eml file when one is given (a mailbox for people who
 * cannot read the Outbox) and to `onCaught` (the tests' mailbox).
 */
export function createMailCatcher(options: { dropDir?: string; onCaught?: (mail: CaughtMail) => void }) {
  if (options.dropDir) mkdirSync(options.dropDir, { recursive: true });
  const transport = nodemailer.createTransport({ streamTransport: true, buffer: true });

  return {
    async send(message: { from: string; to: string; subject: string; text: string; html?: string }): Promise<void> {
      const { envelope, message: composed } = await transport.sendMail(message);
      // With buffer: true the stream transport hands back the whole message, never a stream.
      if (!Buffer.isBuffer(composed)) throw new Error("createMailCatcher requires a buffered stream transport");
      const raw = composed.toString("utf8");
      const mail: CaughtMail = {
        from: envelope.from || "",
        to: envelope.to,
        raw,
        decoded: decodeQuotedPrintable(raw),
        receivedAt: new Date(),
      };
      // One file per message, named to sort by arrival, for whoever reads the drop folder.
      if (options.dropDir)
        writeFileSync(
          join(options.dropDir, `${mail.receivedAt.getTime()}-${randomBytes(4).toString("hex")}.eml`),
          mail.decoded,
        );
      options.onCaught?.(mail);
    },
  };
}
