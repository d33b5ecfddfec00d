import {
  CASE_READING_FIELDS,
  quantityOf,
  readingField,
  READING_FIELDS,
  type CaseReadingField,
  type Quantity,
} from "@shared/schemas/reading-fields.ts";

/** The groups a case's readings are told in: refrigerant circuit, air, electrical, nameplate. */
export type CaseReadingGroup = (typeof READING_FIELDS)[CaseReadingField]["group"];

export interface CaseReading {
  field: CaseReadingField;
  label: string;
  quantity: Quantity;
  group: CaseReadingGroup;
  /** A case is not saved without it. */
  required: boolean;
}

/**
 * The readings of a case in the order a technician takes them (around the circuit, then air and
 * electrical) with what the nameplate says: the catalogue's numbers, measured or from the records.
 */
export const CASE_READINGS: readonly CaseReading[] = CASE_READING_FIELDS.map((field) => {
  const entry = readingField(field);
  return {
    field,
    label: entry.caseLabel ?? entry.label,
    quantity: quantityOf(field),
    group: READING_FIELDS[field].group,
    required: entry.required === true,
  };
});

export const METERING_LABELS = {
  txv: "TXV",
  eev: "EEV",
  "fixed-orifice": "Fixed orifice (piston)",
  capillary: "Capillary tube",
} as const;
