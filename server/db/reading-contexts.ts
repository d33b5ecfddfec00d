/**
 * What the server adds to readings of several units at once (readings saved together,
 * server/visits/save-readings.ts): each unit with its circuits' nameplates, its site's altitude,
 * and each circuit's charge record, in three queries whatever the number of readings. The
 * single-unit path (`readingContext` in server/routes/visits.ts, for the CSV import) reads the
 * same columns with getEquipment, getSite and circuitCharge.
 */
import { and, eq, inArray } from "drizzle-orm";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { ReadingContext } from "../visits/reading-input.ts";
import { chargeRecordsOfUnits, circuitKey } from "./charge-references.ts";
import type { Database } from "./client.ts";
import { equipment, sites } from "./schema.ts";

export interface UnitForReadings {
  id: string;
  organisationId: string;
  name: string;
  circuits: CircuitNameplate[];
  /** The context of one circuit, or undefined when the unit has no such circuit. */
  context: (circuit: number) => ReadingContext | undefined;
}

/** The units by id; a unit of another organisation than those given is never read. */
export async function unitsForReadings(
  db: Database,
  organisationIds: readonly string[],
  equipmentIds: readonly string[],
): Promise<Map<string, UnitForReadings>> {
  const [rows, charges] = await Promise.all([
    db
      .select({
        id: equipment.id,
        organisationId: equipment.organisationId,
        name: equipment.name,
        refrigerant: equipment.refrigerant,
        compressorRlaA: equipment.compressorRlaA,
        application: equipment.application,
        circuits: equipment.circuits,
        altitudeM: sites.altitudeM,
      })
      .from(equipment)
      .innerJoin(sites, eq(sites.id, equipment.siteId))
      .where(and(inArray(equipment.organisationId, [...organisationIds]), inArray(equipment.id, [...equipmentIds]))),
    chargeRecordsOfUnits(db, organisationIds, equipmentIds),
  ]);
  return new Map(
    rows.map((row) => {
      const unit = { refrigerant: row.refrigerant, compressorRlaA: row.compressorRlaA, application: row.application };
      const site = { altitudeM: row.altitudeM };
      const context = (circuit: number): ReadingContext | undefined => {
        const nameplate = row.circuits.find((candidate) => candidate.number === circuit);
        if (!nameplate) return undefined;
        const key = circuitKey(row.id, circuit);
        const charge = {
          chargeKg: nameplate.factoryChargeKg + (charges.lineAdjustmentKg.get(key) ?? 0),
          chargeReference: charges.references.get(key) ?? null,
        };
        return { unit, nameplate, site, charge };
      };
      return [
        row.id,
        { id: row.id, organisationId: row.organisationId, name: row.name, circuits: row.circuits, context },
      ];
    }),
  );
}
