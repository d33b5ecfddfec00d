import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import packageJson from "../../package.json" with { type: "json" };

describe("GET /api/health", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
  });
  afterAll(() => testApp.close());

  it("reports the server and database as ok with the package version", async () => {
    const response = await request(testApp.app).get("/api/health");
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: "ok", db: "ok", version: packageJson.version });
  });

  it("answers unknown API paths with a JSON 404", async () => {
    const response = await request(testApp.app).get("/api/no-such-thing");
    expect(response.status).toBe(404);
    expect(response.body.message).toMatch(/No API route/);
  });

  it("answers malformed JSON with a 400 and a message", async () => {
    const response = await request(testApp.app)
      .post("/api/health")
      .set("Content-Type", "application/json")
      .send("{bad");
    expect(response.status).toBe(400);
    expect(response.body.message).toBe("The request body is not valid JSON");
  });

  it("refuses bodies over the size limit with 413", async () => {
    const response = await request(testApp.app)
      .post("/api/health")
      .set("Content-Type", "application/json")
      .send(JSON.stringify({ padding: "x".repeat(300_000) }));
    expect(response.status).toBe(413);
    expect(response.body.message).toBe("The request is too large");
  });

  it("sends security headers and hides the framework", async () => {
    const response = await request(testApp.app).get("/api/health");
    expect(response.headers["x-powered-by"]).toBeUndefined();
    expect(response.headers["content-security-policy"]).toContain("default-src 'self'");
    expect(response.headers["x-content-type-options"]).toBe("nosniff");
  });
});
