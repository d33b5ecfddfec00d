/**
 * Customers, sites and equipment: the contracts of /api/customers, /api/sites and
 * /api/equipment. A unit's nameplate is what the diagnosis and the refrigerant register
 * rely on, so it is validated here once for the form, the server and the CSV import.
 */
import { z } from "zod";
import { isKnownRefrigerant } from "../property-tables/refrigerant-catalogue.ts";
import {
  ApplicationSchema,
  MAX_CIRCUIT_CHARGE_KG,
  MAX_LINE_LENGTH_M,
  MeteringDeviceSchema,
  MIN_RLA_A,
  type Application,
} from "./diagnosis.ts";
import { text } from "./text.ts";

export const MAX_CIRCUITS = 4;
/** Largest factory charge per circuit accepted, kg: a large packaged chiller circuit. */
export { MAX_CIRCUIT_CHARGE_KG };
export const MAX_NAME_LENGTH = 120;
export const MAX_NOTE_LENGTH = 500;

const optionalText = (max: number, options: { multiline?: boolean } = {}) =>
  text(options)
    .max(max, `Keep this under ${max} characters`)
    .optional()
    .nullable()
    // An emptied field means "no value", never an empty string in the record.
    .transform((value) => (value ? value : null));

const requiredName = (what: string) =>
  text({ error: `Give the ${what} a name` })
    .min(1, `Give the ${what} a name`)
    .max(MAX_NAME_LENGTH, `Keep the name under ${MAX_NAME_LENGTH} characters`);

const optionalPositive = (label: string, unit: string, max: number) =>
  z
    .number({ error: `${label} must be a number in ${unit}` })
    .positive(`${label} must be above 0 ${unit}`)
    .max(max, `${label} above ${max} ${unit} is not plausible`)
    .optional()
    .nullable()
    .transform((value) => value ?? null);

export const CustomerInputSchema = z.object({
  name: requiredName("customer"),
  contactName: optionalText(MAX_NAME_LENGTH),
  contactEmail: z
    .union([z.literal(""), z.email("Enter an e-mail address like name@example.com")])
    .optional()
    .nullable()
    .transform((value) => (value ? value : null)),
  contactPhone: optionalText(40),
});
export type CustomerInput = z.input<typeof CustomerInputSchema>;

export const CustomerSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  contactName: z.string().nullable(),
  contactEmail: z.string().nullable(),
  contactPhone: z.string().nullable(),
});
export type Customer = z.infer<typeof CustomerSchema>;

export const SiteInputSchema = z.object({
  customerId: z.uuid("Choose the customer"),
  name: requiredName("site"),
  address: optionalText(MAX_NOTE_LENGTH, { multiline: true }),
  altitudeM: z
    .number({ error: "Altitude must be a number in metres" })
    .min(-430, "Altitude below the Dead Sea shore is not a site")
    .max(5500, "Altitude above 5 500 m is beyond Satura's atmospheric range")
    .optional()
    .nullable()
    .transform((value) => value ?? null),
});
export type SiteInput = z.input<typeof SiteInputSchema>;

export const SiteSchema = z.object({
  id: z.uuid(),
  customerId: z.uuid(),
  customerName: z.string(),
  name: z.string(),
  address: z.string().nullable(),
  altitudeM: z.number().nullable(),
});
export type Site = z.infer<typeof SiteSchema>;

export const CircuitNameplateSchema = z.object({
  number: z.number().int().min(1).max(MAX_CIRCUITS),
  factoryChargeKg: z
    .number({ error: "Factory charge must be a number in kg" })
    .positive("Factory charge must be above 0 kg")
    .max(MAX_CIRCUIT_CHARGE_KG, `Factory charge above ${MAX_CIRCUIT_CHARGE_KG} kg is not plausible for one circuit`),
  meteringDevice: MeteringDeviceSchema,
  targetSuperheatK: z
    .number({ error: "Target superheat must be a number in K" })
    .min(0, "Target superheat cannot be negative")
    .max(30, "Target superheat above 30 K is not a nameplate value")
    .optional()
    .nullable()
    .transform((value) => value ?? null),
  targetSubcoolingK: z
    .number({ error: "Target subcooling must be a number in K" })
    .min(0, "Target subcooling cannot be negative")
    .max(30, "Target subcooling above 30 K is not a nameplate value")
    .optional()
    .nullable()
    .transform((value) => value ?? null),
  /** Length of the liquid line (the line set) between the units, m; null for a packaged unit or unknown. */
  liquidLineLengthM: z
    .number({ error: "Liquid line length must be a number in m" })
    .min(0, "Liquid line length cannot be negative")
    .max(MAX_LINE_LENGTH_M, `Liquid line length above ${MAX_LINE_LENGTH_M} m is not a line set`)
    .optional()
    .nullable()
    .transform((value) => value ?? null),
});
export type CircuitNameplate = z.infer<typeof CircuitNameplateSchema>;

export const EQUIPMENT_KINDS = [
  "packaged rooftop",
  "split system",
  "wall split",
  "ducted split",
  "cool room",
  "freezer room",
  "chiller",
  "display case",
  "other",
] as const;

/** Application a new unit of each kind usually has (the form's starting point; the technician decides). */
export const DEFAULT_APPLICATION_BY_KIND: Readonly<Record<(typeof EQUIPMENT_KINDS)[number], Application>> = {
  "packaged rooftop": "comfort-cooling",
  "split system": "comfort-cooling",
  "wall split": "comfort-cooling",
  "ducted split": "comfort-cooling",
  "cool room": "medium-temperature-refrigeration",
  "freezer room": "low-temperature-refrigeration",
  chiller: "process-chilling",
  "display case": "medium-temperature-refrigeration",
  other: "comfort-cooling",
};

export const EquipmentInputSchema = z
  .object({
    siteId: z.uuid("Choose the site"),
    name: requiredName("unit"),
    kind: z.enum(EQUIPMENT_KINDS, { error: "Choose the kind of equipment" }),
    /** What the unit does: sets the bands its readings are judged against. Absent: the kind's usual one. */
    application: ApplicationSchema.optional(),
    location: optionalText(MAX_NOTE_LENGTH),
    maker: optionalText(MAX_NAME_LENGTH),
    model: optionalText(MAX_NAME_LENGTH),
    serial: optionalText(MAX_NAME_LENGTH),
    refrigerant: text({ error: "Choose the refrigerant" }).refine(
      isKnownRefrigerant,
      "Choose a refrigerant from the list",
    ),
    circuits: z
      .array(CircuitNameplateSchema)
      .min(1, "A unit has at least one circuit")
      .max(MAX_CIRCUITS, `Satura records up to ${MAX_CIRCUITS} circuits per unit`)
      // Circuits are numbered 1…n in order, so readings can name them unambiguously.
      .refine(
        (circuits) => circuits.every((circuit, index) => circuit.number === index + 1),
        "Number the circuits 1, 2, 3… in order",
      ),
    compressorRlaA: optionalPositive("Compressor RLA", "A", 2000).refine(
      (value) => value === null || value >= MIN_RLA_A,
      `Compressor RLA below ${MIN_RLA_A} A is not a compressor's rating`,
    ),
    compressorLraA: optionalPositive("Compressor LRA", "A", 10_000),
    fanFlaA: optionalPositive("Fan FLA", "A", 500),
    supplyVoltageV: z
      .number({ error: "Supply voltage must be a number in V" })
      .int("Supply voltage is a whole number of volts")
      .min(12, "Supply voltage below 12 V is not a mains supply")
      .max(1000, "Supply voltage above 1 000 V is beyond low voltage equipment")
      .optional()
      .nullable()
      .transform((value) => value ?? null),
    phases: z
      .union([z.literal(1), z.literal(3)], { error: "Phases are 1 or 3" })
      .optional()
      .nullable()
      .transform((value) => value ?? null),
    ratedHighSideKPa: optionalPositive("Rated high-side pressure", "kPa", 15_000),
    ratedLowSideKPa: optionalPositive("Rated low-side pressure", "kPa", 15_000),
  })
  // An API client that leaves the application out gets the one its kind usually has.
  .transform((values) => ({ ...values, application: values.application ?? DEFAULT_APPLICATION_BY_KIND[values.kind] }));

export type EquipmentInput = z.input<typeof EquipmentInputSchema>;
export type EquipmentValues = z.output<typeof EquipmentInputSchema>;

export const EquipmentSchema = z.object({
  id: z.uuid(),
  siteId: z.uuid(),
  siteName: z.string(),
  customerId: z.uuid(),
  customerName: z.string(),
  name: z.string(),
  kind: z.string(),
  application: ApplicationSchema,
  location: z.string().nullable(),
  maker: z.string().nullable(),
  model: z.string().nullable(),
  serial: z.string().nullable(),
  refrigerant: z.string(),
  circuits: z.array(CircuitNameplateSchema),
  compressorRlaA: z.number().nullable(),
  compressorLraA: z.number().nullable(),
  fanFlaA: z.number().nullable(),
  supplyVoltageV: z.number().nullable(),
  phases: z.number().nullable(),
  ratedHighSideKPa: z.number().nullable(),
  ratedLowSideKPa: z.number().nullable(),
  createdAt: z.string(),
});
export type Equipment = z.infer<typeof EquipmentSchema>;
