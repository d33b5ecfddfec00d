import nodemailer from "nodemailer";
import type { Logger } from "pino";
import type { Database } from "../db/client.ts";
import { recordOutboundMail } from "../db/outbox.ts";
import type { Env } from "../env.ts";
import { startFakeSmtp, type FakeSmtp } from "./fake-smtp.ts";

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** The organisation the mail is about; lets the development Outbox show each owner only their own. */
  organisationId?: string | null;
}

/**
 * The one way Satura sends e-mail (invitations, password resets, and later visit reports).
 * `send` resolves once the SMTP server has accepted the message and throws if it refuses.
 */
export interface Mailer {
  send: (message: MailMessage) => Promise<void>;
  /** True when mail goes to the in-process fake server and owners may read it in the Outbox. */
  readonly outboxEnabled: boolean;
  /** The fake SMTP server, when mail is not going to a real host (development and tests). */
  readonly fakeSmtp?: FakeSmtp;
  close: () => Promise<void>;
}

/**
 * Builds the mailer from the environment: nodemailer over SMTP to SMTP_HOST when it is set,
 * otherwise to a fake SMTP server started here, inside the app's process. Mail sent through
 * the fake server is also written to outbound_mail, so the Outbox page can list it.
 */
export async function createMailer({ env, db, logger }: { env: Env; db: Database; logger: Logger }): Promise<Mailer> {
  if (env.SMTP_HOST) {
    const transport = nodemailer.createTransport({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      // Port 465 speaks TLS from the start; others upgrade with STARTTLS, which is then required.
      secure: env.SMTP_PORT === 465,
      requireTLS: env.SMTP_PORT !== 465,
      auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS ?? "" } : undefined,
    });
    return {
      outboxEnabled: false,
      async send({ to, subject, text, html }) {
        await transport.sendMail({ from: env.MAIL_FROM, to, subject, text, html });
      },
      close: async () => transport.close(),
    };
  }

  if (env.NODE_ENV === "production") {
    logger.warn("SMTP_HOST is not set: e-mail goes to the built-in fake mail server and is never delivered");
  }
  const fakeSmtp = await startFakeSmtp({ dropDir: env.MAIL_DROP_DIR });
  const transport = nodemailer.createTransport({
    host: fakeSmtp.host,
    port: fakeSmtp.port,
    secure: false,
    ignoreTLS: true,
  });
  return {
    outboxEnabled: env.outboxEnabled,
    fakeSmtp,
    async send({ to, subject, text, html, organisationId = null }) {
      await transport.sendMail({ from: env.MAIL_FROM, to, subject, text, html });
      // Kept only in this mode: the messages hold sign-in links and must not pile up in production.
      await recordOutboundMail(db, { to, subject, text, html: html ?? null, organisationId });
    },
    async close() {
      transport.close();
      await fakeSmtp.close();
    },
  };
}
