import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { judgeReadingsCsv } from "@server/import/readings-csv.ts";
import { readingInput, siteAtmosphere } from "@server/visits/reading-input.ts";
import {
  atmosphericPressureAtAltitude,
  diagnose,
  saturationPressure,
  STANDARD_ATMOSPHERE_KPA,
} from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { startVisitAt } from "../setup/stored-readings.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const CLINIC_ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
/** Gauge pressure at which R407C saturates at a temperature, against the clinic's atmosphere. */
const gauge = (temperatureC: number, point: "bubble" | "dew", atmosphere = CLINIC_ATMOSPHERE) =>
  Number((saturationPressure("R407C", temperatureC, point) - atmosphere).toFixed(1));

const measured = {
  suctionPressureKPa: gauge(6, "dew"),
  suctionLineTempC: 12,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
  outdoorAirDryBulbC: 31,
  runMinutes: 20,
};

describe("readings are built from the measured values, the nameplate and the site", () => {
  let testApp: TestApp;
  let technician: Agent;
  let rooftop: {
    id: string;
    compressorRlaA: number;
    circuits: { number: number; targetSuperheatK: number; targetSubcoolingK: number }[];
  };
  let visitId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    const units = (await technician.get("/api/equipment")).body.equipment;
    rooftop = units.find((unit: { refrigerant: string }) => unit.refrigerant === "R407C");
    visitId = (
      await technician
        .post("/api/visits")
        .send({ equipmentId: rooftop.id, reason: "Charge check after the leak repair" })
    ).body.visit.id;
  });
  afterAll(() => testApp.close());

  const readingCount = async () => (await technician.get(`/api/visits/${visitId}`)).body.visit.readings.length;

  it("refuses a forged target, RLA or atmosphere by name and stores nothing", async () => {
    const forged = await technician.post(`/api/visits/${visitId}/readings`).send({
      circuit: 1,
      ...measured,
      targetSuperheatK: 25,
      targetSubcoolingK: 1,
      compressorRla: 99,
      atmosphericPressureKPa: 60,
      refrigerant: "R22",
    });
    expect(forged.status).toBe(400);
    expect(forged.body.message).toBe(
      "Not accepted: targetSuperheatK, targetSubcoolingK, compressorRla, atmosphericPressureKPa, refrigerant. A reading takes measured values only; targets and ratings come from the equipment, the atmosphere from the site.",
    );
    for (const field of [
      "targetSuperheatK",
      "targetSubcoolingK",
      "compressorRla",
      "atmosphericPressureKPa",
      "refrigerant",
    ]) {
      expect(forged.body.fields[field]).toMatch(
        /^Not accepted: .*targets and ratings come from the equipment, the atmosphere from the site/,
      );
      expect(forged.body.fields[field]).toContain(field);
    }
    const oneField = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send({ circuit: 1, ...measured, atmosphericPressureKPa: 101.325 });
    expect(oneField.status).toBe(400);
    expect(Object.keys(oneField.body.fields)).toEqual(["atmosphericPressureKPa"]);
    expect(await readingCount()).toBe(0);
  });

  it("stores the finding worked out from the nameplate targets, the unit's RLA and the site's atmosphere", async () => {
    const response = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send({ circuit: 1, ...measured, compressorAmps: 10.2 });
    expect(response.status).toBe(201);
    const { input, result } = response.body.reading;
    const nameplate = rooftop.circuits[0]!;
    expect(input).toMatchObject({
      refrigerant: "R407C",
      meteringDevice: "txv",
      targetSuperheatK: nameplate.targetSuperheatK,
      targetSubcoolingK: nameplate.targetSubcoolingK,
      compressorRla: rooftop.compressorRlaA,
      atmosphericPressureKPa: CLINIC_ATMOSPHERE,
    });
    expect(result).toEqual(diagnose(input));
    // The gauges were set from the clinic's atmosphere, so the engine finds the intended saturation.
    expect(result.evaporatingTempC).toBeCloseTo(6, 1);
    expect(result.condensingTempC).toBeCloseTo(42, 1);
    expect(result.targets.superheat).toMatchObject({ targetK: nameplate.targetSuperheatK, basis: "nameplate" });
    expect(result.compressorCurrentRatio).toBeCloseTo(10.2 / rooftop.compressorRlaA, 6);
  });

  it("tells the client which atmosphere the visit uses and why", async () => {
    const visit = (await technician.get(`/api/visits/${visitId}`)).body.visit;
    expect(visit.atmosphere).toEqual({
      pressureKPa: CLINIC_ATMOSPHERE,
      basis: "site-altitude",
      altitudeM: demoSite.altitudeM,
      description: `site altitude ${demoSite.altitudeM} m`,
    });
  });

  it("uses the standard atmosphere on a site without an altitude", async () => {
    const customer = (await technician.post("/api/customers").send({ name: "Harbour Bakery" })).body.customer;
    const site = (await technician.post("/api/sites").send({ customerId: customer.id, name: "Harbour Bakery kitchen" }))
      .body.site;
    const unit = (
      await technician.post("/api/equipment").send({
        siteId: site.id,
        name: "Bakery cool room",
        kind: "cool room",
        refrigerant: "R407C",
        circuits: [{ number: 1, factoryChargeKg: 3, meteringDevice: "txv" }],
      })
    ).body.equipment;
    const visit = (await technician.post("/api/visits").send({ equipmentId: unit.id, reason: "Warm cool room" })).body
      .visit;
    expect(visit.atmosphere).toEqual({
      pressureKPa: STANDARD_ATMOSPHERE_KPA,
      basis: "standard",
      altitudeM: null,
      description: "standard atmosphere: site has no altitude",
    });
    const saved = await technician.post(`/api/visits/${visit.id}/readings`).send({
      circuit: 1,
      ...measured,
      suctionPressureKPa: gauge(6, "dew", STANDARD_ATMOSPHERE_KPA),
      liquidPressureKPa: gauge(42, "bubble", STANDARD_ATMOSPHERE_KPA),
    });
    expect(saved.status).toBe(201);
    expect(saved.body.reading.input.atmosphericPressureKPa).toBe(STANDARD_ATMOSPHERE_KPA);
    expect(saved.body.reading.input.targetSuperheatK).toBeUndefined();
    expect(saved.body.reading.input.compressorRla).toBeUndefined();
    expect(saved.body.reading.result.evaporatingTempC).toBeCloseTo(6, 1);
  });

  it("builds CSV rows with the same builder: an imported row stores what the same reading typed in stores", async () => {
    const csv = [
      "Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C,Outdoor C,Run min",
      `10:00,${measured.suctionPressureKPa},12,${measured.liquidPressureKPa},37,31,20`,
    ].join("\n");
    const imported = await technician
      .post(`/api/visits/${visitId}/readings/import`)
      .field("circuit", "1")
      .field("dayStart", "2026-12-01T00:00:00+11:00")
      .field("mode", "all")
      .attach("file", Buffer.from(csv), "log.csv");
    expect(imported.status).toBe(201);
    const typed = await technician.post(`/api/visits/${visitId}/readings`).send({ circuit: 1, ...measured });
    const readings = (await technician.get(`/api/visits/${visitId}`)).body.visit.readings;
    const fromCsv = readings.find((reading: { note: string | null }) => reading.note === "imported from CSV");
    expect(fromCsv.input).toEqual(typed.body.reading.input);
    expect(fromCsv.result).toEqual(typed.body.reading.result);
  });

  it("refuses a CSV column mapped to a target, a rating or the atmosphere", async () => {
    const csv = "Time,Suction,Suction temp,Liquid,Liquid temp,Target SH\n10:00,464,12,1734,37,25";
    const response = await technician
      .post(`/api/visits/${visitId}/readings/import`)
      .field("circuit", "1")
      .field("dayStart", "2026-12-01T00:00:00+11:00")
      .field(
        "mapping",
        JSON.stringify({
          Time: "takenAt",
          Suction: "suctionPressureKPa",
          "Suction temp": "suctionLineTempC",
          Liquid: "liquidPressureKPa",
          "Liquid temp": "liquidLineTempC",
          "Target SH": "targetSuperheatK",
        }),
      )
      .attach("file", Buffer.from(csv), "log.csv");
    expect(response.status).toBe(400);
    expect(response.body.fields.mapping).toMatch(/column mapping is not valid/);
  });

  it("keeps the unit's page and the trend working when two readings share one instant (the later entry stands)", async () => {
    const at = "2026-12-02T03:04:05.000Z";
    await startVisitAt(testApp, visitId, new Date(Date.parse(at) - 60 * 60_000));
    for (const suctionLineTempC of [12, 13]) {
      const saved = await technician
        .post(`/api/visits/${visitId}/readings`)
        .send({ circuit: 1, ...measured, suctionLineTempC, takenAt: at });
      expect(saved.status).toBe(201);
    }
    const unit = await technician.get(`/api/equipment/${rooftop.id}`);
    expect(unit.status).toBe(200);
    const visit = (await technician.get(`/api/visits/${visitId}`)).body.visit;
    const twins = visit.readings.filter((reading: { takenAt: string }) => reading.takenAt === at);
    expect(twins).toHaveLength(2);
  });
});

describe("readingInput and siteAtmosphere", () => {
  const context = {
    unit: { refrigerant: "R407C", compressorRlaA: 11.8, application: "comfort-cooling" as const },
    nameplate: {
      number: 1,
      factoryChargeKg: 4.2,
      meteringDevice: "txv" as const,
      targetSuperheatK: 6,
      targetSubcoolingK: 5,
      liquidLineLengthM: null,
    },
    site: { altitudeM: 1000 },
    charge: { chargeKg: 4.5, chargeReference: null },
  };

  it("takes the atmosphere from the site's altitude (ISO 2533) or the standard atmosphere", () => {
    expect(siteAtmosphere({ altitudeM: 1000 })).toMatchObject({
      basis: "site-altitude",
      description: "site altitude 1000 m",
    });
    expect(siteAtmosphere({ altitudeM: 1000 }).pressureKPa).toBeCloseTo(89.875, 2);
    expect(siteAtmosphere({ altitudeM: null }).pressureKPa).toBe(STANDARD_ATMOSPHERE_KPA);
  });

  it("lays the nameplate and the site over whatever the measured values hold", () => {
    const forged = {
      ...measured,
      targetSuperheatK: 25,
      compressorRla: 1,
      atmosphericPressureKPa: 60,
    } as typeof measured;
    const parsed = readingInput(forged, context);
    expect(parsed.success).toBe(true);
    expect(parsed.data).toMatchObject({
      targetSuperheatK: 6,
      targetSubcoolingK: 5,
      compressorRla: 11.8,
      atmosphericPressureKPa: atmosphericPressureAtAltitude(1000),
    });
  });

  it("takes the correct charge and the reference point from the circuit's charge record, never from the reading", () => {
    const reference = {
      subcoolingK: 5,
      superheatK: 6,
      evaporatingTempC: 6,
      condensingTempC: 42,
      outdoorAirDryBulbC: 31,
      returnAirDryBulbC: 25,
    };
    const forged = { ...measured, chargeKg: 99, chargeReference: { ...reference, subcoolingK: 30 } } as typeof measured;
    const parsed = readingInput(forged, { ...context, charge: { chargeKg: 4.5, chargeReference: reference } });
    expect(parsed.data).toMatchObject({ chargeKg: 4.5, chargeReference: reference });
    expect(readingInput(measured, context).data?.chargeReference).toBeUndefined();
  });

  it("judges a CSV row with the same context", () => {
    const outcome = judgeReadingsCsv({
      text: `Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C\n10:00,${measured.suctionPressureKPa},12,${measured.liquidPressureKPa},37`,
      context,
      dayStart: "2026-12-01T00:00:00Z",
      keepRows: true,
    });
    if ("refused" in outcome) throw new Error(outcome.refused.message);
    const [row] = JSON.parse(new TextDecoder().decode(outcome.slices[0]!));
    const typed = readingInput(
      {
        suctionPressureKPa: measured.suctionPressureKPa,
        suctionLineTempC: 12,
        liquidPressureKPa: measured.liquidPressureKPa,
        liquidLineTempC: 37,
      },
      context,
    );
    expect(row.input).toEqual(typed.data);
  });
});
