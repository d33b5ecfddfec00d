import request from "supertest";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { DEFAULT_AUTH_LIMITS } from "@server/auth/rate-limits.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird } from "../../setup/demo-accounts.ts";

// OWASP Authentication Cheat Sheet: throttle per account and per source; the limits are ours.
describe("sign-in and reset throttling", () => {
  let testApp: TestApp;
  beforeEach(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterEach(() => testApp.close());

  const signIn = (email: string, password: string, ip = "203.0.113.7") =>
    request(testApp.app).post("/api/auth/sign-in").set("X-Forwarded-For", ip).send({ email, password });

  it("answers 429 after 5 failed sign-ins to one account, even from different IPs", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInPerAccount; attempt++) {
      const response = await signIn(BELLBIRD.owner, "wrong-password", `198.51.100.${attempt}`);
      expect(response.status).toBe(401);
    }
    const blocked = await signIn(BELLBIRD.owner, "bellbird-demo-2026", "198.51.100.99");
    expect(blocked.status).toBe(429);
    expect(blocked.body.message).toMatch(/Too many attempts/);
    expect(blocked.headers["ratelimit"]).toBeDefined();
    // Another account is not affected.
    expect((await signIn(BELLBIRD.senior, "bellbird-demo-2026")).status).toBe(200);
  });

  it("throttles an unknown address exactly like a known one (no enumeration through 429s)", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInPerAccount; attempt++) {
      expect((await signIn("ghost@bellbird.example", "wrong-password")).status).toBe(401);
    }
    expect((await signIn("ghost@bellbird.example", "wrong-password")).status).toBe(429);
  });

  it("does not count successful sign-ins against the account", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInPerAccount + 2; attempt++) {
      expect((await signIn(BELLBIRD.technician, "bellbird-demo-2026")).status).toBe(200);
    }
  });

  it("answers 429 when one IP tries too many addresses", async () => {
    const small = await createTestApp({ authLimits: { signInPerIp: 3 } });
    try {
      for (let attempt = 0; attempt < 3; attempt++) {
        const response = await request(small.app).post("/api/auth/sign-in").send({ email: `user${attempt}@example.com`, password: "whatever-it-is" });
        expect(response.status).toBe(401);
      }
      const blocked = await request(small.app).post("/api/auth/sign-in").send({ email: "user9@example.com", password: "whatever-it-is" });
      expect(blocked.status).toBe(429);
    } finally {
      await small.close();
    }
  });

  it("answers 429 after 3 reset requests for one account", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.resetPerAccount; attempt++) {
      const response = await request(testApp.app).post("/api/auth/password-reset/request").set("X-Forwarded-For", `192.0.2.${attempt}`).send({ email: BELLBIRD.owner });
      expect(response.status).toBe(202);
    }
    const blocked = await request(testApp.app).post("/api/auth/password-reset/request").send({ email: BELLBIRD.owner });
    expect(blocked.status).toBe(429);
  });

  it("answers 429 when one IP asks for too many resets", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.resetPerIp; attempt++) {
      const response = await request(testApp.app).post("/api/auth/password-reset/request").send({ email: `person${attempt}@example.com` });
      expect(response.status).toBe(202);
    }
    const blocked = await request(testApp.app).post("/api/auth/password-reset/request").send({ email: "one-more@example.com" });
    expect(blocked.status).toBe(429);
  });
});
