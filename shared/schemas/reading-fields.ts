/**
 * The catalogue of a reading's fields: every field of the diagnosis input once, with what each
 * place that lists fields needs: its name, what kind of number it is, where it comes from, and
 * the words a screen shows where they say more than the name. The reading body and the CSV
 * import (which fields a client may send), the run log's entry form, the casebook, the report's
 * table and the schema's own messages all derive their lists from it (README decision 039), so a
 * new input field is added here once and the type check names every place that must say more.
 */
import type { DiagnosisInput } from "./diagnosis.ts";

/**
 * What a number is, so it converts between the stored SI-metric figure and the user's display
 * units (gauge pressure, temperature, temperature difference…).
 */
export const QUANTITIES = [
  "pressure",
  "temperature",
  "difference",
  "percent",
  "current",
  "mass",
  "length",
  "minutes",
] as const;
export type Quantity = (typeof QUANTITIES)[number];

/**
 * What kind of value a field holds: a number of a quantity, the site's absolute atmospheric
 * pressure, a choice from a closed set (refrigerant, metering device, where a temperature was
 * taken) or a record of figures (the circuit's charge reference point).
 */
export type FieldKind = Quantity | "absolute-pressure" | "choice" | "record";

/** The unit each kind of number is stored (and sent, and imported) in. */
export const STORED_UNITS: Record<Quantity | "absolute-pressure", string> = {
  pressure: "kPa gauge",
  "absolute-pressure": "kPa absolute",
  temperature: "°C",
  difference: "K",
  percent: "%",
  current: "A",
  mass: "kg",
  length: "m",
  minutes: "min",
};

/**
 * Where a field's value comes from. "measured": the technician reads it on the circuit (a
 * reading body, a CSV column, the run log's form); "records": the server takes it from the
 * equipment, the circuit's nameplate or its charge record (shared/schemas/circuit-facts.ts);
 * "site": the server works it out from the site's altitude. Only measured fields are accepted
 * from a client, so a stored finding cannot be made to say what a client likes (decision 004).
 */
export type FieldSource = "measured" | "records" | "site";

/** How the casebook groups a case's readings (and what the other fields are part of). */
export type FieldGroup = "equipment" | "refrigerant" | "air" | "electrical" | "nameplate" | "site";

export interface ReadingFieldEntry {
  /** The field's name: in the schema's messages, the CSV column mapping and wherever no other words are given. */
  label: string;
  kind: FieldKind;
  group: FieldGroup;
  source: FieldSource;
  /** The diagnosis needs it: a reading (or a case) is not taken without it. */
  required?: true;
  /** Column head in the report's readings table, where the full name is too wide. */
  columnLabel?: string;
  /** Words on the run log's entry card, where they tell the technician more than the name. */
  entryLabel?: string;
  entryHint?: string;
  /** Unit shown beside the entry field, where it says more than the display unit. */
  entryUnit?: string;
  /** Words in the casebook (story and editor), where they say more than the name. */
  caseLabel?: string;
  /**
   * Header words that identify the column in a logger's CSV export, so its mapping is guessed.
   * Each pattern stands alone (it does not rely on being tried before another one).
   */
  csvHeader?: RegExp;
}

/**
 * Every field of the diagnosis input, in the order a technician takes them: around the circuit
 * (suction, discharge, liquid), then air and electrical, then what the records add. A field
 * added to `DiagnosisInput` without an entry here (or an entry for a field it does not have) is
 * a type error (see `CatalogueCoversDiagnosisInput`).
 */
export const READING_FIELDS = {
  refrigerant: { label: "Refrigerant", kind: "choice", group: "equipment", source: "records", required: true },
  meteringDevice: { label: "Metering device", kind: "choice", group: "equipment", source: "records", required: true },
  suctionPressureKPa: {
    label: "Suction pressure",
    kind: "pressure",
    group: "refrigerant",
    source: "measured",
    required: true,
    columnLabel: "Suction",
    caseLabel: "Suction pressure (low side)",
    csvHeader: /suction.*(press|kpa)|^p.?suc|low.?side.*press/i,
  },
  suctionLineTempC: {
    label: "Suction line temperature",
    kind: "temperature",
    group: "refrigerant",
    source: "measured",
    required: true,
    csvHeader: /suction.*(temp|line)|^t.?suc/i,
  },
  suctionTempLocation: {
    label: "Where the suction temperature was taken",
    kind: "choice",
    group: "refrigerant",
    source: "measured",
  },
  dischargePressureKPa: {
    label: "Discharge pressure",
    kind: "pressure",
    group: "refrigerant",
    source: "measured",
    // A second high-side hose at the compressor: most rounds do without it.
    entryLabel: "Discharge pressure (optional)",
    csvHeader: /discharge.*(press|kpa)|^p.?dis/i,
  },
  dischargeLineTempC: {
    label: "Discharge line temperature",
    kind: "temperature",
    group: "refrigerant",
    source: "measured",
    columnLabel: "DLT",
    entryHint: "Keep this in view: oil breaks down on an overheated discharge",
    csvHeader: /discharge.*(temp|line)|^dlt$|^t.?dis/i,
  },
  liquidPressureKPa: {
    label: "Liquid pressure",
    kind: "pressure",
    group: "refrigerant",
    source: "measured",
    required: true,
    columnLabel: "Liquid",
    caseLabel: "Liquid pressure (high side)",
    csvHeader: /liquid.*(press|kpa)|head.*press|^p.?liq/i,
  },
  liquidLineTempC: {
    label: "Liquid line temperature",
    kind: "temperature",
    group: "refrigerant",
    source: "measured",
    required: true,
    // The card also takes a reading made on the discharge line (and says it voids subcooling).
    entryLabel: "Line temperature for subcooling",
    csvHeader: /liquid.*(temp|line)|^t.?liq/i,
  },
  liquidTempLocation: {
    label: "Where the liquid temperature was taken",
    kind: "choice",
    group: "refrigerant",
    source: "measured",
    entryLabel: "Where the temperature was taken",
  },
  returnAirDryBulbC: {
    label: "Return air dry bulb",
    kind: "temperature",
    group: "air",
    source: "measured",
    // "Return air" alone means the dry bulb; a wet bulb or humidity column is not it.
    csvHeader: /return(?!.*(wet|wb|rh|humid)).*(dry|db|air)/i,
  },
  returnAirWetBulbC: {
    label: "Return air wet bulb",
    kind: "temperature",
    group: "air",
    source: "measured",
    entryHint: "Or enter relative humidity below",
    csvHeader: /return.*(wet|wb)/i,
  },
  returnAirRelativeHumidity: {
    label: "Return air relative humidity",
    kind: "percent",
    group: "air",
    source: "measured",
    entryUnit: "% RH",
    csvHeader: /return(?!.*(wet|wb)).*(rh|humid)/i,
  },
  supplyAirDryBulbC: {
    label: "Supply air dry bulb",
    kind: "temperature",
    group: "air",
    source: "measured",
    csvHeader: /supply/i,
  },
  outdoorAirDryBulbC: {
    label: "Outdoor air dry bulb",
    kind: "temperature",
    group: "air",
    source: "measured",
    entryLabel: "Outdoor air (condenser inlet, shade)",
    caseLabel: "Outdoor air (condenser inlet)",
    csvHeader: /outdoor|ambient|oat/i,
  },
  compressorAmps: {
    label: "Compressor current",
    kind: "current",
    group: "electrical",
    source: "measured",
    entryLabel: "Compressor running current",
    csvHeader: /amp|current/i,
  },
  compressorRla: {
    label: "Compressor RLA",
    kind: "current",
    group: "nameplate",
    source: "records",
    caseLabel: "Compressor RLA (nameplate)",
  },
  targetSuperheatK: {
    label: "Target superheat",
    kind: "difference",
    group: "nameplate",
    source: "records",
    caseLabel: "Target superheat (nameplate)",
  },
  targetSubcoolingK: {
    label: "Target subcooling",
    kind: "difference",
    group: "nameplate",
    source: "records",
    caseLabel: "Target subcooling (nameplate)",
  },
  // The circuit's correct charge lets the engine estimate the charge to add (issue 14).
  chargeKg: {
    label: "Correct charge",
    kind: "mass",
    group: "nameplate",
    source: "records",
    caseLabel: "Correct charge (nameplate plus line set)",
  },
  liquidLineLengthM: { label: "Liquid line length", kind: "length", group: "nameplate", source: "records" },
  runMinutes: {
    label: "Run time",
    kind: "minutes",
    group: "electrical",
    source: "measured",
    entryLabel: "Running since start or last change",
    entryHint: "Readings drift for 10–15 min after every change",
    csvHeader: /run.?(min|time)/i,
  },
  application: { label: "Application", kind: "choice", group: "equipment", source: "records" },
  atmosphericPressureKPa: {
    label: "Atmospheric pressure",
    kind: "absolute-pressure",
    group: "site",
    source: "site",
  },
  chargeReference: { label: "Charge reference point", kind: "record", group: "equipment", source: "records" },
} as const satisfies Record<string, ReadingFieldEntry>;

type Catalogue = typeof READING_FIELDS;
export type ReadingField = keyof Catalogue;

/**
 * The catalogue has exactly the fields of `DiagnosisInput`: a field added to the input without an
 * entry (or an entry left for a field removed) fails the type check here. Checked apart from the
 * catalogue's own type, which the input schema reads its field names from.
 */
type SameKeys<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type Holds<Check extends true> = Check;
export type CatalogueCoversDiagnosisInput = Holds<SameKeys<ReadingField, keyof DiagnosisInput>>;
/** The fields whose entry has the given shape, e.g. `FieldsWhere<{ source: "measured" }>`. */
type FieldsWhere<Shape> = { [Field in ReadingField]: Catalogue[Field] extends Shape ? Field : never }[ReadingField];

/** Every field, in the catalogue's order. */
export const READING_FIELD_NAMES = Object.keys(READING_FIELDS) as ReadingField[];

/** The entry of a field, typed as the general shape (so optional words can be read on any field). */
export const readingField = (field: ReadingField): ReadingFieldEntry => READING_FIELDS[field];

export const isQuantity = (kind: FieldKind): kind is Quantity => (QUANTITIES as readonly string[]).includes(kind);

function fieldsWhere<Field extends ReadingField>(test: (entry: ReadingFieldEntry) => boolean): readonly Field[] {
  return READING_FIELD_NAMES.filter((field) => test(readingField(field))) as Field[];
}

export type MeasuredField = FieldsWhere<{ source: "measured" }>;
/** The measured fields that hold a number (all but where the temperatures were taken). */
export type NumericMeasuredField = FieldsWhere<{ source: "measured"; kind: Quantity }>;
/** Every number a case's readings can carry: what was measured and what the nameplate says. */
export type CaseReadingField = FieldsWhere<{ source: "measured" | "records"; kind: Quantity }>;
export type RequiredMeasuredField = FieldsWhere<{ source: "measured"; kind: Quantity; required: true }>;

/**
 * What a technician measures: the only diagnosis inputs a reading body (and a CSV column) may
 * carry. Everything else the engine needs the server takes from the records and the site
 * (server/visits/reading-input.ts).
 */
export const MEASURED_FIELDS = fieldsWhere<MeasuredField>((entry) => entry.source === "measured");
export const NUMERIC_MEASURED_FIELDS = fieldsWhere<NumericMeasuredField>(
  (entry) => entry.source === "measured" && isQuantity(entry.kind),
);
/** Without these four there is no superheat and no subcooling, so no finding. */
export const REQUIRED_MEASURED_FIELDS = fieldsWhere<RequiredMeasuredField>(
  (entry) => entry.source === "measured" && isQuantity(entry.kind) && entry.required === true,
);
export const CASE_READING_FIELDS = fieldsWhere<CaseReadingField>(
  (entry) => entry.source !== "site" && isQuantity(entry.kind),
);

/** The kind of number a numeric field holds. */
export const quantityOf = (field: NumericMeasuredField | CaseReadingField): Quantity =>
  readingField(field).kind as Quantity;
