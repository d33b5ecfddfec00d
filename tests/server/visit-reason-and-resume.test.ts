import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { NO_REASON_YET, REASON_NEEDED_MESSAGE } from "@shared/schemas/visits.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe("a visit started without a reason, and the viewer's last activity", () => {
  let testApp: TestApp;
  let technician: Agent;
  /** Another member, for whom "your" activity is different. */
  let senior: Agent;
  let unitIds: string[];

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    unitIds = (await technician.get("/api/equipment")).body.equipment.map((unit: { id: string }) => unit.id);
  });
  afterAll(() => testApp.close());

  it("starts a visit with no reason at all (stored empty, the trail says none was given yet)", async () => {
    const created = await technician.post("/api/visits").send({ equipmentId: unitIds[0] });
    expect(created.status).toBe(201);
    expect(created.body.visit.reason).toBe("");
    expect(created.body.visit.events[0]).toMatchObject({ action: "started", summary: NO_REASON_YET });
  });

  it("still refuses a reason too short to say anything, with the field named", async () => {
    const response = await technician.post("/api/visits").send({ equipmentId: unitIds[0], reason: "x" });
    expect(response.status).toBe(400);
    expect(response.body.fields.reason).toMatch(/at least a few words/);
  });

  it("refuses to submit without a reason (400, nothing changes), then takes the reason with the submit", async () => {
    const visitId = (await technician.post("/api/visits").send({ equipmentId: unitIds[0], reason: "  " })).body.visit
      .id;
    const refused = await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" });
    expect(refused.status).toBe(400);
    expect(refused.body.message).toBe(REASON_NEEDED_MESSAGE);
    expect(refused.body.fields.reason).toBe(REASON_NEEDED_MESSAGE);
    const unchanged = (await technician.get(`/api/visits/${visitId}`)).body.visit;
    expect(unchanged).toMatchObject({ status: "open", reason: "" });
    expect(unchanged.events.map((event: { action: string }) => event.action)).toEqual(["started"]);

    const submitted = await technician
      .post(`/api/visits/${visitId}/review`)
      .send({ action: "submit", reason: "Quarterly check, customer reports noise" });
    expect(submitted.status).toBe(200);
    expect(submitted.body.visit).toMatchObject({
      status: "awaiting-review",
      reason: "Quarterly check, customer reports noise",
    });
    expect(submitted.body.visit.events.at(-1)).toMatchObject({
      action: "submitted",
      reason: "Reason for the visit: Quarterly check, customer reports noise",
    });
  });

  it("submits a visit that already has its reason without asking again, keeping that reason", async () => {
    const visitId = (
      await technician.post("/api/visits").send({ equipmentId: unitIds[1], reason: "Iced suction line" })
    ).body.visit.id;
    const submitted = await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" });
    expect(submitted.status).toBe(200);
    expect(submitted.body.visit.reason).toBe("Iced suction line");
  });

  it("tells each person when they last worked on each visit, and nothing for visits they never touched", async () => {
    const mine = (await technician.post("/api/visits").send({ equipmentId: unitIds[2] })).body.visit.id;
    const theirs = (await senior.post("/api/visits").send({ equipmentId: unitIds[2], reason: "Second opinion" })).body
      .visit.id;
    const forMe = (await technician.get("/api/visits?status=open")).body.visits;
    const mineSeen = forMe.find((visit: { id: string }) => visit.id === mine);
    expect(mineSeen.yourLastActivityAt).not.toBeNull();
    expect(forMe.find((visit: { id: string }) => visit.id === theirs).yourLastActivityAt).toBeNull();

    // A comment later on is activity too: the time moves on.
    await technician.post(`/api/visits/${mine}/comments`).send({ body: "Filter changed" });
    const later = (await technician.get("/api/visits?status=open")).body.visits.find(
      (visit: { id: string }) => visit.id === mine,
    );
    expect(Date.parse(later.yourLastActivityAt)).toBeGreaterThanOrEqual(Date.parse(mineSeen.yourLastActivityAt));
    const forThem = (await senior.get("/api/visits?status=open")).body.visits;
    expect(forThem.find((visit: { id: string }) => visit.id === theirs).yourLastActivityAt).not.toBeNull();
    expect(forThem.find((visit: { id: string }) => visit.id === mine).yourLastActivityAt).toBeNull();
  });
});
