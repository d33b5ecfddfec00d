import type { CaughtMail } from "@server/mail/mail-catcher.ts";

/** Every message a test app sent, as nodemailer composed it, in order of sending. */
export interface Mailbox {
  messages: CaughtMail[];
  /** Resolves with the first message (already sent or arriving) that matches. */
  waitFor: (match: (mail: CaughtMail) => boolean, timeoutMs?: number) => Promise<CaughtMail>;
  /** The mailer's `onCaught`: keeps the message and wakes whoever waits for it. */
  receive: (mail: CaughtMail) => void;
}

/**
 * The tests' mailbox. Some mail is sent after the answer (a password reset answers 202 before
 * it looks the address up, so timing tells nothing), hence `waitFor` rather than a plain look.
 */
export function createMailbox(): Mailbox {
  const messages: CaughtMail[] = [];
  const waiters = new Set<(mail: CaughtMail) => void>();
  return {
    messages,
    receive(mail) {
      messages.push(mail);
      for (const waiter of waiters) waiter(mail);
    },
    waitFor(match, timeoutMs = 5_000) {
      const found = messages.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => {
          waiters.delete(waiter);
          reject(new Error("No matching mail was sent"));
        }, timeoutMs);
        const waiter = (mail: CaughtMail) => {
          if (!match(mail)) return;
          clearTimeout(timer);
          waiters.delete(waiter);
          resolve(mail);
        };
        waiters.add(waiter);
      });
    },
  };
}
