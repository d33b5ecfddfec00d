/**
 * The one place the server turns a reading into the engine's input: what the technician
 * measured (a reading body or a CSV row) plus what the server knows. Refrigerant, metering
 * device, targets and the liquid line length come from the circuit's nameplate, the compressor
 * RLA and the application from the equipment, the correct charge (nameplate plus the line-set
 * adjustment of its weigh-in) and the reference point from the circuit's charge record,
 * the atmosphere from the site — never from the client, so a stored finding cannot be forged
 * (README decision 004). POST /api/visits/:id/readings and the CSV import (in its worker) both
 * call it, so the same numbers always give the same stored finding.
 *
 * Pure: no database, no I/O; the callers load the equipment and the site.
 */
import { atmosphericPressureAtAltitude, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import {
  DiagnosisInputSchema,
  type Application,
  type ChargeReference,
  type DiagnosisInput,
} from "@shared/schemas/diagnosis.ts";
import { circuitFacts, withCircuitFacts } from "@shared/schemas/circuit-facts.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { Atmosphere, MeasuredValues } from "@shared/schemas/visits.ts";
import type { z } from "zod";

/** What the diagnosis takes from the unit. */
export interface ReadingEquipment {
  refrigerant: string;
  compressorRlaA: number | null;
  application: Application;
}

/** What the diagnosis takes from the site. */
export interface ReadingSite {
  altitudeM: number | null;
}

/** What the charge estimate takes from the circuit's record (server/db/charge-references.ts). */
export interface ReadingCharge {
  /** Nameplate factory charge plus the line-set adjustment of its latest full weigh-in, kg. */
  chargeKg: number;
  /** The circuit's standing reference point, or null (the estimate then uses generic coefficients). */
  chargeReference: ChargeReference | null;
}

/** Everything the server adds to a reading of one circuit, loaded once per request or import. */
export interface ReadingContext {
  unit: ReadingEquipment;
  nameplate: CircuitNameplate;
  site: ReadingSite;
  charge: ReadingCharge;
}

/**
 * The atmosphere gauge readings on a site are taken against: the ISO 2533 standard atmosphere
 * at the site's altitude, or at sea level (101.325 kPa) when the site has none (PRODUCT.md
 * "Units"). The visit detail sends it to the run log, so the live diagnosis uses this figure too.
 */
export function siteAtmosphere(site: ReadingSite): Atmosphere {
  if (site.altitudeM === null) {
    return {
      pressureKPa: STANDARD_ATMOSPHERE_KPA,
      basis: "standard",
      altitudeM: null,
      description: "standard atmosphere: site has no altitude",
    };
  }
  return {
    pressureKPa: atmosphericPressureAtAltitude(site.altitudeM),
    basis: "site-altitude",
    altitudeM: site.altitudeM,
    description: `site altitude ${site.altitudeM} m`,
  };
}

/**
 * The validated diagnosis input for measured values on a circuit, or the zod error naming the
 * fields to fix (a single reading answers it as a 400; the CSV import reports it by line).
 *
 * Validated once, here, by `DiagnosisInputSchema` (README decision 034): this is the API's
 * boundary for the engine's input, and `diagnose()` trusts what passes it.
 */
export function readingInput(
  measured: Partial<MeasuredValues>,
  { unit, nameplate, site, charge }: ReadingContext,
): z.ZodSafeParseResult<DiagnosisInput> {
  const facts = circuitFacts(unit, nameplate, charge);
  const merged = withCircuitFacts(measured, facts, siteAtmosphere(site).pressureKPa);
  return DiagnosisInputSchema.safeParse(merged);
}
