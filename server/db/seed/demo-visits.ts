/**
 * The demo company's visit history on the Wattle Lane Clinic units (invented): a blocked
 * filter-drier five months ago after which circuit 1 of the rooftop unit was weighed in to its
 * nameplate charge and settled (its charge reference point), a signed-off repair, a leak repair
 * on the rooftop unit waiting for review — circuit 1 found short, its charge recovered and
 * weighed, so the estimate can be checked against the scale — and an open check on the
 * server-cupboard split. Readings are built from the saturation temperatures intended, so
 * their pressures are what a gauge on that refrigerant would show, and each is diagnosed by
 * the same engine as a live reading, with the circuit's correct charge and reference point as
 * the server gives them.
 */
import {
  atmosphericPressureAtAltitude,
  diagnose,
  parseDiagnosisInput,
  saturationPressure,
} from "@shared/engine/index.ts";
import { circuitFacts, withCircuitFacts } from "@shared/schemas/circuit-facts.ts";
import type { Application, ChargeReference, DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { prepareRefrigerant } from "../../diagnosis/diagnose-on-server.ts";
import { calibrateAfterWeighIn } from "../../visits/calibrate-after-weigh-in.ts";
import { standingChargeReference } from "../charge-references.ts";
import { demoSite } from "./demo-scenario.ts";
import type { Database } from "../client.ts";
import { oneRow } from "../one-row.ts";
import { MOVEMENT_DIRECTION } from "@shared/schemas/register.ts";
import {
  adjustments,
  circuitCharges,
  cylinders as cylinderTable,
  readings,
  refrigerantMovements,
  visitComments,
  visitTechnicians,
  visits,
} from "../schema.ts";

type Unit = {
  id: string;
  refrigerant: string;
  name: string;
  application: Application;
  circuits: {
    number: number;
    factoryChargeKg: number;
    meteringDevice: DiagnosisInput["meteringDevice"];
    targetSuperheatK?: number | null;
    targetSubcoolingK?: number | null;
    liquidLineLengthM?: number | null;
  }[];
  compressorRlaA: number | null;
};
type People = Record<"owner" | "senior" | "technician" | "technician2", string>;
/** The demo's R407C recovery cylinder. */
type Cylinders = { recovery: string };

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

function readingRows(
  unit: Unit,
  circuit: number,
  visitId: string,
  organisationId: string,
  recordedBy: string,
  start: number,
  series: DemoReading[],
  air: Partial<DiagnosisInput>,
  chargeReference: ChargeReference | null = null,
) {
  const nameplate = unit.circuits.find((candidate) => candidate.number === circuit)!;
  return series.map((reading) => {
    // Made up here, so it passes the schema as a saved reading does (diagnose() trusts its input).
    // No line-set adjustment on the demo units: the correct charge is the nameplate's.
    const facts = circuitFacts(unit, nameplate, { chargeKg: nameplate.factoryChargeKg, chargeReference });
    const measured = {
      suctionPressureKPa: gauge(unit.refrigerant, reading.evaporatingDewC, "dew"),
      suctionLineTempC: reading.suctionLineTempC,
      liquidPressureKPa: gauge(unit.refrigerant, reading.condensingBubbleC, "bubble"),
      liquidLineTempC: reading.liquidLineTempC,
      dischargeLineTempC: reading.dischargeLineTempC,
      runMinutes: reading.runMinutes,
    };
    const input = parseDiagnosisInput({ ...withCircuitFacts(measured, facts, ATMOSPHERE_KPA), ...air });
    return {
      organisationId,
      visitId,
      circuit,
      takenAt: new Date(start + reading.minutes * MINUTE),
      input,
      result: diagnose(input, { withMeasuredCycle: true }),
      recordedBy,
    };
  });
}

export interface DemoVisitOptions {
  /**
   * The charge history of the rooftop unit's circuit 1: the drier visit's weigh-in and
   * reference point, and the leak visit's recovery and weigh-in in the register (on by default).
   */
  withChargeHistory?: boolean;
  now?: number;
}

export async function seedDemoVisits(
  db: Database,
  organisationId: string,
  units: { rooftop: Unit; split: Unit },
  people: People,
  cylinders: Cylinders,
  { withChargeHistory = true, now = Date.now() }: DemoVisitOptions = {},
): Promise<void> {
  const { rooftop, split } = units;
  // Judged as every run-log reading is: with the measured cycle's compressor figures.
  await Promise.all([prepareRefrigerant(rooftop.refrigerant), prepareRefrigerant(split.refrigerant)]);
  const rooftopAir = { returnAirDryBulbC: 25, returnAirWetBulbC: 18, supplyAirDryBulbC: 14, outdoorAirDryBulbC: 31 };
  const movement = (
    visitId: string,
    technicianId: string,
    at: number,
    values: { kind: "recovered" | "reused" | "added-new"; kg: number; cylinderId: string | null; note: string },
  ) => ({
    organisationId,
    visitId,
    equipmentId: rooftop.id,
    circuit: 1,
    refrigerant: rooftop.refrigerant,
    technicianId,
    at: new Date(at),
    ...values,
  });

  /**
   * Register lines with their run-log charge adjustments linked, as the app writes them: one
   * entry, one number, so the demo report never shows two figures for the same kilograms.
   */
  const insertChargeEntries = async (rows: ReturnType<typeof movement>[]) => {
    const stored = await db.insert(refrigerantMovements).values(rows).returning();
    await db.insert(adjustments).values(
      stored.map((row) => ({
        organisationId,
        visitId: row.visitId!,
        circuit: row.circuit,
        at: row.at,
        kind: MOVEMENT_DIRECTION[row.kind as keyof typeof MOVEMENT_DIRECTION],
        description: row.note ?? "",
        amountKg: row.kg,
        movementId: row.id,
        recordedBy: row.technicianId,
      })),
    );
  };

  if (withChargeHistory) {
    // 0. Five months ago: circuit 1's liquid line filter-drier blocked. The charge was recovered,
    // the drier replaced, the circuit evacuated and the 4.2 kg nameplate charge weighed back in;
    // it settled on target, which made those readings circuit 1's charge reference point.
    const drierStart = now - 150 * DAY;
    const drier = oneRow(
      await db
        .insert(visits)
        .values({
          organisationId,
          equipmentId: rooftop.id,
          reason: "Circuit 1 frosting at the liquid line filter-drier",
          status: "signed-off",
          reviewNote: "Drier replaced, nameplate charge weighed in, settled on target.",
          signedOffBy: people.senior,
          signedOffAt: new Date(drierStart + 5 * 60 * MINUTE),
          createdBy: people.technician2,
          startedAt: new Date(drierStart),
        })
        .returning({ id: visits.id }),
      "insert the drier visit",
    );
    await db.insert(visitTechnicians).values({ visitId: drier.id, userId: people.technician2 });
    await insertChargeEntries([
      movement(drier.id, people.technician2, drierStart + 30 * MINUTE, {
        kind: "recovered",
        kg: 4.2,
        cylinderId: cylinders.recovery,
        note: "Whole charge recovered before replacing the drier",
      }),
      movement(drier.id, people.technician2, drierStart + 150 * MINUTE, {
        kind: "reused",
        kg: 4.2,
        cylinderId: cylinders.recovery,
        note: "Nameplate charge weighed back in as liquid",
      }),
    ]);
    await db.insert(circuitCharges).values({
      organisationId,
      visitId: drier.id,
      circuit: 1,
      lineAdjustmentKg: 0,
      recordedBy: people.technician2,
      createdAt: new Date(drierStart + 152 * MINUTE),
      updatedAt: new Date(drierStart + 152 * MINUTE),
    });
    await db.insert(readings).values(
      readingRows(
        rooftop,
        1,
        drier.id,
        organisationId,
        people.technician2,
        drierStart + 160 * MINUTE,
        [
          {
            minutes: 0,
            evaporatingDewC: 5.5,
            suctionLineTempC: 12.5,
            condensingBubbleC: 41.5,
            liquidLineTempC: 37.5,
            dischargeLineTempC: 84,
            runMinutes: 10,
          },
          {
            minutes: 5,
            evaporatingDewC: 6,
            suctionLineTempC: 12.1,
            condensingBubbleC: 42,
            liquidLineTempC: 37,
            dischargeLineTempC: 82,
            runMinutes: 15,
          },
          {
            minutes: 10,
            evaporatingDewC: 6,
            suctionLineTempC: 12,
            condensingBubbleC: 42,
            liquidLineTempC: 37,
            dischargeLineTempC: 82,
            runMinutes: 20,
          },
          {
            minutes: 15,
            evaporatingDewC: 6,
            suctionLineTempC: 12,
            condensingBubbleC: 42,
            liquidLineTempC: 37.1,
            dischargeLineTempC: 81,
            runMinutes: 25,
          },
        ],
        rooftopAir,
      ),
    );
    await calibrateAfterWeighIn(db, organisationId, {
      visitId: drier.id,
      equipmentId: rooftop.id,
      circuit: 1,
      actorId: people.technician2,
      at: new Date(drierStart + 175 * MINUTE),
    });
  }
  const circuitOneReference = await standingChargeReference(db, organisationId, rooftop.id, 1);

  // 1. Three weeks ago: circuit 2 tripping on high pressure; a burnt condenser-fan contactor.
  const repairStart = now - 21 * DAY;
  const repair = oneRow(
    await db
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
      .returning({ id: visits.id }),
    "insert the repair visit",
  );
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
    readingRows(
      rooftop,
      2,
      repair.id,
      organisationId,
      people.technician2,
      repairStart + 60 * MINUTE,
      [
        {
          minutes: 0,
          evaporatingDewC: 6,
          suctionLineTempC: 12.5,
          condensingBubbleC: 44,
          liquidLineTempC: 39,
          dischargeLineTempC: 84,
          runMinutes: 12,
        },
        {
          minutes: 6,
          evaporatingDewC: 6,
          suctionLineTempC: 12.2,
          condensingBubbleC: 43,
          liquidLineTempC: 38,
          dischargeLineTempC: 82,
          runMinutes: 18,
        },
        {
          minutes: 12,
          evaporatingDewC: 6,
          suctionLineTempC: 12,
          condensingBubbleC: 43,
          liquidLineTempC: 38,
          dischargeLineTempC: 81,
          runMinutes: 24,
        },
      ],
      { ...rooftopAir, outdoorAirDryBulbC: 34 },
    ),
  );

  // 2. Yesterday: waiting room warm; circuit 1 short of charge, leak at the liquid-port valve
  // core. Its readings are estimated against the reference point of the weigh-in five months
  // ago; the charge was then recovered and weighed (3.1 kg of 4.2 kg: 1.1 kg short), the core
  // replaced and the nameplate charge weighed back in.
  const leakStart = now - DAY;
  const leak = oneRow(
    await db
      .insert(visits)
      .values({
        organisationId,
        equipmentId: rooftop.id,
        reason: "Waiting room warm in the afternoons; circuit 1 iced suction line reported",
        status: "awaiting-review",
        createdBy: people.technician,
        startedAt: new Date(leakStart),
      })
      .returning({ id: visits.id }),
    "insert the leak visit",
  );
  await db.insert(visitTechnicians).values({ visitId: leak.id, userId: people.technician });
  const firstRead = leakStart + 20 * MINUTE;
  await db.insert(readings).values(
    readingRows(
      rooftop,
      1,
      leak.id,
      organisationId,
      people.technician,
      firstRead,
      [
        {
          minutes: 0,
          evaporatingDewC: 0,
          suctionLineTempC: 13,
          condensingBubbleC: 37,
          liquidLineTempC: 36.5,
          dischargeLineTempC: 98,
          runMinutes: 25,
        },
        {
          minutes: 5,
          evaporatingDewC: 0,
          suctionLineTempC: 13.2,
          condensingBubbleC: 37,
          liquidLineTempC: 36.6,
          dischargeLineTempC: 99,
          runMinutes: 30,
        },
      ],
      rooftopAir,
      circuitOneReference,
    ),
  );
  // The kilograms (3.1 kg recovered, 3.1 kg reused, 1.1 kg new) are the register lines below,
  // each with its own run-log entry; this line says what was done, without a second figure.
  await db.insert(adjustments).values([
    {
      organisationId,
      visitId: leak.id,
      circuit: 1,
      at: new Date(firstRead + 12 * MINUTE),
      kind: "other",
      description: "Leak found at liquid-port valve core (bubble test); charge recovered, core replaced, evacuated",
      recordedBy: people.technician,
    },
  ]);
  if (withChargeHistory) {
    // Lee brought the recovery machine and the part-used cylinder from the van, and kept the register lines.
    await db.insert(visitTechnicians).values({ visitId: leak.id, userId: people.technician2 });
    const van = oneRow(
      await db
        .insert(cylinderTable)
        .values({
          organisationId,
          label: "BM-407C-N2",
          serial: "NX10-51877",
          kind: "new",
          refrigerant: rooftop.refrigerant,
          waterCapacityKg: 15,
          tareKg: 6.1,
          initialContentsKg: 2.5,
        })
        .returning({ id: cylinderTable.id }),
      "insert the van cylinder",
    );
    await insertChargeEntries([
      movement(leak.id, people.technician2, firstRead + 8 * MINUTE, {
        kind: "recovered",
        kg: 3.1,
        cylinderId: cylinders.recovery,
        note: "Recovered and weighed: 1.1 kg short of the nameplate",
      }),
      movement(leak.id, people.technician2, firstRead + 28 * MINUTE, {
        kind: "reused",
        kg: 3.1,
        cylinderId: cylinders.recovery,
        note: "Recovered charge weighed back in",
      }),
      movement(leak.id, people.technician2, firstRead + 30 * MINUTE, {
        kind: "added-new",
        kg: 1.1,
        cylinderId: van.id,
        note: "Made up to the 4.2 kg nameplate charge",
      }),
    ]);
    await db.insert(circuitCharges).values({
      organisationId,
      visitId: leak.id,
      circuit: 1,
      lineAdjustmentKg: 0,
      recordedBy: people.technician,
      createdAt: new Date(firstRead + 31 * MINUTE),
      updatedAt: new Date(firstRead + 31 * MINUTE),
    });
  }
  await db.insert(readings).values(
    readingRows(
      rooftop,
      1,
      leak.id,
      organisationId,
      people.technician,
      firstRead + 42 * MINUTE,
      [
        {
          minutes: 0,
          evaporatingDewC: 4,
          suctionLineTempC: 11.5,
          condensingBubbleC: 41,
          liquidLineTempC: 37.5,
          dischargeLineTempC: 88,
          runMinutes: 12,
        },
        {
          minutes: 5,
          evaporatingDewC: 5.5,
          suctionLineTempC: 11.8,
          condensingBubbleC: 42,
          liquidLineTempC: 37.2,
          dischargeLineTempC: 84,
          runMinutes: 17,
        },
        {
          minutes: 10,
          evaporatingDewC: 6,
          suctionLineTempC: 12,
          condensingBubbleC: 42,
          liquidLineTempC: 37,
          dischargeLineTempC: 82,
          runMinutes: 22,
        },
        {
          minutes: 15,
          evaporatingDewC: 6,
          suctionLineTempC: 12.1,
          condensingBubbleC: 42,
          liquidLineTempC: 37,
          dischargeLineTempC: 82,
          runMinutes: 27,
        },
      ],
      rooftopAir,
      circuitOneReference,
    ),
  );
  // Settled again on the new charge: this weigh-in becomes the circuit's reference point.
  if (withChargeHistory)
    await calibrateAfterWeighIn(db, organisationId, {
      visitId: leak.id,
      equipmentId: rooftop.id,
      circuit: 1,
      actorId: people.technician,
      at: new Date(firstRead + 58 * MINUTE),
    });
  await db.insert(visitComments).values({
    organisationId,
    visitId: leak.id,
    authorId: people.technician,
    body: "Charge recovered and weighed (1.1 kg short), core replaced, nameplate charge weighed in; superheat and subcooling settled on target. Please review.",
    createdAt: new Date(firstRead + 62 * MINUTE),
  });

  // 3. Today: the quarterly check on the server-cupboard split is under way.
  const checkStart = now - 25 * MINUTE;
  const check = oneRow(
    await db
      .insert(visits)
      .values({
        organisationId,
        equipmentId: split.id,
        reason: "Quarterly check of the server cupboard split",
        createdBy: people.technician,
        startedAt: new Date(checkStart),
      })
      .returning({ id: visits.id }),
    "insert the check visit",
  );
  await db.insert(visitTechnicians).values({ visitId: check.id, userId: people.technician });
  await db.insert(readings).values(
    readingRows(
      split,
      1,
      check.id,
      organisationId,
      people.technician,
      checkStart + 15 * MINUTE,
      [
        {
          minutes: 0,
          evaporatingDewC: 8,
          suctionLineTempC: 13,
          condensingBubbleC: 40,
          liquidLineTempC: 35,
          dischargeLineTempC: 72,
          runMinutes: 15,
        },
      ],
      { returnAirDryBulbC: 23, returnAirRelativeHumidity: 45, supplyAirDryBulbC: 12, outdoorAirDryBulbC: 28 },
    ),
  );
}
