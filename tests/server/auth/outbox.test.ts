import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, linkIn, seedBellbird, signedIn, signUpOtherCompany } from "../../setup/demo-accounts.ts";

describe("development outbox", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("lists, for an owner, the mail caught for that company", async () => {
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    await owner.post("/api/invitations").send({ email: "outbox-check@bellbird.example", role: "technician" });
    await testApp.mailbox.waitFor((mail) => mail.to.includes("outbox-check@bellbird.example"));
    const response = await owner.get("/api/outbox");
    expect(response.status).toBe(200);
    expect(response.body.messages[0]).toMatchObject({
      to: "outbox-check@bellbird.example",
      subject: "Join Bellbird Mechanical on Satura",
    });
  });

  // Issue 13, item 11: the Outbox showed an owner the reset links of every member, enough to
  // take over their accounts. Only the reader's own mail keeps working links.
  it("shows no one else's reset or invitation token, and the reader's own mail whole", async () => {
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    await owner.post("/api/invitations").send({ email: "newcomer@bellbird.example", role: "apprentice" });
    for (const email of [BELLBIRD.technician, BELLBIRD.senior, BELLBIRD.owner]) {
      await request(testApp.app).post("/api/auth/password-reset/request").send({ email });
    }
    const sent = await Promise.all(
      ["newcomer@bellbird.example", BELLBIRD.technician, BELLBIRD.senior, BELLBIRD.owner].map(async (to) => {
        const mail = await testApp.mailbox.waitFor(
          (message) => message.to.includes(to) && /token=/.test(message.decoded),
        );
        return { to, token: linkIn(mail.decoded).searchParams.get("token")! };
      }),
    );

    const { messages } = (await owner.get("/api/outbox")).body as {
      messages: { to: string; text: string; linksHidden: boolean }[];
    };
    const outbox = JSON.stringify(messages);
    for (const { to, token } of sent) {
      const message = messages.find((candidate) => candidate.to === to && /token=/.test(candidate.text))!;
      if (to === BELLBIRD.owner) {
        expect(message.linksHidden).toBe(false);
        expect(message.text).toContain(`http://satura.test/reset-password?token=${token}`);
      } else {
        expect(message.linksHidden, to).toBe(true);
        expect(message.text).toMatch(/http:\/\/satura\.test\/(reset-password|accept-invitation)\?token=hidden/);
        expect(outbox).not.toContain(token);
      }
    }
  });

  it("shows another company's owner none of it", async () => {
    const { agent } = await signUpOtherCompany(testApp.app);
    const response = await agent.get("/api/outbox");
    expect(response.status).toBe(200);
    expect(response.body.messages).toEqual([]);
  });

  it("also drops each caught message in MAIL_DROP_DIR, the invitee's mailbox in development", async () => {
    const folder = mkdtempSync(join(tmpdir(), "satura-mail-drop-"));
    const dropping = await createTestApp({ env: { MAIL_DROP_DIR: folder } });
    try {
      await seedBellbird(dropping);
      const owner = await signedIn(dropping.app, BELLBIRD.owner);
      await owner.post("/api/invitations").send({ email: "dropped@bellbird.example", role: "technician" });
      const mail = await dropping.mailbox.waitFor((message) => message.to.includes("dropped@bellbird.example"));
      const files = readdirSync(folder).map((name) => readFileSync(join(folder, name), "utf8"));
      expect(files).toHaveLength(1);
      expect(files[0]).toMatch(/^To: dropped@bellbird\.example/m);
      expect(files[0]).toContain(linkIn(mail.decoded).href);
    } finally {
      await dropping.close();
      rmSync(folder, { recursive: true, force: true });
    }
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
