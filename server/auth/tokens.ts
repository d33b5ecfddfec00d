import { createHash, randomBytes } from "node:crypto";

/**
 * A single-use token for an e-mailed link: 32 random bytes (256 bits) in base64url, so it
 * cannot be guessed and needs no escaping in a URL. Only its SHA-256 is stored: a leaked
 * database row cannot be turned back into a working link.
 */
export function createToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** The query parameter that carries the token of an e-mailed link (the client's pages read it there). */
const LINK_TOKEN_PARAMETER = "token";
const LINK_TOKEN = new RegExp(`([?&]${LINK_TOKEN_PARAMETER}=)[^\\s&#"'<>]+`, "g");
export const HIDDEN_TOKEN = "hidden";

/** The e-mailed link to a page of the app that takes a one-time token, e.g. /reset-password. */
export function tokenLink(appUrl: string, path: string, token: string): string {
  return `${appUrl}${path}?${LINK_TOKEN_PARAMETER}=${encodeURIComponent(token)}`;
}

/** The text with the token of every e-mailed link in it replaced, so the links no longer work. */
export function hideLinkTokens(text: string): string {
  return text.replace(LINK_TOKEN, `$1${HIDDEN_TOKEN}`);
}
