import type { RequestHandler } from "express";
import { verifyRequestOrigin } from "lucia";
import { HttpError } from "../http/http-error.ts";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Cross-site request forgery guard. Browsers send an Origin header with every POST, PUT,
 * PATCH and DELETE (Fetch standard, "append a request Origin header"); a state-changing
 * request whose Origin is not this server or APP_URL is refused. Without an Origin (curl,
 * server-to-server, tests) the Fetch Metadata header decides: Sec-Fetch-Site "cross-site"
 * is refused too. SameSite=Lax on the cookie is the second layer.
 * (OWASP Cross-Site Request Forgery Prevention Cheat Sheet, "Verifying Origin with standard headers".)
 */
export function originCheck(appUrl: string): RequestHandler {
  const appHost = new URL(appUrl).host;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get("origin");
    const host = req.get("host");
    if (origin !== undefined) {
      const allowed = [appHost, ...(host ? [host] : [])];
      if (origin === "null" || !verifyRequestOrigin(origin, allowed)) {
        return next(new HttpError(403, "This request came from another site and was refused"));
      }
      return next();
    }
    if (req.get("sec-fetch-site") === "cross-site") {
      return next(new HttpError(403, "This request came from another site and was refused"));
    }
    next();
  };
}
