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
