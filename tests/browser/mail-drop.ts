import { existsSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

/**
 * The browser tests' mailbox: the server under test writes every caught message here
 * (MAIL_DROP_DIR, set in playwright.config.ts), one folder per port so two checkouts never mix.
 */
export const MAIL_DROP_DIR = join(tmpdir(), `satura-mail-${process.env.PLAYWRIGHT_PORT ?? 3100}`);

/** The first link of the newest message addressed to `to`, or undefined before it arrives. */
export function lastLinkTo(to: string): URL | undefined {
  if (!existsSync(MAIL_DROP_DIR)) return undefined;
  const newestFirst = readdirSync(MAIL_DROP_DIR).sort().reverse();
  for (const name of newestFirst) {
    const mail = readFileSync(join(MAIL_DROP_DIR, name), "utf8");
    if (!new RegExp(`^To: .*${to.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}`, "mi").test(mail)) continue;
    const link = mail.match(/https?:\/\/[^\s"<>]+/);
    if (link) return new URL(link[0]);
  }
  return undefined;
}
