import type { Application, ChargeReference, MeteringDevice } from "./diagnosis.ts";

/**
 * What a reading of one circuit takes from the records rather than from the gauges: the unit's
 * refrigerant, compressor RLA and application, the circuit's nameplate (metering device, targets,
 * liquid line length) and charge record (correct charge, reference point). Null where the record
 * has nothing; the diagnosis then does without.
 */
export interface CircuitFacts {
  refrigerant: string;
  meteringDevice: MeteringDevice;
  targetSuperheatK: number | null;
  targetSubcoolingK: number | null;
  compressorRla: number | null;
  /** The equipment's application and the circuit's liquid line length: they set the bands. */
  application: Application;
  liquidLineLengthM: number | null;
  /** Nameplate factory charge plus the line-set adjustment of its latest full weigh-in, kg. */
  chargeKg: number | null;
  chargeReference: ChargeReference | null;
}

/** The fields of a unit a reading takes (an equipment record, a demo unit). */
export interface FactsUnit {
  refrigerant: string;
  compressorRlaA: number | null;
  application: Application;
}

/** The fields of a circuit's nameplate a reading takes. */
export interface FactsNameplate {
  meteringDevice: MeteringDevice;
  targetSuperheatK?: number | null;
  targetSubcoolingK?: number | null;
  liquidLineLengthM?: number | null;
}

/** The circuit's charge record as a reading takes it. */
export interface FactsCharge {
  chargeKg: number | null;
  chargeReference: ChargeReference | null;
}

/**
 * The facts of one circuit from its unit, nameplate and charge record: the one mapping of record
 * fields to diagnosis-input fields, used by the server's reading check, the run log's live
 * diagnosis and the demo data alike, so all three diagnose a circuit with the same facts.
 */
export function circuitFacts(unit: FactsUnit, nameplate: FactsNameplate, charge: FactsCharge): CircuitFacts {
  return {
    refrigerant: unit.refrigerant,
    meteringDevice: nameplate.meteringDevice,
    targetSuperheatK: nameplate.targetSuperheatK ?? null,
    targetSubcoolingK: nameplate.targetSubcoolingK ?? null,
    compressorRla: unit.compressorRlaA,
    application: unit.application,
    liquidLineLengthM: nameplate.liquidLineLengthM ?? null,
    chargeKg: charge.chargeKg,
    chargeReference: charge.chargeReference,
  };
}

/**
 * A reading ready for `DiagnosisInputSchema`: the measured values with the circuit's facts and
 * the site's atmosphere over them. The facts win over anything of the same name in `measured`,
 * so a client cannot send its own targets or charge (README decision 004); a fact the records
 * do not have is left out.
 */
export function withCircuitFacts(
  measured: object,
  facts: CircuitFacts,
  atmosphericPressureKPa: number,
): Record<string, unknown> {
  const known = Object.fromEntries(Object.entries(facts).filter(([, value]) => value !== null));
  return { ...measured, ...known, atmosphericPressureKPa };
}
