import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird } from "../../setup/demo-accounts.ts";

// OWASP CSRF Prevention Cheat Sheet: verify the Origin of state-changing requests.
describe("origin check", () => {
  let testApp: TestApp;
  const credentials = { email: BELLBIRD.owner, password: "bellbird-demo-2026" };
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("refuses a POST whose Origin is another site", async () => {
    const response = await request(testApp.app)
      .post("/api/auth/sign-in")
      .set("Origin", "https://evil.example")
      .send(credentials);
    expect(response.status).toBe(403);
    expect(response.body.message).toMatch(/another site/);
  });

  it("refuses an opaque (null) Origin", async () => {
    const response = await request(testApp.app).post("/api/auth/sign-in").set("Origin", "null").send(credentials);
    expect(response.status).toBe(403);
  });

  it("refuses a request marked cross-site by Fetch Metadata even without an Origin", async () => {
    const response = await request(testApp.app).post("/api/auth/sign-out").set("Sec-Fetch-Site", "cross-site");
    expect(response.status).toBe(403);
  });

  it("accepts the server's own origin and APP_URL", async () => {
    const own = await request(testApp.app)
      .post("/api/auth/sign-in")
      .set("Host", "tablet.local:3000")
      .set("Origin", "http://tablet.local:3000")
      .send(credentials);
    expect(own.status).toBe(200);
    const appUrl = await request(testApp.app)
      .post("/api/auth/sign-in")
      .set("Origin", "http://satura.test")
      .send(credentials);
    expect(appUrl.status).toBe(200);
  });

  it("lets reads through whatever their Origin", async () => {
    const response = await request(testApp.app).get("/api/health").set("Origin", "https://evil.example");
    expect(response.status).toBe(200);
  });
});
