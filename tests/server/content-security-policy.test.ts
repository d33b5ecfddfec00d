import request from "supertest";
import { describe, expect, it } from "vitest";
import { createTestApp } from "../setup/test-app.ts";

async function policyFor(env: Record<string, string>): Promise<string> {
  const testApp = await createTestApp({ env });
  try {
    const response = await request(testApp.app).get("/api/health");
    return String(response.headers["content-security-policy"]);
  } finally {
    await testApp.close();
  }
}

// Issue 13, item 10: upgrade-insecure-requests on a plain-http install sent a tablet on the
// workshop LAN to an https address that does not exist (CSP Level 3 / Upgrade Insecure Requests §3).
describe("content security policy", () => {
  it("asks browsers to upgrade requests when the public address is https", async () => {
    const policy = await policyFor({ NODE_ENV: "production", APP_URL: "https://satura.example.com" });
    expect(policy).toContain("upgrade-insecure-requests");
    expect(policy).toContain("default-src 'self'");
  });

  it("does not on a plain-http install, such as a LAN address", async () => {
    const policy = await policyFor({ NODE_ENV: "production", APP_URL: "http://192.168.1.20:3000" });
    expect(policy).not.toContain("upgrade-insecure-requests");
    expect(policy).toContain("default-src 'self'");
  });
});
