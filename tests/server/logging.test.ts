import { Writable } from "node:stream";
import { DrizzleQueryError } from "drizzle-orm/errors";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SESSION_COOKIE_NAME } from "@server/auth/lucia.ts";
import { redactUrl, serializeError } from "@server/logger.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, cookieHeader, linkIn, seedBellbird } from "../setup/demo-accounts.ts";

/** Every line the app logs, kept in memory. */
function captureLog() {
  const lines: string[] = [];
  const stream = new Writable({
    write(chunk: Buffer, _encoding, done) {
      lines.push(chunk.toString("utf8"));
      done();
    },
  });
  return { stream, text: () => lines.join("") };
}

/** The session ids the server handed out in Set-Cookie headers. */
function sessionIds(response: request.Response): string[] {
  return cookieHeader(response)
    .map((cookie) => cookie.match(new RegExp(`^${SESSION_COOKIE_NAME}=([^;]+)`))?.[1])
    .filter((id): id is string => Boolean(id));
}

// Issue 13, item 1: pino-http logged request and response headers, so live session cookies
// landed in the log. Nothing that works as a credential may be written there.
describe("request log", () => {
  let testApp: TestApp;
  const log = captureLog();

  beforeAll(async () => {
    testApp = await createTestApp({ logDestination: log.stream });
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("holds no session token, reset token or bearer credential after a signed-in session", async () => {
    const secrets: string[] = [];
    const agent = request.agent(testApp.app);
    const signIn = await agent
      .post("/api/auth/sign-in")
      .send({ email: BELLBIRD.owner, password: "bellbird-demo-2026" });
    expect(signIn.status).toBe(200);
    secrets.push(...sessionIds(signIn));
    expect(secrets).toHaveLength(1);

    // Requests that carry the cookie, one that fails, and one that names a token in its URL and Referer.
    expect((await agent.get("/api/auth/me")).status).toBe(200);
    expect((await agent.get("/api/equipment")).status).toBe(200);
    expect((await agent.get("/api/visits/not-a-visit")).status).toBe(404);
    await request(testApp.app).post("/api/auth/password-reset/request").send({ email: BELLBIRD.owner });
    const mail = await testApp.mailbox.waitFor(
      (message) => message.to.includes(BELLBIRD.owner) && message.decoded.includes("reset-password"),
    );
    const resetToken = linkIn(mail.decoded).searchParams.get("token")!;
    secrets.push(resetToken);
    await agent
      .get(`/api/auth/me?token=${encodeURIComponent(resetToken)}&from=mail`)
      .set("Referer", `http://satura.test/reset-password?token=${encodeURIComponent(resetToken)}`);
    const bearer = "bearer-credential-that-must-not-be-logged";
    secrets.push(bearer);
    await request(testApp.app).get("/api/members").set("Authorization", `Bearer ${bearer}`);
    const signOut = await agent.post("/api/auth/sign-out");
    expect(signOut.status).toBe(204);

    const text = log.text();
    // The log did record these requests, so the absence of secrets means something.
    expect(text).toContain('"url":"/api/auth/me?token=[redacted]&from=[redacted]"');
    expect(text).toContain('"cookie":"[redacted]"');
    expect(text).toContain('"set-cookie":"[redacted]"');
    for (const secret of secrets) expect(text).not.toContain(secret);
    expect(text).not.toContain(encodeURIComponent(resetToken));
  });

  it("hides every query value in a logged URL, keeping the path and names", () => {
    expect(redactUrl("/api/register?from=2026-01-01&technicianId=abc")).toBe(
      "/api/register?from=[redacted]&technicianId=[redacted]",
    );
    expect(redactUrl("/accept-invitation?token=abc123")).toBe("/accept-invitation?token=[redacted]");
    expect(redactUrl("/api/visits")).toBe("/api/visits");
  });

  it("logs a failed query by its SQL, never by its parameters", () => {
    const cause = Object.assign(new Error('duplicate key value violates unique constraint "users_email_unique"'), {
      code: "23505",
      constraint: "users_email_unique",
      detail: "Key (lower(email))=(owner@bellbird.example) already exists.",
    });
    const error = new DrizzleQueryError(
      'insert into "users" ("email", "password_hash") values ($1, $2)',
      ["owner@bellbird.example", "$argon2id$v=19$secret-hash"],
      cause,
    );
    const serialized = JSON.stringify(serializeError(error));
    expect(serialized).toContain('insert into \\"users\\"');
    expect(serialized).toContain("23505");
    expect(serialized).not.toContain("secret-hash");
    expect(serialized).not.toContain("owner@bellbird.example");
  });
});
