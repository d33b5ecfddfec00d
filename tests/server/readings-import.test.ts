import { isNotNull } from "drizzle-orm";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { readings } from "@server/db/schema.ts";
import { judgeReadingsCsv } from "@server/import/readings-csv.ts";
import { storeImportedReadings } from "@server/import/store-imported-readings.ts";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { startRooftopVisit } from "../setup/stored-readings.ts";

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
    visitId = await startRooftopVisit(technician, "Logger data from last week");
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

  it("caps the columns and the line length with messages that say so, before judging anything", async () => {
    const wide = ["Time", ...Array.from({ length: 70 }, (_, index) => `c${index}`)].join(",");
    const tooWide = await send(`${wide}\n10:00${",1".repeat(70)}`, "preview");
    expect(tooWide.status).toBe(400);
    expect(tooWide.body.message).toBe("The header has 71 columns; Satura reads at most 64.");
    // The 1.9 MB header of the issue: refused on its length at once, not parsed column by column.
    const huge = Array.from({ length: 190_000 }, (_, index) => `c${index % 10}`).join(",");
    const started = performance.now();
    const tooLong = await send(`${huge}\n1,2`, "preview");
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.message).toMatch(/^Line 1 has [\d ]+ characters; a line may have at most 4 096\./);
    expect(performance.now() - started).toBeLessThan(5_000);
    expect(await readingCount()).toBe(4);
  });

  it("names the CSV limit (2 MB) when the file is too large", async () => {
    const response = await send("x".repeat(2 * 1024 * 1024 + 10), "preview");
    expect(response.status).toBe(413);
    expect(response.body.message).toBe("That CSV file is too large (2 MB at most)");
  });

  it("stores every row or none: a visit signed off while the slices go in gets none of them", async () => {
    const units = (await technician.get("/api/equipment")).body.equipment;
    const rooftop = units.find((unit: { refrigerant: string }) => unit.refrigerant === "R407C");
    const closing = (
      await technician.post("/api/visits").send({ equipmentId: rooftop.id, reason: "Signed off mid-import" })
    ).body.visit.id;
    const judged = judgeReadingsCsv({
      text: loggedSeries(30).join("\n"),
      context: {
        unit: rooftop,
        nameplate: rooftop.circuits[0],
        site: { altitudeM: demoSite.altitudeM },
        charge: { chargeKg: rooftop.circuits[0].factoryChargeKg, chargeReference: null },
      },
      dayStart,
      keepRows: true,
    });
    if ("refused" in judged) throw new Error(judged.refused.message);
    expect(judged.validCount).toBe(30);
    const senior = await signedIn(testApp.app, BELLBIRD.senior);
    expect((await senior.post(`/api/visits/${closing}/review`).send({ action: "sign-off" })).status).toBe(200);

    const organisationId = (await technician.get("/api/auth/me")).body.user.organisationId;
    const recordedBy = (await technician.get("/api/auth/me")).body.user.id;
    await expect(
      storeImportedReadings(testApp.database.db, organisationId, {
        visitId: closing,
        equipmentId: rooftop.id,
        circuit: 1,
        recordedBy,
        slices: judged.slices,
      }),
    ).rejects.toThrow(/signed off/);
    const staged = await testApp.database.db
      .select({ id: readings.id })
      .from(readings)
      .where(isNotNull(readings.pendingImportId));
    expect(staged).toHaveLength(0);
    expect((await technician.get(`/api/visits/${closing}`)).body.visit.readings).toHaveLength(0);
  });

  it("keeps the server answering while a 5 000-row file is judged and stored", async () => {
    const units = (await technician.get("/api/equipment")).body.equipment;
    const rooftop = units.find((unit: { refrigerant: string }) => unit.refrigerant === "R407C");
    const busy = (await technician.post("/api/visits").send({ equipmentId: rooftop.id, reason: "Week of logger data" }))
      .body.visit.id;
    const lines = ["Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C"];
    for (let second = 0; second < 5000; second++) {
      const iso = new Date(Date.UTC(2026, 10, 30, 20, 0, second)).toISOString();
      lines.push(`${iso},${gauge(6, "dew")},${(12 + (second % 50) / 100).toFixed(2)},${gauge(42, "bubble")},37`);
    }
    const file = Buffer.from(lines.join("\n"));
    const waits: number[] = [];
    let importing = true;
    const importStarted = performance.now();
    const importDone = technician
      .post(`/api/visits/${busy}/readings/import`)
      .field("circuit", "1")
      .field("dayStart", dayStart)
      .field("mode", "all")
      .attach("file", file, "week.csv")
      .then((response) => {
        importing = false;
        return response;
      });
    while (importing) {
      const started = performance.now();
      const health = await request(testApp.app).get("/api/health");
      if (importing) waits.push(performance.now() - started);
      expect(health.status).toBe(200);
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    const imported = await importDone;
    const importMs = performance.now() - importStarted;
    expect(imported.status).toBe(201);
    expect(imported.body.stored).toBe(5000);
    // Health checks kept being answered all through the import, most of them at once. The target
    // is under 100 ms (npm run bench prints the figures); these bounds only catch a server that
    // stalls again (before: one health check waited 9.9 s, the whole import), and they scale with
    // the import's own time because the suite runs on machines shared with other work.
    waits.sort((a, b) => a - b);
    expect(waits.length).toBeGreaterThan(5);
    expect(waits[Math.floor(waits.length / 2)]).toBeLessThan(250);
    expect(waits.at(-1)).toBeLessThan(Math.max(1_000, importMs / 4));
    expect((await technician.get(`/api/visits/${busy}`)).body.visit.readingCount).toBe(5000);
  });
});
