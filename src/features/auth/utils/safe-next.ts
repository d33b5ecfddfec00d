/**
 * The `next` query parameter after sign-in, kept to paths on this site: "//evil.example" or
 * "https://evil.example" would turn the sign-in page into an open redirect (OWASP
 * Unvalidated Redirects and Forwards Cheat Sheet).
 */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return "/";
  return next;
}
