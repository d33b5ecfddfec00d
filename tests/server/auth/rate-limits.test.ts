import request from "supertest";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { createApp } from "@server/app.ts";
import { DEFAULT_AUTH_LIMITS } from "@server/auth/rate-limits.ts";
import { rateLimitCounters } from "@server/db/schema.ts";
import { readEnv } from "@server/env.ts";
import { createLogger } from "@server/logger.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { DEMO_PASSWORD } from "@server/db/seed/demo-scenario.ts";
import { BELLBIRD, seedBellbird } from "../../setup/demo-accounts.ts";

const PASSWORD = "bellbird-demo-2026";

// The policy is in docs/accounts.md ("Sign-in throttling"), after the OWASP Authentication
// Cheat Sheet ("Account Lockout") and OWASP's "Blocking Brute Force Attacks"; the numbers are ours.
describe("sign-in and reset throttling", () => {
  let testApp: TestApp;
  beforeEach(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterEach(() => testApp.close());

  const signIn = (email: string, password: string, ip: string, app = testApp.app) =>
    request(app).post("/api/auth/sign-in").set("X-Forwarded-For", ip).send({ email, password });

  // Issue 13, item 2: five wrong passwords from one client used to refuse the account to
  // everyone, from everywhere, for 15 minutes.
  it("refuses a client after 5 failures for an account, and only that client: the owner still signs in from elsewhere", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient; attempt++) {
      expect((await signIn(BELLBIRD.owner, "wrong-password", "198.51.100.7")).status).toBe(401);
    }
    const blocked = await signIn(BELLBIRD.owner, PASSWORD, "198.51.100.7");
    expect(blocked.status).toBe(429);
    expect(blocked.body.message).toMatch(/Too many attempts/);
    expect(blocked.headers["ratelimit"]).toBeDefined();
    expect((await signIn(BELLBIRD.owner, PASSWORD, "203.0.113.50")).status).toBe(200);
  });

  it("lets no single client, however long it keeps at it, reach the account's ceiling", async () => {
    const attempts = DEFAULT_AUTH_LIMITS.signInFailuresPerAccount + 10;
    const statuses: number[] = [];
    for (let attempt = 0; attempt < attempts; attempt++)
      statuses.push((await signIn(BELLBIRD.owner, "wrong-password", "198.51.100.8")).status);
    expect(statuses.filter((status) => status === 401)).toHaveLength(
      DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient,
    );
    expect(
      statuses.slice(DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient).every((status) => status === 429),
    ).toBe(true);
    expect((await signIn(BELLBIRD.owner, PASSWORD, "203.0.113.51")).status).toBe(200);
  });

  it("slows guessing spread over many clients with a ceiling per account, leaving other accounts alone", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInFailuresPerAccount; attempt++) {
      expect((await signIn(BELLBIRD.owner, "wrong-password", `192.0.2.${attempt + 1}`)).status).toBe(401);
    }
    const ceiling = await signIn(BELLBIRD.owner, PASSWORD, "192.0.2.200");
    expect(ceiling.status).toBe(429);
    expect((await signIn(BELLBIRD.senior, PASSWORD, "192.0.2.200")).status).toBe(200);
  });

  it("throttles an unknown address exactly like a known one (no enumeration through 429s)", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient; attempt++) {
      expect((await signIn("ghost@bellbird.example", "wrong-password", "198.51.100.9")).status).toBe(401);
    }
    expect((await signIn("ghost@bellbird.example", "wrong-password", "198.51.100.9")).status).toBe(429);
  });

  it("does not count successful sign-ins against the account", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient + 2; attempt++) {
      expect((await signIn(BELLBIRD.technician, PASSWORD, "198.51.100.10")).status).toBe(200);
    }
  });

  it("keeps the counts in the database, shared by every app server, without addresses or e-mails in it", async () => {
    // A second app server over the same database, as a second process would be.
    const env = readEnv({
      NODE_ENV: "test",
      DATA_DIR: "memory://",
      APP_URL: "http://satura.test",
      LOG_LEVEL: "silent",
    });
    const second = createApp({
      db: testApp.database.db,
      env,
      logger: createLogger(env),
      mailer: testApp.mailer,
      photoStore: testApp.photoStore,
    });
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.signInFailuresPerAccountAndClient; attempt++) {
      const app = attempt % 2 === 0 ? testApp.app : second;
      expect((await signIn(BELLBIRD.owner, "wrong-password", "198.51.100.11", app)).status).toBe(401);
    }
    expect((await signIn(BELLBIRD.owner, PASSWORD, "198.51.100.11", second)).status).toBe(429);
    expect((await signIn(BELLBIRD.owner, PASSWORD, "198.51.100.11", testApp.app)).status).toBe(429);

    const rows = await testApp.database.db.select().from(rateLimitCounters);
    expect(rows.length).toBeGreaterThan(0);
    const stored = JSON.stringify(rows);
    expect(stored).not.toContain("bellbird.example");
    expect(stored).not.toContain("198.51.100.11");
    expect(rows.every((row) => /^[0-9a-f]{64}$/.test(row.key))).toBe(true);
  });

  it("answers 429 when one client tries too many accounts", async () => {
    const small = await createTestApp({ authLimits: { signInPerIp: 3 } });
    try {
      for (let attempt = 0; attempt < 3; attempt++) {
        const response = await request(small.app)
          .post("/api/auth/sign-in")
          .send({ email: `user${attempt}@example.com`, password: "whatever-it-is" });
        expect(response.status).toBe(401);
      }
      const blocked = await request(small.app)
        .post("/api/auth/sign-in")
        .send({ email: "user9@example.com", password: "whatever-it-is" });
      expect(blocked.status).toBe(429);
    } finally {
      await small.close();
    }
  });

  it("lets a crew sign in from one address: successes do not count against the address", async () => {
    const small = await createTestApp({ authLimits: { signInPerIp: 3 } });
    try {
      await seedBellbird(small);
      for (let attempt = 0; attempt < 5; attempt++) {
        const email = [BELLBIRD.technician, BELLBIRD.senior, BELLBIRD.owner][attempt % 3];
        const response = await request(small.app).post("/api/auth/sign-in").send({ email, password: DEMO_PASSWORD });
        expect(response.status).toBe(200);
      }
    } finally {
      await small.close();
    }
  });

  it("answers 429 after 3 reset requests for one account", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.resetPerAccount; attempt++) {
      const response = await request(testApp.app)
        .post("/api/auth/password-reset/request")
        .set("X-Forwarded-For", `192.0.2.${attempt}`)
        .send({ email: BELLBIRD.owner });
      expect(response.status).toBe(202);
    }
    const blocked = await request(testApp.app).post("/api/auth/password-reset/request").send({ email: BELLBIRD.owner });
    expect(blocked.status).toBe(429);
  });

  it("answers 429 when one client asks for too many resets", async () => {
    for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.resetPerIp; attempt++) {
      const response = await request(testApp.app)
        .post("/api/auth/password-reset/request")
        .send({ email: `person${attempt}@example.com` });
      expect(response.status).toBe(202);
    }
    const blocked = await request(testApp.app)
      .post("/api/auth/password-reset/request")
      .send({ email: "one-more@example.com" });
    expect(blocked.status).toBe(429);
  });

  // Express's "trust proxy" (https://expressjs.com/en/guide/behind-proxies.html): a forwarded
  // address counts only when the proxy that sent it is trusted. The tests connect from 127.0.0.1.
  it("believes X-Forwarded-For only from the proxies in TRUST_PROXY", async () => {
    const behindOtherProxy = await createTestApp({ env: { TRUST_PROXY: "203.0.113.7" } });
    try {
      // Each request claims another address, but 127.0.0.1 is not a trusted proxy: one client.
      for (let attempt = 0; attempt < DEFAULT_AUTH_LIMITS.resetPerIp; attempt++) {
        const response = await request(behindOtherProxy.app)
          .post("/api/auth/password-reset/request")
          .set("X-Forwarded-For", `198.51.100.${attempt}`)
          .send({ email: `person${attempt}@example.com` });
        expect(response.status).toBe(202);
      }
      const blocked = await request(behindOtherProxy.app)
        .post("/api/auth/password-reset/request")
        .set("X-Forwarded-For", "198.51.100.200")
        .send({ email: "one-more@example.com" });
      expect(blocked.status).toBe(429);
    } finally {
      await behindOtherProxy.close();
    }
  });

  it("refuses a TRUST_PROXY that is not addresses, subnets or Express's names, naming the variable", () => {
    expect(() => readEnv({ TRUST_PROXY: "everyone" })).toThrow(/TRUST_PROXY/);
    expect(() => readEnv({ TRUST_PROXY: "10.0.0.0/33" })).toThrow(/TRUST_PROXY/);
    expect(readEnv({ TRUST_PROXY: "10.0.0.10, 10.0.1.0/24,loopback" }).TRUST_PROXY).toEqual([
      "10.0.0.10",
      "10.0.1.0/24",
      "loopback",
    ]);
    expect(readEnv({}).TRUST_PROXY).toEqual(["loopback"]);
  });
});
