/**
 * Visits and their run log: the contracts of /api/visits. A reading stores the diagnosis
 * input as the technician entered it (SI-metric, gauge pressures) and the result the server
 * computed from it with the same engine the client runs.
 */
import { z } from "zod";
import {
  DiagnosisInputObjectSchema,
  DiagnosisInputSchema,
  DiagnosisResultSchema,
  TrendResultSchema,
} from "./diagnosis.ts";
import { MAX_CIRCUITS } from "./equipment.ts";
import { MEASURED_FIELDS, type MeasuredField } from "./reading-fields.ts";
import { instant } from "./dates.ts";
import { deviceTime, optionalClientId } from "./device-entries.ts";
import { isTimeZone } from "../format/date-time.ts";
import { text } from "./text.ts";

export const VISIT_STATUSES = ["open", "awaiting-review", "signed-off", "sent-back"] as const;
export const VisitStatusSchema = z.enum(VISIT_STATUSES);
export type VisitStatus = z.infer<typeof VisitStatusSchema>;

export const VISIT_STATUS_LABELS: Record<VisitStatus, string> = {
  open: "Open",
  "awaiting-review": "Awaiting review",
  "signed-off": "Signed off",
  "sent-back": "Sent back",
};

export const MAX_REASON_LENGTH = 500;
export const MAX_COMMENT_LENGTH = 2000;

/**
 * Statuses in which a visit takes new entries (readings, procedures, refrigerant, photos) and
 * voids. Awaiting review and signed off are closed until a senior or owner reopens the visit.
 */
export const STATUSES_OPEN_FOR_ENTRIES = ["open", "sent-back"] as const satisfies readonly VisitStatus[];
export const acceptsEntries = (status: VisitStatus) =>
  (STATUSES_OPEN_FOR_ENTRIES as readonly VisitStatus[]).includes(status);
/** Comments stay possible while a senior reviews; only a signed-off visit is closed to them. */
export const STATUSES_OPEN_FOR_COMMENTS = [
  "open",
  "sent-back",
  "awaiting-review",
] as const satisfies readonly VisitStatus[];

/** Why a closed visit refuses an entry, in words the technician can act on. */
export function closedVisitMessage(status: VisitStatus): string {
  return status === "signed-off"
    ? "This visit is signed off: nothing more can be recorded or voided until a senior technician or an owner reopens it with a reason"
    : "This visit is awaiting review: nothing more can be recorded or voided until the reviewer sends it back or a senior technician or an owner reopens it";
}

/** A reason for voiding a record or reopening a visit: kept in the audit trail for good. */
const reasonSchema = (prompt: string) =>
  z
    .string({ error: prompt })
    .trim()
    .min(3, prompt)
    .max(MAX_REASON_LENGTH, `Keep the reason under ${MAX_REASON_LENGTH} characters`);

/**
 * The reason for a visit. Optional when it starts (on the roof, the first reading matters
 * more than the words), so an empty text is a visit whose reason is still to come; it must
 * be given before the visit goes for review. Stored as "" — the column stays NOT NULL and
 * needs no migration.
 */
const VisitReasonSchema = text({ multiline: true, error: "Say why you are visiting" })
  .max(MAX_REASON_LENGTH, `Keep the reason under ${MAX_REASON_LENGTH} characters`)
  // Empty means "not given yet"; anything typed must say something.
  .refine(
    (value) => value === "" || value.length >= 3,
    "Say why you are visiting (at least a few words), or leave it for later",
  );

/** What screens show for a visit whose reason is still to be given. */
export const NO_REASON_YET = "No reason given yet";
export const REASON_NEEDED_MESSAGE = "Give the reason for the visit first";
/** The reason as shown: the text, or plainly that none was given yet. */
export const visitReasonText = (reason: string) => (reason.trim() === "" ? NO_REASON_YET : reason);
export const hasReason = (reason: string) => reason.trim() !== "";

export const VisitCreateSchema = z.object({
  equipmentId: z.uuid("Choose the equipment"),
  reason: VisitReasonSchema.default(""),
});
export type VisitCreate = z.input<typeof VisitCreateSchema>;

const CircuitNumberSchema = z
  .number({ error: "Say which circuit the reading is from" })
  .int("Circuits are numbered 1, 2, 3…")
  .min(1, "Circuits are numbered from 1")
  .max(MAX_CIRCUITS, `Satura records up to ${MAX_CIRCUITS} circuits`);

/**
 * The measured values a reading body (and a CSV row) carries: the catalogue's measured fields
 * (shared/schemas/reading-fields.ts), with the input schema's checks.
 */
export const MeasuredValuesSchema = DiagnosisInputObjectSchema.pick(
  Object.fromEntries(MEASURED_FIELDS.map((field) => [field, true])) as Record<MeasuredField, true>,
);
export type MeasuredValues = z.infer<typeof MeasuredValuesSchema>;

/** The message for fields a strict body does not take, naming each one. */
export const unknownFieldsMessage = (keys: readonly string[], hint: string) =>
  `Not accepted: ${keys.join(", ")}. ${hint}`;

/**
 * Body of POST /api/visits/:id/readings: the circuit, when it was read, and the measured
 * values. Strict: an unknown field (a target, an RLA, an atmosphere) is refused by name.
 */
export const ReadingBodySchema = z.strictObject(
  {
    circuit: CircuitNumberSchema,
    takenAt: instant("takenAt must be an ISO 8601 date and time").optional(),
    note: text({ multiline: true }).max(MAX_REASON_LENGTH).optional(),
    /** The device's id for this reading: a repeated send stores it once (README decision 026). */
    clientId: optionalClientId,
    ...MeasuredValuesSchema.shape,
  },
  {
    error: (issue) =>
      issue.code === "unrecognized_keys"
        ? unknownFieldsMessage(
            issue.keys,
            "A reading takes measured values only; targets and ratings come from the equipment, the atmosphere from the site.",
          )
        : undefined,
  },
);
export type ReadingBody = z.input<typeof ReadingBodySchema>;

export const PersonRefSchema = z.object({ id: z.uuid(), name: z.string() });

/** Who voided a record, when and why; null while the record stands. */
export const VoidInfoSchema = z
  .object({ at: z.string(), by: PersonRefSchema.nullable(), reason: z.string() })
  .nullable();
export type VoidInfo = z.infer<typeof VoidInfoSchema>;
/** A record that has not been voided: the only kind results, balances and reports count. */
export const isStanding = (record: { voided: VoidInfo }) => record.voided === null;

/** Records of a visit that can be voided (with a reason) and entered again; none is ever deleted. */
export const VOIDABLE_KINDS = [
  "reading",
  "adjustment",
  "electrical-check",
  "leak-search",
  "standing-pressure",
  "pressure-test",
  "evacuation",
  "movement",
  "charging",
] as const;
export const VoidableKindSchema = z.enum(VOIDABLE_KINDS);
export type VoidableKind = z.infer<typeof VoidableKindSchema>;
export const VOIDABLE_KIND_LABELS: Record<VoidableKind, string> = {
  reading: "Reading",
  adjustment: "Adjustment",
  "electrical-check": "Electrical check",
  "leak-search": "Leak search",
  "standing-pressure": "Standing-pressure check",
  "pressure-test": "Pressure test",
  evacuation: "Evacuation",
  movement: "Refrigerant movement",
  charging: "Full weigh-in declaration",
};

/**
 * The reason every void carries, checked the same wherever a record is voided: the body of
 * POST /api/cylinders/:id/movements/:movementId/void (a reclaim, which has no visit) and the
 * void dialog's form.
 */
export const VoidReasonSchema = z.strictObject({
  reason: reasonSchema("Say why this record is void, e.g. “typed 3500 for 350 kPa”"),
});

/** Body of POST /api/visits/:id/voids. */
export const VoidBodySchema = z.strictObject({
  kind: VoidableKindSchema,
  recordId: z.uuid("Say which record to void"),
  reason: VoidReasonSchema.shape.reason,
});
export type VoidBody = z.input<typeof VoidBodySchema>;

export const VISIT_EVENT_ACTIONS = [
  "started",
  "submitted",
  "signed-off",
  "sent-back",
  "reopened",
  "voided",
  "imported",
  "charge-reference-set",
] as const;
export type VisitEventAction = (typeof VISIT_EVENT_ACTIONS)[number];
export const VISIT_EVENT_LABELS: Record<VisitEventAction, string> = {
  started: "Started the visit",
  submitted: "Submitted for review",
  "signed-off": "Signed off",
  "sent-back": "Sent back",
  reopened: "Reopened",
  voided: "Voided",
  imported: "Imported readings",
  // The visit's settled readings after a full weigh-in became a circuit's charge reference point.
  "charge-reference-set": "Charge reference point set",
};

/** One line of a visit's audit trail. */
export const VisitEventSchema = z.object({
  id: z.uuid(),
  action: z.enum(VISIT_EVENT_ACTIONS),
  recordKind: VoidableKindSchema.nullable(),
  recordId: z.uuid().nullable(),
  summary: z.string(),
  reason: z.string().nullable(),
  actor: PersonRefSchema.nullable(),
  at: z.string(),
});
export type VisitEvent = z.infer<typeof VisitEventSchema>;

/**
 * The atmospheric pressure gauge readings on this visit are taken against, and why: the
 * site's altitude (ISO 2533) or, without one, the standard atmosphere. The server diagnoses
 * with it; the run log's live diagnosis uses the same figure.
 */
export const AtmosphereSchema = z.object({
  pressureKPa: z.number(),
  basis: z.enum(["site-altitude", "standard"]),
  altitudeM: z.number().nullable(),
  /** e.g. "site altitude 85 m" or "standard atmosphere: site has no altitude". */
  description: z.string(),
});
export type Atmosphere = z.infer<typeof AtmosphereSchema>;

export const ReadingSchema = z.object({
  id: z.uuid(),
  visitId: z.uuid(),
  circuit: z.number().int(),
  takenAt: z.string(),
  note: z.string().nullable(),
  input: DiagnosisInputSchema,
  result: DiagnosisResultSchema,
  recordedBy: PersonRefSchema.nullable(),
  voided: VoidInfoSchema,
});
export type Reading = z.infer<typeof ReadingSchema>;

export const ADJUSTMENT_KINDS = [
  "metering",
  "charge-added",
  "charge-removed",
  "airflow",
  "electrical",
  "other",
] as const;
export const ADJUSTMENT_KIND_LABELS: Record<(typeof ADJUSTMENT_KINDS)[number], string> = {
  metering: "Metering device adjusted",
  "charge-added": "Refrigerant added",
  "charge-removed": "Refrigerant removed",
  airflow: "Airflow changed",
  electrical: "Electrical repair",
  other: "Other change",
};

/** Adjustment kinds that move refrigerant: each is one register movement, never a second figure. */
export const CHARGE_ADJUSTMENT_KINDS = ["charge-added", "charge-removed"] as const;
export type ChargeAdjustmentKind = (typeof CHARGE_ADJUSTMENT_KINDS)[number];
export const isChargeAdjustment = (kind: string): kind is ChargeAdjustmentKind =>
  (CHARGE_ADJUSTMENT_KINDS as readonly string[]).includes(kind);

export const AdjustmentCreateSchema = z
  .object({
    circuit: CircuitNumberSchema.optional().nullable(),
    at: instant().optional(),
    kind: z.enum(ADJUSTMENT_KINDS, { error: "Choose what was changed" }),
    description: text({ multiline: true, error: "Describe the change" })
      .min(2, "Describe the change, e.g. “metering opened half a turn”")
      .max(MAX_REASON_LENGTH),
    amountKg: z
      .number({ error: "Amount must be a number in kg" })
      .positive("Amount must be above 0 kg")
      .max(100, "More than 100 kg in one step is not plausible")
      .optional()
      .nullable(),
    /** Charge adjustments: the register cylinder, so the server records the movement with it. */
    cylinderId: z.uuid("Choose a cylinder").optional().nullable(),
    /** Charge adjustments: a movement already in the visit's register that this entry is. */
    movementId: z.uuid("Choose a register line").optional().nullable(),
    clientId: optionalClientId,
  })
  // A charge change is only meaningful with its mass: the register needs the kilograms.
  .refine((value) => !isChargeAdjustment(value.kind) || value.amountKg != null, {
    path: ["amountKg"],
    message: "Enter how many kg were added or removed",
  })
  // A charge adjustment is a register movement, and a movement belongs to one circuit.
  .refine((value) => !isChargeAdjustment(value.kind) || value.circuit != null, {
    path: ["circuit"],
    message: "Say which circuit the refrigerant went into or came out of",
  })
  // The register needs the cylinder it came from or went into (TRADE.md §6 record fields);
  // a movement already in the register can be named instead, so it is not entered twice.
  .refine((value) => !isChargeAdjustment(value.kind) || Boolean(value.cylinderId) || Boolean(value.movementId), {
    path: ["cylinderId"],
    message: "Choose the cylinder it came from or went into",
  })
  .refine((value) => isChargeAdjustment(value.kind) || (!value.cylinderId && !value.movementId), {
    path: ["cylinderId"],
    message: "Only refrigerant added or removed goes with a cylinder",
  });
export type AdjustmentCreate = z.input<typeof AdjustmentCreateSchema>;

export const AdjustmentSchema = z.object({
  id: z.uuid(),
  circuit: z.number().int().nullable(),
  at: z.string(),
  kind: z.enum(ADJUSTMENT_KINDS),
  description: z.string(),
  amountKg: z.number().nullable(),
  /** The register movement a charge adjustment is (same kilograms, voided together); null for others and old unlinked rows. */
  movementId: z.uuid().nullable(),
  recordedBy: PersonRefSchema.nullable(),
  voided: VoidInfoSchema,
});
export type Adjustment = z.infer<typeof AdjustmentSchema>;

export const CommentCreateSchema = z.object({
  body: text({ multiline: true, error: "Write a comment" })
    .min(1, "Write a comment")
    .max(MAX_COMMENT_LENGTH, `Keep comments under ${MAX_COMMENT_LENGTH} characters`),
  readingId: z.uuid().optional().nullable(),
  clientId: optionalClientId,
});

export const CommentSchema = z.object({
  id: z.uuid(),
  readingId: z.uuid().nullable(),
  /** Which reading the comment is about, named by the server: the run log may not hold it (older pages). */
  reading: z.object({ circuit: z.number().int(), takenAt: z.string() }).nullable(),
  body: z.string(),
  author: PersonRefSchema.nullable(),
  createdAt: z.string(),
});
export type Comment = z.infer<typeof CommentSchema>;

export const PHOTO_KINDS = ["nameplate", "gauges", "damage", "repair", "other"] as const;
export const PhotoSchema = z.object({
  id: z.uuid(),
  kind: z.enum(PHOTO_KINDS),
  caption: z.string().nullable(),
  url: z.string(),
  thumbnailUrl: z.string(),
  /** When it was added on the device (it may have waited there without signal). */
  takenAt: z.string(),
  createdAt: z.string(),
});
export type Photo = z.infer<typeof PhotoSchema>;

/** The form fields sent with a photo (multipart, beside the file). */
export const PhotoFieldsSchema = z.object({
  kind: z.enum(PHOTO_KINDS).default("other"),
  caption: text().max(200).optional(),
  clientId: optionalClientId,
  takenAt: deviceTime("takenAt"),
});

export const ReviewActionSchema = z.discriminatedUnion("action", [
  // A visit started without a reason gets it here, at the latest: submit refuses without one.
  z.object({ action: z.literal("submit"), reason: VisitReasonSchema.optional() }),
  z.object({ action: z.literal("sign-off"), note: text({ multiline: true }).max(MAX_COMMENT_LENGTH).optional() }),
  z.object({
    action: z.literal("send-back"),
    reason: text({ multiline: true, error: "Say what needs doing before sign-off" })
      .min(3, "Say what needs doing before sign-off")
      .max(MAX_COMMENT_LENGTH),
  }),
  // A senior or owner opens a closed visit again for corrections; the reason goes in the audit trail.
  z.object({
    action: z.literal("reopen"),
    reason: reasonSchema("Say why the visit is reopened, e.g. “pressure test entered wrongly”"),
  }),
]);
export type ReviewAction = z.infer<typeof ReviewActionSchema>;

export const VisitSummarySchema = z.object({
  id: z.uuid(),
  equipmentId: z.uuid(),
  equipmentName: z.string(),
  siteName: z.string(),
  customerName: z.string(),
  refrigerant: z.string(),
  reason: z.string(),
  status: VisitStatusSchema,
  startedAt: z.string(),
  readingCount: z.number().int(),
  technicians: z.array(PersonRefSchema),
  /**
   * When the person asking last recorded anything on this visit (a reading, an adjustment, a
   * comment, a step in its trail); null if never, or when the answer is not for one person.
   * Today's "Resume" opens the open visit with the latest.
   */
  yourLastActivityAt: z.string().nullable(),
});
export type VisitSummary = z.infer<typeof VisitSummarySchema>;

/**
 * How many of a circuit's latest readings (voided ones included) the visit detail carries, and
 * the largest page of older ones GET /api/visits/:id/readings gives: a logger's series holds
 * thousands, each with its whole result (about 11 kB of JSON), and the run log draws the latest
 * 50 entries first (recorded entries).
 */
export const READINGS_PAGE_SIZE = 50;
export const MAX_READINGS_PAGE_SIZE = 200;
/**
 * Chart points per circuit, at most, that the server sends: the whole series reduced to the
 * least and greatest of each line per time bucket (peaks and dips stay), the latest readings as
 * they are. A few hundred points draw the same line on a phone as ten thousand.
 */
export const MAX_SERIES_POINTS = 400;
/** Up to this many readings, a circuit's report table lists every one. */
export const REPORT_ALL_READINGS_UP_TO = 40;
/** Of a longer series, the report keeps the latest this many (the settled state the finding is drawn from). */
export const REPORT_LATEST_READINGS = 12;

/** One point of a circuit's trend chart: a standing reading's figures. */
export const ChartPointSchema = z.object({
  /** Minutes since the circuit's first standing reading. */
  x: z.number(),
  takenAt: z.string(),
  superheatK: z.number().nullable(),
  subcoolingK: z.number().nullable(),
  evaporatingTempC: z.number().nullable(),
  condensingTempC: z.number().nullable(),
});
export type ChartPoint = z.infer<typeof ChartPointSchema>;

/**
 * What the server works out over ALL of one circuit's standing readings, so the run log, the
 * review and the report never need the whole series in the browser: counts, the settling
 * assessment, the chart series (downsampled) and the readings that matter, sent whole.
 */
export const CircuitLogSchema = z.object({
  circuit: z.number().int(),
  /** Readings recorded on the circuit, voided ones included. */
  recordCount: z.number().int(),
  /** Standing (not voided) readings. */
  readingCount: z.number().int(),
  /** The first and last standing readings' times; null without any. */
  firstTakenAt: z.string().nullable(),
  lastTakenAt: z.string().nullable(),
  /**
   * `before` for GET /api/visits/:id/readings: the oldest of this circuit's readings the detail
   * carries, when older ones exist; null when the detail carries them all.
   */
  olderCursor: z.string().nullable(),
  /** The whole standing series for the chart, at most MAX_SERIES_POINTS points, in time order. */
  points: z.array(ChartPointSchema),
  /** assessTrend over every standing reading (one per instant, adjustments marked); null without any. */
  trend: TrendResultSchema.nullable(),
  /**
   * The standing readings that tell the story, whole, in time order: the first, those either side
   * of each adjustment and the latest REPORT_LATEST_READINGS (all of them up to
   * REPORT_ALL_READINGS_UP_TO). The report lists them; charge-step checks read them.
   */
  keyReadings: z.array(ReadingSchema),
});
export type CircuitLog = z.infer<typeof CircuitLogSchema>;

export const VisitSchema = VisitSummarySchema.extend({
  customerContactEmail: z.string().nullable(),
  reviewNote: z.string().nullable(),
  signedOffBy: PersonRefSchema.nullable(),
  signedOffAt: z.string().nullable(),
  /**
   * The latest READINGS_PAGE_SIZE readings of each circuit (voided ones included), in time order;
   * older ones come a page at a time (GET /api/visits/:id/readings, from circuitLogs' olderCursor).
   */
  readings: z.array(ReadingSchema),
  /** Per circuit with readings, what the server works out over all of them. */
  circuitLogs: z.array(CircuitLogSchema),
  adjustments: z.array(AdjustmentSchema),
  comments: z.array(CommentSchema),
  photos: z.array(PhotoSchema),
  atmosphere: AtmosphereSchema,
  /** The audit trail, oldest first. */
  events: z.array(VisitEventSchema),
  /**
   * Opaque token of the state this copy shows: the detail's ETag, and the `since` with which the
   * client asks only for what changed (GET /api/visits/:id?since=…).
   */
  revision: z.string(),
});
export type Visit = z.infer<typeof VisitSchema>;

/** Query of GET /api/visits/:id/readings: one circuit's readings taken before the reading `before`. */
export const ReadingsPageQuerySchema = z.object({
  circuit: z.coerce.number().int().min(1).max(MAX_CIRCUITS),
  before: z.uuid("before names a reading"),
  limit: z.coerce.number().int().min(1).max(MAX_READINGS_PAGE_SIZE).default(READINGS_PAGE_SIZE),
});
export type ReadingsPageQuery = z.input<typeof ReadingsPageQuerySchema>;

/**
 * Answer of GET /api/visits/:id/readings: readings (voided ones included) in time order, the
 * newest just before `before`; `olderCursor` asks for the page before these, null at the first.
 */
export const ReadingsPageSchema = z.object({ readings: z.array(ReadingSchema), olderCursor: z.string().nullable() });
export type ReadingsPage = z.infer<typeof ReadingsPageSchema>;

/** Query of GET /api/visits/:id: `since`, the revision the client holds, asks for a delta. */
export const VisitDetailQuerySchema = z.object({ since: z.string().max(100).optional() });

/**
 * What changed on a visit after the revision `since`: the summary, counts, crew and review state
 * whole, with the whole log of each circuit that changed; in the lists only the records added or changed (voided, imported) since,
 * each whole, to be merged by id. `revision` is the state the client holds once merged. When
 * more readings changed than a page holds (an imported series), the server sends the whole
 * (bounded) visit instead.
 */
export const VisitDeltaSchema = VisitSchema.extend({
  since: z.string(),
  /** The logs of the circuits whose readings or adjustments changed; left out when none did: the held logs still hold. */
  circuitLogs: z.array(CircuitLogSchema).optional(),
});
export type VisitDelta = z.infer<typeof VisitDeltaSchema>;

/**
 * Answer of GET /api/visits/:id: the whole visit, or (asked with a `since` the server can build
 * on) a delta. 304 with no body when If-None-Match names the current revision.
 */
export const VisitDetailResponseSchema = z.union([
  z.object({ visit: VisitSchema }),
  z.object({ delta: VisitDeltaSchema }),
]);

export const SendReportSchema = z.object({
  to: z.email("Enter an e-mail address, like facilities@example.com"),
  /**
   * The sender's IANA time zone, so the e-mail's times read as the report they just saw; left
   * out, the e-mail writes UTC and says so. An unknown name is refused, never silently dropped.
   */
  timeZone: z.string().max(64).refine(isTimeZone, "Use a time zone name like Australia/Sydney").optional(),
});
