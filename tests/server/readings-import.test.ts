import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;
/** Gauges at the demo clinic (85 m) read against the ISO 2533 atmosphere there. */
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  (saturationPressure("R407C", temperatureC, point) - atmosphericPressureAtAltitude(demoSite.altitudeM)).toFixed(1);

/** A logger export: one row a minute, suction dew 6 °C, liquid bubble 42 °C. */
function loggedSeries(rows: number): string[] {
  const lines = ["Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C,DLT,Outdoor C"];
  for (let minute = 0; minute < rows; minute++) {
    const clock = `10:${String(minute).padStart(2, "0")}`;
    lines.push(`${clock},${gauge(6, "dew")},${(12 + minute * 0.05).toFixed(2)},${gauge(42, "bubble")},37,78,31`);
  }
  return lines;
}

describe("CSV import of a reading series", () => {
  let testApp: TestApp;
  let technician: Agent;
  let visitId: string;
  const dayStart = "2026-12-01T00:00:00+11:00";

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    const units = (await technician.get("/api/equipment")).body.equipment;
    const rooftop = units.find((unit: { refrigerant: string }) => unit.refrigerant === "R407C");
    visitId = (await technician.post("/api/visits").send({ equipmentId: rooftop.id, reason: "Logger data from last week" })).body.visit.id;
  });
  afterAll(() => testApp.close());

  const send = (csv: string, mode: "preview" | "all" | "valid-only", mapping?: Record<string, string>) => {
    const call = technician
      .post(`/api/visits/${visitId}/readings/import`)
      .field("circuit", "1")
      .field("dayStart", dayStart)
      .field("mode", mode);
    if (mapping) call.field("mapping", JSON.stringify(mapping));
    return call.attach("file", Buffer.from(csv), "log.csv");
  };
  const readingCount = async () => (await technician.get(`/api/visits/${visitId}`)).body.visit.readings.length;

  it("previews a file: guesses the columns and stores nothing", async () => {
    const response = await send(loggedSeries(5).join("\n"), "preview");
    expect(response.status).toBe(200);
    expect(response.body.mapping).toMatchObject({
      Time: "takenAt",
      "Suction pressure kPa": "suctionPressureKPa",
      "Suction temp C": "suctionLineTempC",
      "Liquid pressure kPa": "liquidPressureKPa",
      "Liquid temp C": "liquidLineTempC",
      DLT: "dischargeLineTempC",
      "Outdoor C": "outdoorAirDryBulbC",
    });
    expect(response.body).toMatchObject({ rowCount: 5, validCount: 5, problems: [], stored: 0 });
    expect(await readingCount()).toBe(0);
  });

  it("reports every bad row with its line number and stores nothing when asked for all rows", async () => {
    const lines = loggedSeries(6);
    lines[2] = lines[2]!.replace(/,37,/, ",abc,"); // line 3 of the file
    lines[5] = lines[5]!.replace(/^10:04/, "10:01"); // line 6: goes back in time
    const response = await send(lines.join("\n"), "all");
    expect(response.status).toBe(422);
    expect(response.body.problems).toEqual([
      { line: 3, field: "liquidLineTempC", message: "Liquid temp C: “abc” is not a number" },
      { line: 6, field: "takenAt", message: "Rows must be in time order, each later than the one before" },
    ]);
    expect(response.body.stored).toBe(0);
    expect(await readingCount()).toBe(0);

    const accepted = await send(lines.join("\n"), "valid-only");
    expect(accepted.status).toBe(201);
    expect(accepted.body.stored).toBe(4);
    const visit = (await technician.get(`/api/visits/${visitId}`)).body.visit;
    expect(visit.readings).toHaveLength(4);
    // Times of day are placed on the logging day given by the client (10:00 at +11:00).
    expect(visit.readings[0].takenAt).toBe("2026-11-30T23:00:00.000Z");
    expect(visit.readings[0].result.superheatK).toBeCloseTo(6, 1);
  });

  it("refuses a file without a time column and a file that is not CSV", async () => {
    const noTime = await send("a,b\n1,2", "preview", { a: "suctionPressureKPa", b: "ignore" });
    expect(noTime.body.problems[0].message).toMatch(/reading time/);
    const binary = await send('"unclosed,quote\n1,2', "preview");
    expect(binary.status).toBe(400);
    expect(binary.body.message).toMatch(/not a readable CSV/);
  });
});
