/**
 * A visit's procedure records: the contracts of /api/visits/:id/electrical-checks,
 * /leak-searches, /standing-pressure-checks, /pressure-tests and /evacuations. Each record keeps what the technician
 * entered (SI-metric: V, A, Ω, MΩ, kPa gauge, °C, microns) and the result the server computed
 * from it with the procedures engine, recomputed on every save. The single-check inputs and
 * the engine's result shapes come from ./procedures.ts; this file composes them into records.
 */
import { z } from "zod";
import { PRESSURE_HOLD_LIMITS } from "../engine/procedures/procedure-limits.ts";
import { MAX_GAUGE_PRESSURE_KPA } from "./diagnosis.ts";
import { MAX_CIRCUITS } from "./equipment.ts";
import {
  DecayAnalysisSchema,
  EvacuationReachedSchema,
  InsulationResistanceInputSchema,
  InsulationResistanceResultSchema,
  PressureTestInputSchema,
  ProcedureLimitsSchema,
  PressureTestResultSchema,
  RunningCurrentInputSchema,
  RunningCurrentResultSchema,
  SinglePhaseWindingInputSchema,
  SinglePhaseWindingResultSchema,
  StandingPressureInputSchema,
  StandingPressureResultSchema,
  SupplyVoltageInputSchema,
  SupplyVoltageResultSchema,
  VacuumSampleSchema,
  VacuumSamplesSchema,
  VerdictSchema,
  WindingBalanceInputSchema,
  WindingBalanceResultSchema,
} from "./procedures.ts";
import { PersonRefSchema, unknownFieldsMessage, VoidInfoSchema } from "./visits.ts";
import { text } from "./text.ts";
import { deviceTime, optionalClientId } from "./device-entries.ts";

export const MAX_NOTE_LENGTH = 500;
const NoteSchema = text({ multiline: true })
  .max(MAX_NOTE_LENGTH, `Keep notes under ${MAX_NOTE_LENGTH} characters`)
  .optional();
const CircuitSchema = z.number().int("Circuits are numbered 1, 2, 3…").min(1).max(MAX_CIRCUITS).optional().nullable();

/** The verdict of a whole record: the worst of its checks, with that check's reason and source. */
export const OverallVerdictSchema = VerdictSchema.extend({ check: z.string() });
export type OverallVerdict = z.infer<typeof OverallVerdictSchema>;

// ---------------------------------------------------------------------------------------------
// Electrical checks
// ---------------------------------------------------------------------------------------------

export const ELECTRICAL_TARGETS = ["compressor", "fan", "supply"] as const;
export const ElectricalTargetSchema = z.enum(ELECTRICAL_TARGETS, {
  error: "Choose what was checked: compressor, fan or supply",
});
export type ElectricalTarget = z.infer<typeof ElectricalTargetSchema>;
export const ELECTRICAL_TARGET_LABELS: Record<ElectricalTarget, string> = {
  compressor: "Compressor",
  fan: "Fan motor",
  supply: "Supply",
};

/** One insulation reading to earth, named by the point tested (e.g. "C to earth"). */
export const InsulationReadingSchema = InsulationResistanceInputSchema.omit({ kind: true }).extend({
  point: text().max(60, "Name the point in under 60 characters").optional(),
});

/**
 * Body of POST /api/visits/:id/electrical-checks. Every group is optional, but at least one is
 * needed. The nameplate voltage and the rated current default to the equipment's nameplate.
 */
export const ElectricalCheckBodySchema = z
  .object({
    target: ElectricalTargetSchema,
    circuit: CircuitSchema,
    supplyVolts: SupplyVoltageInputSchema.shape.measuredV.optional(),
    nameplateV: SupplyVoltageInputSchema.shape.nameplateV.optional(),
    insulation: z.array(InsulationReadingSchema).max(6, "Record at most six insulation readings per check").optional(),
    windingOhms: WindingBalanceInputSchema.shape.ohms.optional(),
    /** A single-phase compressor's terminals C–R, C–S, R–S (instead of three-phase T1–T2…). */
    singlePhaseWindingOhms: SinglePhaseWindingInputSchema.optional(),
    runningAmps: z
      .array(RunningCurrentInputSchema.shape.amps)
      .min(1)
      .max(3, "Enter at most three phase currents")
      .optional(),
    ratedA: RunningCurrentInputSchema.shape.ratedA.optional(),
    note: NoteSchema,
    clientId: optionalClientId,
    takenAt: deviceTime("takenAt"),
  })
  // A record with nothing measured says nothing; ask for at least one reading.
  .refine(
    (body) =>
      Boolean(
        body.supplyVolts?.length ||
        body.insulation?.length ||
        body.windingOhms ||
        body.singlePhaseWindingOhms ||
        body.runningAmps?.length,
      ),
    {
      path: ["supplyVolts"],
      message: "Enter at least one measurement: supply voltage, insulation, winding resistance or running current",
    },
  )
  // The supply has no windings or running current of its own.
  .refine(
    (body) =>
      body.target !== "supply" || (!body.windingOhms && !body.singlePhaseWindingOhms && !body.runningAmps?.length),
    {
      path: ["target"],
      message: "Winding resistance and running current belong to a compressor or fan check",
    },
  )
  // C, R and S are a compressor's terminals; one motor has either three-phase or single-phase windings.
  .refine((body) => !body.singlePhaseWindingOhms || (body.target === "compressor" && !body.windingOhms), {
    path: ["singlePhaseWindingOhms"],
    message: "C–R, C–S and R–S belong to a single-phase compressor, not alongside three-phase windings",
  });
export type ElectricalCheckBody = z.input<typeof ElectricalCheckBodySchema>;

/** What the server stores as input: the body with the nameplate defaults filled in. */
export const ElectricalCheckInputSchema = z.object({
  target: ElectricalTargetSchema,
  circuit: z.number().int().nullable(),
  supplyVolts: z.array(z.number()).nullable(),
  nameplateV: z.number().nullable(),
  insulation: z.array(z.object({ megohms: z.number(), testVoltageV: z.number(), point: z.string().optional() })),
  windingOhms: z.tuple([z.number(), z.number(), z.number()]).nullable(),
  /** Absent on checks saved before single-phase windings were recorded. */
  singlePhaseWindingOhms: z
    .object({ commonRun: z.number(), commonStart: z.number(), runStart: z.number() })
    .nullable()
    .optional(),
  runningAmps: z.array(z.number()).nullable(),
  ratedA: z.number().nullable(),
  note: z.string().nullable(),
});
export type ElectricalCheckInput = z.infer<typeof ElectricalCheckInputSchema>;

export const ElectricalCheckResultSchema = z.object({
  voltageImbalancePercent: z.number().nullable(),
  voltageImbalance: VerdictSchema.nullable(),
  supplyVoltage: SupplyVoltageResultSchema.nullable(),
  insulation: z.array(InsulationResistanceResultSchema.extend({ point: z.string().optional() })),
  windingBalance: WindingBalanceResultSchema.nullable(),
  /** Absent on checks saved before single-phase windings were recorded. */
  singlePhaseWindings: SinglePhaseWindingResultSchema.nullable().optional(),
  runningCurrent: z.array(RunningCurrentResultSchema),
  currentImbalancePercent: z.number().nullable(),
  overall: OverallVerdictSchema,
});
export type ElectricalCheckResult = z.infer<typeof ElectricalCheckResultSchema>;

const RecordBaseSchema = z.object({
  id: z.uuid(),
  visitId: z.uuid(),
  takenAt: z.string(),
  recordedBy: PersonRefSchema.nullable(),
  /** A voided record stays listed, struck through, and is left out of the report. */
  voided: VoidInfoSchema,
});

export const ElectricalCheckSchema = RecordBaseSchema.extend({
  input: ElectricalCheckInputSchema,
  result: ElectricalCheckResultSchema,
});
export type ElectricalCheck = z.infer<typeof ElectricalCheckSchema>;

// ---------------------------------------------------------------------------------------------
// Leak search
// ---------------------------------------------------------------------------------------------

export const LEAK_METHODS = [
  "electronic-detector",
  "bubble-solution",
  "nitrogen-tracer",
  "uv-dye",
  "ultrasonic",
  "standing-pressure",
] as const;
export const LeakMethodSchema = z.enum(LEAK_METHODS, { error: "Choose how you searched" });
export type LeakMethod = z.infer<typeof LeakMethodSchema>;
export const LEAK_METHOD_LABELS: Record<LeakMethod, string> = {
  "electronic-detector": "Electronic detector",
  "bubble-solution": "Bubble solution",
  "nitrogen-tracer": "Nitrogen and tracer gas",
  "uv-dye": "UV dye",
  ultrasonic: "Ultrasonic",
  "standing-pressure": "Standing pressure",
};

export const LEAK_SEVERITIES = ["trace", "small", "major"] as const;
export const LeakSeveritySchema = z.enum(LEAK_SEVERITIES, { error: "Say how bad the leak is" });
export type LeakSeverity = z.infer<typeof LeakSeveritySchema>;
export const LEAK_SEVERITY_LABELS: Record<LeakSeverity, string> = {
  trace: "Trace (detector only)",
  small: "Small (bubbles form)",
  major: "Major (audible or fast loss)",
};

export const RECHECK_RESULTS = ["not-done", "no-leak", "still-leaking"] as const;
export const RecheckResultSchema = z.enum(RECHECK_RESULTS, { error: "Say what the recheck found" });
export type RecheckResult = z.infer<typeof RecheckResultSchema>;
export const RECHECK_LABELS: Record<RecheckResult, string> = {
  "not-done": "Not rechecked yet",
  "no-leak": "No leak on recheck",
  "still-leaking": "Still leaking",
};

export const LeakFoundSchema = z.object({
  location: text({ error: "Say where the leak is" })
    .min(2, "Say where the leak is, e.g. “Schrader core, suction service valve”")
    .max(200),
  severity: LeakSeveritySchema,
  repair: text().max(200).optional(),
  repaired: z.boolean().default(false),
});
export type LeakFound = z.infer<typeof LeakFoundSchema>;

/** Body of POST /api/visits/:id/leak-searches. */
export const LeakSearchBodySchema = z
  .object({
    method: LeakMethodSchema,
    placesChecked: z
      .array(text().min(1).max(120), { error: "List the places you checked" })
      .min(1, "List at least one place you checked")
      .max(40, "List at most 40 places"),
    leaks: z.array(LeakFoundSchema).max(20).default([]),
    recheck: RecheckResultSchema.default("not-done"),
    note: NoteSchema,
    clientId: optionalClientId,
    takenAt: deviceTime("takenAt"),
  })
  // "Still leaking" after a search that found nothing contradicts itself.
  .refine((body) => body.recheck !== "still-leaking" || body.leaks.length > 0, {
    path: ["recheck"],
    message: "Record the leak you found before marking it still leaking",
  });
export type LeakSearchBody = z.input<typeof LeakSearchBodySchema>;
export type LeakSearchInput = z.output<typeof LeakSearchBodySchema>;

export const LeakSearchSchema = RecordBaseSchema.extend({
  input: z.object({
    method: LeakMethodSchema,
    placesChecked: z.array(z.string()),
    leaks: z.array(LeakFoundSchema),
    recheck: RecheckResultSchema,
    note: z.string().optional(),
  }),
  result: VerdictSchema,
});
export type LeakSearch = z.infer<typeof LeakSearchSchema>;

// ---------------------------------------------------------------------------------------------
// Off-cycle standing pressure (non-condensables)
// ---------------------------------------------------------------------------------------------

/**
 * Body of POST /api/visits/:id/standing-pressure-checks: what the technician read. Strict: the
 * refrigerant comes from the visit's equipment and the atmosphere from the site, so a client
 * cannot choose the table its own reading is judged against.
 */
export const StandingPressureBodySchema = z.strictObject(
  {
    standingGaugeKPa: StandingPressureInputSchema.shape.standingGaugeKPa,
    equalisedTempC: StandingPressureInputSchema.shape.equalisedTempC,
    circuit: CircuitSchema,
    note: NoteSchema,
    clientId: optionalClientId,
    takenAt: deviceTime("takenAt"),
  },
  {
    error: (issue) =>
      issue.code === "unrecognized_keys"
        ? unknownFieldsMessage(
            issue.keys,
            "A standing-pressure check takes the gauge pressure and the temperature; the refrigerant comes from the equipment, the atmosphere from the site.",
          )
        : undefined,
  },
);
export type StandingPressureBody = z.input<typeof StandingPressureBodySchema>;

/** What the server stores as input: the readings with the refrigerant and atmosphere it supplied. */
export const StandingPressureRecordInputSchema = z.object({
  refrigerant: z.string(),
  standingGaugeKPa: z.number(),
  equalisedTempC: z.number(),
  atmosphericPressureKPa: z.number(),
  circuit: z.number().int().nullable(),
  note: z.string().nullable(),
});
export type StandingPressureRecordInput = z.infer<typeof StandingPressureRecordInputSchema>;

export const StandingPressureCheckSchema = RecordBaseSchema.extend({
  input: StandingPressureRecordInputSchema,
  result: StandingPressureResultSchema,
});
export type StandingPressureCheck = z.infer<typeof StandingPressureCheckSchema>;

// ---------------------------------------------------------------------------------------------
// Nitrogen pressure test
// ---------------------------------------------------------------------------------------------

export const PRESSURE_TEST_SECTIONS = ["whole-system", "high-side", "low-side", "field-piping"] as const;
export const PressureTestSectionSchema = z.enum(PRESSURE_TEST_SECTIONS, { error: "Say which part was tested" });
export type PressureTestSection = z.infer<typeof PressureTestSectionSchema>;
export const PRESSURE_TEST_SECTION_LABELS: Record<PressureTestSection, string> = {
  "whole-system": "Whole system",
  "high-side": "High side",
  "low-side": "Low side",
  "field-piping": "Field piping only",
};

/**
 * Largest allowed drop a company may set, kPa: five times the default. The test asks for no
 * drop [S53][S67]; a larger allowance than gauge and thermometer error explain would pass a
 * leaking joint (this app's ceiling).
 */
export const MAX_ALLOWED_DROP_KPA = 5 * PRESSURE_HOLD_LIMITS.allowedDropKPa;
const CompanyAllowedDropSchema = z
  .number({ error: "Allowed drop must be a number in kPa" })
  .min(0, "Allowed drop cannot be negative")
  .max(
    MAX_ALLOWED_DROP_KPA,
    `An allowed drop above ${MAX_ALLOWED_DROP_KPA} kPa would pass a leaking joint; the test asks for no drop beyond gauge and thermometer error`,
  );

/** Body of POST /api/visits/:id/pressure-tests. The rated pressure is the user's, checked against the nameplate. */
export const PressureTestBodySchema = PressureTestInputSchema.extend({
  section: PressureTestSectionSchema.default("whole-system"),
  /** Rated (maximum allowable) pressure of the lowest-rated component in the tested part, kPa gauge. */
  ratedKPa: z
    .number({ error: "Enter the rated pressure of the lowest-rated component, kPa gauge" })
    .gt(0, "Rated pressure must be above 0 kPa")
    .max(MAX_GAUGE_PRESSURE_KPA, `Rated pressure above ${MAX_GAUGE_PRESSURE_KPA} kPa is not plausible`),
  /** Highest pressure applied, if above the start of the hold; kPa gauge. */
  testGaugeKPa: PressureTestInputSchema.shape.startGaugeKPa.optional(),
  holdMinutes: z
    .number({ error: "Hold time must be a number of minutes" })
    .gt(0, "Hold time must be above 0 minutes")
    .max(14 * 24 * 60, "A hold over two weeks is not plausible"),
  /** Optional: the organisation's figure is used when absent. */
  allowedDropKPa: PressureTestInputSchema.shape.allowedDropKPa.optional(),
  note: NoteSchema,
  clientId: optionalClientId,
  takenAt: deviceTime("takenAt"),
});
export type PressureTestBody = z.input<typeof PressureTestBodySchema>;

export const PressureTestRecordInputSchema = PressureTestInputSchema.extend({
  section: PressureTestSectionSchema,
  ratedKPa: z.number(),
  testGaugeKPa: z.number(),
  holdMinutes: z.number(),
  note: z.string().nullable(),
});
export type PressureTestRecordInput = z.infer<typeof PressureTestRecordInputSchema>;

export const PressureTestRecordResultSchema = z.object({
  testPressure: VerdictSchema,
  hold: PressureTestResultSchema,
  overall: OverallVerdictSchema,
});
export type PressureTestRecordResult = z.infer<typeof PressureTestRecordResultSchema>;

export const PressureTestSchema = RecordBaseSchema.extend({
  input: PressureTestRecordInputSchema,
  result: PressureTestRecordResultSchema,
});
export type PressureTest = z.infer<typeof PressureTestSchema>;

// ---------------------------------------------------------------------------------------------
// Evacuation and decay test
// ---------------------------------------------------------------------------------------------

/**
 * Bounds of an evacuation target, microns. Makers and specifications ask for 250–500 µm
 * (trade notes §4.1: [S4][S52][S53][S54][S57]) and the loosest rule in use is about 1000 µm
 * (the "1000-micron rule", common practice). Above 1000 µm a "target" lets a wet system pass;
 * below 50 µm a field pump and micron gauge rarely get there at all (memory; this app's floor).
 */
export const MIN_TARGET_MICRONS = 50;
export const MAX_TARGET_MICRONS = 1000;
const TargetMicronsSchema = z
  .number({ error: "Target must be a number of microns" })
  .min(
    MIN_TARGET_MICRONS,
    `A target below ${MIN_TARGET_MICRONS} microns is beyond what a field pump and micron gauge reach; makers ask for 250–500 µm`,
  )
  .max(
    MAX_TARGET_MICRONS,
    `A target above ${MAX_TARGET_MICRONS} microns leaves moisture in the system; makers ask for 250–500 µm, the trade norm is 500`,
  );
const MinutesSchema = z
  .number({ error: "Time must be a number of minutes" })
  .min(0, "Time cannot be negative")
  .max(7 * 24 * 60, "An evacuation over a week is not plausible");

/** Body of POST /api/visits/:id/evacuations: start one; samples may come now or later. */
export const EvacuationCreateSchema = z.object({
  targetMicrons: TargetMicronsSchema.optional(),
  samples: VacuumSamplesSchema.optional(),
  isolatedAtMinutes: MinutesSchema.optional(),
  note: NoteSchema,
  clientId: optionalClientId,
  /** When the pump was started, by the device's clock (samples count minutes from it). */
  startedAt: deviceTime("startedAt"),
});
export type EvacuationCreate = z.input<typeof EvacuationCreateSchema>;

/** Body of POST …/evacuations/:evacuationId/samples: one reading; time defaults to now. */
export const EvacuationSampleBodySchema = z.object({
  microns: VacuumSampleSchema.shape.microns,
  minutes: MinutesSchema.optional(),
  clientId: optionalClientId,
});
export type EvacuationSampleBody = z.input<typeof EvacuationSampleBodySchema>;

/** Body of PATCH …/evacuations/:evacuationId: valve off the pump (null undoes it), change target or note. */
export const EvacuationUpdateSchema = z
  .object({
    isolatedAtMinutes: MinutesSchema.nullable().optional(),
    /** true: valved off now (the server takes the time). */
    isolateNow: z.boolean().optional(),
    targetMicrons: TargetMicronsSchema.optional(),
    note: NoteSchema,
  })
  .refine((body) => Object.values(body).some((value) => value !== undefined), {
    path: ["isolatedAtMinutes"],
    message: "Nothing to change",
  });
export type EvacuationUpdate = z.input<typeof EvacuationUpdateSchema>;

export const EVACUATION_STAGES = ["pulling-down", "decay-test", "judged"] as const;
export type EvacuationStage = (typeof EVACUATION_STAGES)[number];

export const EvacuationResultSchema = z.object({
  stage: z.enum(EVACUATION_STAGES),
  reached: EvacuationReachedSchema,
  /** The decay analysis once the pump is valved off and two readings follow; null before. */
  decay: DecayAnalysisSchema.nullable(),
  /** Minutes covered by the decay readings. */
  decayMinutes: z.number().nullable(),
  overall: OverallVerdictSchema.nullable(),
});
export type EvacuationResult = z.infer<typeof EvacuationResultSchema>;

export const EvacuationSchema = RecordBaseSchema.omit({ takenAt: true }).extend({
  startedAt: z.string(),
  updatedAt: z.string(),
  targetMicrons: z.number(),
  isolatedAtMinutes: z.number().nullable(),
  /** A sample added from a device carries its client id (README decision 026). */
  samples: z.array(z.object({ minutes: z.number(), microns: z.number(), clientId: z.uuid().optional() })),
  /** The device's id for it, by which a device that started it offline names it until it learns its id. */
  clientId: z.uuid().nullable(),
  note: z.string().nullable(),
  result: EvacuationResultSchema,
  /** Sent back as If-Match when valving off or changing the target or note. */
  version: z.number().int(),
});
export type Evacuation = z.infer<typeof EvacuationSchema>;

// ---------------------------------------------------------------------------------------------
// List responses (with the organisation's defaults the forms start from)
// ---------------------------------------------------------------------------------------------

export const ElectricalCheckListSchema = z.object({
  electricalChecks: z.array(ElectricalCheckSchema),
  defaults: z.object({
    nameplateV: z.number().nullable(),
    phases: z.number().nullable(),
    compressorRlaA: z.number().nullable(),
    fanFlaA: z.number().nullable(),
  }),
});
export const LeakSearchListSchema = z.object({ leakSearches: z.array(LeakSearchSchema) });
export const StandingPressureCheckListSchema = z.object({
  standingPressureChecks: z.array(StandingPressureCheckSchema),
});
export const PressureTestListSchema = z.object({
  pressureTests: z.array(PressureTestSchema),
  defaults: z.object({
    allowedDropKPa: z.number(),
    ratedHighSideKPa: z.number().nullable(),
    ratedLowSideKPa: z.number().nullable(),
  }),
});
export const EvacuationListSchema = z.object({
  evacuations: z.array(EvacuationSchema),
  /** The company's target, and its limits, so a device judges readings waiting on it as the server will. */
  defaults: z.object({ targetMicrons: z.number(), limits: ProcedureLimitsSchema }),
});
export type EvacuationList = z.infer<typeof EvacuationListSchema>;

/**
 * Organisation settings read for procedures (organisations.settings): the company's one limits
 * object, the engine's own limit groups where the organisation's codes differ (the evacuation
 * target is `evacuation.targetMicrons`, the pressure test's allowed drop
 * `pressureHold.allowedDropKPa`). Anything else there is ignored, and malformed limits fall back
 * to the defaults.
 */
export const ProcedureSettingsSchema = z.object({
  procedureLimits: ProcedureLimitsSchema.optional().catch(undefined),
});
export type ProcedureSettings = z.infer<typeof ProcedureSettingsSchema>;

/**
 * Body of PATCH /api/organisation/settings (owners): the organisation's own limits where local
 * codes differ from Satura's defaults. Only the fields sent change; a null clears an override
 * back to the default. The request names the version it was based on (If-Match).
 */
export const ProcedureSettingsUpdateSchema = z
  .strictObject({
    evacuationTargetMicrons: TargetMicronsSchema.nullable().optional(),
    pressureTestAllowedDropKPa: CompanyAllowedDropSchema.nullable().optional(),
  })
  .refine((body) => Object.values(body).some((value) => value !== undefined), {
    path: ["evacuationTargetMicrons"],
    message: "Nothing to change",
  });
export type ProcedureSettingsUpdate = z.input<typeof ProcedureSettingsUpdateSchema>;

/** Answer of GET/PATCH /api/organisation/settings: the overrides, the defaults they replace, and their version. */
export const ProcedureSettingsResponseSchema = z.object({
  settings: z.object({
    evacuationTargetMicrons: z.number().nullable(),
    pressureTestAllowedDropKPa: z.number().nullable(),
  }),
  defaults: z.object({ evacuationTargetMicrons: z.number(), pressureTestAllowedDropKPa: z.number() }),
  version: z.number().int(),
});
export type ProcedureSettingsResponse = z.infer<typeof ProcedureSettingsResponseSchema>;
