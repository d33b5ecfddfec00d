/**
 * Charge diagnosis contract: what a technician measures on one running circuit, and what the
 * diagnosis engine (`diagnose()` in shared/engine) answers. Client forms, the server and the
 * engine all validate with these schemas, so a reading is accepted or refused the same way
 * everywhere.
 *
 * Units (PRODUCT.md "Units"): temperatures °C, pressures kPa **gauge** unless a name says
 * otherwise, temperature differences K, relative humidity in percent (0–100), currents A.
 */
import { z } from "zod";
import { STANDARD_ATMOSPHERE_KPA } from "../engine/properties/property-tolerances.ts";
import { READING_FIELDS, STORED_UNITS, type ReadingField } from "./reading-fields.ts";
import { text } from "./text.ts";

// ---------------------------------------------------------------------------------------------
// Enumerations
// ---------------------------------------------------------------------------------------------

export const METERING_DEVICES = ["txv", "eev", "fixed-orifice", "capillary"] as const;
export const MeteringDeviceSchema = z.enum(METERING_DEVICES, {
  error: "Choose the metering device: TXV, EEV, fixed orifice or capillary",
});
export type MeteringDevice = z.infer<typeof MeteringDeviceSchema>;

export const LIQUID_TEMP_LOCATIONS = ["liquid-line", "discharge-line"] as const;
export const LiquidTempLocationSchema = z.enum(LIQUID_TEMP_LOCATIONS, {
  error: "Say where the liquid temperature was taken: liquid line or discharge line",
});
export type LiquidTempLocation = z.infer<typeof LiquidTempLocationSchema>;

/**
 * What the equipment does: the bands of the air-side and coil checks, the default superheat and
 * the discharge limits depend on it (comfort cooling runs its coil about 19 K below the room, a
 * cool room about 6 K). A heat pump is judged in cooling mode.
 */
export const APPLICATIONS = [
  "comfort-cooling",
  "heat-pump",
  "medium-temperature-refrigeration",
  "low-temperature-refrigeration",
  "process-chilling",
] as const;
export const ApplicationSchema = z.enum(APPLICATIONS, {
  error:
    "Choose the application: comfort cooling, heat pump, medium- or low-temperature refrigeration, or process chilling",
});
export type Application = z.infer<typeof ApplicationSchema>;

/**
 * Where the suction line temperature (and pressure) for superheat was taken: at the evaporator
 * outlet (what a TXV controls) or at the outdoor unit / compressor suction service valve (what
 * fixed-orifice charging charts use), which reads higher by the line set's heat gain and
 * pressure drop.
 */
export const SUCTION_TEMP_LOCATIONS = ["evaporator-outlet", "outdoor-unit"] as const;
export const SuctionTempLocationSchema = z.enum(SUCTION_TEMP_LOCATIONS, {
  error: "Say where the suction temperature was taken: evaporator outlet or outdoor unit",
});
export type SuctionTempLocation = z.infer<typeof SuctionTempLocationSchema>;

export const CHARGE_STATES = [
  "normal",
  "undercharged",
  "overcharged",
  "restricted-metering",
  "low-evaporator-airflow",
  "overfeeding-metering",
  "condenser-airflow",
  "non-condensables",
  "weak-compressor",
  "insufficient-data",
] as const;
export const ChargeStateSchema = z.enum(CHARGE_STATES);
export type ChargeState = z.infer<typeof ChargeStateSchema>;
/** The fault (and normal) states that evidence can point to; `insufficient-data` is a verdict only. */
export type EvidenceState = Exclude<ChargeState, "insufficient-data">;

// ---------------------------------------------------------------------------------------------
// Limits (named so that forms, tests and the engine share them)
// ---------------------------------------------------------------------------------------------

/** Standard atmosphere at sea level, kPa absolute (ISO 2533): one constant for the whole engine. */
export { STANDARD_ATMOSPHERE_KPA };
/** Lowest accepted site atmospheric pressure, kPa abs: about 5 500 m altitude. */
export const MIN_ATMOSPHERIC_PRESSURE_KPA = 50;
/** Highest accepted site atmospheric pressure, kPa abs: above any weather at sea level. */
export const MAX_ATMOSPHERIC_PRESSURE_KPA = 110;
/** Highest accepted gauge pressure, kPa: covers transcritical R744 gas coolers (~13 MPa). */
export const MAX_GAUGE_PRESSURE_KPA = 15_000;
/** Plausible pipe temperatures for a running circuit, °C. */
export const MIN_LINE_TEMPERATURE_C = -100;
export const MAX_LINE_TEMPERATURE_C = 200;
/** Plausible air temperatures at a unit, °C. */
export const MIN_AIR_TEMPERATURE_C = -50;
export const MAX_AIR_TEMPERATURE_C = 70;
/** Largest nameplate superheat or subcooling target accepted, K. */
export const MAX_TARGET_K = 30;
/** Longest liquid line (line set) accepted, m. */
export const MAX_LINE_LENGTH_M = 300;
/** Largest charge of one circuit, kg. */
export const MAX_CIRCUIT_CHARGE_KG = 500;
/** Largest current accepted, A. */
export const MAX_CURRENT_A = 2_000;
/**
 * The smallest compressor rating taken, amperes. The smallest hermetic compressors (domestic
 * refrigerators, about 1/12 hp) are rated near half an ampere (memory (unverified)); below a tenth
 * of that a typed RLA is a slip, and the current ratio divided by it would run away.
 */
export const MIN_RLA_A = 0.05;
/** Wet bulb may read this much above dry bulb before it is called impossible (sensor noise), K. */
export const WET_BULB_ABOVE_DRY_BULB_TOLERANCE_K = 0.2;

// ---------------------------------------------------------------------------------------------
// Input
// ---------------------------------------------------------------------------------------------

/** A field's name, from the catalogue of reading fields: the messages below say it as the screens do. */
const name = (field: ReadingField) => READING_FIELDS[field].label;

type NumberField = {
  [Field in ReadingField]: (typeof READING_FIELDS)[Field]["kind"] extends keyof typeof STORED_UNITS ? Field : never;
}[ReadingField];

/** A numeric field of the input, refused in the catalogue's words and stored unit when it is not a number. */
function number(field: NumberField) {
  return z.number({ error: `${name(field)} must be a number in ${STORED_UNITS[READING_FIELDS[field].kind]}` });
}

/**
 * Plausible range of one numeric reading. The ranges are checked in the schema's single
 * refinement pass below rather than as per-field `.min()/.max()` checks: forty small zod checks
 * cost about as much as the whole diagnosis should (bench target 5 µs per `diagnose()`).
 */
interface FieldRange {
  min: number;
  /** True when the minimum itself is not allowed. */
  minExclusive?: boolean;
  max: number;
  minMessage: string;
  maxMessage: string;
}

function gaugePressureRange(label: string): FieldRange {
  // The lower bound (a perfect vacuum) depends on atmospheric pressure: checked separately.
  return {
    min: -Infinity,
    max: MAX_GAUGE_PRESSURE_KPA,
    minMessage: "",
    maxMessage: `${label} above ${MAX_GAUGE_PRESSURE_KPA} kPa gauge is beyond any refrigeration gauge`,
  };
}

function lineTemperatureRange(label: string): FieldRange {
  return {
    min: MIN_LINE_TEMPERATURE_C,
    max: MAX_LINE_TEMPERATURE_C,
    minMessage: `${label} below ${MIN_LINE_TEMPERATURE_C} °C is not a pipe reading`,
    maxMessage: `${label} above ${MAX_LINE_TEMPERATURE_C} °C is not a pipe reading`,
  };
}

function airTemperatureRange(label: string): FieldRange {
  return {
    min: MIN_AIR_TEMPERATURE_C,
    max: MAX_AIR_TEMPERATURE_C,
    minMessage: `${label} below ${MIN_AIR_TEMPERATURE_C} °C is not an air reading`,
    maxMessage: `${label} above ${MAX_AIR_TEMPERATURE_C} °C is not an air reading`,
  };
}

function targetRange(label: string): FieldRange {
  return {
    min: 0,
    max: MAX_TARGET_K,
    minMessage: `${label} cannot be negative`,
    maxMessage: `${label} above ${MAX_TARGET_K} K is not a nameplate value`,
  };
}

/** Ranges of the numeric readings, by field: one for every number of the catalogue. */
export const DIAGNOSIS_FIELD_RANGES = {
  suctionPressureKPa: gaugePressureRange(name("suctionPressureKPa")),
  suctionLineTempC: lineTemperatureRange(name("suctionLineTempC")),
  liquidPressureKPa: gaugePressureRange(name("liquidPressureKPa")),
  liquidLineTempC: lineTemperatureRange(name("liquidLineTempC")),
  dischargePressureKPa: gaugePressureRange(name("dischargePressureKPa")),
  dischargeLineTempC: lineTemperatureRange(name("dischargeLineTempC")),
  returnAirDryBulbC: airTemperatureRange(name("returnAirDryBulbC")),
  returnAirWetBulbC: airTemperatureRange(name("returnAirWetBulbC")),
  returnAirRelativeHumidity: {
    min: 0,
    minExclusive: true,
    max: 100,
    minMessage: `${name("returnAirRelativeHumidity")} must be above 0 %`,
    maxMessage: `${name("returnAirRelativeHumidity")} cannot exceed 100 %`,
  },
  supplyAirDryBulbC: airTemperatureRange(name("supplyAirDryBulbC")),
  outdoorAirDryBulbC: airTemperatureRange(name("outdoorAirDryBulbC")),
  compressorAmps: {
    min: 0,
    max: MAX_CURRENT_A,
    minMessage: `${name("compressorAmps")} cannot be negative`,
    maxMessage: `${name("compressorAmps")} above ${MAX_CURRENT_A} A is not plausible`,
  },
  compressorRla: {
    min: MIN_RLA_A,
    max: MAX_CURRENT_A,
    minMessage: `${name("compressorRla")} below ${MIN_RLA_A} A is not a compressor's rating`,
    maxMessage: `${name("compressorRla")} above ${MAX_CURRENT_A} A is not plausible`,
  },
  targetSuperheatK: targetRange(name("targetSuperheatK")),
  targetSubcoolingK: targetRange(name("targetSubcoolingK")),
  atmosphericPressureKPa: {
    min: MIN_ATMOSPHERIC_PRESSURE_KPA,
    max: MAX_ATMOSPHERIC_PRESSURE_KPA,
    minMessage: `${name("atmosphericPressureKPa")} below ${MIN_ATMOSPHERIC_PRESSURE_KPA} kPa is above any inhabited altitude`,
    maxMessage: `${name("atmosphericPressureKPa")} above ${MAX_ATMOSPHERIC_PRESSURE_KPA} kPa is not a weather reading`,
  },
  runMinutes: { min: 0, max: Infinity, minMessage: `${name("runMinutes")} cannot be negative`, maxMessage: "" },
  liquidLineLengthM: {
    min: 0,
    max: MAX_LINE_LENGTH_M,
    minMessage: `${name("liquidLineLengthM")} cannot be negative`,
    maxMessage: `${name("liquidLineLengthM")} above ${MAX_LINE_LENGTH_M} m is not a line set`,
  },
  chargeKg: {
    min: 0,
    minExclusive: true,
    max: MAX_CIRCUIT_CHARGE_KG,
    minMessage: `${name("chargeKg")} must be above 0 kg`,
    maxMessage: `${name("chargeKg")} above ${MAX_CIRCUIT_CHARGE_KG} kg is not one circuit`,
  },
} as const satisfies Record<NumberField, FieldRange>;
const RANGE_ENTRIES = Object.entries(DIAGNOSIS_FIELD_RANGES) as [keyof typeof DIAGNOSIS_FIELD_RANGES, FieldRange][];

/** Bounds of a reference point's figures, °C and K. */
export const CHARGE_REFERENCE_LIMITS = {
  temperatureC: { min: -80, max: 90 },
  differenceK: { min: -5, max: 60 },
} as const;
const { temperatureC: REF_T, differenceK: REF_D } = CHARGE_REFERENCE_LIMITS;
const referenceTemperature = (label: string) =>
  z
    .number({ error: `${label} must be a number in °C` })
    .min(REF_T.min, `${label} below −80 °C is not a running circuit`)
    .max(REF_T.max, `${label} above 90 °C is not a running circuit`);
const referenceDifference = (label: string) =>
  z
    .number({ error: `${label} must be a number in K` })
    .min(REF_D.min, `${label} below −5 K is not a settled reading`)
    .max(REF_D.max, `${label} above 60 K is not a settled reading`);
/**
 * A circuit's charge reference point: settled readings taken at a known correct charge (after a
 * weigh-in of the nameplate charge into an evacuated circuit). Charge deviation is measured from
 * it (virtual refrigerant charge method, Li & Braun 2009).
 */
export const ChargeReferenceSchema = z.object({
  subcoolingK: referenceDifference("Reference subcooling"),
  superheatK: referenceDifference("Reference superheat"),
  evaporatingTempC: referenceTemperature("Reference evaporating temperature"),
  condensingTempC: referenceTemperature("Reference condensing temperature"),
  outdoorAirDryBulbC: referenceTemperature("Reference outdoor air").nullable(),
  returnAirDryBulbC: referenceTemperature("Reference return air").nullable(),
});
export type ChargeReference = z.infer<typeof ChargeReferenceSchema>;

export const CHARGE_DEVIATION_BASES = ["unit-reference", "generic"] as const;
export type ChargeDeviationBasis = (typeof CHARGE_DEVIATION_BASES)[number];
/** Charge over (+) or under (−) the correct charge, kg, with its range, basis and source. */
export const ChargeDeviationSchema = z.object({
  kg: z.number(),
  lowKg: z.number(),
  highKg: z.number(),
  /** unit-reference: against the circuit's own reference point (narrow); generic: published default coefficients (wide). */
  basis: z.enum(CHARGE_DEVIATION_BASES),
  source: z.string(),
});
export type ChargeDeviation = z.infer<typeof ChargeDeviationSchema>;

/** The input's fields without the cross-field checks, so a request body can pick the ones it takes. */
export const DiagnosisInputObjectSchema = z.object({
  /** ASHRAE designation as listed by `listRefrigerants()`, e.g. "R410A". */
  refrigerant: text({ error: "Choose the refrigerant" }).min(1, "Choose the refrigerant"),
  meteringDevice: MeteringDeviceSchema,
  /** Suction pressure at the suction service port, kPa gauge. */
  suctionPressureKPa: number("suctionPressureKPa"),
  /** Suction line temperature next to the suction port / evaporator outlet, °C. */
  suctionLineTempC: number("suctionLineTempC"),
  /**
   * Where the suction temperature was taken. Unstated, each target is read at its own reference
   * point (TXV/EEV at the evaporator outlet, fixed-device charts at the outdoor unit).
   */
  suctionTempLocation: SuctionTempLocationSchema.optional(),
  /** Liquid pressure at the liquid service port (condenser outlet), kPa gauge. */
  liquidPressureKPa: number("liquidPressureKPa"),
  /** Pipe temperature taken for subcooling, °C. */
  liquidLineTempC: number("liquidLineTempC"),
  /** Where `liquidLineTempC` was taken; default liquid line. A discharge-line reading voids subcooling. */
  liquidTempLocation: LiquidTempLocationSchema.optional(),
  /** Discharge pressure at the compressor, kPa gauge. */
  dischargePressureKPa: number("dischargePressureKPa").optional(),
  /** Discharge line temperature within about 15 cm of the compressor, °C. */
  dischargeLineTempC: number("dischargeLineTempC").optional(),
  /**
   * Air entering the evaporator, °C: return air for comfort cooling and heat pumps, the room or
   * box air on the coil for refrigeration, the entering water or glycol for process chilling.
   */
  returnAirDryBulbC: number("returnAirDryBulbC").optional(),
  returnAirWetBulbC: number("returnAirWetBulbC").optional(),
  /** Return air relative humidity, percent (0–100]; used for the wet bulb when none is measured. */
  returnAirRelativeHumidity: number("returnAirRelativeHumidity").optional(),
  /** Air (or fluid, for process chilling) leaving the evaporator, °C. */
  supplyAirDryBulbC: number("supplyAirDryBulbC").optional(),
  /** Outdoor air entering the condenser, in the shade, °C. */
  outdoorAirDryBulbC: number("outdoorAirDryBulbC").optional(),
  compressorAmps: number("compressorAmps").optional(),
  compressorRla: number("compressorRla").optional(),
  /** Maker's target superheat, K (nameplate, manual or the unit's own charging chart). */
  targetSuperheatK: number("targetSuperheatK").optional(),
  /** Maker's target subcooling, K. */
  targetSubcoolingK: number("targetSubcoolingK").optional(),
  /** Site atmospheric pressure, kPa absolute; default 101.325. */
  atmosphericPressureKPa: number("atmosphericPressureKPa").optional(),
  /** Minutes the compressor has run since start or the last adjustment. */
  runMinutes: number("runMinutes").optional(),
  /**
   * What the equipment does (from the equipment record). Without it the engine infers it from
   * the return air temperature and says so.
   */
  application: ApplicationSchema.optional(),
  /** Length of the liquid line (the line set), m: sets the suction line allowance. */
  liquidLineLengthM: number("liquidLineLengthM").optional(),
  /** The circuit's correct charge (nameplate plus any line-set adjustment), kg: sets the scale of `chargeDeviation`. */
  chargeKg: number("chargeKg").optional(),
  /** The circuit's own reference point (settled readings at a known correct charge), when one was set. */
  chargeReference: ChargeReferenceSchema.optional(),
});

/**
 * One circuit's readings. Cross-field checks refuse readings that cannot come from a running
 * circuit, with the message on the field the technician should look at.
 */
export const DiagnosisInputSchema = DiagnosisInputObjectSchema.superRefine((input, ctx) => {
  for (const [field, range] of RANGE_ENTRIES) {
    const value = input[field];
    if (value === undefined) continue;
    if (range.minExclusive ? value <= range.min : value < range.min)
      ctx.addIssue({ code: "custom", path: [field], message: range.minMessage });
    else if (value > range.max) ctx.addIssue({ code: "custom", path: [field], message: range.maxMessage });
  }
  const atmosphere = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  // A gauge cannot read below a perfect vacuum: absolute pressure must stay above zero.
  const gauges = [
    ["suctionPressureKPa", input.suctionPressureKPa],
    ["liquidPressureKPa", input.liquidPressureKPa],
    ["dischargePressureKPa", input.dischargePressureKPa],
  ] as const;
  for (const [field, value] of gauges) {
    if (value !== undefined && value <= -atmosphere) {
      ctx.addIssue({
        code: "custom",
        path: [field],
        message: `${name(field)} of ${value} kPa gauge is below a perfect vacuum (${(-atmosphere).toFixed(1)} kPa gauge at this atmospheric pressure)`,
      });
    }
  }
  // In a running circuit the compressor lifts suction to condensing pressure; suction at or
  // above the liquid pressure means swapped hoses, a stopped compressor or a wrong entry.
  if (input.suctionPressureKPa >= input.liquidPressureKPa) {
    const message = `Suction pressure (${input.suctionPressureKPa} kPa) must be below liquid pressure (${input.liquidPressureKPa} kPa) on a running circuit: check the hoses are not swapped and the compressor is running`;
    ctx.addIssue({ code: "custom", path: ["suctionPressureKPa"], message });
    ctx.addIssue({ code: "custom", path: ["liquidPressureKPa"], message });
  }
  if (input.dischargePressureKPa !== undefined && input.dischargePressureKPa <= input.suctionPressureKPa) {
    ctx.addIssue({
      code: "custom",
      path: ["dischargePressureKPa"],
      message: `Discharge pressure (${input.dischargePressureKPa} kPa) must be above suction pressure (${input.suctionPressureKPa} kPa) on a running compressor`,
    });
  }
  // Wet bulb can never exceed dry bulb (psychrometric definition); allow sensor noise.
  if (
    input.returnAirWetBulbC !== undefined &&
    input.returnAirDryBulbC !== undefined &&
    input.returnAirWetBulbC > input.returnAirDryBulbC + WET_BULB_ABOVE_DRY_BULB_TOLERANCE_K
  ) {
    ctx.addIssue({
      code: "custom",
      path: ["returnAirWetBulbC"],
      message: `Return air wet bulb (${input.returnAirWetBulbC} °C) cannot be above its dry bulb (${input.returnAirDryBulbC} °C): check the probes`,
    });
  }
  // Relative humidity alone says nothing about wet bulb: it needs the dry bulb it was read at.
  if (input.returnAirRelativeHumidity !== undefined && input.returnAirDryBulbC === undefined) {
    ctx.addIssue({
      code: "custom",
      path: ["returnAirDryBulbC"],
      message: "Enter the return air dry bulb too: relative humidity needs it to give a wet bulb",
    });
  }
});
export type DiagnosisInput = z.infer<typeof DiagnosisInputSchema>;
/** What callers pass in (before defaults); same as `DiagnosisInput` since no field transforms. */
export type DiagnosisInputDraft = z.input<typeof DiagnosisInputSchema>;

// ---------------------------------------------------------------------------------------------
// Result
// ---------------------------------------------------------------------------------------------

export const TARGET_BASES = ["nameplate", "formula", "common-practice"] as const;
/** Where the application the bands come from was found. */
export const APPLICATION_BASES = ["equipment", "inferred-from-return-air", "default"] as const;

/** A band a measured superheat or subcooling is judged against, K. */
export const TargetBandSchema = z.object({
  /** Nominal target, K (mid-band for a common-practice band). */
  targetK: z.number(),
  lowK: z.number(),
  highK: z.number(),
  basis: z.enum(TARGET_BASES),
  /** Why this band: rule, tolerance and source tags. */
  source: z.string(),
});
export type TargetBand = z.infer<typeof TargetBandSchema>;

/** "summary": the verdict's signature in words (first line, no evidence of its own). */
export const FINDING_DIRECTIONS = ["low", "normal", "high", "excluded", "not-judged", "summary"] as const;

export const EvidenceSchema = z.object({
  state: ChargeStateSchema.exclude(["insufficient-data"]),
  /** Positive supports the state, negative speaks against it; one rule gives at most ±1.5. */
  weight: z.number(),
});
export type Evidence = z.infer<typeof EvidenceSchema>;

export const FindingSchema = z.object({
  /** Id of the rule that produced it (see the rule registry). */
  ruleId: z.string(),
  /** Result field the finding is about, e.g. "superheatK". */
  reading: z.string(),
  value: z.number(),
  unit: z.string(),
  direction: z.enum(FINDING_DIRECTIONS),
  /** States this reading points to (positive) and away from (negative), in the rule's order. */
  pointsTo: z.array(EvidenceSchema),
  /** One sentence for the technician. */
  message: z.string(),
  /** Source tag(s) with title, or "common practice" / "memory". */
  source: z.string(),
});
export type Finding = z.infer<typeof FindingSchema>;

export const WARNING_CODES = [
  "subcooling-on-discharge-line",
  "suction-below-saturation",
  "liquid-above-saturation",
  "discharge-below-saturation",
  "liquid-colder-than-outdoor-air",
  "discharge-temperature-high",
  "low-superheat-floodback",
  "short-run-time",
  "outside-table",
  "fixed-orifice-target-unavailable",
  "no-current-rating",
  "compression-ratio-high",
  "supply-warmer-than-return",
  "suction-inside-glide",
  "suction-pressure-very-low",
  "transcritical-gas-cooler",
  "application-assumed",
  "application-mismatch",
  "low-discharge-superheat",
  "judged-without-charge-signal",
  "charge-estimate-beside-other-fault",
] as const;
export const WarningCodeSchema = z.enum(WARNING_CODES);
export type WarningCode = z.infer<typeof WarningCodeSchema>;

export const DiagnosisWarningSchema = z.object({
  code: WarningCodeSchema,
  /** "invalid-data": a value was not used; "danger": risk to plant; "caution": read with care. */
  severity: z.enum(["caution", "invalid-data", "danger"]),
  /** Input field the warning is about, when there is one. */
  field: z.string().optional(),
  message: z.string(),
  source: z.string(),
});
export type DiagnosisWarning = z.infer<typeof DiagnosisWarningSchema>;

export const RankedStateSchema = z.object({
  state: ChargeStateSchema.exclude(["insufficient-data"]),
  /** 0–1; from this state's own evidence only (1 − e^(−score)). */
  confidence: z.number().min(0).max(1),
  /** Net evidence score: sum of finding weights for this state, floored at 0. */
  score: z.number().min(0),
});
export type RankedState = z.infer<typeof RankedStateSchema>;

const nullableNumber = z.number().nullable();

/** A reading left out of the verdict, with the reason in words. */
export const LeftOutReadingSchema = z.object({ field: z.string(), reason: z.string() });
export type LeftOutReading = z.infer<typeof LeftOutReadingSchema>;

export const DiagnosisResultSchema = z.object({
  refrigerant: z.string(),
  meteringDevice: MeteringDeviceSchema,
  /** The application whose bands were used, and where it came from. */
  application: ApplicationSchema,
  applicationBasis: z.enum(APPLICATION_BASES),
  /** Atmospheric pressure used to turn gauge readings into absolute, kPa abs. */
  atmosphericPressureKPa: z.number(),
  /**
   * Where superheat was measured (null: not stated, so each target is read at its own reference
   * point: TXV/EEV bands at the evaporator outlet, fixed-device charts at the outdoor unit), and
   * the line-set allowance that moved the superheat band for it, K (0 when none).
   */
  suctionTempLocation: SuctionTempLocationSchema.nullable(),
  suctionLineAllowanceK: z.number(),
  /** Dew point at the suction pressure, °C. */
  evaporatingTempC: nullableNumber,
  /** Bubble point at the suction pressure, °C (equals the dew point for pure fluids). */
  evaporatingBubbleTempC: nullableNumber,
  /** Bubble point at the liquid pressure, °C. */
  condensingTempC: nullableNumber,
  /** Dew point at the liquid pressure, °C. */
  condensingDewTempC: nullableNumber,
  /** Glide at the suction pressure (dew − bubble), K; 0 for pure fluids and azeotropes. */
  glideK: nullableNumber,
  /** Glide at the liquid pressure, K. */
  condenserGlideK: nullableNumber,
  superheatK: nullableNumber,
  /** Null when not valid (e.g. temperature taken on the discharge line). */
  subcoolingK: nullableNumber,
  targets: z.object({
    superheat: TargetBandSchema.nullable(),
    subcooling: TargetBandSchema.nullable(),
    /** Expected return − supply split: from the return dry and wet bulb, or the application's band. */
    temperatureSplit: TargetBandSchema.nullable(),
    /** Expected liquid line − outdoor air: condensing over ambient minus the subcooling target. */
    condenserApproach: TargetBandSchema,
  }),
  /** Return air wet bulb used, °C, and where it came from. */
  returnAirWetBulbC: nullableNumber,
  wetBulbBasis: z.enum(["measured", "from-relative-humidity"]).nullable(),
  /** Return air dry bulb − supply air dry bulb, K. */
  temperatureSplitK: nullableNumber,
  /** Liquid line temperature − outdoor air dry bulb, K. */
  condenserApproachK: nullableNumber,
  /** Mean (mid-glide) condensing temperature − outdoor air dry bulb, K. */
  condensingOverAmbientK: nullableNumber,
  /** Return (room, entering fluid) temperature − mean (mid-glide) evaporating temperature, K. */
  evaporatorTemperatureDifferenceK: nullableNumber,
  /** Discharge line temperature − dew point at the discharge (or liquid) pressure, K. */
  dischargeSuperheatK: nullableNumber,
  /** Discharge line temperatures for this refrigerant and application, °C. */
  dischargeLineLimits: z.object({ elevatedC: z.number(), limitC: z.number(), source: z.string() }),
  /** Absolute discharge (or liquid, see basis) pressure ÷ absolute suction pressure. */
  compressionRatio: nullableNumber,
  compressionRatioBasis: z.enum(["discharge", "liquid"]).nullable(),
  /** Compressor running current ÷ RLA. */
  compressorCurrentRatio: nullableNumber,
  chargeState: ChargeStateSchema,
  /** Confidence of `chargeState` (0 for insufficient-data). */
  confidence: z.number().min(0).max(1),
  /** Other states with evidence, most likely first. */
  alternatives: z.array(RankedStateSchema),
  /** Readings measured but left out of the verdict (impossible where taken, outside the table…). */
  readingsLeftOut: z.array(LeftOutReadingSchema),
  /** How far the charge is from the correct charge, kg (negative: short); null with `chargeDeviationNote` when the readings cannot support it. */
  chargeDeviation: ChargeDeviationSchema.nullable(),
  chargeDeviationNote: z.string().nullable(),
  findings: z.array(FindingSchema),
  warnings: z.array(DiagnosisWarningSchema),
});
export type DiagnosisResult = z.infer<typeof DiagnosisResultSchema>;

// ---------------------------------------------------------------------------------------------
// Trend (run log of one circuit)
// ---------------------------------------------------------------------------------------------

export const TrendReadingSchema = z.object({
  /** When the reading was taken, ISO 8601 date-time with offset. */
  takenAt: z.iso.datetime({ offset: true, error: "Reading time must be an ISO date-time" }),
  input: DiagnosisInputSchema,
  /** Set when the technician adjusted the system (charge, fan, valve) just before this reading. */
  adjustment: z.string().trim().min(1).optional(),
  /**
   * The diagnosis stored with the reading when it was saved (the server's own `diagnose()`
   * output): the trend reads it instead of diagnosing again. Trusted, not re-validated.
   */
  result: z
    .custom<DiagnosisResult>(
      (value) => typeof value === "object" && value !== null && "chargeState" in value,
      "A stored result must be a diagnosis",
    )
    .optional(),
});
export type TrendReading = z.infer<typeof TrendReadingSchema>;

export const TrendInputSchema = z
  .array(TrendReadingSchema)
  .min(1, "A trend needs at least one reading")
  .superRefine((series, ctx) => {
    let previous = Number.NEGATIVE_INFINITY;
    series.forEach((reading, index) => {
      const at = Date.parse(reading.takenAt);
      if (at <= previous) {
        ctx.addIssue({
          code: "custom",
          path: [index, "takenAt"],
          message: "Readings must be in time order, each later than the one before",
        });
      }
      previous = at;
    });
  });

const RateSchema = z.object({
  superheatKPerMin: nullableNumber,
  subcoolingKPerMin: nullableNumber,
});

export const TrendResultSchema = z.object({
  settled: z.boolean(),
  /** Why settled or not, in words. */
  reason: z.string(),
  /** The criterion applied. */
  criterion: z.object({
    windowMinutes: z.number(),
    maxChangeK: z.number(),
    maxRateKPerMin: z.number(),
    minRunMinutes: z.number(),
    source: z.string(),
  }),
  /** Least-squares slope over the last window (or the readings since the last adjustment), K/min. */
  rate: RateSchema,
  /** Largest − smallest value over the last window, K. */
  changeOverWindow: z.object({ superheatK: nullableNumber, subcoolingK: nullableNumber }),
  /** Minutes from the first reading (or last adjustment) to the last reading. */
  minutesObserved: z.number(),
  /** The most recent reading at which the circuit was settled, with its diagnosis. */
  lastSettled: z.object({ index: z.number().int(), takenAt: z.string(), result: DiagnosisResultSchema }).nullable(),
  /** Diagnosis of the latest reading (settled or not). */
  latest: DiagnosisResultSchema,
});
export type TrendResult = z.infer<typeof TrendResultSchema>;
