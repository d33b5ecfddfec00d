import { eq } from "drizzle-orm";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SESSION_LIFETIME } from "@server/auth/lucia.ts";
import { sessions, users } from "@server/db/schema.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, cookieHeader, seedBellbird, signedIn, type DemoIds } from "../../setup/demo-accounts.ts";

const DAY_MS = 24 * 3600_000;

describe("sessions", () => {
  let testApp: TestApp;
  let ids: DemoIds;
  beforeAll(async () => {
    testApp = await createTestApp();
    ids = await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  async function onlySessionOf(userId: string) {
    const rows = await testApp.database.db.select().from(sessions).where(eq(sessions.userId, userId));
    expect(rows).toHaveLength(1);
    return rows[0]!;
  }

  it("stores a session that expires 30 days after sign-in", async () => {
    const before = Date.now();
    await signedIn(testApp.app, BELLBIRD.owner);
    const session = await onlySessionOf(ids[BELLBIRD.owner]);
    expect(session.expiresAt.getTime() - before).toBeGreaterThanOrEqual(SESSION_LIFETIME.milliseconds() - 5_000);
    expect(session.expiresAt.getTime() - before).toBeLessThanOrEqual(SESSION_LIFETIME.milliseconds() + 5_000);
  });

  it("refuses an expired session and clears its cookie", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.senior);
    const session = await onlySessionOf(ids[BELLBIRD.senior]);
    await testApp.database.db
      .update(sessions)
      .set({ expiresAt: new Date(Date.now() - 1_000) })
      .where(eq(sessions.id, session.id));
    const response = await agent.get("/api/auth/me");
    expect(response.status).toBe(401);
    expect(cookieHeader(response).join(";")).toMatch(/satura_session=;/);
  });

  it("renews a session used in the second half of its life, with a new cookie expiry", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.technician);
    const session = await onlySessionOf(ids[BELLBIRD.technician]);
    const nearEnd = new Date(Date.now() + 2 * DAY_MS);
    await testApp.database.db.update(sessions).set({ expiresAt: nearEnd }).where(eq(sessions.id, session.id));

    const response = await agent.get("/api/auth/me");
    expect(response.status).toBe(200);
    expect(cookieHeader(response).join(";")).toMatch(new RegExp(`satura_session=${session.id};.*Max-Age=2592000`));
    const renewed = await onlySessionOf(ids[BELLBIRD.technician]);
    expect(renewed.expiresAt.getTime()).toBeGreaterThan(Date.now() + 29 * DAY_MS);
  });

  it("does not resend the cookie for a session early in its life", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.apprentice);
    const response = await agent.get("/api/auth/me");
    expect(response.status).toBe(200);
    expect(cookieHeader(response)).toEqual([]);
  });

  it("ignores a forged session id", async () => {
    const response = await request(testApp.app)
      .get("/api/auth/me")
      .set("Cookie", "satura_session=not-a-real-session-id");
    expect(response.status).toBe(401);
  });

  it("applies a role change to an existing session at once", async () => {
    const agent = await signedIn(testApp.app, "tech2@bellbird.example");
    await testApp.database.db
      .update(users)
      .set({ role: "apprentice" })
      .where(eq(users.email, "tech2@bellbird.example"));
    const me = await agent.get("/api/auth/me");
    expect(me.body.user.role).toBe("apprentice");
  });
});

describe("session fixation", () => {
  it("replaces the browser's existing session on a new sign-in", async () => {
    const testApp = await createTestApp();
    try {
      await seedBellbird(testApp);
      const agent = await signedIn(testApp.app, BELLBIRD.owner);
      const first = await testApp.database.db.select().from(sessions);
      const again = await agent
        .post("/api/auth/sign-in")
        .send({ email: BELLBIRD.owner, password: "bellbird-demo-2026" });
      expect(again.status).toBe(200);
      const after = await testApp.database.db.select().from(sessions);
      expect(after).toHaveLength(1);
      expect(after[0]!.id).not.toBe(first[0]!.id);
    } finally {
      await testApp.close();
    }
  });
});
