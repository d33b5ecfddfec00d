import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../../setup/demo-accounts.ts";

describe("profile settings", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("starts metric, at the standard atmosphere", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.technician);
    const response = await agent.get("/api/profile");
    expect(response.status).toBe(200);
    expect(response.body.organisationName).toBe("Bellbird Mechanical");
    // ISO 2533 standard atmosphere at sea level: 101.325 kPa.
    expect(response.body.preferences).toEqual({ temperatureUnit: "C", pressureUnit: "kPa", atmosphericPressureKPa: 101.325 });
  });

  it("saves display units, atmospheric pressure and name for that user only", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.technician);
    const update = await agent
      .put("/api/profile")
      .send({ name: "Sam Toko", preferences: { temperatureUnit: "F", pressureUnit: "psi", atmosphericPressureKPa: 95.5 } });
    expect(update.status).toBe(200);
    expect(update.body.preferences).toEqual({ temperatureUnit: "F", pressureUnit: "psi", atmosphericPressureKPa: 95.5 });
    expect((await agent.get("/api/profile")).body.preferences.pressureUnit).toBe("psi");

    const colleague = await signedIn(testApp.app, BELLBIRD.senior);
    expect((await colleague.get("/api/profile")).body.preferences.pressureUnit).toBe("kPa");
  });

  it("refuses units it does not know and pressures outside 50–110 kPa", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.apprentice);
    const response = await agent
      .put("/api/profile")
      .send({ name: "", preferences: { temperatureUnit: "K", pressureUnit: "inHg", atmosphericPressureKPa: 20 } });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields).sort()).toEqual([
      "name",
      "preferences.atmosphericPressureKPa",
      "preferences.pressureUnit",
      "preferences.temperatureUnit",
    ]);
  });
});
