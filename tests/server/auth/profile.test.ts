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
    expect(response.body.preferences).toEqual({
      temperatureUnit: "C",
      pressureUnit: "kPa",
      atmosphericPressureKPa: 101.325,
    });
  });

  it("saves display units, atmospheric pressure and name for that user only", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.technician);
    const update = await agent
      .put("/api/profile")
      .set("If-Match", '"1"')
      .send({
        name: "Sam Toko",
        preferences: { temperatureUnit: "F", pressureUnit: "psi", atmosphericPressureKPa: 95.5 },
      });
    expect(update.status).toBe(200);
    expect(update.body.version).toBe(2);
    expect(update.body.preferences).toEqual({
      temperatureUnit: "F",
      pressureUnit: "psi",
      atmosphericPressureKPa: 95.5,
    });
    expect((await agent.get("/api/profile")).body.preferences.pressureUnit).toBe("psi");

    const colleague = await signedIn(testApp.app, BELLBIRD.senior);
    expect((await colleague.get("/api/profile")).body.preferences.pressureUnit).toBe("kPa");
  });

  it("refuses units it does not know and pressures outside 50–110 kPa", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.apprentice);
    const response = await agent
      .put("/api/profile")
      .set("If-Match", '"1"')
      .send({ name: "", preferences: { temperatureUnit: "K", pressureUnit: "inHg", atmosphericPressureKPa: 20 } });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.fields).sort()).toEqual([
      "name",
      "preferences.atmosphericPressureKPa",
      "preferences.pressureUnit",
      "preferences.temperatureUnit",
    ]);
  });

  it("refuses a save from a stale copy (another tab or device saved since) with 409", async () => {
    const agent = await signedIn(testApp.app, BELLBIRD.senior);
    const { version } = (await agent.get("/api/profile")).body;
    // The form sends an emptied licence number as null (what the shared schema makes of "").
    const body = (name: string) => ({
      name,
      preferences: { temperatureUnit: "C", pressureUnit: "kPa", atmosphericPressureKPa: 101.325 },
      licenceNumber: null,
    });
    expect((await agent.put("/api/profile").set("If-Match", `"${version}"`).send(body("Priya Raman"))).status).toBe(
      200,
    );
    const stale = await agent.put("/api/profile").set("If-Match", `"${version}"`).send(body("Priya R."));
    expect(stale.status).toBe(409);
    expect(stale.body.message).toMatch(/A newer version of your profile was saved/);
    expect((await agent.get("/api/profile")).body.user.name).toBe("Priya Raman");
  });
});
