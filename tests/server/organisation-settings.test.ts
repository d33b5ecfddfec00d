import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../setup/demo-accounts.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe("organisation procedure settings", () => {
  let testApp: TestApp;
  let owner: Agent;
  let senior: Agent;
  let technician: Agent;
  let outsider: Agent;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    owner = await signedIn(testApp.app, BELLBIRD.owner);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    outsider = (await signUpOtherCompany(testApp.app)).agent;
  });
  afterAll(() => testApp.close());

  it("starts on Satura's defaults: 500 microns (the trade norm, ACHR News [S4]) and the app's 10 kPa allowed drop", async () => {
    const response = await technician.get("/api/organisation/settings");
    expect(response.status).toBe(200);
    expect(response.body).toEqual({
      settings: { evacuationTargetMicrons: null, pressureTestAllowedDropKPa: null },
      defaults: { evacuationTargetMicrons: 500, pressureTestAllowedDropKPa: 10 },
    });
  });

  it("lets only owners change them, with field messages for bad values", async () => {
    expect((await senior.put("/api/organisation/settings").send({ evacuationTargetMicrons: 300, pressureTestAllowedDropKPa: null })).status).toBe(403);
    const bad = await owner.put("/api/organisation/settings").send({ evacuationTargetMicrons: -5, pressureTestAllowedDropKPa: "x" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(expect.arrayContaining(["evacuationTargetMicrons", "pressureTestAllowedDropKPa"]));
    const saved = await owner.put("/api/organisation/settings").send({ evacuationTargetMicrons: 300, pressureTestAllowedDropKPa: 5 });
    expect(saved.body.settings).toEqual({ evacuationTargetMicrons: 300, pressureTestAllowedDropKPa: 5 });
  });

  it("applies the override to new evacuations on a visit, and keeps it to the one organisation", async () => {
    const units = (await technician.get("/api/equipment")).body.equipment;
    const visitId = (await technician.post("/api/visits").send({ equipmentId: units[0].id, reason: "Evacuation after repair" })).body.visit.id;
    const started = await technician.post(`/api/visits/${visitId}/evacuations`).send({});
    expect(started.body.evacuation.targetMicrons).toBe(300);
    expect((await outsider.get("/api/organisation/settings")).body.settings.evacuationTargetMicrons).toBeNull();
  });

  it("clears an override with null", async () => {
    const cleared = await owner.put("/api/organisation/settings").send({ evacuationTargetMicrons: null, pressureTestAllowedDropKPa: 5 });
    expect(cleared.body.settings).toEqual({ evacuationTargetMicrons: null, pressureTestAllowedDropKPa: 5 });
  });
});
