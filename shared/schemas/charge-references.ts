/**
 * A circuit's charge reference point as stored with the equipment: the settled readings taken
 * at a known correct charge (ChargeReferenceSchema, the engine's input), plus where it came
 * from. Charge deviation is measured from it (virtual refrigerant charge method, Li & Braun 2009).
 * One stands per circuit; replaced or cleared ones stay as history, never deleted.
 */
import { z } from "zod";
import { ChargeReferenceSchema } from "./diagnosis.ts";
import { text } from "./text.ts";
import { PersonRefSchema } from "./visits.ts";

/**
 * weigh-in: set automatically once the circuit settled after a full weigh-in of its charge
 * (the register's charging declaration); set-by-senior: chosen by a senior or an owner.
 */
export const CHARGE_REFERENCE_SOURCES = ["weigh-in", "set-by-senior"] as const;
export const ChargeReferenceSourceSchema = z.enum(CHARGE_REFERENCE_SOURCES);
export type ChargeReferenceSource = z.infer<typeof ChargeReferenceSourceSchema>;

export const CHARGE_REFERENCE_SOURCE_LABELS: Record<ChargeReferenceSource, string> = {
  "weigh-in": "Settled after a weigh-in",
  "set-by-senior": "Set by a senior",
};

export const MAX_CLEAR_REASON_LENGTH = 500;

export const StoredChargeReferenceSchema = z.object({
  id: z.uuid(),
  circuit: z.number().int(),
  values: ChargeReferenceSchema,
  source: ChargeReferenceSourceSchema,
  setAt: z.string(),
  setBy: PersonRefSchema.nullable(),
  /** The visit whose readings it came from, and the (last) reading; null when typed in. */
  visitId: z.uuid().nullable(),
  visitStartedAt: z.string().nullable(),
  readingId: z.uuid().nullable(),
  /** How many settled readings were averaged (1 for a chosen reading, 0 for typed values). */
  readingCount: z.number().int().min(0),
  note: z.string().nullable(),
  /** When, by whom and why it stopped standing (cleared, or replaced by a newer one); null while it stands. */
  cleared: z.object({ at: z.string(), by: PersonRefSchema.nullable(), reason: z.string() }).nullable(),
});
export type StoredChargeReference = z.infer<typeof StoredChargeReferenceSchema>;

/** GET /api/equipment/:id/charge-references: per circuit, its correct charge, the standing reference and the history (newest first). */
export const CircuitChargeReferencesSchema = z.object({
  circuit: z.number().int(),
  /** Nameplate factory charge plus the line-set adjustment of the latest full weigh-in, kg: the diagnosis' `chargeKg`. */
  correctChargeKg: z.number(),
  lineAdjustmentKg: z.number(),
  current: StoredChargeReferenceSchema.nullable(),
  history: z.array(StoredChargeReferenceSchema),
});
export type CircuitChargeReferences = z.infer<typeof CircuitChargeReferencesSchema>;

export const ChargeReferencesResponseSchema = z.object({ circuits: z.array(CircuitChargeReferencesSchema) });
export type ChargeReferencesResponse = z.infer<typeof ChargeReferencesResponseSchema>;

const noteSchema = text({ multiline: true })
  .max(MAX_CLEAR_REASON_LENGTH, `Keep the note under ${MAX_CLEAR_REASON_LENGTH} characters`)
  .optional();

/**
 * PUT /api/equipment/:id/charge-references/:circuit: from one of the circuit's readings (its
 * computed subcooling, superheat and saturation temperatures, and its measured air), or from
 * values typed in (e.g. a commissioning sheet). Strict: one or the other, nothing else.
 */
export const ChargeReferenceSetSchema = z.union(
  [
    z.strictObject({ readingId: z.uuid("Choose a reading of this circuit"), note: noteSchema }),
    z.strictObject({ values: ChargeReferenceSchema, note: noteSchema }),
  ],
  { error: "Send either readingId (a reading of this circuit) or values (the reference point)" },
);
export type ChargeReferenceSet = z.input<typeof ChargeReferenceSetSchema>;

/** DELETE /api/equipment/:id/charge-references/:circuit: the reason stays in the history. */
export const ChargeReferenceClearSchema = z.strictObject({
  reason: text({ multiline: true, error: "Say why the reference point is cleared" })
    .min(3, "Say why the reference point is cleared, e.g. “condenser coil replaced”")
    .max(MAX_CLEAR_REASON_LENGTH, `Keep the reason under ${MAX_CLEAR_REASON_LENGTH} characters`),
});
export type ChargeReferenceClear = z.input<typeof ChargeReferenceClearSchema>;
