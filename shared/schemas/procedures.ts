/**
 * Procedure checks contract (issue 8): electrical checks, nitrogen pressure test, evacuation and
 * decay test, refrigerant balance and cylinder fill, leak rate, weighed-in charge. The server
 * validates request bodies with these, forms validate with the same schemas, and the engine
 * functions in shared/engine/procedures take the parsed values.
 *
 * Units (PRODUCT.md "Units"): pressures kPa **gauge** unless a name says Abs, vacuum in microns
 * (µmHg), temperatures °C, voltages V, currents A, resistances Ω, insulation MΩ, masses kg.
 */
import { z } from "zod";
import {
  CHARGE_LIMITS,
  CYLINDER_FILL_LIMITS,
  EVACUATION_LIMITS,
  INSULATION_LIMITS,
  PRESSURE_HOLD_LIMITS,
  RUNNING_CURRENT_LIMITS,
  SINGLE_PHASE_WINDING_LIMITS,
  SUPPLY_VOLTAGE_LIMITS,
  TEST_PRESSURE_LIMITS,
  VOLTAGE_IMBALANCE_LIMITS,
  WINDING_BALANCE_LIMITS,
} from "../engine/procedures/procedure-limits.ts";
import {
  MAX_ATMOSPHERIC_PRESSURE_KPA,
  MAX_CURRENT_A,
  MAX_GAUGE_PRESSURE_KPA,
  MIN_ATMOSPHERIC_PRESSURE_KPA,
} from "./diagnosis.ts";
import { dayOrInstant } from "./dates.ts";

// ---------------------------------------------------------------------------------------------
// Verdicts
// ---------------------------------------------------------------------------------------------

export const VERDICTS = ["pass", "warn", "fail"] as const;
export const VerdictLevelSchema = z.enum(VERDICTS);
export type VerdictLevel = z.infer<typeof VerdictLevelSchema>;

/**
 * Every judged check answers with a verdict, one sentence for the technician and the source of
 * the limit (trade source tag and title, "common practice" or "memory", and a note when the
 * organisation set its own limit).
 */
export const VerdictSchema = z.object({
  verdict: VerdictLevelSchema,
  reason: z.string(),
  source: z.string(),
});
export type Verdict = z.infer<typeof VerdictSchema>;

export const DECAY_VERDICTS = ["held", "moisture", "leak"] as const;
export const DecayVerdictSchema = z.enum(DECAY_VERDICTS);
export type DecayVerdict = z.infer<typeof DecayVerdictSchema>;

// ---------------------------------------------------------------------------------------------
// Plausible ranges (named so that forms, tests and the engine share them)
// ---------------------------------------------------------------------------------------------

/** Highest supply voltage accepted, V: covers 11 kV chiller motors. */
export const MAX_SUPPLY_VOLTAGE_V = 15_000;
/** Highest insulation tester voltage accepted, V d.c. (5000 V testers exist for > 600 V motors [S50]). */
export const MAX_TEST_VOLTAGE_V = 10_000;
/** Highest insulation reading accepted, MΩ (testers top out at tens of GΩ). */
export const MAX_INSULATION_MEGOHMS = 100_000;
/** Highest winding resistance accepted, Ω. */
export const MAX_WINDING_OHMS = 10_000;
/** Vacuum gauge range: a perfect vacuum up to one standard atmosphere, microns (760 000 µm = 101.325 kPa). */
export const MAX_MICRONS = 760_000;
/** Highest refrigerant mass accepted in one entry, kg. */
export const MAX_REFRIGERANT_KG = 100_000;
/** Largest cylinder water capacity accepted, kg (ton containers hold about 1 t of water). */
export const MAX_WATER_CAPACITY_KG = 2_000;
/** Plausible ambient or pipe temperatures during a pressure test or at a cylinder, °C. */
export const MIN_AMBIENT_TEMPERATURE_C = -50;
export const MAX_AMBIENT_TEMPERATURE_C = 70;

// ---------------------------------------------------------------------------------------------
// Field helpers
// ---------------------------------------------------------------------------------------------

function number(label: string, unit: string) {
  // zod 4 numbers already refuse NaN and ±Infinity.
  return z.number({ error: `${label} must be a number in ${unit}` });
}

function nonNegative(label: string, unit: string, max: number) {
  return number(label, unit)
    .min(0, `${label} cannot be negative`)
    .max(max, `${label} above ${max} ${unit} is not plausible`);
}

function positive(label: string, unit: string, max: number) {
  return number(label, unit)
    .gt(0, `${label} must be above 0 ${unit}`)
    .max(max, `${label} above ${max} ${unit} is not plausible`);
}

function temperature(label: string) {
  return number(label, "°C")
    .min(MIN_AMBIENT_TEMPERATURE_C, `${label} below ${MIN_AMBIENT_TEMPERATURE_C} °C is not an ambient reading`)
    .max(MAX_AMBIENT_TEMPERATURE_C, `${label} above ${MAX_AMBIENT_TEMPERATURE_C} °C is not an ambient reading`);
}

function threePhase(label: string, unit: string, item: z.ZodType<number>) {
  return z.tuple([item, item, item], { error: `Enter ${label} for all three phases, in ${unit}` });
}

// ---------------------------------------------------------------------------------------------
// Electrical (trade notes §3, §9)
// ---------------------------------------------------------------------------------------------

const phaseVolts = nonNegative("Phase voltage", "V", MAX_SUPPLY_VOLTAGE_V);
const phaseAmps = nonNegative("Phase current", "A", MAX_CURRENT_A);

/** Line-to-line voltages L1–L2, L2–L3, L3–L1 (V); a lost phase may read 0 V. */
export const VoltageImbalanceInputSchema = z.object({
  volts: threePhase("the line voltage", "V", phaseVolts).refine(
    (volts) => volts.some((v) => v > 0),
    "At least one phase voltage must be above 0 V",
  ),
});
export type VoltageImbalanceInput = z.infer<typeof VoltageImbalanceInputSchema>;

/** Running current in each phase (A); a lost phase may read 0 A. */
export const CurrentImbalanceInputSchema = z.object({
  amps: threePhase("the running current", "A", phaseAmps).refine(
    (amps) => amps.some((a) => a > 0),
    "At least one phase current must be above 0 A: is the motor running?",
  ),
});
export type CurrentImbalanceInput = z.infer<typeof CurrentImbalanceInputSchema>;

/** Supply voltage per phase (one reading for single phase, three for three phase) against the nameplate. */
export const SupplyVoltageInputSchema = z.object({
  measuredV: z
    .array(phaseVolts, { error: "Enter the measured supply voltage" })
    .min(1, "Enter at least one measured supply voltage")
    .max(3, "Enter at most three phase voltages"),
  nameplateV: positive("Nameplate voltage", "V", MAX_SUPPLY_VOLTAGE_V),
});
export type SupplyVoltageInput = z.infer<typeof SupplyVoltageInputSchema>;

export const INSULATION_KINDS = ["compressor", "motor", "wiring"] as const;
export const InsulationKindSchema = z.enum(INSULATION_KINDS, {
  error: "Say what was tested: compressor, motor or wiring",
});
export type InsulationKind = z.infer<typeof InsulationKindSchema>;

/** One insulation-resistance reading to earth. Any reading is judged, none refused. */
export const InsulationResistanceInputSchema = z.object({
  megohms: nonNegative("Insulation resistance", "MΩ", MAX_INSULATION_MEGOHMS),
  testVoltageV: positive("Test voltage", "V d.c.", MAX_TEST_VOLTAGE_V),
  kind: InsulationKindSchema,
});
export type InsulationResistanceInput = z.infer<typeof InsulationResistanceInputSchema>;

/** Lead-to-lead winding resistances T1–T2, T2–T3, T3–T1 (Ω). An open winding cannot be entered as a number: record it as a fault. */
export const WindingBalanceInputSchema = z.object({
  ohms: threePhase("the winding resistance", "Ω", positive("Winding resistance", "Ω", MAX_WINDING_OHMS)),
});
export type WindingBalanceInput = z.infer<typeof WindingBalanceInputSchema>;

const terminalOhms = (pair: string) => positive(`Winding resistance ${pair}`, "Ω", MAX_WINDING_OHMS);
/**
 * A single-phase compressor's three terminal-to-terminal resistances (Ω): common to run, common
 * to start, run to start. An open winding cannot be entered as a number: record it as a fault.
 */
export const SinglePhaseWindingInputSchema = z.object(
  { commonRun: terminalOhms("C–R"), commonStart: terminalOhms("C–S"), runStart: terminalOhms("R–S") },
  { error: "Enter all three resistances C–R, C–S and R–S, in Ω" },
);
export type SinglePhaseWindingInput = z.infer<typeof SinglePhaseWindingInputSchema>;

export const RUNNING_CURRENT_KINDS = ["compressor-rla", "fan-fla"] as const;
export const RunningCurrentKindSchema = z.enum(RUNNING_CURRENT_KINDS, {
  error: "Say which nameplate current this is: compressor RLA or fan FLA",
});
export type RunningCurrentKind = z.infer<typeof RunningCurrentKindSchema>;

/** One phase's running current against the nameplate RLA (compressor) or FLA (fan). */
export const RunningCurrentInputSchema = z.object({
  amps: nonNegative("Running current", "A", MAX_CURRENT_A),
  ratedA: positive("Nameplate current", "A", MAX_CURRENT_A),
  kind: RunningCurrentKindSchema,
});
export type RunningCurrentInput = z.infer<typeof RunningCurrentInputSchema>;

/** The site's atmospheric pressure a gauge reads against, kPa absolute, within what weather and altitude allow. */
const atmosphericPressure = number("Atmospheric pressure", "kPa absolute")
  .min(
    MIN_ATMOSPHERIC_PRESSURE_KPA,
    `Atmospheric pressure below ${MIN_ATMOSPHERIC_PRESSURE_KPA} kPa is above any inhabited altitude`,
  )
  .max(
    MAX_ATMOSPHERIC_PRESSURE_KPA,
    `Atmospheric pressure above ${MAX_ATMOSPHERIC_PRESSURE_KPA} kPa is not a weather reading`,
  )
  .optional();

// ---------------------------------------------------------------------------------------------
// Nitrogen pressure test (trade notes §5)
// ---------------------------------------------------------------------------------------------

/** Start and end of a standing nitrogen test. Gauge pressures kPa; temperatures °C (ambient or pipe). */
export const PressureTestInputSchema = z.object({
  startGaugeKPa: positive("Start pressure", "kPa gauge", MAX_GAUGE_PRESSURE_KPA),
  startTempC: temperature("Start temperature"),
  endGaugeKPa: nonNegative("End pressure", "kPa gauge", MAX_GAUGE_PRESSURE_KPA),
  endTempC: temperature("End temperature"),
  allowedDropKPa: nonNegative("Allowed drop", "kPa", MAX_GAUGE_PRESSURE_KPA),
  /** Site atmospheric pressure, kPa absolute; default 101.325. */
  atmosphericPressureKPa: atmosphericPressure,
});
export type PressureTestInput = z.infer<typeof PressureTestInputSchema>;

// ---------------------------------------------------------------------------------------------
// Standing-pressure check for non-condensables (trade notes §2)
// ---------------------------------------------------------------------------------------------

/**
 * Off-cycle standing pressure of the condenser (or the whole equalised circuit) and the
 * temperature it has settled to: the unit is off, the condenser fan has run until the air
 * leaving equals the air entering.
 */
export const StandingPressureInputSchema = z.object({
  refrigerant: z.string({ error: "Choose the refrigerant" }).trim().min(1, "Choose the refrigerant"),
  standingGaugeKPa: number("Standing pressure", "kPa gauge").max(
    MAX_GAUGE_PRESSURE_KPA,
    `Standing pressure above ${MAX_GAUGE_PRESSURE_KPA} kPa gauge is beyond any refrigeration gauge`,
  ),
  equalisedTempC: temperature("Equalised temperature"),
  /** Site atmospheric pressure, kPa absolute; default 101.325. */
  atmosphericPressureKPa: atmosphericPressure,
});
export type StandingPressureInput = z.infer<typeof StandingPressureInputSchema>;

export const StandingPressureResultSchema = VerdictSchema.extend({
  /** Saturation pressure at the equalised temperature, kPa gauge (bubble point for blends). */
  expectedGaugeKPa: z.number(),
  /** Dew-point pressure at that temperature, kPa gauge (equal to the expected one for pure fluids). */
  dewGaugeKPa: z.number(),
  /** Standing pressure − expected pressure, kPa. */
  excessKPa: z.number(),
  /** Saturation temperature at the standing pressure (bubble point for blends) − equalised temperature, K. */
  excessK: z.number(),
  /** True when the refrigerant is a zeotropic blend (the comparison shows less, see `reason`). */
  zeotrope: z.boolean(),
});
export type StandingPressureResult = z.infer<typeof StandingPressureResultSchema>;

/** Test pressure against the rated pressure (PS) of the lowest-rated component, both kPa gauge. */
export const TestPressureInputSchema = z.object({
  testGaugeKPa: positive("Test pressure", "kPa gauge", MAX_GAUGE_PRESSURE_KPA),
  ratedKPa: positive("Rated pressure of the lowest-rated component", "kPa gauge", MAX_GAUGE_PRESSURE_KPA),
});
export type TestPressureInput = z.infer<typeof TestPressureInputSchema>;

// ---------------------------------------------------------------------------------------------
// Evacuation (trade notes §4)
// ---------------------------------------------------------------------------------------------

/** One timed vacuum reading: minutes from the start of the series, microns (µmHg) absolute. */
export const VacuumSampleSchema = z.object({
  minutes: nonNegative("Reading time", "minutes", Number.MAX_SAFE_INTEGER),
  microns: nonNegative("Vacuum reading", "microns", MAX_MICRONS),
});
export type VacuumSample = z.infer<typeof VacuumSampleSchema>;

/** Readings in time order (strictly increasing minutes); at least one for a pull-down. */
export const VacuumSamplesSchema = z
  .array(VacuumSampleSchema, { error: "Enter the vacuum readings" })
  .min(1, "Enter at least one vacuum reading")
  .superRefine((samples, ctx) => {
    // Rates need time to move forward; a repeated or earlier time is a typing error.
    let previous = Number.NEGATIVE_INFINITY;
    samples.forEach((sample, index) => {
      if (sample.minutes <= previous) {
        ctx.addIssue({
          code: "custom",
          path: [index, "minutes"],
          message: "Each reading must be later than the one before it",
        });
      }
      previous = sample.minutes;
    });
  });

/** Decay test readings, taken after the pump is valved off: at least two (start and end). */
export const DecaySamplesSchema = VacuumSamplesSchema.refine(
  (samples) => samples.length >= 2,
  "Enter at least two readings after valving off the pump: the first and the last",
);

export const DecayOptionsSchema = z.object({
  /** Evacuation target, microns; default 500 [S4]. */
  targetMicrons: positive("Target vacuum", "microns", MAX_MICRONS).optional(),
  /** Hold limit after valving off, microns; default the target [S52][S53]. */
  holdMicrons: positive("Hold limit", "microns", MAX_MICRONS).optional(),
  /** Above this the rise is a leak, microns; default 5000 [S54]. */
  leakRiseMicrons: positive("Leak threshold", "microns", MAX_MICRONS).optional(),
  /** Later-half rise rate at most this fraction of the earlier-half rate counts as levelled; default 0.25. */
  levelledRatio: number("Levelling ratio", "a fraction")
    .min(0, "Levelling ratio cannot be negative")
    .max(1, "Levelling ratio cannot exceed 1")
    .optional(),
  /** A later-half rise no faster than this counts as level, microns per minute; default 2. */
  flatRiseMicronsPerMinute: nonNegative("Flat rise rate", "microns per minute", MAX_MICRONS).optional(),
});
export type DecayOptions = z.infer<typeof DecayOptionsSchema>;

/** Request body for a decay analysis. */
export const DecayTestInputSchema = z.object({
  samples: DecaySamplesSchema,
  options: DecayOptionsSchema.optional(),
});
export type DecayTestInput = z.infer<typeof DecayTestInputSchema>;

/** Request body for a pull-down check. */
export const EvacuationInputSchema = z.object({
  samples: VacuumSamplesSchema,
  targetMicrons: positive("Target vacuum", "microns", MAX_MICRONS).optional(),
});
export type EvacuationInput = z.infer<typeof EvacuationInputSchema>;

// ---------------------------------------------------------------------------------------------
// Refrigerant (trade notes §6, §8)
// ---------------------------------------------------------------------------------------------

const kilograms = (label: string) => nonNegative(label, "kg", MAX_REFRIGERANT_KG);

/**
 * One visit's refrigerant movements on a circuit that was recovered (emptied) and recharged.
 * `reusedKg` is the part of the recovered refrigerant put back; it cannot exceed what was recovered.
 */
export const RefrigerantBalanceInputSchema = z
  .object({
    nameplateKg: positive("Nameplate charge", "kg", MAX_REFRIGERANT_KG),
    recoveredKg: kilograms("Recovered refrigerant"),
    addedKg: kilograms("Added refrigerant"),
    reusedKg: kilograms("Reused refrigerant").optional(),
  })
  .refine((input) => (input.reusedKg ?? 0) <= input.recoveredKg, {
    path: ["reusedKg"],
    message: "Reused refrigerant cannot be more than was recovered",
  });
export type RefrigerantBalanceInput = z.infer<typeof RefrigerantBalanceInputSchema>;

/** A recovery cylinder's fill limit: water capacity (WC, kg of water, stamped on the cylinder) and its refrigerant. */
export const CylinderFillLimitInputSchema = z.object({
  waterCapacityKg: positive("Water capacity", "kg", MAX_WATER_CAPACITY_KG),
  refrigerant: z.string({ error: "Choose the refrigerant" }).trim().min(1, "Choose the refrigerant"),
  /** Hottest temperature the cylinder may see, °C; default 54 °C [S79]. */
  referenceTempC: temperature("Reference temperature").optional(),
});
export type CylinderFillLimitInput = z.infer<typeof CylinderFillLimitInputSchema>;

export const CylinderFillInputSchema = z.object({
  contentsKg: kilograms("Cylinder contents"),
  maxContentsKg: positive("Cylinder fill limit", "kg", MAX_REFRIGERANT_KG),
});
export type CylinderFillInput = z.infer<typeof CylinderFillInputSchema>;

/** A calendar date (YYYY-MM-DD) or an ISO 8601 timestamp with offset. */
const EventDateSchema = dayOrInstant("Enter the date as YYYY-MM-DD");

/** One addition of refrigerant to a piece of equipment (a top-up after a leak). */
export const LeakEventSchema = z.object({
  date: EventDateSchema,
  addedKg: kilograms("Added refrigerant"),
});
export type LeakEvent = z.infer<typeof LeakEventSchema>;

export const AnnualLeakRateInputSchema = z.object({
  events: z
    .array(LeakEventSchema, { error: "Enter the refrigerant additions" })
    .min(1, "Enter at least one refrigerant addition"),
  nameplateKg: positive("Nameplate charge", "kg", MAX_REFRIGERANT_KG),
  /** Length of the period the events cover, days; without it the period runs from the first to the last event. */
  periodDays: positive("Period", "days", 100 * 365).optional(),
});
export type AnnualLeakRateInput = z.infer<typeof AnnualLeakRateInputSchema>;

// ---------------------------------------------------------------------------------------------
// Charging (trade notes §6)
// ---------------------------------------------------------------------------------------------

export const ChargeAgainstNameplateInputSchema = z.object({
  nameplateKg: positive("Nameplate charge", "kg", MAX_REFRIGERANT_KG),
  weighedInKg: kilograms("Weighed-in charge"),
  /** Added (+) or removed (−) for line length beyond (or short of) the factory length, kg. */
  lineAdjustmentKg: number("Line-length adjustment", "kg").min(-MAX_REFRIGERANT_KG).max(MAX_REFRIGERANT_KG).optional(),
});
export type ChargeAgainstNameplateInput = z.infer<typeof ChargeAgainstNameplateInputSchema>;

// ---------------------------------------------------------------------------------------------
// Organisation limit overrides (each group optional, each figure optional)
// ---------------------------------------------------------------------------------------------

function overrides<T extends Record<string, number>>(defaults: T) {
  const shape = Object.fromEntries(
    Object.keys(defaults).map((key) => [
      key,
      z
        .number({ error: `${key} must be a number` })
        .min(0, `${key} cannot be negative`)
        .optional(),
    ]),
  ) as { [K in keyof T]: z.ZodOptional<z.ZodNumber> };
  return z.object(shape).strict();
}

/** Limits an organisation may set instead of the defaults of shared/engine/procedures/procedure-limits.ts. */
export const ProcedureLimitsSchema = z.object({
  voltageImbalance: overrides(VOLTAGE_IMBALANCE_LIMITS).optional(),
  supplyVoltage: overrides(SUPPLY_VOLTAGE_LIMITS).optional(),
  insulation: overrides(INSULATION_LIMITS).optional(),
  windingBalance: overrides(WINDING_BALANCE_LIMITS).optional(),
  singlePhaseWindings: overrides(SINGLE_PHASE_WINDING_LIMITS).optional(),
  runningCurrent: overrides(RUNNING_CURRENT_LIMITS).optional(),
  testPressure: overrides(TEST_PRESSURE_LIMITS).optional(),
  pressureHold: overrides(PRESSURE_HOLD_LIMITS).optional(),
  evacuation: overrides(EVACUATION_LIMITS).optional(),
  cylinderFill: overrides(CYLINDER_FILL_LIMITS).optional(),
  charge: overrides(CHARGE_LIMITS).optional(),
});
export type ProcedureLimits = z.infer<typeof ProcedureLimitsSchema>;

// ---------------------------------------------------------------------------------------------
// Results (what the engine returns; stored and shown in the report)
// ---------------------------------------------------------------------------------------------

export const SupplyVoltageResultSchema = VerdictSchema.extend({ deviationPercent: z.array(z.number()) });
export type SupplyVoltageResult = z.infer<typeof SupplyVoltageResultSchema>;

export const InsulationResistanceResultSchema = VerdictSchema.extend({ minimumMegohms: z.number() });
export type InsulationResistanceResult = z.infer<typeof InsulationResistanceResultSchema>;

export const WindingBalanceResultSchema = VerdictSchema.extend({ maxDeviationPercent: z.number() });
export type WindingBalanceResult = z.infer<typeof WindingBalanceResultSchema>;

export const SinglePhaseWindingResultSchema = VerdictSchema.extend({
  /** C–R + C–S, Ω: what R–S should read. */
  expectedRunStartOhms: z.number(),
  /** |R–S − (C–R + C–S)| as percent of R–S. */
  sumMismatchPercent: z.number(),
  /** True when C–S reads higher than C–R, as a start winding should. */
  startAboveRun: z.boolean(),
});
export type SinglePhaseWindingResult = z.infer<typeof SinglePhaseWindingResultSchema>;

export const RunningCurrentResultSchema = VerdictSchema.extend({ percentOfRated: z.number() });
export type RunningCurrentResult = z.infer<typeof RunningCurrentResultSchema>;

export const PressureTestResultSchema = z.object({
  expectedEndGaugeKPa: z.number(),
  correctedDropKPa: z.number(),
  pass: z.boolean(),
  /** Drop read on the gauge (start − end), kPa, before the temperature correction. */
  gaugeDropKPa: z.number(),
  /** Pressure change per kelvin at the start conditions, kPa/K. */
  sensitivityKPaPerK: z.number(),
  verdict: z.enum(["pass", "fail"]),
  reason: z.string(),
  source: z.string(),
});
export type PressureTestResult = z.infer<typeof PressureTestResultSchema>;

/** Units a vacuum is read in: microns (µmHg, stored) or pascals absolute. */
export const VACUUM_UNITS = ["micron", "Pa"] as const;
export type VacuumUnit = (typeof VACUUM_UNITS)[number];

export const DECAY_CASES = [
  "held",
  "leak-past-threshold",
  "moisture-never-reached",
  "moisture-rose",
  "moisture-stayed-above",
  "leak-still-rising",
] as const;

/**
 * The figures a decay verdict's sentence is built from, so it can be worded again in the unit
 * the technician reads (describeDecay). Records saved before it existed lack it and keep their
 * stored sentence, in microns.
 */
export const DecayWordingSchema = z.object({
  case: z.enum(DECAY_CASES),
  holdMicrons: z.number(),
  leakRiseMicrons: z.number(),
  startMicrons: z.number(),
  finalMicrons: z.number(),
  riseRateMicronsPerMinute: z.number(),
  minutes: z.number(),
  /** The peak was above the first reading. */
  risen: z.boolean(),
  /** Only two readings: no levelling-off can be seen. */
  twoReadingsOnly: z.boolean(),
  /** Shortest hold makers ask for, minutes, when the test was shorter; null otherwise. */
  shortOfMinutes: z.number().nullable(),
});
export type DecayWording = z.infer<typeof DecayWordingSchema>;

export const DecayAnalysisSchema = z.object({
  verdict: DecayVerdictSchema,
  riseRateMicronsPerMinute: z.number(),
  finalMicrons: z.number(),
  levelledOff: z.boolean(),
  reason: z.string(),
  source: z.string(),
  wording: DecayWordingSchema.optional(),
});
export type DecayAnalysis = z.infer<typeof DecayAnalysisSchema>;

export const EvacuationReachedSchema = z.object({ reached: z.boolean(), atMinutes: z.number().nullable() });
export type EvacuationReached = z.infer<typeof EvacuationReachedSchema>;

export const RefrigerantBalanceSchema = z.object({
  shortfallKg: z.number(),
  finalChargeKg: z.number(),
  differenceFromNameplateKg: z.number(),
});
export type RefrigerantBalance = z.infer<typeof RefrigerantBalanceSchema>;

export const CylinderFillLimitSchema = z.object({
  maxContentsKg: z.number(),
  liquidDensityKgPerL: z.number(),
  referenceTempC: z.number(),
});
export type CylinderFillLimit = z.infer<typeof CylinderFillLimitSchema>;

export const AnnualLeakRateSchema = z.object({
  kgPerYear: z.number(),
  percentOfChargePerYear: z.number(),
  periodDays: z.number(),
});
export type AnnualLeakRate = z.infer<typeof AnnualLeakRateSchema>;

export const ChargeAgainstNameplateResultSchema = VerdictSchema.extend({
  differenceKg: z.number(),
  percent: z.number(),
  expectedKg: z.number(),
});
export type ChargeAgainstNameplateResult = z.infer<typeof ChargeAgainstNameplateResultSchema>;
