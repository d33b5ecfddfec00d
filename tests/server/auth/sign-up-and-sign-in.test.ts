import { eq } from "drizzle-orm";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { organisations, users } from "@server/db/schema.ts";
import { SIGN_IN_FAILED } from "@server/routes/auth.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, cookieHeader, seedBellbird, signedIn } from "../../setup/demo-accounts.ts";

describe("sign-up, sign-in, sign-out and me", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("creates an organisation and its owner on sign-up, answering 201 with a session cookie", async () => {
    const agent = request.agent(testApp.app);
    const response = await agent.post("/api/auth/sign-up").send({
      name: " Mia Osei ",
      email: "Mia@Southwind.Example",
      password: "long-enough-passphrase",
      organisationName: "Southwind Air",
    });
    expect(response.status).toBe(201);
    expect(response.body.user).toMatchObject({ name: "Mia Osei", email: "mia@southwind.example", role: "owner" });
    const cookie = cookieHeader(response).find((line) => line.startsWith("satura_session="));
    expect(cookie).toBeDefined();
    // OWASP Session Management Cheat Sheet: HttpOnly, SameSite, Secure (Secure only over https; see the next test).
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);

    const me = await agent.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(me.body).toEqual({ user: response.body.user });
    const [organisation] = await testApp.database.db
      .select()
      .from(organisations)
      .where(eq(organisations.id, me.body.user.organisationId));
    expect(organisation!.name).toBe("Southwind Air");
  });

  it("marks the cookie Secure in production", async () => {
    const production = await createTestApp({ env: { NODE_ENV: "production" } });
    try {
      const response = await request(production.app).post("/api/auth/sign-up").send({
        name: "Kai Brand",
        email: "kai@prod.example",
        password: "another-long-passphrase",
        organisationName: "Prod Co",
      });
      expect(response.status).toBe(201);
      expect(cookieHeader(response).join(";")).toMatch(/; Secure/i);
    } finally {
      await production.close();
    }
  });

  it("refuses a second account with the same address, whatever its case", async () => {
    const response = await request(testApp.app).post("/api/auth/sign-up").send({
      name: "Copy",
      email: "OWNER@bellbird.example",
      password: "long-enough-passphrase",
      organisationName: "Copy Co",
    });
    expect(response.status).toBe(409);
    expect(response.body.fields.email).toMatch(/already has an account/);
  });

  it("validates every sign-up field with a message per field", async () => {
    const response = await request(testApp.app)
      .post("/api/auth/sign-up")
      .send({ name: "", email: "not-an-address", password: "short", organisationName: "" });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields).sort()).toEqual(["email", "name", "organisationName", "password"]);
  });

  // NIST SP 800-63B §5.1.1.2: at least 8 characters (we ask 10) and no commonly used passwords.
  it.each([
    ["nine char", /at least 10/],
    ["password123", /too common/],
    ["Qwertyuiop", /too common/],
    ["bellbird-demo-2026", /too common/],
    ["zzzzzzzzzzzz", /more than one kind/],
  ])("refuses the password %j", async (password, message) => {
    const response = await request(testApp.app)
      .post("/api/auth/sign-up")
      .send({ name: "Pat", email: `pat-${password.length}@example.com`, password, organisationName: "Pat Co" });
    expect(response.status).toBe(400);
    expect(response.body.fields.password).toMatch(message);
  });

  it("signs in a demo person with the demo password and answers me with the documented shape", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.senior);
    const me = await agent.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(Object.keys(me.body.user).sort()).toEqual(["email", "id", "name", "organisationId", "role"]);
    expect(me.body.user).toMatchObject({ email: BELLBIRD.senior, name: "Priya Raman", role: "senior" });
  });

  it("accepts the address in any case and with spaces around it", async () => {
    const response = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: "  Tech@Bellbird.EXAMPLE ", password: "bellbird-demo-2026" });
    expect(response.status).toBe(200);
  });

  it("answers a wrong password, an unknown address and a malformed address with the same 401", async () => {
    const wrongPassword = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: BELLBIRD.owner, password: "not-the-password" });
    const unknown = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: "nobody@bellbird.example", password: "not-the-password" });
    const malformed = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: "nobody", password: "not-the-password" });
    for (const response of [wrongPassword, unknown, malformed]) {
      expect(response.status).toBe(401);
      expect(response.body).toEqual({ message: SIGN_IN_FAILED });
      expect(
        cookieHeader(response).some(
          (line) => line.startsWith("satura_session=") && !line.startsWith("satura_session=;"),
        ),
      ).toBe(false);
    }
  });

  it("answers 400 when the password is missing", async () => {
    const response = await request(testApp.app).post("/api/auth/sign-in").send({ email: BELLBIRD.owner });
    expect(response.status).toBe(400);
    expect(response.body.fields.password).toBeDefined();
  });

  it("ends the session on sign-out with 204, so the same cookie no longer works", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.technician);
    const before = await agent.get("/api/auth/me");
    expect(before.status).toBe(200);
    const signOut = await agent.post("/api/auth/sign-out");
    expect(signOut.status).toBe(204);
    expect(cookieHeader(signOut).join(";")).toMatch(/satura_session=;/);
    const after = await agent.get("/api/auth/me");
    expect(after.status).toBe(401);
  });

  it("answers me without a session with 401", async () => {
    const response = await request(testApp.app).get("/api/auth/me");
    expect(response.status).toBe(401);
    expect(response.body.message).toBe("Sign in to continue");
  });

  it("refuses sign-in to a removed member with the same generic 401", async () => {
    await testApp.database.db
      .update(users)
      .set({ deactivatedAt: new Date() })
      .where(eq(users.email, "tech2@bellbird.example"));
    const response = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: "tech2@bellbird.example", password: "bellbird-demo-2026" });
    expect(response.status).toBe(401);
    expect(response.body).toEqual({ message: SIGN_IN_FAILED });
  });
});
