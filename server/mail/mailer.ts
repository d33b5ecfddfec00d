import nodemailer from "nodemailer";
import type { Logger } from "pino";
import type { Database } from "../db/client.ts";
import { recordOutboundMail } from "../db/outbox.ts";
import type { Env } from "../env.ts";
import { createMailCatcher, type CaughtMail } from "./mail-catcher.ts";

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** The organisation the mail is about; lets the development Outbox show each owner only their own. */
  organisationId?: string | null;
}

/**
 * The one way Satura sends e-mail (invitations, password resets, visit reports).
 * `send` resolves once the SMTP server has accepted the message (or the catcher has kept it)
 * and throws if it refuses.
 */
export interface Mailer {
  send: (message: MailMessage) => Promise<void>;
  /** True when mail is caught rather than delivered and owners may read it in the Outbox. */
  readonly outboxEnabled: boolean;
  close: () => Promise<void>;
}

/**
 * Builds the mailer from the environment: nodemailer over SMTP to SMTP_HOST when it is set,
 * otherwise nodemailer's stream transport, which composes each message and delivers none
 * (server/mail/mail-catcher.ts). Caught mail is also written to outbound_mail, so the Outbox
 * page can list it; `onCaught` hands each caught message to the caller (the tests' mailbox).
 */
export function createMailer({
  env,
  db,
  logger,
  onCaught,
}: {
  env: Env;
  db: Database;
  logger: Logger;
  onCaught?: (mail: CaughtMail) => void;
}): Mailer {
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
    logger.warn("SMTP_HOST is not set: e-mail is composed but never delivered");
  }
  const catcher = createMailCatcher({ dropDir: env.MAIL_DROP_DIR, onCaught });
  return {
    outboxEnabled: env.outboxEnabled,
    async send({ to, subject, text, html, organisationId = null }) {
      await catcher.send({ from: env.MAIL_FROM, to, subject, text, html });
      // Kept only in this mode: the messages hold sign-in links and must not pile up in production.
      await recordOutboundMail(db, { to, subject, text, html: html ?? null, organisationId });
    },
    close: async () => {},
  };
}
