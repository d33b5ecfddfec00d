import { eq } from "drizzle-orm";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { invitations, users } from "@server/db/schema.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, linkIn, seedBellbird, signedIn, signUpOtherCompany } from "../../setup/demo-accounts.ts";

describe("invitations", () => {
  let testApp: TestApp;
  let owner: Awaited<ReturnType<typeof signedIn>>;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    owner = await signedIn(testApp.app, BELLBIRD.owner);
  });
  afterAll(() => testApp.close());

  const tokenFor = async (email: string) => {
    const mail = await testApp.mailbox.waitFor((message) => message.to.includes(email));
    return linkIn(mail.decoded).searchParams.get("token")!;
  };

  it("lets an owner invite by e-mail with a role and mails a link to the invitee", async () => {
    const response = await owner.post("/api/invitations").send({ email: "Casey@Bellbird.example", role: "technician" });
    expect(response.status).toBe(201);
    expect(response.body.invitation).toMatchObject({
      email: "casey@bellbird.example",
      role: "technician",
      invitedByName: "Dana Whitlock",
    });
    expect(response.body.invitation.token).toBeUndefined();

    const mail = await testApp.mailbox.waitFor((message) => message.to.includes("casey@bellbird.example"));
    expect(mail.decoded).toContain("Subject: Join Bellbird Mechanical on Satura");
    expect(linkIn(mail.decoded).pathname).toBe("/accept-invitation");

    const list = await owner.get("/api/invitations");
    expect(list.body.invitations.map((invitation: { email: string }) => invitation.email)).toContain(
      "casey@bellbird.example",
    );
  });

  it("previews and accepts an invitation: the invitee joins with the role and a session", async () => {
    const token = await tokenFor("casey@bellbird.example");
    const preview = await request(testApp.app).post("/api/invitations/preview").send({ token });
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({
      organisationName: "Bellbird Mechanical",
      email: "casey@bellbird.example",
      role: "technician",
    });

    const invitee = request.agent(testApp.app);
    const accept = await invitee
      .post("/api/invitations/accept")
      .send({ token, name: "Casey Lin", password: "suction-line-insulated" });
    expect(accept.status).toBe(201);
    expect(accept.body.user).toMatchObject({ email: "casey@bellbird.example", name: "Casey Lin", role: "technician" });
    const me = await invitee.get("/api/auth/me");
    expect(me.body.user.organisationId).toBe(accept.body.user.organisationId);

    const signIn = await request(testApp.app)
      .post("/api/auth/sign-in")
      .send({ email: "casey@bellbird.example", password: "suction-line-insulated" });
    expect(signIn.status).toBe(200);
  });

  it("accepts a link only once", async () => {
    const token = await tokenFor("casey@bellbird.example");
    const again = await request(testApp.app)
      .post("/api/invitations/accept")
      .send({ token, name: "Someone Else", password: "suction-line-insulated" });
    expect(again.status).toBe(404);
    expect((await request(testApp.app).post("/api/invitations/preview").send({ token })).status).toBe(404);
  });

  it("refuses an expired invitation", async () => {
    await owner.post("/api/invitations").send({ email: "late@bellbird.example", role: "apprentice" });
    const token = await tokenFor("late@bellbird.example");
    await testApp.database.db
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.email, "late@bellbird.example"));
    const response = await request(testApp.app)
      .post("/api/invitations/accept")
      .send({ token, name: "Late Comer", password: "suction-line-insulated" });
    expect(response.status).toBe(404);
    expect(response.body.message).toMatch(/not valid any more/);
  });

  it("checks the invitee's name and password with the same rules as sign-up", async () => {
    const response = await request(testApp.app)
      .post("/api/invitations/accept")
      .send({ token: "y".repeat(43), name: "", password: "short" });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields).sort()).toEqual(["name", "password"]);
  });

  it("tells the owner when the address is already a member of the company", async () => {
    const response = await owner.post("/api/invitations").send({ email: BELLBIRD.senior, role: "technician" });
    expect(response.status).toBe(409);
    expect(response.body.fields.email).toMatch(/already a member/);
  });

  it("answers an address of another company exactly like a new address (no enumeration)", async () => {
    await signUpOtherCompany(testApp.app, "boss@coldfront.example");
    const taken = await owner.post("/api/invitations").send({ email: "boss@coldfront.example", role: "senior" });
    const fresh = await owner.post("/api/invitations").send({ email: "newcomer@bellbird.example", role: "senior" });
    expect(taken.status).toBe(201);
    expect(fresh.status).toBe(201);
    expect(Object.keys(taken.body.invitation).sort()).toEqual(Object.keys(fresh.body.invitation).sort());

    // Whoever reads that mailbox learns it already has an account, and no user is created.
    const token = await tokenFor("boss@coldfront.example");
    const accept = await request(testApp.app)
      .post("/api/invitations/accept")
      .send({ token, name: "Alex", password: "suction-line-insulated" });
    expect(accept.status).toBe(409);
    const rows = await testApp.database.db.select().from(users).where(eq(users.email, "boss@coldfront.example"));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.role).toBe("owner");
  });

  it("replaces a pending invitation when the same address is invited again", async () => {
    await owner.post("/api/invitations").send({ email: "twice@bellbird.example", role: "apprentice" });
    const first = await tokenFor("twice@bellbird.example");
    testApp.mailbox.messages.length = 0;
    await owner.post("/api/invitations").send({ email: "twice@bellbird.example", role: "technician" });
    const second = await tokenFor("twice@bellbird.example");
    expect((await request(testApp.app).post("/api/invitations/preview").send({ token: first })).status).toBe(404);
    const preview = await request(testApp.app).post("/api/invitations/preview").send({ token: second });
    expect(preview.body.role).toBe("technician");
    const pending = await owner.get("/api/invitations");
    expect(
      pending.body.invitations.filter((item: { email: string }) => item.email === "twice@bellbird.example"),
    ).toHaveLength(1);
  });

  it("lets an owner revoke an invitation, after which its link is dead", async () => {
    testApp.mailbox.messages.length = 0;
    const created = await owner
      .post("/api/invitations")
      .send({ email: "revoked@bellbird.example", role: "apprentice" });
    const token = await tokenFor("revoked@bellbird.example");
    const revoke = await owner.delete(`/api/invitations/${created.body.invitation.id}`);
    expect(revoke.status).toBe(204);
    expect((await request(testApp.app).post("/api/invitations/preview").send({ token })).status).toBe(404);
    expect((await owner.delete(`/api/invitations/${created.body.invitation.id}`)).status).toBe(404);
  });

  it("validates the invitation's e-mail and role", async () => {
    const response = await owner.post("/api/invitations").send({ email: "nope", role: "boss" });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields).sort()).toEqual(["email", "role"]);
  });
});
