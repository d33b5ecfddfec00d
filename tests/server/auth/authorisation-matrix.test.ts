import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@shared/schemas/auth.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import {
  BELLBIRD,
  seedBellbird,
  signedIn,
  signedInBellbird,
  signUpOtherCompany,
  type DemoIds,
} from "../../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/**
 * Every protected account route × every role (issue 5's role rules: only owners manage
 * members; everyone reads their own profile and colleagues), plus unauthenticated callers
 * (401) and another company's owner, who must get 404 for every Bellbird record, never 403.
 */
describe("authorisation matrix", () => {
  let testApp: TestApp;
  let ids: DemoIds;
  let agents: Record<Role, Agent>;
  let outsider: Agent;
  let invitationId: string;
  let outsiderInvitationId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    ids = await seedBellbird(testApp);
    agents = await signedInBellbird(testApp.app);
    outsider = (await signUpOtherCompany(testApp.app)).agent;
    invitationId = (
      await agents.owner.post("/api/invitations").send({ email: "cross@bellbird.example", role: "apprentice" })
    ).body.invitation.id;
    outsiderInvitationId = (
      await outsider.post("/api/invitations").send({ email: "matrix@coldfront.example", role: "technician" })
    ).body.invitation.id;
  });
  afterAll(() => testApp.close());

  interface RouteCase {
    name: string;
    call: (agent: Agent | ReturnType<typeof request>) => Promise<request.Response>;
    /** Expected status per Bellbird role. */
    expect: Record<Role, number>;
    /** What another company's owner gets when it names a Bellbird record; undefined for list routes. */
    outsider?: number;
  }

  const allowAll = (status: number) => ({ owner: status, senior: status, technician: status, apprentice: status });
  const ownerOnly = (status: number) => ({ owner: status, senior: 403, technician: 403, apprentice: 403 });

  // Harmless writes: the role set is the one the member already has, so the matrix can run them in any order.
  const cases: RouteCase[] = [
    { name: "GET /api/auth/me", call: (a) => a.get("/api/auth/me"), expect: allowAll(200) },
    { name: "GET /api/profile", call: (a) => a.get("/api/profile"), expect: allowAll(200) },
    {
      name: "PUT /api/profile",
      // A profile save names the version it replaces (If-Match), read just before.
      call: async (a) => {
        const version = (await a.get("/api/profile")).body.version ?? 0;
        return a
          .put("/api/profile")
          .set("If-Match", `"${version}"`)
          .send({
            name: "Same Name",
            preferences: { temperatureUnit: "C", pressureUnit: "kPa", atmosphericPressureKPa: 101.325 },
          });
      },
      expect: allowAll(200),
    },
    { name: "GET /api/members", call: (a) => a.get("/api/members"), expect: allowAll(200) },
    {
      name: "PATCH /api/members/:id",
      call: (a) => a.patch(`/api/members/${ids["tech2@bellbird.example"]}`).send({ role: "technician" }),
      expect: ownerOnly(200),
      outsider: 404,
    },
    {
      name: "DELETE /api/members/:id (unknown id)",
      call: (a) => a.delete("/api/members/00000000-0000-4000-8000-000000000000"),
      expect: ownerOnly(404),
      outsider: 404,
    },
    {
      name: "DELETE /api/members/:id",
      // The last owner cannot be removed, so a permitted call answers 409 without changing anything.
      call: (a) => a.delete(`/api/members/${ids[BELLBIRD.owner]}`),
      expect: ownerOnly(409),
      outsider: 404,
    },
    { name: "GET /api/invitations", call: (a) => a.get("/api/invitations"), expect: ownerOnly(200) },
    {
      name: "POST /api/invitations",
      call: (a) => a.post("/api/invitations").send({ email: "matrix@bellbird.example", role: "apprentice" }),
      expect: ownerOnly(201),
    },
    {
      name: "DELETE /api/invitations/:id (unknown id)",
      call: (a) => a.delete("/api/invitations/00000000-0000-4000-8000-000000000000"),
      expect: ownerOnly(404),
      outsider: 404,
    },
    { name: "GET /api/outbox", call: (a) => a.get("/api/outbox"), expect: ownerOnly(200) },
  ];

  describe.each(cases)("$name", (routeCase) => {
    it("answers 401 without a session", async () => {
      expect((await routeCase.call(request(testApp.app))).status).toBe(401);
    });

    it.each(["owner", "senior", "technician", "apprentice"] as const)("answers %s as the matrix says", async (role) => {
      const response = await routeCase.call(agents[role]);
      expect(response.status, JSON.stringify(response.body)).toBe(routeCase.expect[role]);
    });

    if (routeCase.outsider !== undefined) {
      it("answers another company's owner 404, never 403", async () => {
        expect((await routeCase.call(outsider)).status).toBe(routeCase.outsider);
      });
    }
  });

  it("never lets another company's owner revoke a Bellbird invitation (404), nor the reverse", async () => {
    expect((await outsider.delete(`/api/invitations/${invitationId}`)).status).toBe(404);
    expect((await agents.owner.delete(`/api/invitations/${outsiderInvitationId}`)).status).toBe(404);
    const pending = await agents.owner.get("/api/invitations");
    expect(pending.body.invitations.map((item: { id: string }) => item.id)).toContain(invitationId);
  });

  it("shows each company only its own members, invitations and mail", async () => {
    const bellbirdEmails = ["owner@bellbird.example", "matrix@bellbird.example", "cross@bellbird.example"];
    const members = await outsider.get("/api/members");
    expect(members.body.members.map((member: { email: string }) => member.email)).toEqual(["owner@coldfront.example"]);
    const invitations = await outsider.get("/api/invitations");
    expect(invitations.body.invitations.map((item: { email: string }) => item.email)).toEqual([
      "matrix@coldfront.example",
    ]);
    const outbox = await outsider.get("/api/outbox");
    for (const message of outbox.body.messages as { to: string }[]) expect(bellbirdEmails).not.toContain(message.to);
    const bellbirdMembers = await agents.owner.get("/api/members");
    expect(bellbirdMembers.body.members.map((member: { email: string }) => member.email)).not.toContain(
      "owner@coldfront.example",
    );
  });

  it("refuses a senior who tries to promote themselves to owner", async () => {
    const response = await agents.senior.patch(`/api/members/${ids[BELLBIRD.senior]}`).send({ role: "owner" });
    expect(response.status).toBe(403);
    expect((await agents.senior.get("/api/auth/me")).body.user.role).toBe("senior");
  });
});
