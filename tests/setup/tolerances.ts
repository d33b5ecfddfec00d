/**
 * Tolerances shared by several engine accuracy tests, each with where it comes from.
 * A tolerance used by one file alone is named at the top of that file; the engine's own
 * promises (INTERPOLATION_TOLERANCE_K, SINGLE_PHASE_TOLERANCES) live in
 * shared/engine/properties/property-tolerances.ts and are imported from there.
 */

/**
 * Saturated-table densities and enthalpies (interpolated linearly in T between rows 0.5 K
 * apart) against the equation of state or mixture model that generated them, more than 5 K
 * below the table's end: the bound the project set with the tables (docs/properties.md,
 * "Interpolation"), looser for the vapour density, which bends most between rows. The
 * enthalpy bound is the same 0.05 kJ/kg as the single-phase tables' promise.
 */
export const SATURATED_TABLE_TOLERANCES = {
  liquidDensityRelative: 2e-4,
  vapourDensityRelative: 2e-3,
  enthalpyKJPerKg: 0.05,
} as const;
