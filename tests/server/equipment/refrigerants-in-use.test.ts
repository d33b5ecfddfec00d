import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../../setup/demo-accounts.ts";

/**
 * GET /api/equipment/refrigerants: the refrigerants whose tables a device keeps for offline use,
 * compared with the company's units as the paged equipment list shows them.
 */
describe("GET /api/equipment/refrigerants", () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("lists each refrigerant of the company's units in use once, in order", async () => {
    const technician = await signedIn(testApp.app, BELLBIRD.technician);
    const units: { refrigerant: string }[] = [];
    let cursor: string | null = null;
    do {
      const page = await technician.get(`/api/equipment${cursor ? `?cursor=${cursor}` : ""}`);
      expect(page.status).toBe(200);
      units.push(...page.body.equipment);
      cursor = page.body.nextCursor;
    } while (cursor);
    const response = await technician.get("/api/equipment/refrigerants");
    expect(response.status).toBe(200);
    expect(response.body.refrigerants).toEqual([...new Set(units.map((unit) => unit.refrigerant))].sort());
    expect(response.body.refrigerants.length).toBeGreaterThan(1);
  });

  it("shows another company only its own units' refrigerants, and no one signed out", async () => {
    const { agent } = await signUpOtherCompany(testApp.app);
    expect((await agent.get("/api/equipment/refrigerants")).body).toEqual({ refrigerants: [] });
    expect((await request(testApp.app).get("/api/equipment/refrigerants")).status).toBe(401);
  });
});
