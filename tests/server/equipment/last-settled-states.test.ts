import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DatabaseHandle } from "@server/db/client.ts";
import { equipment, readings, users, visits } from "@server/db/schema.ts";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import { diagnoseReading } from "@server/diagnosis/diagnose-on-server.ts";
import { lastSettledStates, MAX_TAIL_READINGS } from "@server/equipment/last-settled-states.ts";
import { readingInput } from "@server/visits/reading-input.ts";
import { assessTrend, atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { createTestDatabase } from "../../setup/test-database.ts";

const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Math.round(saturationPressure("R407C", temperatureC, point) - ATMOSPHERE);

describe("lastSettledStates", () => {
  let handle: DatabaseHandle;
  let rooftop: typeof equipment.$inferSelect;
  let technician: string;
  let visitsLogged = 0;

  beforeAll(async () => {
    handle = await createTestDatabase();
    await seedDemoData(handle.db, { withChargeHistory: false });
    rooftop = (await handle.db.select().from(equipment).where(eq(equipment.refrigerant, "R407C")))[0]!;
    technician = (
      await handle.db.select({ id: users.id }).from(users).where(eq(users.email, "tech@bellbird.example"))
    )[0]!.id;
  });
  afterAll(() => handle.close());

  /**
   * A logger on circuit 1, one reading every 2 s, as the server stores them; `suctionLineAt`
   * gives the suction line temperature (°C) at each minute, so superheat moves with it.
   */
  async function loggedVisit(count: number, suctionLineAt: (minute: number) => number): Promise<string> {
    // After every demo reading (they are dated up to now), so this visit is the unit's latest.
    const start = Date.now() + ++visitsLogged * 86_400_000;
    const [visit] = await handle.db
      .insert(visits)
      .values({
        organisationId: rooftop.organisationId,
        equipmentId: rooftop.id,
        reason: "Logger",
        startedAt: new Date(start),
      })
      .returning();
    const context = {
      unit: rooftop,
      nameplate: rooftop.circuits[0]!,
      site: { altitudeM: demoSite.altitudeM },
      charge: { chargeKg: 4.2, chargeReference: null },
    };
    const rows = [];
    for (let index = 0; index < count; index++) {
      const minute = (index * 2) / 60;
      const measured = {
        suctionPressureKPa: gauge(6, "dew"),
        suctionLineTempC: Math.round(suctionLineAt(minute) * 10) / 10,
        liquidPressureKPa: gauge(42, "bubble"),
        liquidLineTempC: 37,
        dischargeLineTempC: 82,
        runMinutes: 20 + Math.floor(minute),
      };
      const input = readingInput(measured, context);
      if (!input.success) throw input.error;
      rows.push({
        organisationId: rooftop.organisationId,
        visitId: visit!.id,
        circuit: 1,
        takenAt: new Date(start + index * 2_000),
        input: input.data,
        result: await diagnoseReading(input.data),
        recordedBy: technician,
      });
    }
    for (let first = 0; first < rows.length; first += 500)
      await handle.db.insert(readings).values(rows.slice(first, first + 500));
    return visit!.id;
  }

  /** What assessTrend says over the visit's whole log, as the route judged it before. */
  async function wholeLogVerdict(visitId: string) {
    const rows = await handle.db.select().from(readings).where(eq(readings.visitId, visitId)).orderBy(readings.takenAt);
    return assessTrend(
      rows.map((row) => ({ takenAt: row.takenAt.toISOString(), input: row.input, result: row.result })),
    ).lastSettled;
  }

  it("finds the same last settled reading as the whole log, reading further back when the tail has none", async () => {
    // 40 min: steady at 12 °C until minute 30, then the suction line swings ±2 K every 2 minutes.
    const visitId = await loggedVisit(1_200, (minute) =>
      minute < 30 ? 12 : 12 + 2 * Math.sin((2 * Math.PI * minute) / 2),
    );
    const whole = await wholeLogVerdict(visitId);
    expect(whole).not.toBeNull();
    const [circuitOne, circuitTwo] = await lastSettledStates(
      handle.db,
      rooftop.organisationId,
      rooftop.id,
      rooftop.circuits,
    );
    expect(circuitOne).toEqual({ circuit: 1, takenAt: whole!.takenAt, result: whole!.result });
    // Circuit 2 has no reading on the latest visit.
    expect(circuitTwo).toEqual({ circuit: 2, takenAt: null, result: null });
  });

  it("stops looking back after MAX_TAIL_READINGS: a circuit unsettled that long shows as not settled", async () => {
    // Settled for its first 10 minutes, then swinging for longer than the look-back.
    const swinging = MAX_TAIL_READINGS + 100;
    const visitId = await loggedVisit(300 + swinging, (minute) =>
      minute < 10 ? 12 : 12 + 2 * Math.sin((2 * Math.PI * minute) / 2),
    );
    expect(await wholeLogVerdict(visitId)).not.toBeNull();
    const [circuitOne] = await lastSettledStates(handle.db, rooftop.organisationId, rooftop.id, rooftop.circuits);
    expect(circuitOne).toEqual({ circuit: 1, takenAt: null, result: null });
  });
});
