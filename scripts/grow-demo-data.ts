/**
 * Grows the demo company (Bellbird Mechanical) to the size a busy service company reaches after
 * a few years, for the benchmarks of issue 16 ("Fast at any size"): by default 2,000 units,
 * 20,000 visits and one open visit with 10,000 readings (one every 2 s, a logger left on the
 * rooftop unit for five and a half hours).
 *
 *   npm run data:large -- --dir data/large [--units 2000] [--visits 20000] [--long-readings 10000] [--seed 16]
 *
 * Rows are what the app itself stores: each reading's input is built by readingInput (the
 * function POST /api/visits/:id/readings and the CSV import use) from gauge values a real
 * refrigerant would show, and its result by diagnoseReading, the server's own engine call;
 * visits carry their crew and audit trail, charge entries their linked register movement. Only
 * the batching differs: rows go in slices of a few hundred instead of one request each.
 * Deterministic for a seed (names, values, statuses); times are relative to the day it runs,
 * as the demo's are. It adds only what is missing, so running it again on the same folder
 * is a no-op, and a bigger size grows it further.
 */
import { parseArgs } from "node:util";
import { performance } from "node:perf_hooks";
import { and, count, eq, sql } from "drizzle-orm";
import { atmosphericPressureAtAltitude, loadAllRefrigerants, saturationPressure } from "@shared/engine/index.ts";
import { visitReasonText, VISIT_EVENT_LABELS, type MeasuredValues, type VisitStatus } from "@shared/schemas/visits.ts";
import { MOVEMENT_DIRECTION } from "@shared/schemas/register.ts";
import { circuitCharge } from "../server/db/charge-references.ts";
import { openDatabase, type Database } from "../server/db/client.ts";
import { analyzeTables } from "../server/db/planner-statistics.ts";
import {
  adjustments,
  customers,
  cylinders,
  equipment,
  organisations,
  readings,
  refrigerantMovements,
  sites,
  users,
  visitComments,
  visitEvents,
  visitTechnicians,
  visits,
} from "../server/db/schema.ts";
import { demoEquipment, demoOrganisation } from "../server/db/seed/demo-scenario.ts";
import { seedDemoData } from "../server/db/seed/seed-demo.ts";
import { diagnoseReading } from "../server/diagnosis/diagnose-on-server.ts";
import { readingInput, type ReadingContext } from "../server/visits/reading-input.ts";

export interface GrowSizes {
  /** Units in the organisation, the demo's three included. */
  units: number;
  /** Visits in the organisation, the demo's and the long one included. */
  visits: number;
  /** Readings on the one long open visit. */
  longVisitReadings: number;
  seed: number;
}

export const LARGE_SIZES: GrowSizes = { units: 2_000, visits: 20_000, longVisitReadings: 10_000, seed: 16 };

/** What the long visit is called, so the bench (and a person) can find it again. */
export const LONG_VISIT_REASON = "Logger left on circuit 1 overnight: reading every 2 s";
/** Open visits kept recent, so POST readings has many open visits to spread over. */
const OPEN_VISITS = 60;
/** Rows per INSERT: a few hundred readings is ~1 MB of JSON, one short statement each. */
const SLICE_ROWS = 400;
/**
 * The logger's scatter against hand-held readings: fixed probes read within about ±0.1–0.2 K of
 * each other from one reading to the next, so the circuit settles by the run log's rule (less
 * than 1 K over 5 minutes) once the pull-down is over.
 */
const LOGGER_NOISE = 0.2;
const MINUTE = 60_000;
const DAY = 24 * 60 * MINUTE;

/** Small deterministic generator (mulberry32), so a seed always gives the same company. */
function randomSource(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let value = state;
    value = Math.imul(value ^ (value >>> 15), value | 1);
    value ^= value + Math.imul(value ^ (value >>> 7), value | 61);
    return ((value ^ (value >>> 14)) >>> 0) / 4_294_967_296;
  };
  return {
    next,
    between: (low: number, high: number) => low + (high - low) * next(),
    integer: (low: number, high: number) => Math.floor(low + (high - low + 1) * next()),
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)]!,
  };
}
type Random = ReturnType<typeof randomSource>;

/**
 * How each demo unit kind runs when healthy (saturation temperatures and line temperatures, °C),
 * from the demo's own settled readings; the cool room's are a medium-temperature box at 2–4 °C.
 */
const HEALTHY: Record<
  string,
  {
    evaporatingDewC: number;
    superheatK: number;
    condensingBubbleC: number;
    subcoolingK: number;
    dischargeLineTempC: number;
    air: "comfort" | "box";
  }
> = {
  R407C: {
    evaporatingDewC: 6,
    superheatK: 6,
    condensingBubbleC: 42,
    subcoolingK: 5,
    dischargeLineTempC: 82,
    air: "comfort",
  },
  R32: {
    evaporatingDewC: 8,
    superheatK: 5,
    condensingBubbleC: 40,
    subcoolingK: 5,
    dischargeLineTempC: 72,
    air: "comfort",
  },
  R404A: {
    evaporatingDewC: -8,
    superheatK: 5.5,
    condensingBubbleC: 38,
    subcoolingK: 4,
    dischargeLineTempC: 70,
    air: "box",
  },
};

/** The few faults the history draws on, as shifts from the healthy state (the demo's own cases). */
const CONDITIONS = [
  { name: "healthy", weight: 70, evaporatingK: 0, superheatK: 0, condensingK: 0, subcoolingK: 0, dischargeK: 0 },
  {
    name: "short of charge",
    weight: 12,
    evaporatingK: -5,
    superheatK: 8,
    condensingK: -4,
    subcoolingK: -3,
    dischargeK: 14,
  },
  {
    name: "dirty condenser",
    weight: 10,
    evaporatingK: 1,
    superheatK: 0,
    condensingK: 9,
    subcoolingK: 1,
    dischargeK: 12,
  },
  { name: "restriction", weight: 8, evaporatingK: -7, superheatK: 10, condensingK: -1, subcoolingK: 6, dischargeK: 10 },
] as const;
type Condition = (typeof CONDITIONS)[number];

const REASONS = [
  "Quarterly maintenance check",
  "Not cooling enough in the afternoons",
  "Unit tripping on high pressure",
  "Ice on the suction line",
  "Noisy outdoor fan",
  "Water leaking from the indoor unit",
  "Box temperature drifting up overnight",
  "Annual leak check",
];
const SUBURBS = [
  "Bellbird Creek",
  "Wattle Flat",
  "Kookaburra Hill",
  "Red Gum Vale",
  "Magpie Bend",
  "Banksia Point",
  "Ironbark Ridge",
  "Lyrebird Gully",
];
const BUSINESSES = [
  "Clinic",
  "Bakery",
  "Pharmacy",
  "Library",
  "Community Hall",
  "Dental Surgery",
  "Supermarket",
  "Childcare Centre",
  "Veterinary Hospital",
  "Hotel",
];

function pickCondition(random: Random): Condition {
  let roll = random.next() * CONDITIONS.reduce((sum, condition) => sum + condition.weight, 0);
  for (const condition of CONDITIONS) {
    roll -= condition.weight;
    if (roll < 0) return condition;
  }
  return CONDITIONS[0];
}

/**
 * What a technician's gauges and probes would read on a unit in a condition, rounded as the
 * instruments read (gauge kPa to 1, probes to 0.1 K): pressures from the refrigerant's own
 * saturation curve at the site's atmosphere, so the engine sees a consistent cycle.
 * `settle` (0…1) eases a just-started system in from its start-up state; `noiseScale` shrinks the
 * scatter between readings (a logger's fixed probes scatter far less than hand-held ones moved
 * from unit to unit).
 */
function measuredValues(
  refrigerant: string,
  atmosphereKPa: number,
  condition: Condition,
  random: Random,
  runMinutes: number,
  settle = 1,
  noiseScale = 1,
): MeasuredValues {
  const healthy = HEALTHY[refrigerant]!;
  const noise = (spread: number) => noiseScale * random.between(-spread, spread);
  const startUp = 1 - settle;
  const evaporatingDewC = healthy.evaporatingDewC + condition.evaporatingK + noise(0.4) - 3 * startUp;
  const condensingBubbleC = healthy.condensingBubbleC + condition.condensingK + noise(0.5) + 2 * startUp;
  const gauge = (temperatureC: number, point: "bubble" | "dew") =>
    Math.round(saturationPressure(refrigerant, temperatureC, point) - atmosphereKPa);
  const tenth = (value: number) => Math.round(value * 10) / 10;
  const air =
    healthy.air === "comfort"
      ? {
          returnAirDryBulbC: tenth(24 + noise(1.5)),
          returnAirWetBulbC: tenth(17.5 + noise(1)),
          supplyAirDryBulbC: tenth(13.5 + noise(1) + 4 * startUp),
          outdoorAirDryBulbC: tenth(30 + noise(4)),
        }
      : { outdoorAirDryBulbC: tenth(27 + noise(4)) };
  return {
    suctionPressureKPa: gauge(evaporatingDewC, "dew"),
    suctionLineTempC: tenth(
      evaporatingDewC + Math.max(1, healthy.superheatK + condition.superheatK + noise(0.8) + 6 * startUp),
    ),
    liquidPressureKPa: gauge(condensingBubbleC, "bubble"),
    liquidLineTempC: tenth(condensingBubbleC - Math.max(0.5, healthy.subcoolingK + condition.subcoolingK + noise(0.5))),
    dischargeLineTempC: tenth(healthy.dischargeLineTempC + condition.dischargeK + noise(2) + 8 * startUp),
    runMinutes: Math.round(runMinutes),
    ...air,
  };
}

/** One reading row as POST /api/visits/:id/readings stores it: readingInput, then the engine. */
async function readingRow(
  context: ReadingContext,
  measured: MeasuredValues,
  row: { organisationId: string; visitId: string; circuit: number; takenAt: Date; recordedBy: string },
) {
  const parsed = readingInput(measured, context);
  if (!parsed.success) throw new Error(`grow-demo-data built an invalid reading: ${parsed.error.message}`);
  return { ...row, note: null, input: parsed.data, result: await diagnoseReading(parsed.data) };
}

async function insertInSlices<T>(rows: T[], insert: (slice: T[]) => Promise<unknown>) {
  for (let start = 0; start < rows.length; start += SLICE_ROWS) await insert(rows.slice(start, start + SLICE_ROWS));
}

async function countOf(db: Database, table: typeof equipment | typeof visits, organisationId: string) {
  const [row] = await db.select({ n: count() }).from(table).where(eq(table.organisationId, organisationId));
  return row!.n;
}

export interface GrowReport {
  organisationId: string;
  addedUnits: number;
  addedVisits: number;
  addedReadings: number;
  longVisitId: string;
}

/**
 * Grows the demo organisation in `db` (seeding it first when the database is empty) to `sizes`.
 * @throws when the database holds another organisation but not Bellbird
 */
export async function growDemoData(
  db: Database,
  sizes: GrowSizes,
  { now = Date.now(), progress = (_step: string) => {} } = {},
): Promise<GrowReport> {
  await seedDemoData(db);
  const random = randomSource(sizes.seed);
  const [organisation] = await db.select().from(organisations).where(eq(organisations.name, demoOrganisation.name));
  if (!organisation) throw new Error("growDemoData requires the demo organisation (Bellbird Mechanical)");
  const organisationId = organisation.id;
  const people = await db
    .select({ id: users.id, email: users.email, role: users.role })
    .from(users)
    .where(eq(users.organisationId, organisationId));
  const byEmail = (email: string) => people.find((person) => person.email === email)!.id;
  const technicians = people
    .filter((person) => person.role === "technician" || person.role === "senior")
    .map((person) => person.id);
  const seniors = people
    .filter((person) => person.role === "senior" || person.role === "owner")
    .map((person) => person.id);
  let addedReadings = 0;

  // Customers and sites: about five units a site, four sites a customer.
  const existingUnits = await countOf(db, equipment, organisationId);
  const unitsToAdd = Math.max(0, sizes.units - existingUnits);
  if (unitsToAdd > 0) {
    const siteCount = Math.ceil(unitsToAdd / 5);
    const customerRows = Array.from({ length: Math.ceil(siteCount / 4) }, (_, index) => ({
      organisationId,
      name: `${random.pick(SUBURBS)} ${random.pick(BUSINESSES)} ${existingUnits + index + 1}`,
      contactName: "Facilities desk",
      contactEmail: `facilities${existingUnits + index + 1}@customers.example`,
      contactPhone: `03 5550 ${String(1000 + index).slice(-4)}`,
    }));
    const storedCustomers = await db
      .insert(customers)
      .values(customerRows)
      .returning({ id: customers.id, name: customers.name });
    const siteRows = Array.from({ length: siteCount }, (_, index) => {
      const customer = storedCustomers[Math.floor(index / 4)]!;
      return {
        organisationId,
        customerId: customer.id,
        name: `${customer.name} — building ${(index % 4) + 1}`,
        address: `${random.integer(1, 400)} Main Road, ${random.pick(SUBURBS)}`,
        altitudeM: random.integer(0, 700),
      };
    });
    const storedSites = await db.insert(sites).values(siteRows).returning({ id: sites.id });
    const unitRows = Array.from({ length: unitsToAdd }, (_, index) => {
      const template = demoEquipment[index % demoEquipment.length]!;
      const number = existingUnits + index + 1;
      return {
        ...template,
        organisationId,
        siteId: storedSites[Math.floor(index / 5)]!.id,
        name: `${template.name} #${number}`,
        serial: `${template.serial.split("-")[0]}-${String(100_000 + number)}`,
      };
    });
    await insertInSlices(unitRows, (slice) => db.insert(equipment).values(slice));
  }

  const units = await db
    .select({
      id: equipment.id,
      siteId: equipment.siteId,
      name: equipment.name,
      refrigerant: equipment.refrigerant,
      circuits: equipment.circuits,
      compressorRlaA: equipment.compressorRlaA,
      application: equipment.application,
      altitudeM: sites.altitudeM,
    })
    .from(equipment)
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .where(eq(equipment.organisationId, organisationId))
    .orderBy(equipment.createdAt, equipment.serial);

  /** The server's reading context for a unit's circuit (nameplate, charge record, site), cached per circuit. */
  const contexts = new Map<string, ReadingContext>();
  const contextOf = async (unit: (typeof units)[number], circuit: number): Promise<ReadingContext> => {
    const key = `${unit.id}/${circuit}`;
    let context = contexts.get(key);
    if (!context) {
      const nameplate = unit.circuits.find((candidate) => candidate.number === circuit)!;
      context = {
        unit,
        nameplate,
        site: { altitudeM: unit.altitudeM },
        charge: await circuitCharge(db, organisationId, unit.id, nameplate),
      };
      contexts.set(key, context);
    }
    return context;
  };
  const atmosphereOf = (unit: (typeof units)[number]) => atmosphericPressureAtAltitude(unit.altitudeM ?? 0);

  // The long open visit on the demo's rooftop unit: pull-down, then settled with probe noise.
  const rooftop = units.find((unit) => unit.refrigerant === "R407C")!;
  const technician = byEmail("tech@bellbird.example");
  let [longVisit] = await db
    .select({ id: visits.id })
    .from(visits)
    .where(and(eq(visits.organisationId, organisationId), eq(visits.reason, LONG_VISIT_REASON)));
  if (!longVisit) {
    const startedAt = now - Math.ceil((sizes.longVisitReadings * 2_000) / MINUTE) * MINUTE - 10 * MINUTE;
    [longVisit] = await db
      .insert(visits)
      .values({
        organisationId,
        equipmentId: rooftop.id,
        reason: LONG_VISIT_REASON,
        createdBy: technician,
        startedAt: new Date(startedAt),
      })
      .returning({ id: visits.id });
    await db.insert(visitTechnicians).values({ visitId: longVisit!.id, userId: technician });
    await db.insert(visitEvents).values({
      organisationId,
      visitId: longVisit!.id,
      action: "started",
      summary: LONG_VISIT_REASON,
      actorId: technician,
      at: new Date(startedAt),
    });
    const context = await contextOf(rooftop, 1);
    const healthy = CONDITIONS[0];
    let rows = [];
    for (let index = 0; index < sizes.longVisitReadings; index++) {
      const seconds = index * 2;
      const measured = measuredValues(
        rooftop.refrigerant,
        atmosphereOf(rooftop),
        healthy,
        random,
        5 + seconds / 60,
        1 - Math.exp(-seconds / 600),
        LOGGER_NOISE,
      );
      rows.push(
        await readingRow(context, measured, {
          organisationId,
          visitId: longVisit!.id,
          circuit: 1,
          takenAt: new Date(startedAt + 5 * MINUTE + seconds * 1_000),
          recordedBy: technician,
        }),
      );
      if (rows.length === SLICE_ROWS) {
        await db.insert(readings).values(rows);
        addedReadings += rows.length;
        rows = [];
      }
    }
    if (rows.length > 0) await db.insert(readings).values(rows);
    addedReadings += rows.length;
    progress(`long visit: ${sizes.longVisitReadings} readings`);
  }

  // The visit history: spread over four years, newest the open ones, 1–3 readings each.
  const visitsToAdd = Math.max(0, sizes.visits - (await countOf(db, visits, organisationId)));
  const cylinderStock = new Map<string, { id: string; leftKg: number }>();
  const cylinderFor = async (refrigerant: string, kg: number) => {
    let stock = cylinderStock.get(refrigerant);
    if (!stock || stock.leftKg < kg) {
      const [row] = await db
        .insert(cylinders)
        .values({
          organisationId,
          label: `BM-${refrigerant}-G${cylinderStock.size}-${random.integer(10_000, 99_999)}`,
          serial: `GR-${random.integer(100_000, 999_999)}`,
          kind: "new",
          refrigerant,
          waterCapacityKg: 15,
          tareKg: 6.1,
          initialContentsKg: 10,
        })
        .returning({ id: cylinders.id });
      stock = { id: row!.id, leftKg: 10 };
      cylinderStock.set(refrigerant, stock);
    }
    stock.leftKg -= kg;
    return stock.id;
  };
  const BATCH_VISITS = 200;
  for (let done = 0; done < visitsToAdd; done += BATCH_VISITS) {
    if (done > 0 && done % 2_000 === 0) progress(`${done} of ${visitsToAdd} visits`);
    const batch = Math.min(BATCH_VISITS, visitsToAdd - done);
    const planned = Array.from({ length: batch }, (_, offset) => {
      const index = done + offset;
      const open = visitsToAdd - index <= OPEN_VISITS;
      const daysAgo = open ? random.between(0, 2) : random.between(2, 4 * 365);
      const statusRoll = random.next();
      const status: VisitStatus = open
        ? "open"
        : daysAgo < 20 && statusRoll < 0.3
          ? "awaiting-review"
          : statusRoll < 0.02
            ? "sent-back"
            : "signed-off";
      const unit = random.pick(units);
      const crew = random.pick(technicians);
      return {
        unit,
        crew,
        status,
        startedAt: now - daysAgo * DAY,
        reason: random.pick(REASONS),
        condition: pickCondition(random),
        readingCount: random.integer(1, 3),
        signer: random.pick(seniors),
      };
    });
    const storedVisits = await db
      .insert(visits)
      .values(
        planned.map((visit) => ({
          organisationId,
          equipmentId: visit.unit.id,
          reason: visit.reason,
          status: visit.status,
          createdBy: visit.crew,
          startedAt: new Date(visit.startedAt),
          ...(visit.status === "signed-off"
            ? {
                signedOffBy: visit.signer,
                signedOffAt: new Date(visit.startedAt + 3 * 60 * MINUTE),
                reviewNote: "Checked and in band.",
              }
            : {}),
          ...(visit.status === "sent-back" ? { reviewNote: "Please add the supply air temperature." } : {}),
        })),
      )
      .returning({ id: visits.id });
    const readingRows = [];
    const eventRows = [];
    const chargeRows = [];
    const commentRows = [];
    for (const [offset, visit] of planned.entries()) {
      const visitId = storedVisits[offset]!.id;
      const at = (minutes: number) => new Date(visit.startedAt + minutes * MINUTE);
      eventRows.push({
        organisationId,
        visitId,
        action: "started" as const,
        summary: visitReasonText(visit.reason),
        actorId: visit.crew,
        at: at(0),
      });
      if (visit.status !== "open")
        eventRows.push({
          organisationId,
          visitId,
          action: "submitted" as const,
          summary: VISIT_EVENT_LABELS.submitted,
          actorId: visit.crew,
          at: at(90),
        });
      if (visit.status === "signed-off" || visit.status === "sent-back")
        eventRows.push({
          organisationId,
          visitId,
          action: visit.status,
          summary: VISIT_EVENT_LABELS[visit.status],
          actorId: visit.signer,
          at: at(180),
        });
      const circuit = random.integer(1, visit.unit.circuits.length);
      const context = await contextOf(visit.unit, circuit);
      for (let reading = 0; reading < visit.readingCount; reading++) {
        const measured = measuredValues(
          visit.unit.refrigerant,
          atmosphereOf(visit.unit),
          visit.condition,
          random,
          12 + reading * 5,
        );
        readingRows.push(
          await readingRow(context, measured, {
            organisationId,
            visitId,
            circuit,
            takenAt: at(20 + reading * 5),
            recordedBy: visit.crew,
          }),
        );
      }
      // A visit that found the circuit short tops it up: a register movement and its linked run-log line.
      if (visit.condition.name === "short of charge" && visit.status !== "open") {
        const kg = Math.round(random.between(0.2, 1.2) * 100) / 100;
        chargeRows.push({
          organisationId,
          visitId,
          equipmentId: visit.unit.id,
          circuit,
          refrigerant: visit.unit.refrigerant,
          kind: "added-new" as const,
          kg,
          cylinderId: await cylinderFor(visit.unit.refrigerant, kg),
          technicianId: visit.crew,
          at: at(40),
          note: "Topped up after the leak was repaired",
        });
      }
      if (random.next() < 0.1)
        commentRows.push({
          organisationId,
          visitId,
          authorId: visit.crew,
          body: "Customer asked for a quote to replace the unit next year.",
          createdAt: at(60),
        });
    }
    await db
      .insert(visitTechnicians)
      .values(planned.map((visit, offset) => ({ visitId: storedVisits[offset]!.id, userId: visit.crew })));
    await insertInSlices(eventRows, (slice) => db.insert(visitEvents).values(slice));
    await insertInSlices(readingRows, (slice) => db.insert(readings).values(slice));
    addedReadings += readingRows.length;
    if (commentRows.length > 0) await db.insert(visitComments).values(commentRows);
    if (chargeRows.length > 0) {
      const movements = await db.insert(refrigerantMovements).values(chargeRows).returning();
      await db.insert(adjustments).values(
        movements.map((row) => ({
          organisationId,
          visitId: row.visitId!,
          circuit: row.circuit,
          at: row.at,
          kind: MOVEMENT_DIRECTION[row.kind as "added-new"],
          description: row.note ?? "",
          amountKg: row.kg,
          movementId: row.id,
          recordedBy: row.technicianId,
        })),
      );
    }
  }

  // A bulk write: without fresh statistics the planner would still see the demo's few rows.
  await analyzeTables(db);
  return {
    organisationId,
    addedUnits: unitsToAdd,
    addedVisits: visitsToAdd,
    addedReadings,
    longVisitId: longVisit!.id,
  };
}

/** Row counts and on-disk sizes of the biggest tables, for the report and the bench. */
export async function describeDataSet(db: Database, organisationId: string) {
  const counted = async (table: string) =>
    Number(
      (
        await db.execute<{ n: number }>(
          sql.raw(`select count(*)::int as n from ${table} where organisation_id = '${organisationId}'`),
        )
      ).rows[0]!.n,
    );
  const size = async (table: string) =>
    Number(
      (await db.execute<{ bytes: string }>(sql.raw(`select pg_total_relation_size('${table}') as bytes`))).rows[0]!
        .bytes,
    );
  const tables = [
    "equipment",
    "visits",
    "readings",
    "visit_events",
    "refrigerant_movements",
    "cylinders",
    "customers",
    "sites",
  ];
  const rows = [];
  for (const table of tables) rows.push({ table, rows: await counted(table), bytes: await size(table) });
  const [database] = (await db.execute<{ bytes: string }>(sql`select pg_database_size(current_database()) as bytes`))
    .rows;
  return { tables: rows, databaseBytes: Number(database!.bytes) };
}

const megabytes = (bytes: number) => `${(bytes / 1_048_576).toFixed(1)} MB`;

async function main() {
  // Tables load on demand (decision on saturation tables); the builder looks up every refrigerant it seeds.
  await loadAllRefrigerants();
  const { values } = parseArgs({
    options: {
      dir: { type: "string", default: "data/large" },
      units: { type: "string", default: String(LARGE_SIZES.units) },
      visits: { type: "string", default: String(LARGE_SIZES.visits) },
      "long-readings": { type: "string", default: String(LARGE_SIZES.longVisitReadings) },
      seed: { type: "string", default: String(LARGE_SIZES.seed) },
    },
  });
  const sizes: GrowSizes = {
    units: Number(values.units),
    visits: Number(values.visits),
    longVisitReadings: Number(values["long-readings"]),
    seed: Number(values.seed),
  };
  const started = performance.now();
  const handle = await openDatabase(values.dir);
  try {
    const progress = (step: string) =>
      console.log(`  ${((performance.now() - started) / 1000).toFixed(0).padStart(5)} s  ${step}`);
    const report = await growDemoData(handle.db, sizes, { progress });
    const seconds = ((performance.now() - started) / 1000).toFixed(1);
    console.log(
      `Grew ${values.dir} in ${seconds} s: +${report.addedUnits} units, +${report.addedVisits} visits, +${report.addedReadings} readings (seed ${sizes.seed}).`,
    );
    console.log(`Long open visit: /api/visits/${report.longVisitId}`);
    const { tables, databaseBytes } = await describeDataSet(handle.db, report.organisationId);
    for (const row of tables)
      console.log(
        `  ${row.table.padEnd(22)} ${String(row.rows).padStart(8)} rows  ${megabytes(row.bytes).padStart(10)}`,
      );
    console.log(`  database                               ${megabytes(databaseBytes).padStart(10)}`);
  } finally {
    await handle.close();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await main();
