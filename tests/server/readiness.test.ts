import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { databaseReadiness } from "@server/routes/readiness.ts";
import { startS3TestStore, type TestPhotoStore } from "../setup/photo-stores.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";

describe("GET /api/ready", () => {
  let testApp: TestApp;
  let shuttingDown = false;
  let storeAnswers = true;
  beforeAll(async () => {
    testApp = await createTestApp({
      isShuttingDown: () => shuttingDown,
      // A second dependency beside the database, as the photo store is.
      readinessChecks: (database) => [
        databaseReadiness(database.db),
        {
          name: "store",
          check: async () => {
            if (!storeAnswers) throw new Error("connect ECONNREFUSED 10.0.0.9:9000 as secret-user");
          },
        },
      ],
    });
  });
  afterAll(() => testApp.close());

  it("is ready when every check passes, without a session", async () => {
    const response = await request(testApp.app).get("/api/ready");
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ready: true, checks: { database: "ok", store: "ok" } });
  });

  it("answers 503 naming the failed check, and not its reason", async () => {
    storeAnswers = false;
    try {
      const response = await request(testApp.app).get("/api/ready");
      expect(response.status).toBe(503);
      expect(response.body).toEqual({ ready: false, checks: { database: "ok", store: "failed" } });
      expect(JSON.stringify(response.body)).not.toContain("secret-user");
    } finally {
      storeAnswers = true;
    }
  });

  it("answers 503 once the server is shutting down, so a load balancer drains it", async () => {
    shuttingDown = true;
    try {
      const response = await request(testApp.app).get("/api/ready");
      expect(response.status).toBe(503);
      expect(response.body).toMatchObject({ ready: false, shuttingDown: true });
      // Liveness is another question: the process still answers.
      expect((await request(testApp.app).get("/api/health")).status).toBe(200);
    } finally {
      shuttingDown = false;
    }
  });
});

describe("GET /api/ready with the default checks", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
  });
  afterAll(() => testApp.close());

  it("checks the database and the photo store", async () => {
    const response = await request(testApp.app).get("/api/ready");
    expect(response.body).toEqual({ ready: true, checks: { database: "ok", "photo store": "ok" } });
  });
});

describe("GET /api/ready with a photo bucket that is missing", () => {
  let testApp: TestApp;
  let store: TestPhotoStore;
  beforeAll(async () => {
    store = await startS3TestStore({ withoutBucket: true });
    testApp = await createTestApp({ env: store.env });
  });
  afterAll(async () => {
    await testApp.close();
    await store.close();
  });

  it("is not ready, naming the photo store", async () => {
    const response = await request(testApp.app).get("/api/ready");
    expect(response.status).toBe(503);
    expect(response.body).toEqual({ ready: false, checks: { database: "ok", "photo store": "failed" } });
  });
});
