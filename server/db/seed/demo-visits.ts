/**
 * The demo company's visit history on the Wattle Lane Clinic units (invented): a signed-off
 * repair, a leak repair on the rooftop unit waiting for review, and an open check on the
 * server-cupboard split. Readings are built from the saturation temperatures intended, so
 * their pressures are what a gauge on that refrigerant would show, and each is diagnosed by
 * the same engine as a live reading.
 */
import { atmosphericPressureAtAltitude, diagnose, saturationPressure } from "@shared/engine/index.ts";
import type { Application, DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { prepareRefrigerant } from "../../diagnosis/diagnose-on-server.ts";
import { demoSite } from "./demo-scenario.ts";
import type { Database } from "../client.ts";
import { adjustments, readings, visitComments, visitTechnicians, visits } from "../schema.ts";

type Unit = {
  id: string;
  refrigerant: string;
  name: string;
  application: Application;
  circuits: { number: number; meteringDevice: DiagnosisInput["meteringDevice"]; targetSuperheatK?: number | null; targetSubcoolingK?: number | null; liquidLineLengthM?: number | null }[];
  compressorRlaA: number | null;
};
type People = Record<"owner" | "senior" | "technician" | "technician2", string>;

const MINUTE = 60_000;
const DAY = 24 * 60 * MINUTE;

/** The clinic's atmosphere (ISO 2533 at the site's altitude), as the server uses for its readings. */
const ATMOSPHERE_KPA = atmosphericPressureAtAltitude(demoSite.altitudeM);

/** Gauge pressure (kPa) at which the refrigerant saturates at a temperature, rounded as a gauge reads. */
const gauge = (refrigerant: string, temperatureC: number, point: "bubble" | "dew") =>
  Math.round(saturationPressure(refrigerant, temperatureC, point) - ATMOSPHERE_KPA);

interface DemoReading {
  minutes: number;
  evaporatingDewC: number;
  suctionLineTempC: number;
  condensingBubbleC: number;
  liquidLineTempC: number;
  dischargeLineTempC: number;
  runMinutes: number;
}

function readingRows(unit: Unit, circuit: number, visitId: string, organisationId: string, recordedBy: string, start: number, series: DemoReading[], air: Partial<DiagnosisInput>) {
  const nameplate = unit.circuits.find((candidate) => candidate.number === circuit)!;
  return series.map((reading) => {
    const input: DiagnosisInput = {
      refrigerant: unit.refrigerant,
      meteringDevice: nameplate.meteringDevice,
      suctionPressureKPa: gauge(unit.refrigerant, reading.evaporatingDewC, "dew"),
      suctionLineTempC: reading.suctionLineTempC,
      liquidPressureKPa: gauge(unit.refrigerant, reading.condensingBubbleC, "bubble"),
      liquidLineTempC: reading.liquidLineTempC,
      dischargeLineTempC: reading.dischargeLineTempC,
      runMinutes: reading.runMinutes,
      atmosphericPressureKPa: ATMOSPHERE_KPA,
      application: unit.application,
      ...(nameplate.liquidLineLengthM != null ? { liquidLineLengthM: nameplate.liquidLineLengthM } : {}),
      ...(nameplate.targetSuperheatK != null ? { targetSuperheatK: nameplate.targetSuperheatK } : {}),
      ...(nameplate.targetSubcoolingK != null ? { targetSubcoolingK: nameplate.targetSubcoolingK } : {}),
      ...(unit.compressorRlaA != null ? { compressorRla: unit.compressorRlaA } : {}),
      ...air,
    };
    return { organisationId, visitId, circuit, takenAt: new Date(start + reading.minutes * MINUTE), input, result: diagnose(input, { withMeasuredCycle: true }), recordedBy };
  });
}

export async function seedDemoVisits(db: Pick<Database, "insert">, organisationId: string, units: { rooftop: Unit; split: Unit }, people: People, now = Date.now()): Promise<void> {
  const { rooftop, split } = units;
  // Judged as every run-log reading is: with the measured cycle's compressor figures.
  await Promise.all([prepareRefrigerant(rooftop.refrigerant), prepareRefrigerant(split.refrigerant)]);
  const rooftopAir = { returnAirDryBulbC: 25, returnAirWetBulbC: 18, supplyAirDryBulbC: 14, outdoorAirDryBulbC: 31 };

  // 1. Three weeks ago: circuit 2 tripping on high pressure; a burnt condenser-fan contactor.
  const repairStart = now - 21 * DAY;
  const [repair] = await db
    .insert(visits)
    .values({
      organisationId,
      equipmentId: rooftop.id,
      reason: "Circuit 2 trips on high pressure on hot afternoons",
      status: "signed-off",
      reviewNote: "Contactor replaced, circuit settled in band.",
      signedOffBy: people.senior,
      signedOffAt: new Date(repairStart + 3 * 60 * MINUTE),
      createdBy: people.technician2,
      startedAt: new Date(repairStart),
    })
    .returning({ id: visits.id });
  await db.insert(visitTechnicians).values({ visitId: repair.id, userId: people.technician2 });
  await db.insert(adjustments).values({
    organisationId,
    visitId: repair.id,
    circuit: 2,
    at: new Date(repairStart + 40 * MINUTE),
    kind: "electrical",
    description: "Replaced burnt condenser fan contactor",
    recordedBy: people.technician2,
  });
  await db.insert(readings).values(
    readingRows(rooftop, 2, repair.id, organisationId, people.technician2, repairStart + 60 * MINUTE, [
      { minutes: 0, evaporatingDewC: 6, suctionLineTempC: 12.5, condensingBubbleC: 44, liquidLineTempC: 39, dischargeLineTempC: 84, runMinutes: 12 },
      { minutes: 6, evaporatingDewC: 6, suctionLineTempC: 12.2, condensingBubbleC: 43, liquidLineTempC: 38, dischargeLineTempC: 82, runMinutes: 18 },
      { minutes: 12, evaporatingDewC: 6, suctionLineTempC: 12, condensingBubbleC: 43, liquidLineTempC: 38, dischargeLineTempC: 81, runMinutes: 24 },
    ], { ...rooftopAir, outdoorAirDryBulbC: 34 }),
  );

  // 2. Yesterday: waiting room warm; circuit 1 short of charge, leak at the liquid-port valve core.
  const leakStart = now - DAY;
  const [leak] = await db
    .insert(visits)
    .values({
      organisationId,
      equipmentId: rooftop.id,
      reason: "Waiting room warm in the afternoons; circuit 1 iced suction line reported",
      status: "awaiting-review",
      createdBy: people.technician,
      startedAt: new Date(leakStart),
    })
    .returning({ id: visits.id });
  await db.insert(visitTechnicians).values({ visitId: leak.id, userId: people.technician });
  const firstRead = leakStart + 20 * MINUTE;
  await db.insert(readings).values(
    readingRows(rooftop, 1, leak.id, organisationId, people.technician, firstRead, [
      { minutes: 0, evaporatingDewC: 0, suctionLineTempC: 13, condensingBubbleC: 37, liquidLineTempC: 36.5, dischargeLineTempC: 98, runMinutes: 25 },
      { minutes: 5, evaporatingDewC: 0, suctionLineTempC: 13.2, condensingBubbleC: 37, liquidLineTempC: 36.6, dischargeLineTempC: 99, runMinutes: 30 },
    ], rooftopAir),
  );
  await db.insert(adjustments).values([
    { organisationId, visitId: leak.id, circuit: 1, at: new Date(firstRead + 12 * MINUTE), kind: "other", description: "Leak found at liquid-port valve core (bubble test); core replaced", recordedBy: people.technician },
    { organisationId, visitId: leak.id, circuit: 1, at: new Date(firstRead + 30 * MINUTE), kind: "charge-added", description: "Added 0.6 kg R407C as liquid", amountKg: 0.6, recordedBy: people.technician },
  ]);
  await db.insert(readings).values(
    readingRows(rooftop, 1, leak.id, organisationId, people.technician, firstRead + 42 * MINUTE, [
      { minutes: 0, evaporatingDewC: 4, suctionLineTempC: 11.5, condensingBubbleC: 41, liquidLineTempC: 37.5, dischargeLineTempC: 88, runMinutes: 12 },
      { minutes: 5, evaporatingDewC: 5.5, suctionLineTempC: 11.8, condensingBubbleC: 42, liquidLineTempC: 37.2, dischargeLineTempC: 84, runMinutes: 17 },
      { minutes: 10, evaporatingDewC: 6, suctionLineTempC: 12, condensingBubbleC: 42, liquidLineTempC: 37, dischargeLineTempC: 82, runMinutes: 22 },
      { minutes: 15, evaporatingDewC: 6, suctionLineTempC: 12.1, condensingBubbleC: 42, liquidLineTempC: 37, dischargeLineTempC: 82, runMinutes: 27 },
    ], rooftopAir),
  );
  await db.insert(visitComments).values({
    organisationId,
    visitId: leak.id,
    authorId: people.technician,
    body: "Charge weighed in after the core replacement; superheat and subcooling settled on target. Please review.",
    createdAt: new Date(firstRead + 62 * MINUTE),
  });

  // 3. Today: the quarterly check on the server-cupboard split is under way.
  const checkStart = now - 25 * MINUTE;
  const [check] = await db
    .insert(visits)
    .values({ organisationId, equipmentId: split.id, reason: "Quarterly check of the server cupboard split", createdBy: people.technician, startedAt: new Date(checkStart) })
    .returning({ id: visits.id });
  await db.insert(visitTechnicians).values({ visitId: check.id, userId: people.technician });
  await db.insert(readings).values(
    readingRows(split, 1, check.id, organisationId, people.technician, checkStart + 15 * MINUTE, [
      { minutes: 0, evaporatingDewC: 8, suctionLineTempC: 13, condensingBubbleC: 40, liquidLineTempC: 35, dischargeLineTempC: 72, runMinutes: 15 },
    ], { returnAirDryBulbC: 23, returnAirRelativeHumidity: 45, supplyAirDryBulbC: 12, outdoorAirDryBulbC: 28 }),
  );
}
