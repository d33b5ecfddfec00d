import { randomBytes } from "node:crypto";
import { mkdirSync, writeFileSync } from "node:fs";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import { SMTPServer } from "smtp-server";

/** A message as the fake server received it over SMTP. */
export interface ReceivedMail {
  from: string;
  to: string[];
  /** The raw RFC 5322 message. */
  raw: string;
  /** The raw message with quoted-printable soft breaks and escapes undone, for searching. */
  decoded: string;
  receivedAt: Date;
}

export interface FakeSmtp {
  host: string;
  port: number;
  messages: ReceivedMail[];
  /** Resolves with the first message (already received or arriving) that matches. */
  waitFor: (match: (mail: ReceivedMail) => boolean, timeoutMs?: number) => Promise<ReceivedMail>;
  close: () => Promise<void>;
}

/** Undoes quoted-printable (RFC 2045 §6.7) well enough to read links in the text part. */
function decodeQuotedPrintable(raw: string): string {
  return raw
    .replace(/=\r?\n/g, "")
    .replace(/=([0-9A-F]{2})/g, (_match, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

/**
 * The development and test mail server: a real SMTP listener on 127.0.0.1 (random port),
 * inside the app's process, that accepts everything and keeps it in memory. No TLS and no
 * login (STACK.md gotcha 12), so it must never listen beyond loopback.
 */
export async function startFakeSmtp(options: { dropDir?: string } = {}): Promise<FakeSmtp> {
  if (options.dropDir) mkdirSync(options.dropDir, { recursive: true });
  const messages: ReceivedMail[] = [];
  const waiters = new Set<(mail: ReceivedMail) => void>();

  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    banner: "Satura development mail catcher",
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("end", () => {
        const raw = Buffer.concat(chunks).toString("utf8");
        const mail: ReceivedMail = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
          to: session.envelope.rcptTo.map((address) => address.address),
          raw,
          decoded: decodeQuotedPrintable(raw),
          receivedAt: new Date(),
        };
        messages.push(mail);
        // One file per message, named to sort by arrival, for whoever reads the drop folder.
        if (options.dropDir)
          writeFileSync(
            join(options.dropDir, `${mail.receivedAt.getTime()}-${randomBytes(4).toString("hex")}.eml`),
            mail.decoded,
          );
        for (const waiter of waiters) waiter(mail);
        callback();
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;

  return {
    host: "127.0.0.1",
    port,
    messages,
    waitFor(match, timeoutMs = 5_000) {
      const found = messages.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => {
          waiters.delete(waiter);
          reject(new Error("No matching mail arrived at the fake SMTP server"));
        }, timeoutMs);
        const waiter = (mail: ReceivedMail) => {
          if (!match(mail)) return;
          clearTimeout(timer);
          waiters.delete(waiter);
          resolve(mail);
        };
        waiters.add(waiter);
      });
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
