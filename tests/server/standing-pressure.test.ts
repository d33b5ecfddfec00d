import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { atmosphericPressureAtAltitude, judgeStandingPressure, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** The demo clinic's site altitude, m: its gauges read against the ISO 2533 atmosphere there. */
const SITE_ALTITUDE_M = 85;

describe("standing-pressure checks API (non-condensables from the off-cycle standing pressure [S27][S28][S31])", () => {
  let testApp: TestApp;
  let technician: Agent;
  let apprentice: Agent;
  let outsider: Agent;
  let visitId: string;
  const path = () => `/api/visits/${visitId}/standing-pressure-checks`;
  const atmosphere = atmosphericPressureAtAltitude(SITE_ALTITUDE_M);

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    apprentice = await signedIn(testApp.app, BELLBIRD.apprentice);
    outsider = (await signUpOtherCompany(testApp.app)).agent;
    const sites = (await technician.get("/api/sites")).body.sites as { id: string; altitudeM: number | null }[];
    const site = sites.find((candidate) => candidate.altitudeM === SITE_ALTITUDE_M)!;
    const unit = await technician.post("/api/equipment").send({
      siteId: site.id,
      name: "Consulting room split",
      kind: "wall split",
      refrigerant: "R410A",
      circuits: [{ number: 1, factoryChargeKg: 1.6, meteringDevice: "txv" }],
    });
    expect(unit.status).toBe(201);
    visitId = (
      await technician
        .post("/api/visits")
        .send({ equipmentId: unit.body.equipment.id, reason: "Head pressure high after a line-set repair" })
    ).body.visit.id;
  });
  afterAll(() => testApp.close());

  it("fails R410A standing at 1750 kPa gauge with the condenser at 25 °C: about 4 K over, more than the 3 K (5 °F) limit [S31]", async () => {
    const response = await technician
      .post(path())
      .send({ standingGaugeKPa: 1750, equalisedTempC: 25, circuit: 1, note: "Fan run 10 min, air off = air on" });
    expect(response.status).toBe(201);
    const { input, result } = response.body.standingPressureCheck;
    // The refrigerant is the unit's and the atmosphere the site's, never the client's.
    expect(input).toEqual({
      refrigerant: "R410A",
      standingGaugeKPa: 1750,
      equalisedTempC: 25,
      atmosphericPressureKPa: atmosphere,
      circuit: 1,
      note: "Fan run 10 min, air off = air on",
    });
    expect(result).toEqual(
      judgeStandingPressure({
        refrigerant: "R410A",
        standingGaugeKPa: 1750,
        equalisedTempC: 25,
        atmosphericPressureKPa: atmosphere,
      }),
    );
    expect(result.verdict).toBe("fail");
    expect(result.excessK).toBeGreaterThan(3.5);
    expect(result.excessK).toBeLessThan(4.5);
    expect(result.reason).toMatch(/Non-condensables/);
    expect(result.zeotrope).toBe(false);
  });

  it("passes a standing pressure at the saturation pressure of the equalised temperature", async () => {
    const standing = Math.round(saturationPressure("R410A", 25, "bubble") - atmosphere);
    const response = await technician.post(path()).send({ standingGaugeKPa: standing, equalisedTempC: 25 });
    expect(response.status).toBe(201);
    expect(response.body.standingPressureCheck.result.verdict).toBe("pass");
    expect(response.body.standingPressureCheck.input.circuit).toBeNull();
    const list = (await apprentice.get(path())).body.standingPressureChecks;
    expect(list.map((check: { result: { verdict: string } }) => check.result.verdict)).toEqual(["fail", "pass"]);
  });

  it("refuses a malformed body, a forged refrigerant and readings outside the table with field messages, never a 500", async () => {
    const bad = await technician.post(path()).send({ standingGaugeKPa: "lots", circuit: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(
      expect.arrayContaining(["standingGaugeKPa", "equalisedTempC", "circuit"]),
    );
    const forged = await technician
      .post(path())
      .send({ standingGaugeKPa: 1750, equalisedTempC: 25, refrigerant: "R22", atmosphericPressureKPa: 60 });
    expect(forged.status).toBe(400);
    expect(forged.body.fields.refrigerant).toMatch(
      /^Not accepted: refrigerant, atmosphericPressureKPa\. .*refrigerant comes from the equipment/,
    );
    const hotCondenser = await technician.post(path()).send({ standingGaugeKPa: 1750, equalisedTempC: 90 });
    expect(hotCondenser.status).toBe(400);
    expect(Object.keys(hotCondenser.body.fields)).toEqual(["equalisedTempC"]);
    const beyondTable = await technician.post(path()).send({ standingGaugeKPa: 6000, equalisedTempC: 25 });
    expect(beyondTable.status).toBe(400);
    expect(Object.keys(beyondTable.body.fields)).toEqual(["standingGaugeKPa"]);
    const noCircuit = await technician.post(path()).send({ standingGaugeKPa: 1750, equalisedTempC: 25, circuit: 2 });
    expect(noCircuit.status).toBe(400);
    expect(noCircuit.body.fields.circuit).toMatch(/1 circuit/);
    expect((await technician.get(path())).body.standingPressureChecks).toHaveLength(2);
  });

  it("lets an apprentice read but not record, and hides the visit from another company", async () => {
    expect((await apprentice.post(path()).send({ standingGaugeKPa: 1750, equalisedTempC: 25 })).status).toBe(403);
    expect((await outsider.get(path())).status).toBe(404);
    expect((await outsider.post(path()).send({ standingGaugeKPa: 1750, equalisedTempC: 25 })).status).toBe(404);
  });

  it("voids a check with a reason: still listed with who and why, and the trail names it", async () => {
    const [first] = (await technician.get(path())).body.standingPressureChecks;
    const voided = await technician
      .post(`/api/visits/${visitId}/voids`)
      .send({ kind: "standing-pressure", recordId: first.id, reason: "Condenser still in the sun" });
    expect(voided.status).toBe(201);
    const list = (await technician.get(path())).body.standingPressureChecks;
    expect(list[0].voided).toMatchObject({ reason: "Condenser still in the sun", by: { name: "Sam Toko" } });
    expect(list[1].voided).toBeNull();
    const trail = (await technician.get(`/api/visits/${visitId}`)).body.visit.events;
    expect(trail.at(-1)).toMatchObject({
      action: "voided",
      recordKind: "standing-pressure",
      summary: "Standing pressure 1750 kPa gauge at 25 °C (R410A)",
      reason: "Condenser still in the sun",
    });
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/voids`)
          .send({ kind: "standing-pressure", recordId: first.id, reason: "Again" })
      ).status,
    ).toBe(409);
  });
});
