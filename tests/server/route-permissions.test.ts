import express from "express";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ROLES, type Role } from "@shared/schemas/auth.ts";
import {
  PUBLIC,
  ROUTE_PERMISSIONS,
  SIGNED_IN,
  parseRouteKey,
  routePermissionGate,
  type Access,
  type RouteKey,
} from "@server/auth/route-permissions.ts";
import { errorHandler } from "@server/http/error-handler.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { appRoutes } from "../setup/route-table.ts";
import { BELLBIRD, signedIn } from "../setup/demo-accounts.ts";
import { SESSION_ROUTES, UNTHROTTLED, sampleBodies } from "../setup/route-samples.ts";
import { pathFor, twoCompanies, type TwoCompanies } from "../setup/two-companies.ts";

const allows = (access: Access, role: Role) =>
  access === PUBLIC || access === SIGNED_IN || (access as readonly Role[]).includes(role);
const ENTRIES = Object.entries(ROUTE_PERMISSIONS) as [RouteKey, Access][];
const hasRecordInPath = (key: RouteKey) => key.includes("/:");
/** A uuid no record has: a permitted caller in its own company gets past the gate, then 404 or 400. */
const NO_SUCH_RECORD = "00000000-0000-4000-8000-000000000000";

/**
 * Calls a route with its sample body (tests/setup/route-samples.ts): routes that read their
 * body before they look up the record in their path must meet a valid one, so that the record
 * answers (404), not the body (400). Writes name a version (If-Match) for the same reason: the
 * versioned records refuse a write without one (428) before they look for the record.
 */
let bodies: ReturnType<typeof sampleBodies> = {};
function call(agent: ReturnType<typeof request.agent> | ReturnType<typeof request>, key: RouteKey, url: string) {
  const { method } = parseRouteKey(key);
  const test = agent[method](url);
  return method === "get" ? test : test.set("If-Match", '"1"').send(bodies[key] ?? {});
}

/** The route's URL naming records that do not exist (and circuit 1). */
const urlWithoutRecords = (path: string) =>
  `/api${path
    .split("/")
    .map((segment) => (segment === ":circuit" ? "1" : segment.startsWith(":") ? NO_SUCH_RECORD : segment))
    .join("/")}`;

/**
 * The role × route × company matrix, generated from the one permission table
 * (server/auth/route-permissions.ts): every route the app has, for every role of two companies
 * and for a caller with no session.
 */
describe("route permissions", () => {
  let testApp: TestApp;
  let world: TwoCompanies;

  beforeAll(async () => {
    // Every caller comes from one address here; the throttles have their own tests.
    testApp = await createTestApp({ authLimits: UNTHROTTLED });
    world = await twoCompanies(testApp);
    bodies = sampleBodies(world.records);
  }, 120_000);
  afterAll(() => testApp.close());

  it("has one entry for every route of the app, and a route for every entry", async () => {
    const inApp = appRoutes(testApp.app)
      .map((route) => route.key)
      .sort();
    const inTable = Object.keys(ROUTE_PERMISSIONS).sort();
    expect(
      inApp.filter((key) => !inTable.includes(key)),
      "routes without an entry in ROUTE_PERMISSIONS",
    ).toEqual([]);
    expect(
      inTable.filter((key) => !inApp.includes(key)),
      "entries without a route",
    ).toEqual([]);
    expect(inApp.length).toBeGreaterThan(70);
  });

  it("keeps a route that has no entry closed (404), whatever the caller", async () => {
    const app = express();
    app.use("/api", routePermissionGate({ "GET /api/listed": PUBLIC }));
    app.get("/api/listed", (_req, res) => void res.json({ ok: true }));
    app.get("/api/unlisted", (_req, res) => void res.json({ leaked: true }));
    app.use(errorHandler);
    expect((await request(app).get("/api/listed")).status).toBe(200);
    const unlisted = await request(app).get("/api/unlisted");
    expect(unlisted.status).toBe(404);
    expect(unlisted.body.message).toMatch(/No API route/);
  });

  describe.each(ENTRIES)("%s", (key, access) => {
    const path = parseRouteKey(key).path;

    it(access === PUBLIC ? "is open without a session" : "answers 401 without a session", async () => {
      const response = await call(request(testApp.app), key, urlWithoutRecords(path));
      if (access === PUBLIC) expect(response.status, JSON.stringify(response.body)).not.toBe(403);
      else expect(response.status, JSON.stringify(response.body)).toBe(401);
    });

    it.each(ROLES)("as a %s of the company: the gate follows the table", async (role) => {
      // Records that do not exist, so a permitted call changes nothing (404 or 400). Routes
      // that end or replace the session get a session of their own.
      const agent = SESSION_ROUTES.has(key) ? await signedIn(testApp.app, BELLBIRD[role]) : world.bellbird[role];
      const response = await call(agent, key, urlWithoutRecords(path));
      if (allows(access, role)) {
        expect(response.status, JSON.stringify(response.body)).not.toBe(403);
        if (access !== PUBLIC) expect(response.status, JSON.stringify(response.body)).not.toBe(401);
      } else {
        expect(response.status, JSON.stringify(response.body)).toBe(403);
      }
    });

    if (hasRecordInPath(key)) {
      it.each(ROLES)(
        "as a %s of another company naming Bellbird's record: 404 when allowed, 403 when not, never the record",
        async (role) => {
          const response = await call(world.coldfront[role], key, `/api${pathFor(path, world.records)}`);
          expect(response.status, JSON.stringify(response.body)).toBe(allows(access, role) ? 404 : 403);
        },
      );
    } else if (parseRouteKey(key).method === "get") {
      it.each(ROLES)("as a %s of another company: lists none of Bellbird's records", async (role) => {
        const response = await call(world.coldfront[role], key, `/api${path}`);
        if (!allows(access, role)) return void expect(response.status).toBe(403);
        const body = JSON.stringify(response.body) + (response.text ?? "");
        for (const id of Object.values(world.records)) expect(body).not.toContain(id);
      });
    }
  });
});
