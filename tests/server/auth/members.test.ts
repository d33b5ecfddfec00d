import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sessions } from "@server/db/schema.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, type DemoIds } from "../../setup/demo-accounts.ts";

describe("members", () => {
  let testApp: TestApp;
  let ids: DemoIds;
  let owner: Awaited<ReturnType<typeof signedIn>>;
  beforeAll(async () => {
    testApp = await createTestApp();
    ids = await seedBellbird(testApp);
    owner = await signedIn(testApp.app, BELLBIRD.owner);
  });
  afterAll(() => testApp.close());

  it("lists the company's people with their roles, by name", async () => {
    const response = await owner.get("/api/members");
    expect(response.status).toBe(200);
    const names = response.body.members.map((member: { name: string }) => member.name);
    expect(names).toEqual([...names].sort());
    expect(response.body.members).toHaveLength(5);
    expect(response.body.members.find((member: { email: string }) => member.email === BELLBIRD.apprentice).role).toBe(
      "apprentice",
    );
  });

  it("lets an owner change a role", async () => {
    const response = await owner.patch(`/api/members/${ids[BELLBIRD.apprentice]}`).send({ role: "technician" });
    expect(response.status).toBe(200);
    expect(response.body.member).toMatchObject({ email: BELLBIRD.apprentice, role: "technician" });
    await owner.patch(`/api/members/${ids[BELLBIRD.apprentice]}`).send({ role: "apprentice" });
  });

  it("refuses an unknown role", async () => {
    const response = await owner.patch(`/api/members/${ids[BELLBIRD.apprentice]}`).send({ role: "admin" });
    expect(response.status).toBe(400);
    expect(response.body.fields.role).toBeDefined();
  });

  it("never demotes or removes the last owner", async () => {
    const demote = await owner.patch(`/api/members/${ids[BELLBIRD.owner]}`).send({ role: "senior" });
    expect(demote.status).toBe(409);
    expect(demote.body.message).toMatch(/at least one owner/);
    const remove = await owner.delete(`/api/members/${ids[BELLBIRD.owner]}`);
    expect(remove.status).toBe(409);
  });

  it("allows an owner to step down once there is a second owner", async () => {
    await owner.patch(`/api/members/${ids[BELLBIRD.senior]}`).send({ role: "owner" });
    const stepDown = await owner.patch(`/api/members/${ids[BELLBIRD.owner]}`).send({ role: "senior" });
    expect(stepDown.status).toBe(200);
    const newOwner = await signedIn(testApp.app, BELLBIRD.senior);
    expect((await newOwner.patch(`/api/members/${ids[BELLBIRD.owner]}`).send({ role: "owner" })).status).toBe(200);
    expect((await newOwner.patch(`/api/members/${ids[BELLBIRD.senior]}`).send({ role: "senior" })).status).toBe(200);
  });

  it("removes a member: their sessions end, they drop off the list and cannot sign in", async () => {
    const leaver = await signedIn(testApp.app, "tech2@bellbird.example");
    const response = await owner.delete(`/api/members/${ids["tech2@bellbird.example"]}`);
    expect(response.status).toBe(204);
    expect((await leaver.get("/api/auth/me")).status).toBe(401);
    expect(
      await testApp.database.db.select().from(sessions).where(eq(sessions.userId, ids["tech2@bellbird.example"])),
    ).toHaveLength(0);
    const list = await owner.get("/api/members");
    expect(list.body.members.map((member: { email: string }) => member.email)).not.toContain("tech2@bellbird.example");
    expect((await owner.delete(`/api/members/${ids["tech2@bellbird.example"]}`)).status).toBe(404);
  });

  it("answers 404 for an id that is not a uuid", async () => {
    expect((await owner.patch("/api/members/12345").send({ role: "senior" })).status).toBe(404);
  });
});
