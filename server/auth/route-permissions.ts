/**
 * Who may call which API route: the one table, and the gate that enforces it for the whole API.
 *
 * The gate runs after the session is read and before any resource router, so a route's
 * handler only runs for a caller its entry allows: everyone else gets 401 (no session) or 403
 * (a role the entry does not list), before any record is looked up. A route that is missing
 * from this table answers 404 until it is added (the gate fails closed), and
 * tests/server/route-permissions.test.ts fails for it; the same test plays every entry for
 * every role, and for another company's records, which must answer 404, never 403.
 *
 * What a role may do with a particular record (a technician's own register lines, who may
 * sign off rather than submit a visit) is decided inside the handler; this table says who may
 * call the route at all.
 */
import { Router, type RequestHandler } from "express";
import { PERMISSIONS, type Role } from "@shared/schemas/auth.ts";
import { CASEBOOK_PERMISSIONS } from "@shared/schemas/casebook-permissions.ts";
import { apiNotFound } from "../http/error-handler.ts";
import { requireRole, requireUser } from "./session.ts";

/** Anyone, signed in or not (sign-in, invitation links, health and readiness). */
export const PUBLIC = "public";
/** Anyone signed in, whatever their role. */
export const SIGNED_IN = "signed-in";
export type Access = typeof PUBLIC | typeof SIGNED_IN | readonly Role[];

export const ROUTE_PERMISSIONS = {
  "GET /api/health": PUBLIC,
  "GET /api/ready": PUBLIC,

  "POST /api/auth/sign-up": PUBLIC,
  "POST /api/auth/sign-in": PUBLIC,
  "POST /api/auth/sign-out": PUBLIC,
  "GET /api/auth/me": SIGNED_IN,
  "POST /api/auth/password-reset/request": PUBLIC,
  "POST /api/auth/password-reset/confirm": PUBLIC,

  "GET /api/members": SIGNED_IN,
  "PATCH /api/members/:id": PERMISSIONS.manageMembers,
  "DELETE /api/members/:id": PERMISSIONS.manageMembers,
  "GET /api/invitations": PERMISSIONS.manageMembers,
  "POST /api/invitations": PERMISSIONS.manageMembers,
  "DELETE /api/invitations/:id": PERMISSIONS.manageMembers,
  "POST /api/invitations/preview": PUBLIC,
  "POST /api/invitations/accept": PUBLIC,
  "GET /api/profile": SIGNED_IN,
  "PUT /api/profile": SIGNED_IN,
  "GET /api/outbox": PERMISSIONS.manageMembers,
  "GET /api/organisation/settings": SIGNED_IN,
  "PATCH /api/organisation/settings": PERMISSIONS.manageMembers,

  "GET /api/customers": SIGNED_IN,
  "POST /api/customers": PERMISSIONS.writeRecords,
  "GET /api/sites": SIGNED_IN,
  "POST /api/sites": PERMISSIONS.writeRecords,
  "GET /api/equipment": SIGNED_IN,
  "POST /api/equipment": PERMISSIONS.writeRecords,
  "GET /api/equipment/refrigerants": SIGNED_IN,
  "GET /api/equipment/:id": SIGNED_IN,
  "GET /api/equipment/:id/refrigerant": SIGNED_IN,
  "GET /api/equipment/:id/charge-references": SIGNED_IN,
  // Every later charge estimate on the unit is measured from its reference point.
  "PUT /api/equipment/:id/charge-references/:circuit": PERMISSIONS.setChargeReference,
  "DELETE /api/equipment/:id/charge-references/:circuit": PERMISSIONS.setChargeReference,

  "GET /api/visits": SIGNED_IN,
  "POST /api/visits": PERMISSIONS.writeRecords,
  "GET /api/visits/:id": SIGNED_IN,
  "GET /api/visits/:id/readings": SIGNED_IN,
  "POST /api/visits/:id/readings": PERMISSIONS.writeRecords,
  "POST /api/visits/:id/readings/import": PERMISSIONS.writeRecords,
  "POST /api/visits/:id/adjustments": PERMISSIONS.writeRecords,
  "POST /api/visits/:id/comments": PERMISSIONS.writeRecords,
  // Voiding a record with its reason: the handler checks the visit is open.
  "POST /api/visits/:id/voids": PERMISSIONS.writeRecords,
  // Submitting needs writeRecords, signing off, sending back or reopening needs signOff: the handler decides by the action.
  "POST /api/visits/:id/review": SIGNED_IN,
  "POST /api/visits/:id/photos": PERMISSIONS.writeRecords,
  "POST /api/visits/:id/report/send": PERMISSIONS.writeRecords,
  "GET /api/photos/:id": SIGNED_IN,
  "GET /api/photos/:id/thumbnail": SIGNED_IN,
  "GET /api/visits/:id/electrical-checks": SIGNED_IN,
  "POST /api/visits/:id/electrical-checks": PERMISSIONS.writeRecords,
  "GET /api/visits/:id/leak-searches": SIGNED_IN,
  "POST /api/visits/:id/leak-searches": PERMISSIONS.writeRecords,
  "GET /api/visits/:id/standing-pressure-checks": SIGNED_IN,
  "POST /api/visits/:id/standing-pressure-checks": PERMISSIONS.writeRecords,
  "GET /api/visits/:id/pressure-tests": SIGNED_IN,
  "POST /api/visits/:id/pressure-tests": PERMISSIONS.writeRecords,
  "GET /api/visits/:id/evacuations": SIGNED_IN,
  "POST /api/visits/:id/evacuations": PERMISSIONS.writeRecords,
  "POST /api/visits/:id/evacuations/:evacuationId/samples": PERMISSIONS.writeRecords,
  "PATCH /api/visits/:id/evacuations/:evacuationId": PERMISSIONS.writeRecords,

  // Which register lines each role reads is server/register/register-visibility.ts.
  "GET /api/visits/:id/refrigerant": SIGNED_IN,
  "POST /api/visits/:id/refrigerant": PERMISSIONS.writeRecords,
  "PUT /api/visits/:id/refrigerant/charging/:circuit": PERMISSIONS.writeRecords,
  "GET /api/cylinders": SIGNED_IN,
  "POST /api/cylinders": PERMISSIONS.writeRecords,
  "GET /api/cylinders/:id": SIGNED_IN,
  "POST /api/cylinders/:id/reclaim": PERMISSIONS.writeRecords,
  "POST /api/cylinders/:id/movements/:movementId/void": PERMISSIONS.writeRecords,
  "GET /api/register": PERMISSIONS.readOwnRegisterLines,
  "GET /api/register/export.csv": PERMISSIONS.readOwnRegisterLines,

  "GET /api/cases": SIGNED_IN,
  "POST /api/cases": CASEBOOK_PERMISSIONS.author,
  "POST /api/cases/from-reading": CASEBOOK_PERMISSIONS.author,
  "POST /api/cases/generate": SIGNED_IN,
  "GET /api/cases/:id": SIGNED_IN,
  "PUT /api/cases/:id": CASEBOOK_PERMISSIONS.author,
  "POST /api/cases/:id/publish": CASEBOOK_PERMISSIONS.author,
  "DELETE /api/cases/:id": CASEBOOK_PERMISSIONS.author,
  "POST /api/attempts": CASEBOOK_PERMISSIONS.attempt,
  "GET /api/attempts": SIGNED_IN,
  "GET /api/attempts/progress": SIGNED_IN,
  "GET /api/attempts/progress/team": CASEBOOK_PERMISSIONS.seeTeamProgress,
  "GET /api/attempts/:id": SIGNED_IN,
} as const satisfies Record<string, Access>;

export type RouteKey = keyof typeof ROUTE_PERMISSIONS;

const METHODS = ["get", "post", "put", "patch", "delete"] as const;
type Method = (typeof METHODS)[number];

function guard(access: Access): RequestHandler {
  if (access === PUBLIC) return (_req, _res, next) => next();
  if (access === SIGNED_IN) return requireUser;
  return requireRole(...access);
}

/** Splits "POST /api/visits/:id/readings" into its method and its path below /api. */
export function parseRouteKey(key: string): { method: Method; path: string } {
  const [method, path] = key.split(" ") as [string, string];
  const lower = method.toLowerCase() as Method;
  if (!METHODS.includes(lower) || !path.startsWith("/api/"))
    throw new Error(`Route key "${key}" is not "METHOD /api/…"`);
  return { method: lower, path: path.slice("/api".length) };
}

/**
 * The gate, to mount on the /api router. Express matches each entry's path as it matches the
 * routers' own (entries with fewer parameters first, so /cases/generate is never taken for
 * /cases/:id); an allowed request leaves the gate for the resource routers (`next("router")`).
 */
export function routePermissionGate(table: Readonly<Record<string, Access>> = ROUTE_PERMISSIONS): Router {
  const gate = Router();
  const parameters = (path: string) => path.split("/").filter((segment) => segment.startsWith(":")).length;
  const entries = Object.entries(table)
    .map(([key, access]) => ({ ...parseRouteKey(key), access }))
    .sort((a, b) => parameters(a.path) - parameters(b.path));
  for (const { method, path, access } of entries) {
    gate.route(path)[method](guard(access), (_req, _res, next) => next("router"));
  }
  // No entry, no route: a route added without a rule stays closed.
  gate.use(apiNotFound);
  // The route-table walk in the tests skips the gate: it holds rules, not routes.
  Object.assign(gate, { isPermissionGate: true });
  return gate;
}
