/**
 * What the server adds to readings of several units at once (readings saved together,
 * server/visits/save-readings.ts): each unit with its circuits' nameplates, its site's altitude,
 * and each circuit's charge record, in one query whatever the number of readings. The
 * single-unit path (`readingContext` in server/routes/visits.ts, for the CSV import) reads the
 * same columns with getEquipment, getSite and circuitCharge.
 */
import { and, eq, inArray, sql } from "drizzle-orm";
import type { ChargeReference } from "@shared/schemas/diagnosis.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { ReadingContext } from "../visits/reading-input.ts";
import type { Database } from "./client.ts";
import { chargeReferences, circuitCharges, equipment, sites, visits } from "./schema.ts";

export interface UnitForReadings {
  id: string;
  organisationId: string;
  name: string;
  circuits: CircuitNameplate[];
  /** The context of one circuit, or undefined when the unit has no such circuit. */
  context: (circuit: number) => ReadingContext | undefined;
}

/** A circuit's standing reference point, as the subquery below builds it. */
type ReferenceOfCircuit = ChargeReference & { circuit: number };

/**
 * The units by id, each with its charge records, in one statement (the embedded database's cost
 * is per statement); a unit of another organisation than those given is never read.
 */
export async function unitsForReadings(
  db: Database,
  organisationIds: readonly string[],
  equipmentIds: readonly string[],
): Promise<Map<string, UnitForReadings>> {
  const rows = await db
    .select({
      id: equipment.id,
      organisationId: equipment.organisationId,
      name: equipment.name,
      refrigerant: equipment.refrigerant,
      compressorRlaA: equipment.compressorRlaA,
      application: equipment.application,
      circuits: equipment.circuits,
      altitudeM: sites.altitudeM,
      // Each circuit's standing reference point (at most one: charge_references_circuit_unique).
      references: sql<ReferenceOfCircuit[]>`(select coalesce(json_agg(json_build_object(
          'circuit', ${chargeReferences.circuit},
          'subcoolingK', ${chargeReferences.subcoolingK},
          'superheatK', ${chargeReferences.superheatK},
          'evaporatingTempC', ${chargeReferences.evaporatingTempC},
          'condensingTempC', ${chargeReferences.condensingTempC},
          'outdoorAirDryBulbC', ${chargeReferences.outdoorAirDryBulbC},
          'returnAirDryBulbC', ${chargeReferences.returnAirDryBulbC})), '[]'::json)
        from ${chargeReferences}
        where ${chargeReferences.equipmentId} = ${equipment.id} and ${chargeReferences.organisationId} = ${equipment.organisationId} and ${chargeReferences.voidedAt} is null)`,
      // Each circuit's latest standing full weigh-in: its line-set adjustment (circuitLineAdjustmentKg).
      lineAdjustments: sql<
        { circuit: number; kg: number }[]
      >`(select coalesce(json_agg(json_build_object('circuit', latest.circuit, 'kg', latest.kg)), '[]'::json)
        from (select distinct on (${circuitCharges.circuit}) ${circuitCharges.circuit} as circuit, ${circuitCharges.lineAdjustmentKg} as kg
          from ${circuitCharges} inner join ${visits} on ${visits.id} = ${circuitCharges.visitId}
          where ${visits.equipmentId} = ${equipment.id} and ${circuitCharges.organisationId} = ${equipment.organisationId} and ${circuitCharges.voidedAt} is null
          order by ${circuitCharges.circuit}, ${circuitCharges.createdAt} desc) latest)`,
    })
    .from(equipment)
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .where(and(inArray(equipment.organisationId, [...organisationIds]), inArray(equipment.id, [...equipmentIds])));
  return new Map(
    rows.map((row) => {
      const unit = { refrigerant: row.refrigerant, compressorRlaA: row.compressorRlaA, application: row.application };
      const site = { altitudeM: row.altitudeM };
      const context = (circuit: number): ReadingContext | undefined => {
        const nameplate = row.circuits.find((candidate) => candidate.number === circuit);
        if (!nameplate) return undefined;
        const found = row.references.find((reference) => reference.circuit === circuit);
        const chargeReference: ChargeReference | null = found
          ? {
              subcoolingK: found.subcoolingK,
              superheatK: found.superheatK,
              evaporatingTempC: found.evaporatingTempC,
              condensingTempC: found.condensingTempC,
              outdoorAirDryBulbC: found.outdoorAirDryBulbC,
              returnAirDryBulbC: found.returnAirDryBulbC,
            }
          : null;
        const lineAdjustmentKg = row.lineAdjustments.find((adjustment) => adjustment.circuit === circuit)?.kg ?? 0;
        return {
          unit,
          nameplate,
          site,
          charge: { chargeKg: nameplate.factoryChargeKg + lineAdjustmentKg, chargeReference },
        };
      };
      return [
        row.id,
        { id: row.id, organisationId: row.organisationId, name: row.name, circuits: row.circuits, context },
      ];
    }),
  );
}
