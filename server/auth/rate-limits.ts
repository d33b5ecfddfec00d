import type { Request, RequestHandler } from "express";
import { rateLimit } from "express-rate-limit";
import { HttpError } from "../http/http-error.ts";

/**
 * Throttles for the endpoints an attacker would hammer: sign-in (password guessing),
 * password reset (mail bombing), sign-up and invitation links. Each is counted per client
 * IP and, where the body names an account, per e-mail address too, so neither many
 * addresses from one IP nor one address from many IPs gets far (OWASP Authentication
 * Cheat Sheet, "Protect against automated attacks"). Counts live in memory: one server process.
 */
export interface AuthLimits {
  windowMs: number;
  /** Sign-in attempts per IP in the window. */
  signInPerIp: number;
  /** Failed sign-ins per e-mail address in the window (successes are not counted). */
  signInPerAccount: number;
  /** Reset requests and confirmations per IP in the window. */
  resetPerIp: number;
  /** Reset requests per e-mail address in the window. */
  resetPerAccount: number;
  /** Sign-ups, invitation previews and acceptances per IP in the window. */
  signUpPerIp: number;
}

export const DEFAULT_AUTH_LIMITS: AuthLimits = {
  windowMs: 15 * 60 * 1000,
  signInPerIp: 30,
  signInPerAccount: 5,
  resetPerIp: 10,
  resetPerAccount: 3,
  signUpPerIp: 20,
};

const TOO_MANY = "Too many attempts. Wait a few minutes, then try again.";

/** The account a request names, normalised as the schemas do; "" when there is none. */
function accountKey(req: Request): string {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === "string" ? `account:${email.trim().toLowerCase()}` : "account:";
}

function limiter(limit: number, windowMs: number, options: { perAccount?: boolean; onlyFailures?: boolean } = {}): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    skipSuccessfulRequests: options.onlyFailures ?? false,
    ...(options.perAccount ? { keyGenerator: accountKey } : {}),
    handler: (_req, _res, next) => next(new HttpError(429, TOO_MANY)),
  });
}

export function createAuthLimiters(overrides: Partial<AuthLimits> = {}) {
  const limits = { ...DEFAULT_AUTH_LIMITS, ...overrides };
  const { windowMs } = limits;
  return {
    signIn: [
      limiter(limits.signInPerIp, windowMs),
      limiter(limits.signInPerAccount, windowMs, { perAccount: true, onlyFailures: true }),
    ],
    resetRequest: [limiter(limits.resetPerIp, windowMs), limiter(limits.resetPerAccount, windowMs, { perAccount: true })],
    resetConfirm: [limiter(limits.resetPerIp, windowMs)],
    signUp: [limiter(limits.signUpPerIp, windowMs)],
  };
}

export type AuthLimiters = ReturnType<typeof createAuthLimiters>;
