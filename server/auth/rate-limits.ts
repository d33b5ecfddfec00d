import type { Request, RequestHandler } from "express";
import { ipKeyGenerator, rateLimit } from "express-rate-limit";
import type { Database } from "../db/client.ts";
import { HttpError } from "../http/http-error.ts";
import { DatabaseRateLimitStore } from "./rate-limit-store.ts";

/**
 * Throttles for the endpoints an attacker would hammer: sign-in (password guessing), password
 * reset (mail bombing), sign-up and invitation links. The policy and its sources are stated in
 * docs/accounts.md ("Sign-in throttling"); in short, for sign-in:
 *
 * - Per client address, any accounts: 30 failures per 15 minutes (one address trying many
 *   accounts, "password spraying"; a crew signing in from one office address is not refused).
 * - Per account and client address: 5 failures per 15 minutes. A burst of wrong passwords from
 *   one address refuses that address only; the owner, signing in from elsewhere, is not
 *   affected (OWASP Authentication Cheat Sheet, "Account Lockout": a lockout that anyone can
 *   trigger is a denial of service against the account's owner).
 * - Per account, from all addresses together: 30 failures per hour, a ceiling that slows
 *   guessing spread over many addresses to at most 720 guesses a day. Once an address is
 *   refused it adds no more failures, so one address alone (at most 5 per 15 minutes) can
 *   never reach this ceiling; only several addresses together can.
 *
 * Failures count, successes do not. Counts live in the database (server/auth/rate-limit-store.ts)
 * so that several app servers share them.
 */
export interface AuthLimits {
  /** Window of every count below except the account ceiling. */
  windowMs: number;
  /** Failed sign-ins per client address in the window, whatever the account. */
  signInPerIp: number;
  /** Failed sign-ins per account from one client address in the window. */
  signInFailuresPerAccountAndClient: number;
  /** Failed sign-ins per account from all client addresses together in `accountWindowMs`. */
  signInFailuresPerAccount: number;
  /** Window of the per-account ceiling. */
  accountWindowMs: number;
  /** Reset requests and confirmations per client address in the window. */
  resetPerIp: number;
  /** Reset requests per e-mail address in the window. */
  resetPerAccount: number;
  /** Sign-ups, invitation previews and acceptances per client address in the window. */
  signUpPerIp: number;
}

export const DEFAULT_AUTH_LIMITS: AuthLimits = {
  windowMs: 15 * 60 * 1000,
  signInPerIp: 30,
  signInFailuresPerAccountAndClient: 5,
  signInFailuresPerAccount: 30,
  accountWindowMs: 60 * 60 * 1000,
  resetPerIp: 10,
  resetPerAccount: 3,
  signUpPerIp: 20,
};

const TOO_MANY = "Too many attempts. Wait a few minutes, then try again.";

/** The account a request names, normalised as the schemas do; "" when there is none. */
function accountOf(req: Request): string {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === "string" ? email.trim().toLowerCase() : "";
}

/** The client's address; IPv6 addresses count by their /56 network, as one household or office has one. */
const clientOf = (req: Request): string => ipKeyGenerator(req.ip ?? "");

const KEYS = {
  client: clientOf,
  account: (req: Request) => `account:${accountOf(req)}`,
  accountAndClient: (req: Request) => `account:${accountOf(req)}|client:${clientOf(req)}`,
} as const;

interface LimiterOptions {
  name: string;
  limit: number;
  windowMs: number;
  key: keyof typeof KEYS;
  /** Count only failed requests (status 400 and above); a success takes its hit back. */
  onlyFailures?: boolean;
}

function limiter(db: Database, options: LimiterOptions): RequestHandler {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    skipSuccessfulRequests: options.onlyFailures ?? false,
    keyGenerator: KEYS[options.key],
    store: new DatabaseRateLimitStore(db, options.name),
    handler: (_req, _res, next) => next(new HttpError(429, TOO_MANY)),
  });
}

export function createAuthLimiters(db: Database, overrides: Partial<AuthLimits> = {}) {
  const limits = { ...DEFAULT_AUTH_LIMITS, ...overrides };
  const { windowMs } = limits;
  return {
    // In this order: a request refused by one throttle never reaches (or counts in) the next.
    signIn: [
      // Failures only: a depot's crew signs in from one address at the start of a shift.
      limiter(db, { name: "sign-in:client", limit: limits.signInPerIp, windowMs, key: "client", onlyFailures: true }),
      limiter(db, {
        name: "sign-in:account-client",
        limit: limits.signInFailuresPerAccountAndClient,
        windowMs,
        key: "accountAndClient",
        onlyFailures: true,
      }),
      limiter(db, {
        name: "sign-in:account",
        limit: limits.signInFailuresPerAccount,
        windowMs: limits.accountWindowMs,
        key: "account",
        onlyFailures: true,
      }),
    ],
    resetRequest: [
      limiter(db, { name: "reset:client", limit: limits.resetPerIp, windowMs, key: "client" }),
      limiter(db, { name: "reset:account", limit: limits.resetPerAccount, windowMs, key: "account" }),
    ],
    resetConfirm: [limiter(db, { name: "reset-confirm:client", limit: limits.resetPerIp, windowMs, key: "client" })],
    signUp: [limiter(db, { name: "sign-up:client", limit: limits.signUpPerIp, windowMs, key: "client" })],
  };
}

export type AuthLimiters = ReturnType<typeof createAuthLimiters>;
