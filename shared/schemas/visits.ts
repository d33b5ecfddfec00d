/**
 * Visits and their run log: the contracts of /api/visits. A reading stores the diagnosis
 * input as the technician entered it (SI-metric, gauge pressures) and the result the server
 * computed from it with the same engine the client runs.
 */
import { z } from "zod";
import { DiagnosisInputSchema, DiagnosisResultSchema } from "./diagnosis.ts";
import { MAX_CIRCUITS } from "./equipment.ts";
import { instant } from "./dates.ts";
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

export const VisitCreateSchema = z.object({
  equipmentId: z.uuid("Choose the equipment"),
  reason: text({ multiline: true, error: "Say why you are visiting" })
    .min(3, "Say why you are visiting (at least a few words)")
    .max(MAX_REASON_LENGTH, `Keep the reason under ${MAX_REASON_LENGTH} characters`),
});
export type VisitCreate = z.input<typeof VisitCreateSchema>;

const CircuitNumberSchema = z
  .number({ error: "Say which circuit the reading is from" })
  .int("Circuits are numbered 1, 2, 3…")
  .min(1, "Circuits are numbered from 1")
  .max(MAX_CIRCUITS, `Satura records up to ${MAX_CIRCUITS} circuits`);

/**
 * Body of POST /api/visits/:id/readings: the circuit, when it was read, and every diagnosis
 * input except the refrigerant and metering device, which come from the equipment's
 * nameplate. The server merges those in and validates the whole with DiagnosisInputSchema.
 */
export const ReadingBodySchema = z
  .object({
    circuit: CircuitNumberSchema,
    takenAt: instant("takenAt must be an ISO 8601 date and time").optional(),
    note: text({ multiline: true }).max(MAX_REASON_LENGTH).optional(),
  })
  .loose();
export type ReadingBody = z.input<typeof ReadingBodySchema>;

export const PersonRefSchema = z.object({ id: z.uuid(), name: z.string() });

export const ReadingSchema = z.object({
  id: z.uuid(),
  visitId: z.uuid(),
  circuit: z.number().int(),
  takenAt: z.string(),
  note: z.string().nullable(),
  input: DiagnosisInputSchema,
  result: DiagnosisResultSchema,
  recordedBy: PersonRefSchema.nullable(),
});
export type Reading = z.infer<typeof ReadingSchema>;

export const ADJUSTMENT_KINDS = ["metering", "charge-added", "charge-removed", "airflow", "electrical", "other"] as const;
export const ADJUSTMENT_KIND_LABELS: Record<(typeof ADJUSTMENT_KINDS)[number], string> = {
  metering: "Metering device adjusted",
  "charge-added": "Refrigerant added",
  "charge-removed": "Refrigerant removed",
  airflow: "Airflow changed",
  electrical: "Electrical repair",
  other: "Other change",
};

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
  })
  // A charge change is only meaningful with its mass: the register needs the kilograms.
  .refine((value) => !value.kind.startsWith("charge-") || value.amountKg != null, {
    path: ["amountKg"],
    message: "Enter how many kg were added or removed",
  });
export type AdjustmentCreate = z.input<typeof AdjustmentCreateSchema>;

export const AdjustmentSchema = z.object({
  id: z.uuid(),
  circuit: z.number().int().nullable(),
  at: z.string(),
  kind: z.enum(ADJUSTMENT_KINDS),
  description: z.string(),
  amountKg: z.number().nullable(),
  recordedBy: PersonRefSchema.nullable(),
});
export type Adjustment = z.infer<typeof AdjustmentSchema>;

export const CommentCreateSchema = z.object({
  body: text({ multiline: true, error: "Write a comment" })
    .min(1, "Write a comment")
    .max(MAX_COMMENT_LENGTH, `Keep comments under ${MAX_COMMENT_LENGTH} characters`),
  readingId: z.uuid().optional().nullable(),
});

export const CommentSchema = z.object({
  id: z.uuid(),
  readingId: z.uuid().nullable(),
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
  createdAt: z.string(),
});
export type Photo = z.infer<typeof PhotoSchema>;

export const ReviewActionSchema = z.discriminatedUnion("action", [
  z.object({ action: z.literal("submit") }),
  z.object({ action: z.literal("sign-off"), note: text({ multiline: true }).max(MAX_COMMENT_LENGTH).optional() }),
  z.object({
    action: z.literal("send-back"),
    reason: text({ multiline: true, error: "Say what needs doing before sign-off" })
      .min(3, "Say what needs doing before sign-off")
      .max(MAX_COMMENT_LENGTH),
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
});
export type VisitSummary = z.infer<typeof VisitSummarySchema>;

export const VisitSchema = VisitSummarySchema.extend({
  customerContactEmail: z.string().nullable(),
  reviewNote: z.string().nullable(),
  signedOffBy: PersonRefSchema.nullable(),
  signedOffAt: z.string().nullable(),
  readings: z.array(ReadingSchema),
  adjustments: z.array(AdjustmentSchema),
  comments: z.array(CommentSchema),
  photos: z.array(PhotoSchema),
});
export type Visit = z.infer<typeof VisitSchema>;

export const SendReportSchema = z.object({
  to: z.email("Enter an e-mail address, like facilities@example.com"),
});
