/**
 * The report sets the readings' charge estimate just before a circuit's first recovery beside
 * what the scale then found. The estimate is worked out on the server over every reading of the
 * visit: the run log in the browser holds only the latest page of a long log, and an estimate
 * taken from those would be missing or wrong. The reference here is the engine's own result
 * for each stored reading (diagnose), picked the way the rule says: the last standing reading
 * taken before the first standing recovery that carries an estimate.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { saturationPressure, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { VisitRefrigerantSchema } from "@shared/schemas/register.ts";
import { READINGS_PAGE_SIZE, VisitSchema } from "@shared/schemas/visits.ts";
import type { NewReading } from "@server/db/visits.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { readingStore, startRooftopVisit } from "../setup/stored-readings.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const COUNT = 3 * READINGS_PAGE_SIZE;
const START = Date.UTC(2026, 11, 2, 1, 0, 0);
const STEP_MS = 30_000;
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  saturationPressure("R407C", temperatureC, point) - STANDARD_ATMOSPHERE_KPA;

/** Reading `index`: a TXV circuit of 4.2 kg whose subcooling falls as the log runs (losing charge), so each estimate differs. */
function inputAt(index: number): DiagnosisInput {
  return {
    refrigerant: "R407C",
    meteringDevice: "txv",
    suctionPressureKPa: gauge(6, "dew"),
    suctionLineTempC: 12,
    liquidPressureKPa: gauge(42, "bubble"),
    liquidLineTempC: 36 + index * (4 / COUNT),
    runMinutes: 20 + index / 2,
    chargeKg: 4.2,
    atmosphericPressureKPa: STANDARD_ATMOSPHERE_KPA,
  };
}

describe("the charge estimate before a circuit's first recovery", () => {
  let testApp: TestApp;
  let technician: Agent;
  let visitId: string;
  let recoveryCylinder: string;
  const stored: NewReading[] = [];

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    visitId = await startRooftopVisit(technician, "Short of charge, recover and weigh in");
    const cylinders = (await technician.get("/api/cylinders?refrigerant=R407C")).body.cylinders as {
      id: string;
      kind: string;
    }[];
    recoveryCylinder = cylinders.find((cylinder) => cylinder.kind === "recovery")!.id;
    const readings = await readingStore(testApp, visitId);
    for (let index = 0; index < COUNT; index++)
      stored.push(readings.row(inputAt(index), new Date(START + index * STEP_MS)));
    await readings.store(stored);
  }, 120_000);
  afterAll(() => testApp.close());

  const refrigerant = async () =>
    VisitRefrigerantSchema.parse((await technician.get(`/api/visits/${visitId}/refrigerant`)).body);
  const recover = async (kg: number, at: number) => {
    const response = await technician
      .post(`/api/visits/${visitId}/refrigerant`)
      .send({ kind: "recovered", kg, circuit: 1, cylinderId: recoveryCylinder, at: new Date(at).toISOString() });
    expect(response.status).toBe(201);
    return response.body.movement.id as string;
  };

  it("is null before anything is recovered", async () => {
    const circuit = (await refrigerant()).circuits.find((balance) => balance.circuit === 1)!;
    expect(circuit.recoveredOnVisit).toBe(false);
    expect(circuit.estimateBeforeRecovery).toBeNull();
  });

  it("is the estimate of the last reading before the first recovery, though the run log's page does not hold it", async () => {
    const last = 40;
    // Every reading carries an estimate here, or the check below would be empty.
    expect(stored.every((row) => row.result.chargeDeviation !== null)).toBe(true);
    await recover(3.1, START + last * STEP_MS + 5_000);
    // A later recovery on the same circuit does not move the point the scale is compared at.
    await recover(0.4, START + (COUNT - 10) * STEP_MS);

    const visit = VisitSchema.parse((await technician.get(`/api/visits/${visitId}`)).body.visit);
    expect(visit.readings.some((reading) => reading.id === stored[last]!.id)).toBe(false);

    const circuit = (await refrigerant()).circuits.find((balance) => balance.circuit === 1)!;
    expect(circuit.recoveredOnVisit).toBe(true);
    expect(circuit.estimateBeforeRecovery).toEqual(stored[last]!.result.chargeDeviation);
    expect(circuit.estimateBeforeRecovery).not.toEqual(stored[COUNT - 11]!.result.chargeDeviation);
  });

  it("skips a voided reading: a correction never counts", async () => {
    const voided = stored[40]!;
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/voids`)
          .send({ kind: "reading", recordId: voided.id, reason: "Probe slipped off the liquid line" })
      ).status,
    ).toBe(201);
    const circuit = (await refrigerant()).circuits.find((balance) => balance.circuit === 1)!;
    expect(circuit.estimateBeforeRecovery).toEqual(stored[39]!.result.chargeDeviation);
  });

  it("follows the first standing recovery when the earlier one is voided", async () => {
    const refrigerantNow = await refrigerant();
    const first = refrigerantNow.movements
      .filter((movement) => movement.kind === "recovered")
      .sort((a, b) => Date.parse(a.at) - Date.parse(b.at))[0]!;
    const voided = await technician
      .post(`/api/visits/${visitId}/voids`)
      .send({ kind: "movement", recordId: first.id, reason: "Logged against the wrong visit" });
    expect(voided.status).toBe(201);
    const circuit = (await refrigerant()).circuits.find((balance) => balance.circuit === 1)!;
    // The later recovery now stands first: the last reading before it is number COUNT − 11.
    expect(circuit.estimateBeforeRecovery).toEqual(stored[COUNT - 11]!.result.chargeDeviation);
  });
});
