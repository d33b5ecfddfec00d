import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../../setup/demo-accounts.ts";

describe("development outbox", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("lists, for an owner, the mail the fake SMTP server received for that company", async () => {
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    await owner.post("/api/invitations").send({ email: "outbox-check@bellbird.example", role: "technician" });
    await testApp.smtp.waitFor((mail) => mail.to.includes("outbox-check@bellbird.example"));
    const response = await owner.get("/api/outbox");
    expect(response.status).toBe(200);
    expect(response.body.messages[0]).toMatchObject({ to: "outbox-check@bellbird.example", subject: "Join Bellbird Mechanical on Satura" });
    expect(response.body.messages[0].text).toContain("http://satura.test/accept-invitation?token=");
  });

  it("shows another company's owner none of it", async () => {
    const { agent } = await signUpOtherCompany(testApp.app);
    const response = await agent.get("/api/outbox");
    expect(response.status).toBe(200);
    expect(response.body.messages).toEqual([]);
  });

  it("is absent (404) when switched off, as it is by default in production", async () => {
    const off = await createTestApp({ env: { OUTBOX_ENABLED: "false" } });
    try {
      await seedBellbird(off);
      const owner = await signedIn(off.app, BELLBIRD.owner);
      expect((await owner.get("/api/outbox")).status).toBe(404);
    } finally {
      await off.close();
    }
  });
});
