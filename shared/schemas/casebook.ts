/**
 * Casebook contract: worked cases for apprentices, their attempts and progress. Client forms,
 * the server and the casebook engine all validate with these schemas.
 *
 * A case is a short story, the readings a technician would take (exactly `DiagnosisInputSchema`:
 * kPa gauge, °C, K) and the expected answers, which always come from `diagnose()` — they are
 * never typed in by hand. Built-in cases ship with Satura and are shared by every organisation;
 * organisation cases are authored by seniors and owners; generated cases are made on demand
 * from a seed and never stored.
 *
 * Units: SI-metric throughout (°C, K, kPa gauge); the attempt screen converts answers from the
 * user's display units before sending them.
 */
import { z } from "zod";
// Straight from its file, not the engine's index: the index also loads the scorer, which reads this module.
import { GENERATOR_REFRIGERANTS } from "../engine/casebook/generate-case.ts";
import { ROLES } from "./auth.ts";
import {
  ApplicationSchema,
  ChargeDeviationSchema,
  ChargeStateSchema,
  DiagnosisInputSchema,
  MAX_CIRCUIT_CHARGE_KG,
  MeteringDeviceSchema,
  TargetBandSchema,
  WarningCodeSchema,
  type Application,
  type MeteringDevice,
} from "./diagnosis.ts";
import { text } from "./text.ts";

// ---------------------------------------------------------------------------------------------
// Limits and enumerations
// ---------------------------------------------------------------------------------------------

/** An answered temperature or difference counts as right within this many kelvin (issue 7). */
export const ANSWER_TOLERANCE_K = 0.5;
/**
 * A refrigerating effect read off a pressure–enthalpy diagram counts as right within this many
 * kJ/kg: about half a minor division of a printed chart's enthalpy scale, or 2–3 % of a typical
 * effect (common practice for chart reading; issue 18).
 */
export const REFRIGERATING_EFFECT_TOLERANCE_KJ_PER_KG = 5;
export const CASE_TITLE_MAX_LENGTH = 120;
export const STORY_FIELD_MAX_LENGTH = 600;
export const REASONING_MAX_LENGTH = 300;

export const CASE_DIFFICULTIES = ["starter", "intermediate", "advanced"] as const;
export const CaseDifficultySchema = z.enum(CASE_DIFFICULTIES, {
  error: "Choose a difficulty: starter, intermediate or advanced",
});
export type CaseDifficulty = z.infer<typeof CaseDifficultySchema>;
export const DIFFICULTY_LABELS: Record<CaseDifficulty, string> = {
  starter: "Starter",
  intermediate: "Intermediate",
  advanced: "Advanced",
};

export const CASE_SOURCES = ["built-in", "organisation", "generated"] as const;
export type CaseSource = (typeof CASE_SOURCES)[number];

export const CASE_STATUSES = ["draft", "published"] as const;
export const CaseStatusSchema = z.enum(CASE_STATUSES);
export type CaseStatus = z.infer<typeof CaseStatusSchema>;

/** Safety topics a case can add to the one its refrigerant's class brings (see shared/content/cautions.ts). */
export const CASE_SAFETY_TOPICS = [
  "electrical",
  "flammable",
  "toxic",
  "nitrogen",
  "pressure",
  "liquid-refrigerant",
  "recovery-cylinder",
  "height",
  "hot-surface",
] as const;
export const CaseSafetyTopicSchema = z.enum(CASE_SAFETY_TOPICS);

// ---------------------------------------------------------------------------------------------
// The case
// ---------------------------------------------------------------------------------------------

const storyText = (label: string) =>
  text({ multiline: true, error: `${label} is needed` })
    .min(3, `${label} is needed`)
    .max(STORY_FIELD_MAX_LENGTH, `${label} must be at most ${STORY_FIELD_MAX_LENGTH} characters`);

/** The short story: where, what, what the customer says, and the conditions on the day. */
export const CaseStorySchema = z.object({
  site: storyText("The site"),
  equipment: storyText("The equipment"),
  complaint: storyText("The complaint"),
  conditions: storyText("The conditions"),
});
export type CaseStory = z.infer<typeof CaseStorySchema>;

/** Expected answers, as `diagnose()` gives them for the case's readings. */
export const CaseExpectedSchema = z.object({
  /** Dew point at the suction pressure, °C; null when the pressure is outside the table. */
  evaporatingTempC: z.number().nullable(),
  /** Bubble point at the liquid pressure, °C. */
  condensingTempC: z.number().nullable(),
  superheatK: z.number().nullable(),
  /** Null when no valid subcooling exists (e.g. a discharge-line temperature). */
  subcoolingK: z.number().nullable(),
  chargeState: ChargeStateSchema,
  /** The target the charge signal was judged against (superheat for fixed devices, subcooling for valves). */
  targetSuperheatK: z.number().nullable(),
  targetSubcoolingK: z.number().nullable(),
  warnings: z.array(WarningCodeSchema),
  /**
   * Measured-cycle questions (issue 18), present only when the case asks them, from
   * measuredCycle(): h₁ − h₄ in kJ/kg, and the discharge line temperature minus the dew point at
   * the discharge pressure in K. Null when the readings cannot give it.
   */
  refrigeratingEffectKJPerKg: z.number().nullable().optional(),
  dischargeSuperheatK: z.number().nullable().optional(),
  /**
   * The charge-to-add question (issue 14), present only when the case asks it: the engine's
   * charge deviation for the readings (kg over the correct charge, negative = short, with its
   * range, basis and source), or null with `chargeDeviationNote` saying why there is none.
   */
  chargeDeviation: ChargeDeviationSchema.nullable().optional(),
  chargeDeviationNote: z.string().nullable().optional(),
});
export type CaseExpected = z.infer<typeof CaseExpectedSchema>;

/** Questions about the measured cycle a case may add to the usual five (read off the pressure–enthalpy diagram). */
export const CYCLE_ANSWER_FIELDS = ["refrigeratingEffectKJPerKg", "dischargeSuperheatK"] as const;
export type CycleAnswerField = (typeof CYCLE_ANSWER_FIELDS)[number];

/** The cycle questions a case asks: those its expected answers carry. */
export function cycleQuestionsOf(expected: CaseExpected): CycleAnswerField[] {
  return CYCLE_ANSWER_FIELDS.filter((field) => expected[field] !== undefined);
}

/** The charge-to-add answer: kg to add, negative to recover (issue 14). */
export const CHARGE_ANSWER_FIELD = "chargeToAddKg";

/** Whether a case asks the charge to add: its expected answers carry the engine's estimate (or its absence). */
export function asksChargeToAdd(expected: CaseExpected): boolean {
  return expected.chargeDeviation !== undefined;
}

/** The saturation temperatures a case's pressures were derived from, °C (reproducibility). */
export const CaseDesignSchema = z.object({
  evaporatingDewC: z.number().nullable(),
  condensingBubbleC: z.number().nullable(),
});

const caseFields = {
  title: text({ error: "Give the case a title" })
    .min(5, "Give the case a title of at least 5 characters")
    .max(CASE_TITLE_MAX_LENGTH, `The title must be at most ${CASE_TITLE_MAX_LENGTH} characters`),
  difficulty: CaseDifficultySchema,
  story: CaseStorySchema,
  input: DiagnosisInputSchema,
  /** One or two sentences a senior would give as the reason for the verdict. */
  reasoning: text({ multiline: true, error: "Write the reasoning" })
    .min(10, "Write the reasoning in a sentence")
    .max(REASONING_MAX_LENGTH * 2, `The reasoning must be at most ${REASONING_MAX_LENGTH * 2} characters`),
  /** Hazards of the job in the story beyond the refrigerant's class (e.g. a condenser fan: electrical). */
  safetyTopics: z.array(CaseSafetyTopicSchema).max(CASE_SAFETY_TOPICS.length).default([]),
};

/** A built-in case as stored in data/casebook/built-in-cases.json. */
export const BuiltInCaseSchema = z.object({
  /** Stable kebab-case id. */
  id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/),
  ...caseFields,
  design: CaseDesignSchema,
  expected: CaseExpectedSchema,
  /** Trade-note source tags behind the answer, or "common practice". */
  sources: z.array(z.string()).min(1),
});
export type BuiltInCase = z.infer<typeof BuiltInCaseSchema>;

export const BUILT_IN_CASE_FORMAT = "satura-casebook";
export const BuiltInCaseFileSchema = z.object({
  format: z.literal(BUILT_IN_CASE_FORMAT),
  version: z.literal(1),
  generatedBy: z.string(),
  cases: z.array(BuiltInCaseSchema).min(1),
});

/** What a senior or owner sends to create or change an organisation case. */
export const CaseDraftSchema = z.object(caseFields);
export type CaseDraft = z.infer<typeof CaseDraftSchema>;
export type CaseDraftInput = z.input<typeof CaseDraftSchema>;

export const CaseFromReadingSchema = z.object({ readingId: z.uuid("Choose a reading") });

/** Faults the generator can make: every state evidence can point to. */
export const GeneratorFaultSchema = ChargeStateSchema.exclude(["insufficient-data"], {
  error: "Choose the fault to practise",
});
export const GENERATOR_FAULTS = GeneratorFaultSchema.options;
export type GeneratorFault = z.infer<typeof GeneratorFaultSchema>;

/** Metering devices each application is built with (a fixed orifice is a comfort-cooling part). */
export const GENERATOR_DEVICES: Readonly<Record<Application, readonly MeteringDevice[]>> = {
  "comfort-cooling": ["txv", "eev", "fixed-orifice", "capillary"],
  "heat-pump": ["txv", "eev", "fixed-orifice"],
  "medium-temperature-refrigeration": ["txv", "eev", "capillary"],
  "low-temperature-refrigeration": ["txv", "eev", "capillary"],
  "process-chilling": ["txv", "eev"],
};

export const GenerateCaseSchema = z
  .object({
    refrigerant: text({ error: "Choose the refrigerant" })
      .min(1, "Choose the refrigerant")
      // The generator's own list: a case id naming any other refrigerant is not a case.
      .refine(
        (id) => (GENERATOR_REFRIGERANTS as readonly string[]).includes(id),
        `The generator makes cases for ${GENERATOR_REFRIGERANTS.join(", ")}`,
      ),
    meteringDevice: MeteringDeviceSchema,
    fault: GeneratorFaultSchema,
    /** What the equipment does; comfort cooling when absent. */
    application: ApplicationSchema.optional(),
    /** Same seed, same case; the server picks one when absent. */
    seed: z
      .number()
      .int()
      .min(0)
      .max(2 ** 32 - 1)
      .optional(),
  })
  // A fixed orifice belongs to air conditioning, a capillary to small units and cabinets, never to a chiller.
  .refine((options) => GENERATOR_DEVICES[options.application ?? "comfort-cooling"].includes(options.meteringDevice), {
    path: ["meteringDevice"],
    message:
      "That metering device is not used in that application: choose a TXV or EEV (or a capillary for small refrigeration)",
  });
export type GenerateCase = z.infer<typeof GenerateCaseSchema>;

/**
 * A generated case is never stored: its id carries what made it (seed, device, fault,
 * refrigerant), so the server can make the very same case again to score an attempt.
 * "~" never occurs in refrigerant names, devices or faults, and needs no URL escaping.
 */
const GENERATED_PREFIX = "gen";
export type GeneratedCaseOptions = Omit<GenerateCase, "seed" | "application"> & {
  seed: number;
  application?: Application;
};

export function generatedCaseId(options: GeneratedCaseOptions): string {
  const parts: (string | number)[] = [
    GENERATED_PREFIX,
    options.seed,
    options.meteringDevice,
    options.fault,
    options.refrigerant,
  ];
  // Comfort cooling needs no part of its own, so ids made before applications existed still work.
  if (options.application && options.application !== "comfort-cooling") parts.push(options.application);
  return parts.join("~");
}

export function parseGeneratedCaseId(id: string): GeneratedCaseOptions | null {
  const [prefix, seed, meteringDevice, fault, refrigerant, application, ...rest] = id.split("~");
  if (prefix !== GENERATED_PREFIX || rest.length !== 0 || !refrigerant || !/^\d+$/.test(seed ?? "")) return null;
  const parsed = GenerateCaseSchema.safeParse({
    seed: Number(seed),
    meteringDevice,
    fault,
    refrigerant,
    ...(application === undefined ? {} : { application }),
  });
  if (!parsed.success || parsed.data.seed === undefined) return null;
  const { seed: parsedSeed, application: parsedApplication, ...rest2 } = parsed.data;
  return { ...rest2, seed: parsedSeed, ...(parsedApplication ? { application: parsedApplication } : {}) };
}

/** One case as the API sends it. `expected` is present only for authors (preview) and after an attempt. */
export const CaseSchema = z.object({
  id: z.string(),
  source: z.enum(CASE_SOURCES),
  status: CaseStatusSchema,
  title: z.string(),
  difficulty: CaseDifficultySchema,
  story: CaseStorySchema,
  input: DiagnosisInputSchema,
  reasoning: z.string().nullable(),
  safetyTopics: z.array(CaseSafetyTopicSchema),
  expected: CaseExpectedSchema.nullable(),
  /** Measured-cycle questions the attempt form adds (shown to everyone; the answers stay hidden). */
  cycleQuestions: z.array(z.enum(CYCLE_ANSWER_FIELDS)).default([]),
  /** Whether the attempt form asks the charge to add (shown to everyone; the estimate stays hidden). */
  chargeQuestion: z.boolean().default(false),
  /** Organisation cases: who wrote it and whether it came from a real reading. */
  authorName: z.string().nullable(),
  fromReading: z.boolean(),
  editable: z.boolean(),
  updatedAt: z.string().nullable(),
  /** An organisation case's version, sent back as If-Match when it is changed; null for built-in and generated cases. */
  version: z.number().int().nullable(),
});
export type Case = z.infer<typeof CaseSchema>;

export const CaseSummarySchema = CaseSchema.pick({
  id: true,
  source: true,
  status: true,
  title: true,
  difficulty: true,
}).extend({
  refrigerant: z.string(),
  meteringDevice: MeteringDeviceSchema,
  site: z.string(),
  /** The signed-in user's attempts at it, and whether the best one was all right. */
  attempts: z.number().int(),
  solved: z.boolean(),
});
export type CaseSummary = z.infer<typeof CaseSummarySchema>;

// ---------------------------------------------------------------------------------------------
// Attempts
// ---------------------------------------------------------------------------------------------

const answerNumber = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .min(-150, `${label} is out of range`)
    .max(250, `${label} is out of range`);

/**
 * The apprentice's answers, SI-metric (°C for saturation temperatures, K for superheat and
 * subcooling). A null number means "cannot be worked out from these readings".
 */
export const AttemptAnswersSchema = z.object({
  evaporatingTempC: answerNumber("Evaporating temperature").nullable(),
  condensingTempC: answerNumber("Condensing temperature").nullable(),
  superheatK: answerNumber("Superheat").nullable(),
  subcoolingK: answerNumber("Subcooling").nullable(),
  /** Cycle questions, only for cases that ask them (kJ/kg and K); absent or null = left blank. */
  refrigeratingEffectKJPerKg: z
    .number({ error: "Refrigerating effect must be a number" })
    .min(0, "Refrigerating effect is out of range")
    .max(3000, "Refrigerating effect is out of range")
    .nullable()
    .optional(),
  dischargeSuperheatK: answerNumber("Discharge superheat").nullable().optional(),
  /** Charge to add, kg (negative: to recover), only for cases that ask it; absent or null = no estimate possible. */
  chargeToAddKg: z
    .number({ error: "Charge to add must be a number of kilograms" })
    .min(-MAX_CIRCUIT_CHARGE_KG, "Charge to add is more than any one circuit holds")
    .max(MAX_CIRCUIT_CHARGE_KG, "Charge to add is more than any one circuit holds")
    .nullable()
    .optional(),
  chargeState: ChargeStateSchema,
  // Single-line text: a pasted paragraph would not be "one line of reasoning".
  reasoning: text({ error: "Write one line of reasoning" })
    .min(3, "Write one line of reasoning")
    .max(REASONING_MAX_LENGTH, `Keep the reasoning to one line (${REASONING_MAX_LENGTH} characters)`),
});
export type AttemptAnswers = z.infer<typeof AttemptAnswersSchema>;

export const AttemptCreateSchema = z.object({ caseId: text().min(1).max(200), answers: AttemptAnswersSchema });
export type AttemptCreate = z.infer<typeof AttemptCreateSchema>;

export const ANSWER_FIELDS = [
  "evaporatingTempC",
  "condensingTempC",
  "superheatK",
  "subcoolingK",
  "chargeState",
] as const;
export type AnswerField = (typeof ANSWER_FIELDS)[number];

export const AnswerMarkSchema = z.object({
  field: z.enum([...ANSWER_FIELDS, ...CYCLE_ANSWER_FIELDS, CHARGE_ANSWER_FIELD]),
  /** Number (°C, K, kJ/kg, or kg to add) or charge state; null = no valid value. */
  expected: z.union([z.number(), ChargeStateSchema]).nullable(),
  given: z.union([z.number(), ChargeStateSchema]).nullable(),
  correct: z.boolean(),
  /** given − expected, K, for numeric answers that both exist. */
  differenceK: z.number().nullable(),
  /** given − expected, kJ/kg, for the refrigerating effect. */
  differenceKJPerKg: z.number().nullable().optional(),
  /** The charge to add: the range (kg to add) an answer is right within; null when the engine gives no estimate. */
  rangeKg: z.object({ lowKg: z.number(), highKg: z.number() }).nullable().optional(),
});
export type AnswerMark = z.infer<typeof AnswerMarkSchema>;

export const AttemptScoreSchema = z.object({
  marks: z.array(AnswerMarkSchema),
  correctCount: z.number().int(),
  total: z.number().int(),
  allCorrect: z.boolean(),
  toleranceK: z.number(),
  /** Present when a refrigerating effect was marked. */
  toleranceKJPerKg: z.number().optional(),
});
export type AttemptScore = z.infer<typeof AttemptScoreSchema>;

const point = z.enum(["dew", "bubble"]);

/** One step of the worked solution; numbers SI-metric, words unit-free so any display unit fits. */
export const WorkedStepSchema = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("saturation"),
    side: z.enum(["suction", "liquid"]),
    pressureGaugeKPa: z.number(),
    atmosphericKPa: z.number(),
    pressureAbsoluteKPa: z.number(),
    point,
    saturationC: z.number().nullable(),
    /** The other column at the same pressure (blends), °C. */
    otherPoint: point,
    otherSaturationC: z.number().nullable(),
    glideK: z.number().nullable(),
    isBlend: z.boolean(),
    why: z.string(),
  }),
  z.object({
    kind: z.literal("difference"),
    quantity: z.enum(["superheat", "subcooling"]),
    /** Superheat = line − saturation; subcooling = saturation − line. */
    lineTempC: z.number(),
    saturationC: z.number().nullable(),
    resultK: z.number().nullable(),
    why: z.string(),
  }),
  z.object({
    kind: z.literal("target"),
    quantity: z.enum(["superheat", "subcooling"]),
    band: TargetBandSchema.nullable(),
    measuredK: z.number().nullable(),
    /** Fixed devices: the air readings the formula used, °C. */
    wetBulbC: z.number().nullable(),
    outdoorC: z.number().nullable(),
    why: z.string(),
  }),
  z.object({
    kind: z.literal("verdict"),
    chargeState: ChargeStateSchema,
    evidence: z.array(z.string()),
    why: z.string(),
  }),
]);
export type WorkedStep = z.infer<typeof WorkedStepSchema>;

export const SafetyNoteSchema = z.object({
  topic: CaseSafetyTopicSchema,
  /** Why this note applies to this case. */
  reason: z.string(),
});
export type SafetyNote = z.infer<typeof SafetyNoteSchema>;

export const AttemptSchema = z.object({
  id: z.uuid(),
  caseId: z.string(),
  caseTitle: z.string(),
  refrigerant: z.string(),
  expectedState: ChargeStateSchema,
  answers: AttemptAnswersSchema,
  score: AttemptScoreSchema,
  expected: CaseExpectedSchema,
  reasoning: z.string().nullable(),
  worked: z.array(WorkedStepSchema),
  safety: z.array(SafetyNoteSchema),
  user: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
});
export type Attempt = z.infer<typeof AttemptSchema>;

export const AttemptSummarySchema = AttemptSchema.pick({
  id: true,
  caseId: true,
  caseTitle: true,
  refrigerant: true,
  expectedState: true,
  createdAt: true,
}).extend({
  correctCount: z.number().int(),
  total: z.number().int(),
  allCorrect: z.boolean(),
});
export type AttemptSummary = z.infer<typeof AttemptSummarySchema>;

/** Attempts and fully right attempts in one group (a charge state or a refrigerant). */
export const ProgressGroupSchema = z.object({
  key: z.string(),
  attempts: z.number().int(),
  solved: z.number().int(),
  answersRight: z.number().int(),
  answersTotal: z.number().int(),
});
export type ProgressGroup = z.infer<typeof ProgressGroupSchema>;

export const ProgressSchema = z.object({
  attempts: z.number().int(),
  solved: z.number().int(),
  byState: z.array(ProgressGroupSchema),
  byRefrigerant: z.array(ProgressGroupSchema),
});
export type Progress = z.infer<typeof ProgressSchema>;

export const TeamProgressSchema = z.object({
  people: z.array(
    z.object({
      user: z.object({ id: z.string(), name: z.string(), role: z.enum(ROLES) }),
      progress: ProgressSchema,
      lastAttemptAt: z.string().nullable(),
    }),
  ),
});
export type TeamProgress = z.infer<typeof TeamProgressSchema>;
