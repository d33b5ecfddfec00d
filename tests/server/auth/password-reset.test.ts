import { eq } from "drizzle-orm";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { passwordResets, sessions } from "@server/db/schema.ts";
import { RESET_REQUESTED } from "@server/routes/auth.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, linkIn, seedBellbird, signedIn, type DemoIds } from "../../setup/demo-accounts.ts";

describe("password reset", () => {
  let testApp: TestApp;
  let ids: DemoIds;
  beforeAll(async () => {
    testApp = await createTestApp();
    ids = await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  const requestReset = (email: string) => request(testApp.app).post("/api/auth/password-reset/request").send({ email });
  const mailTo = (email: string) => testApp.mailbox.waitFor((mail) => mail.to.includes(email));
  const tokenFrom = async (email: string) => linkIn((await mailTo(email)).decoded).searchParams.get("token")!;

  it("answers a known and an unknown address identically, and mails only the known one", async () => {
    const known = await requestReset(BELLBIRD.senior);
    const unknown = await requestReset("nobody@bellbird.example");
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual({ message: RESET_REQUESTED });
    expect(unknown.body).toEqual(known.body);

    const mail = await mailTo(BELLBIRD.senior);
    expect(mail.decoded).toContain("Subject: Reset your Satura password");
    const link = linkIn(mail.decoded);
    expect(link.origin).toBe("http://satura.test"); // built from APP_URL, never from the Host header
    expect(link.pathname).toBe("/reset-password");
    // Give a stray mail a moment to show up before asserting none did.
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(testApp.mailbox.messages.some((message) => message.to.includes("nobody@bellbird.example"))).toBe(false);
  });

  it("stores only a hash of the token, which expires after an hour", async () => {
    const token = await tokenFrom(BELLBIRD.senior);
    const rows = await testApp.database.db
      .select()
      .from(passwordResets)
      .where(eq(passwordResets.userId, ids[BELLBIRD.senior]));
    expect(rows.some((row) => row.tokenHash === token)).toBe(false);
    const latest = rows.find((row) => row.usedAt === null)!;
    const minutes = (latest.expiresAt.getTime() - latest.createdAt.getTime()) / 60_000;
    expect(minutes).toBeCloseTo(60, 0);
  });

  it("sets the new password once, signs out every session and refuses the link a second time", async () => {
    const oldSession = await signedIn(testApp.app, BELLBIRD.senior);
    const token = await tokenFrom(BELLBIRD.senior);
    const confirm = await request(testApp.app)
      .post("/api/auth/password-reset/confirm")
      .send({ token, password: "evaporator-glide-2027" });
    expect(confirm.status).toBe(204);

    expect((await oldSession.get("/api/auth/me")).status).toBe(401);
    const oldPassword = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: BELLBIRD.senior, password: "bellbird-demo-2026" });
    expect(oldPassword.status).toBe(401);
    const newPassword = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: BELLBIRD.senior, password: "evaporator-glide-2027" });
    expect(newPassword.status).toBe(200);

    const again = await request(testApp.app)
      .post("/api/auth/password-reset/confirm")
      .send({ token, password: "another-fresh-password" });
    expect(again.status).toBe(400);
    expect(again.body.fields.token).toMatch(/expired or was already used/);
  });

  it("makes an earlier link useless when a newer one is sent", async () => {
    await requestReset(BELLBIRD.apprentice);
    const first = await tokenFrom(BELLBIRD.apprentice);
    testApp.mailbox.messages.length = 0;
    await requestReset(BELLBIRD.apprentice);
    const second = await tokenFrom(BELLBIRD.apprentice);
    expect(second).not.toBe(first);
    const stale = await request(testApp.app)
      .post("/api/auth/password-reset/confirm")
      .send({ token: first, password: "brand-new-password-1" });
    expect(stale.status).toBe(400);
    const fresh = await request(testApp.app)
      .post("/api/auth/password-reset/confirm")
      .send({ token: second, password: "brand-new-password-1" });
    expect(fresh.status).toBe(204);
  });

  it("refuses an expired link", async () => {
    testApp.mailbox.messages.length = 0;
    await requestReset(BELLBIRD.technician);
    const token = await tokenFrom(BELLBIRD.technician);
    await testApp.database.db
      .update(passwordResets)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(passwordResets.userId, ids[BELLBIRD.technician]));
    const response = await request(testApp.app)
      .post("/api/auth/password-reset/confirm")
      .send({ token, password: "brand-new-password-2" });
    expect(response.status).toBe(400);
    const sessionCount = await testApp.database.db
      .select()
      .from(sessions)
      .where(eq(sessions.userId, ids[BELLBIRD.technician]));
    expect(sessionCount).toHaveLength(0);
  });

  it("applies the password policy to the new password", async () => {
    const response = await request(testApp.app)
      .post("/api/auth/password-reset/confirm")
      .send({ token: "x".repeat(43), password: "password123" });
    expect(response.status).toBe(400);
    expect(response.body.fields.password).toMatch(/too common/);
  });
});
