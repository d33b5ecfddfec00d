import { z } from "zod";
import { STANDARD_ATMOSPHERE_KPA } from "../engine/properties/property-tolerances.ts";
import { AuthUserSchema, PersonNameSchema } from "./auth.ts";
import { text } from "./text.ts";

/**
 * Display preferences. Storage and the engine stay SI-metric (°C, kPa); these only change
 * what screens show.
 */
export const TEMPERATURE_UNITS = ["C", "F"] as const;
export const PRESSURE_UNITS = ["kPa", "psi", "bar"] as const;
export const TemperatureUnitSchema = z.enum(TEMPERATURE_UNITS);
export const PressureUnitSchema = z.enum(PRESSURE_UNITS);
export type TemperatureUnit = z.infer<typeof TemperatureUnitSchema>;
export type PressureUnit = z.infer<typeof PressureUnitSchema>;

/** Standard atmosphere at sea level (ISO 2533 / ICAO: 101.325 kPa), the engine's constant. */
export { STANDARD_ATMOSPHERE_KPA };
/**
 * Accepted default atmospheric pressures, kPa absolute. 50 kPa is roughly the ISO 2533
 * standard atmosphere at 5 500 m, above any serviced building; 110 kPa is above the
 * highest sea-level pressures recorded (about 108.4 kPa, from memory).
 */
export const ATMOSPHERIC_PRESSURE_MIN_KPA = 50;
export const ATMOSPHERIC_PRESSURE_MAX_KPA = 110;

export const PreferencesSchema = z.object({
  temperatureUnit: TemperatureUnitSchema,
  pressureUnit: PressureUnitSchema,
  /** kPa absolute; converts gauge readings to absolute where a site gives no altitude. */
  atmosphericPressureKPa: z
    .number({ error: "Enter a pressure in kPa" })
    .min(ATMOSPHERIC_PRESSURE_MIN_KPA, `At least ${ATMOSPHERIC_PRESSURE_MIN_KPA} kPa`)
    .max(ATMOSPHERIC_PRESSURE_MAX_KPA, `At most ${ATMOSPHERIC_PRESSURE_MAX_KPA} kPa`),
});
export type Preferences = z.infer<typeof PreferencesSchema>;

/** Metric first (PRODUCT.md "Units"). */
export const DEFAULT_PREFERENCES: Preferences = {
  temperatureUnit: "C",
  pressureUnit: "kPa",
  atmosphericPressureKPa: STANDARD_ATMOSPHERE_KPA,
};

/** GET /api/profile and the answer to PUT. */
export const LICENCE_NUMBER_MAX_LENGTH = 40;

export const ProfileSchema = z.object({
  user: AuthUserSchema,
  organisationName: z.string(),
  preferences: PreferencesSchema,
  /** Refrigerant handling licence or certificate number (the register export names it). */
  licenceNumber: z.string().nullable(),
  /** Sent back as If-Match with PUT /api/profile. */
  version: z.number().int(),
});
export type Profile = z.infer<typeof ProfileSchema>;

/** PUT /api/profile */
export const UpdateProfileSchema = z.object({
  name: PersonNameSchema,
  preferences: PreferencesSchema,
  /**
   * Left out: unchanged. Empty or null: removed. Null is accepted because the form sends what
   * this schema made of an emptied field (regression: a profile with no licence could not be saved).
   */
  licenceNumber: text()
    .max(LICENCE_NUMBER_MAX_LENGTH, `At most ${LICENCE_NUMBER_MAX_LENGTH} characters`)
    .nullable()
    .optional()
    .transform((value) => (value === undefined ? undefined : value ? value : null)),
});
export type UpdateProfile = z.infer<typeof UpdateProfileSchema>;
