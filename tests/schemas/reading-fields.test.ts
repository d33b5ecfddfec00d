import { describe, expect, it } from "vitest";
import { circuitFacts } from "@shared/schemas/circuit-facts.ts";
import { DiagnosisInputObjectSchema, DiagnosisInputSchema } from "@shared/schemas/diagnosis.ts";
import {
  CASE_READING_FIELDS,
  isQuantity,
  MEASURED_FIELDS,
  NUMERIC_MEASURED_FIELDS,
  READING_FIELD_NAMES,
  READING_FIELDS,
  readingField,
  REQUIRED_MEASURED_FIELDS,
} from "@shared/schemas/reading-fields.ts";
import { guessMapping, IMPORT_TARGET_LABELS, IMPORTABLE_FIELDS } from "@shared/schemas/readings-import.ts";
import { MeasuredValuesSchema, ReadingBodySchema } from "@shared/schemas/visits.ts";
import { CASE_READINGS } from "@/features/casebook/utils/case-readings.ts";
import { DRAFT_FIELDS, emptyDraft, REQUIRED_FIELDS } from "@/features/run-log/utils/reading-draft.ts";

const inputFields = Object.keys(DiagnosisInputObjectSchema.shape);
const where = (test: (field: (typeof READING_FIELD_NAMES)[number]) => boolean) => READING_FIELD_NAMES.filter(test);

describe("the catalogue of reading fields", () => {
  it("has one entry for every field of the diagnosis input, and no other", () => {
    expect([...READING_FIELD_NAMES].sort()).toEqual([...inputFields].sort());
  });

  it("marks as required exactly the fields the input schema cannot do without", () => {
    const required = inputFields.filter(
      (field) => !DiagnosisInputObjectSchema.shape[field as keyof typeof DiagnosisInputObjectSchema.shape].isOptional(),
    );
    expect(where((field) => readingField(field).required === true).sort()).toEqual(required.sort());
  });

  it("takes from the records exactly what a circuit's facts supply, and only the atmosphere from the site", () => {
    const facts = circuitFacts(
      { refrigerant: "R410A", compressorRlaA: null, application: "comfort-cooling" },
      { meteringDevice: "txv" },
      { chargeKg: null, chargeReference: null },
    );
    expect(where((field) => readingField(field).source === "records").sort()).toEqual(Object.keys(facts).sort());
    expect(where((field) => readingField(field).source === "site")).toEqual(["atmosphericPressureKPa"]);
  });

  it("derives the measured fields a reading body and a CSV column may carry", () => {
    // The list as it stood before the catalogue: a change to it is a change to the API.
    expect(MEASURED_FIELDS).toEqual([
      "suctionPressureKPa",
      "suctionLineTempC",
      "suctionTempLocation",
      "dischargePressureKPa",
      "dischargeLineTempC",
      "liquidPressureKPa",
      "liquidLineTempC",
      "liquidTempLocation",
      "returnAirDryBulbC",
      "returnAirWetBulbC",
      "returnAirRelativeHumidity",
      "supplyAirDryBulbC",
      "outdoorAirDryBulbC",
      "compressorAmps",
      "runMinutes",
    ]);
    expect(MEASURED_FIELDS).toEqual(where((field) => readingField(field).source === "measured"));
    expect(Object.keys(MeasuredValuesSchema.shape)).toEqual(MEASURED_FIELDS);
    const envelope = ["circuit", "takenAt", "note", "clientId"];
    expect(Object.keys(ReadingBodySchema.shape).filter((key) => !envelope.includes(key))).toEqual(MEASURED_FIELDS);
  });

  it("gives the run log's form, the CSV import and the casebook the same numbers in the same order", () => {
    const numbers = MEASURED_FIELDS.filter((field) => isQuantity(readingField(field).kind));
    expect(NUMERIC_MEASURED_FIELDS).toEqual(numbers);
    expect(numbers).not.toContain("suctionTempLocation");
    expect(DRAFT_FIELDS).toEqual(numbers);
    expect(Object.keys(emptyDraft())).toEqual([...numbers, "liquidTempLocation", "suctionTempLocation"]);
    expect(IMPORTABLE_FIELDS).toEqual(numbers);
    expect(Object.keys(IMPORT_TARGET_LABELS)).toEqual(["ignore", "takenAt", ...numbers]);
    expect(REQUIRED_FIELDS).toEqual(REQUIRED_MEASURED_FIELDS);
    expect(REQUIRED_FIELDS).toEqual(["suctionPressureKPa", "suctionLineTempC", "liquidPressureKPa", "liquidLineTempC"]);
    expect(CASE_READINGS.map((reading) => reading.field)).toEqual(CASE_READING_FIELDS);
    // Every measured number and every nameplate number, the site's atmosphere aside.
    expect(CASE_READING_FIELDS.filter((field) => readingField(field).source === "measured")).toEqual(numbers);
    expect(new Set(CASE_READINGS.map((reading) => reading.group))).toEqual(
      new Set(["refrigerant", "air", "electrical", "nameplate"]),
    );
  });

  it("shows the casebook's and the import's words from the catalogue", () => {
    const suction = CASE_READINGS.find((reading) => reading.field === "suctionPressureKPa");
    expect(suction).toMatchObject({ label: "Suction pressure (low side)", quantity: "pressure", required: true });
    expect(CASE_READINGS.find((reading) => reading.field === "liquidLineLengthM")?.label).toBe("Liquid line length");
    expect(IMPORT_TARGET_LABELS.suctionPressureKPa).toBe("Suction pressure (kPa gauge)");
    expect(IMPORT_TARGET_LABELS.runMinutes).toBe("Run time (min)");
  });

  it("refuses a value in the catalogue's name and stored unit", () => {
    const parsed = DiagnosisInputSchema.safeParse({
      refrigerant: "R410A",
      meteringDevice: "txv",
      suctionPressureKPa: 800,
      suctionLineTempC: 12,
      liquidPressureKPa: 2600,
      liquidLineTempC: "hot",
    });
    const messages = parsed.error?.issues.map((issue) => issue.message);
    expect(messages).toContain(`${READING_FIELDS.liquidLineTempC.label} must be a number in °C`);
    expect(parsed.success).toBe(false);
  });

  it("guesses each column of a logger's export from its header words, whatever their order", () => {
    const headers = [
      "Timestamp",
      "Return air",
      "Return air RH",
      "Return air wet bulb",
      "Suction line pressure",
      "Amps",
    ];
    expect(guessMapping(headers)).toEqual({
      Timestamp: "takenAt",
      "Return air": "returnAirDryBulbC",
      "Return air RH": "returnAirRelativeHumidity",
      "Return air wet bulb": "returnAirWetBulbC",
      "Suction line pressure": "suctionPressureKPa",
      Amps: "compressorAmps",
    });
    expect(guessMapping(["Notes", "Return air wet bulb", "Return air wet bulb (2)"])).toEqual({
      Notes: "ignore",
      "Return air wet bulb": "returnAirWetBulbC",
      // A second wet bulb is not taken for the dry bulb: it is left for the user to map.
      "Return air wet bulb (2)": "ignore",
    });
  });
});
