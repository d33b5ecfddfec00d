/**
 * The refrigerant register: cylinders and every kilogram moved into or out of a system.
 * Contracts of /api/cylinders, /api/visits/:id/refrigerant, /api/equipment/:id/refrigerant
 * and /api/register. Masses in kg; the refrigerant of a movement always comes from the
 * equipment's nameplate (or, for a cylinder sent for reclaim, the cylinder's label), never
 * typed by hand.
 *
 * What a record must hold follows the record-keeping rules collated in TRADE.md §6
 * ("Refrigerant records at charging/recovery") and §8: equipment and location, refrigerant,
 * kg recovered / added (virgin or reclaimed) / sent on, cylinder id, technician, date.
 */
import { z } from "zod";
import { isKnownRefrigerant } from "../property-tables/refrigerant-catalogue.ts";
import { MAX_CIRCUIT_CHARGE_KG, MAX_CIRCUITS, MAX_NOTE_LENGTH } from "./equipment.ts";
import {
  AnnualLeakRateSchema,
  ChargeAgainstNameplateResultSchema,
  MAX_WATER_CAPACITY_KG,
  RefrigerantBalanceSchema,
  VerdictSchema,
} from "./procedures.ts";
import { PersonRefSchema, VoidInfoSchema } from "./visits.ts";
import { ChargeDeviationSchema } from "./diagnosis.ts";
import { instant } from "./dates.ts";
import { periodInOrder, REGISTER_FILTER_FIELDS } from "./list-pages.ts";
import { optionalClientId } from "./device-entries.ts";
import { text } from "./text.ts";

// ---------------------------------------------------------------------------------------------
// Cylinders
// ---------------------------------------------------------------------------------------------

/** recovery: takes refrigerant out of systems; new (virgin) and reclaimed: supply charge. */
export const CYLINDER_KINDS = ["recovery", "new", "reclaimed"] as const;
export const CylinderKindSchema = z.enum(CYLINDER_KINDS, { error: "Choose the kind of cylinder" });
export type CylinderKind = z.infer<typeof CylinderKindSchema>;
export const CYLINDER_KIND_LABELS: Record<CylinderKind, string> = {
  recovery: "Recovery",
  new: "New (virgin)",
  reclaimed: "Reclaimed",
};

export const MAX_LABEL_LENGTH = 60;

const massKg = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number in kg` })
    .refine(Number.isFinite, `${label} must be a number in kg`)
    .min(0, `${label} cannot be negative`)
    .max(max, `${label} above ${max} kg is not plausible`);

export const CylinderCreateSchema = z
  .object({
    label: text({ error: "Give the cylinder the label written on it" })
      .min(1, "Give the cylinder the label written on it")
      .max(MAX_LABEL_LENGTH, `Keep the label under ${MAX_LABEL_LENGTH} characters`),
    serial: text()
      .max(MAX_LABEL_LENGTH, `Keep the serial under ${MAX_LABEL_LENGTH} characters`)
      .optional()
      .nullable()
      // An emptied field means "no serial", never an empty string in the record.
      .transform((value) => (value ? value : null)),
    kind: CylinderKindSchema,
    refrigerant: text({ error: "Choose the refrigerant" }).refine(
      isKnownRefrigerant,
      "Choose a refrigerant from the list",
    ),
    waterCapacityKg: massKg("Water capacity", MAX_WATER_CAPACITY_KG).refine(
      (value) => value > 0,
      "Water capacity must be above 0 kg",
    ),
    tareKg: massKg("Tare", MAX_WATER_CAPACITY_KG).refine((value) => value > 0, "Tare must be above 0 kg"),
    /** What is in it on the day it is entered: gross weight on the scale minus the tare. */
    initialContentsKg: massKg("Contents", MAX_WATER_CAPACITY_KG).default(0),
  })
  // Refrigerant liquid is at most about 1.5 kg/L near room temperature, so a cylinder cannot
  // hold more than 1.5 × its water capacity; a larger figure is a typing error (kg vs lb).
  .refine((value) => value.initialContentsKg <= value.waterCapacityKg * 1.5, {
    path: ["initialContentsKg"],
    message: "More than the cylinder can physically hold: check the water capacity and the contents",
  });
export type CylinderCreate = z.input<typeof CylinderCreateSchema>;
export type CylinderValues = z.output<typeof CylinderCreateSchema>;

export const CylinderFillSchema = z.object({
  /** 80 % liquid fill at the reference temperature (cylinderFillLimit); null when the tables cannot say. */
  maxContentsKg: z.number().nullable(),
  referenceTempC: z.number(),
  /** judgeCylinderFill on a recovery cylinder's contents; null for supplier-filled cylinders or without a limit. */
  check: VerdictSchema.nullable(),
  /** Why there is no limit (e.g. the refrigerant is supercritical at the reference temperature). */
  note: z.string().nullable(),
});
export type CylinderFill = z.infer<typeof CylinderFillSchema>;

export const CylinderSchema = z.object({
  id: z.uuid(),
  label: z.string(),
  serial: z.string().nullable(),
  kind: CylinderKindSchema,
  refrigerant: z.string(),
  waterCapacityKg: z.number(),
  tareKg: z.number(),
  initialContentsKg: z.number(),
  /** initial contents + movements in − movements out (derived from the register). */
  contentsKg: z.number(),
  /** tare + contents: what the scale should read. */
  grossKg: z.number(),
  fill: CylinderFillSchema,
  createdAt: z.string(),
});
export type Cylinder = z.infer<typeof CylinderSchema>;

// ---------------------------------------------------------------------------------------------
// Movements
// ---------------------------------------------------------------------------------------------

export const MOVEMENT_KINDS = ["recovered", "reused", "added-new", "added-reclaimed", "sent-for-reclaim"] as const;
export const MovementKindSchema = z.enum(MOVEMENT_KINDS, { error: "Choose what happened to the refrigerant" });
export type MovementKind = z.infer<typeof MovementKindSchema>;
export const MOVEMENT_KIND_LABELS: Record<MovementKind, string> = {
  recovered: "Recovered from the system",
  reused: "Reused (charged back into this system)",
  "added-new": "Added, new refrigerant",
  "added-reclaimed": "Added, reclaimed refrigerant",
  "sent-for-reclaim": "Sent for reclaim",
};

/**
 * Which cylinders each movement may use, and which way the mass goes for the cylinder.
 * Recovered refrigerant goes into a recovery cylinder; reused refrigerant comes back out of
 * one (or straight from the unit's own receiver, with no cylinder); additions come from a new
 * or reclaimed cylinder; a recovery cylinder's contents are sent for reclaim.
 */
export const MOVEMENT_CYLINDER_RULES: Record<
  MovementKind,
  { cylinderKinds: readonly CylinderKind[]; cylinderRequired: boolean; intoCylinder: boolean }
> = {
  recovered: { cylinderKinds: ["recovery"], cylinderRequired: true, intoCylinder: true },
  reused: { cylinderKinds: ["recovery"], cylinderRequired: false, intoCylinder: false },
  "added-new": { cylinderKinds: ["new"], cylinderRequired: true, intoCylinder: false },
  "added-reclaimed": { cylinderKinds: ["reclaimed"], cylinderRequired: true, intoCylinder: false },
  "sent-for-reclaim": { cylinderKinds: ["recovery"], cylinderRequired: true, intoCylinder: false },
};

/** One movement is at most a large circuit's whole charge. */
export const MAX_MOVEMENT_KG = MAX_CIRCUIT_CHARGE_KG;

const MovementMassSchema = z
  .number({ error: "Enter the mass in kg, weighed on the scale" })
  .refine(Number.isFinite, "Enter the mass in kg, weighed on the scale")
  .positive("The mass must be above 0 kg")
  .max(MAX_MOVEMENT_KG, `More than ${MAX_MOVEMENT_KG} kg in one movement is not plausible`);

const optionalNote = text({ multiline: true })
  .max(MAX_NOTE_LENGTH, `Keep the note under ${MAX_NOTE_LENGTH} characters`)
  .optional()
  .nullable()
  .transform((value) => (value ? value : null));

/** Body of POST /api/visits/:id/refrigerant. */
export const MovementCreateSchema = z
  .object({
    kind: MovementKindSchema,
    kg: MovementMassSchema,
    circuit: z
      .number({ error: "Say which circuit" })
      .int("Circuits are numbered 1, 2, 3…")
      .min(1, "Circuits are numbered from 1")
      .max(MAX_CIRCUITS, `Satura records up to ${MAX_CIRCUITS} circuits`),
    cylinderId: z.uuid("Choose a cylinder").optional().nullable(),
    at: instant("at must be an ISO 8601 date and time").optional(),
    note: optionalNote,
    /** The device's id for this movement: a repeated send stores it once (README decision 026). */
    clientId: optionalClientId,
  })
  // The register must say where the refrigerant went or came from (TRADE.md §6 record fields).
  .refine((value) => !MOVEMENT_CYLINDER_RULES[value.kind].cylinderRequired || Boolean(value.cylinderId), {
    path: ["cylinderId"],
    message: "Choose the cylinder it went into or came from",
  });
export type MovementCreate = z.input<typeof MovementCreateSchema>;
export type MovementValues = z.output<typeof MovementCreateSchema>;

/** Body of POST /api/cylinders/:id/reclaim: a recovery cylinder's contents handed on for reclaim. */
export const ReclaimCreateSchema = z.object({
  kg: MovementMassSchema,
  at: instant().optional(),
  note: optionalNote,
});
export type ReclaimCreate = z.input<typeof ReclaimCreateSchema>;

export const MovementSchema = z.object({
  id: z.uuid(),
  visitId: z.uuid().nullable(),
  equipmentId: z.uuid().nullable(),
  equipmentName: z.string().nullable(),
  circuit: z.number().int().nullable(),
  refrigerant: z.string(),
  kind: MovementKindSchema,
  kg: z.number(),
  cylinder: z.object({ id: z.uuid(), label: z.string() }).nullable(),
  technician: PersonRefSchema.nullable(),
  at: z.string(),
  note: z.string().nullable(),
  /** A voided movement stays listed, struck through, and counts in no balance, contents, total or export. */
  voided: VoidInfoSchema,
});
export type Movement = z.infer<typeof MovementSchema>;

/**
 * How many register lines an answer leaves out because the reader may not see them (another
 * technician's, for a technician; all, for an apprentice). Balances and contents still count them.
 */
const HiddenMovementsSchema = z.number().int().min(0);

export const CylinderDetailSchema = z.object({
  cylinder: CylinderSchema,
  movements: z.array(MovementSchema),
  hiddenMovements: HiddenMovementsSchema,
});
export type CylinderDetail = z.infer<typeof CylinderDetailSchema>;

/** The answer to POST /api/visits/:id/refrigerant: the movement and, if it used one, its cylinder after it. */
export const MovementCreatedSchema = z.object({ movement: MovementSchema, cylinder: CylinderSchema.nullable() });

// ---------------------------------------------------------------------------------------------
// A visit's balance and charging
// ---------------------------------------------------------------------------------------------

/** Line-length allowances are grams per metre (TRADE.md §6); ±50 kg covers any field run. */
export const MAX_LINE_ADJUSTMENT_KG = 50;

/**
 * Body of PUT /api/visits/:id/refrigerant/charging/:circuit: this circuit had a full weigh-in.
 * A changed figure voids the standing declaration (saying what changed) and records the new one;
 * withdrawing it is a void with a reason (POST /api/visits/:id/voids, kind "charging").
 */
export const ChargingUpdateSchema = z.strictObject({
  lineAdjustmentKg: z
    .number({ error: "Enter the line-length adjustment in kg (0 if none)" })
    .refine(Number.isFinite, "Enter the line-length adjustment in kg (0 if none)")
    .min(-MAX_LINE_ADJUSTMENT_KG, `A line adjustment below −${MAX_LINE_ADJUSTMENT_KG} kg is not plausible`)
    .max(MAX_LINE_ADJUSTMENT_KG, `A line adjustment above ${MAX_LINE_ADJUSTMENT_KG} kg is not plausible`),
});
export type ChargingUpdate = z.input<typeof ChargingUpdateSchema>;

export const CircuitBalanceSchema = z.object({
  circuit: z.number().int(),
  nameplateKg: z.number(),
  recoveredKg: z.number(),
  reusedKg: z.number(),
  addedKg: z.number(),
  sentForReclaimKg: z.number(),
  /** refrigerantBalance() over this visit's movements on the circuit. */
  balance: RefrigerantBalanceSchema,
  /** True when refrigerant was recovered, so the shortfall says how far short the system was. */
  recoveredOnVisit: z.boolean(),
  /**
   * The charge estimate of the circuit's last standing reading taken before its first standing
   * recovery on the visit, set beside what the scale then found; null when the circuit was not
   * recovered or no reading before it carried an estimate. Worked out over every reading of
   * the visit on the server (the browser holds only the latest pages of a long run log).
   */
  estimateBeforeRecovery: ChargeDeviationSchema.nullable(),
  /** The full weigh-in against the nameplate, when the circuit was emptied or a weigh-in was declared. */
  charging: z
    .object({
      weighedInKg: z.number(),
      lineAdjustmentKg: z.number(),
      declared: z.boolean(),
      /** The standing declaration's id (to void it); null when the weigh-in is inferred from a recovery. */
      declarationId: z.uuid().nullable(),
      check: ChargeAgainstNameplateResultSchema,
    })
    .nullable(),
});
export type CircuitBalance = z.infer<typeof CircuitBalanceSchema>;

/**
 * The run log's charge adjustments beside the register. A linked adjustment carries its
 * movement's kilograms, so the two totals are equal by construction; `agrees` is the check that
 * says so on the report. Adjustments stored before entries were linked are listed, never counted.
 */
export const RunLogChargeCheckSchema = z.object({
  /** Standing linked adjustments: refrigerant added (into the system) and removed, kg. */
  runLogInKg: z.number(),
  runLogOutKg: z.number(),
  /** Standing register movements of the visit: reused + added, and recovered, kg. */
  registerInKg: z.number(),
  registerOutKg: z.number(),
  agrees: z.boolean(),
  unlinked: z.array(
    z.object({
      id: z.uuid(),
      at: z.string(),
      circuit: z.number().int().nullable(),
      kind: z.enum(["charge-added", "charge-removed"]),
      amountKg: z.number(),
    }),
  ),
});
export type RunLogChargeCheck = z.infer<typeof RunLogChargeCheckSchema>;

/** Into or out of the system, for the run log's two charge adjustment kinds. */
export const MOVEMENT_DIRECTION: Record<
  Exclude<MovementKind, "sent-for-reclaim">,
  "charge-added" | "charge-removed"
> = {
  recovered: "charge-removed",
  reused: "charge-added",
  "added-new": "charge-added",
  "added-reclaimed": "charge-added",
};

export const VisitRefrigerantSchema = z.object({
  refrigerant: z.string(),
  /** Zeotropic blend with a glide above ZEOTROPE_GLIDE_NOTE_K: charge it as liquid (TRADE.md §6). */
  liquidChargingNote: z.string().nullable(),
  glideK: z.number().nullable(),
  movements: z.array(MovementSchema),
  hiddenMovements: HiddenMovementsSchema,
  circuits: z.array(CircuitBalanceSchema),
  /** The run log's charge adjustments against the register: one entry, one number. */
  runLogCheck: RunLogChargeCheckSchema,
});
export type VisitRefrigerant = z.infer<typeof VisitRefrigerantSchema>;

/**
 * Glide above which Satura shows the liquid-charging note, K. Near-azeotropes such as R410A
 * glide about 0.1 K and may be treated like pure fluids; 400-series blends with a real glide
 * must leave the cylinder as liquid (TRADE.md §6 [S4][S56]); the 1 K threshold is common practice.
 */
export const ZEOTROPE_GLIDE_NOTE_K = 1;

// ---------------------------------------------------------------------------------------------
// Equipment history and the register
// ---------------------------------------------------------------------------------------------

export const EquipmentRefrigerantSchema = z.object({
  refrigerant: z.string(),
  nameplateKg: z.number(),
  movements: z.array(MovementSchema),
  hiddenMovements: HiddenMovementsSchema,
  /** Refrigerant put back per visit beyond what was taken out: what had leaked since. */
  topUps: z.array(z.object({ visitId: z.uuid(), date: z.string(), addedKg: z.number() })),
  leakRate: AnnualLeakRateSchema.nullable(),
});
export type EquipmentRefrigerant = z.infer<typeof EquipmentRefrigerantSchema>;

/** Query of GET /api/register/export.csv (and the filters of GET /api/register). */
export const RegisterQuerySchema = z.object(REGISTER_FILTER_FIELDS).refine(...periodInOrder);
export type RegisterQuery = z.input<typeof RegisterQuerySchema>;

export const RegisterLineSchema = MovementSchema.extend({
  siteName: z.string().nullable(),
  location: z.string().nullable(),
});
export type RegisterLine = z.infer<typeof RegisterLineSchema>;

/** GET /api/register: one page of lines (RegisterPageQuerySchema in list-pages.ts) and the period's totals. */
export const RegisterListSchema = z.object({
  movements: z.array(RegisterLineSchema),
  /**
   * Totals by refrigerant and kind, kg, over every line of the period and technician, not only
   * the page shown: what a regulator's return asks for.
   */
  totals: z.array(z.object({ refrigerant: z.string(), kind: MovementKindSchema, kg: z.number() })),
  /** False when the caller may only see their own movements (technicians). */
  allTechnicians: z.boolean(),
  /** The cursor of the next page; null on the last. */
  nextCursor: z.string().nullable(),
});
export type RegisterList = z.infer<typeof RegisterListSchema>;
