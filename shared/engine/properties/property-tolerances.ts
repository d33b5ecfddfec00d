/**
 * Named tolerances of the property engine, shared by code and tests.
 */

/** Largest allowed error of an interpolated saturation temperature against the EOS, K (issue 3). */
export const INTERPOLATION_TOLERANCE_K = 0.005;

/** Build-time limit for the phase-equilibrium solution against the superancillary (relative). */
export const SUPERANCILLARY_TOLERANCE = 1e-6;

/** Offset between the Celsius and Kelvin scales. */
export const KELVIN_OFFSET = 273.15;

/** Standard atmosphere in kPa, the default for gauge ↔ absolute conversions. */
export const STANDARD_ATMOSPHERE_KPA = 101.325;

/**
 * Promised interpolation error of the single-phase tables (superheated vapour and subcooled
 * liquid) against the direct equation-of-state solve, shared by the tests: enthalpy and
 * entropy at (p, T), density relative, and the temperature found back from (p, h) and (p, s).
 */
export const SINGLE_PHASE_TOLERANCES = {
  enthalpyKJPerKg: 0.05,
  entropyKJPerKgK: 1e-4,
  densityRelative: 5e-4,
  temperatureK: 0.02,
} as const;

/** What the generator accepts (half the promise): a phase grid is refined until it fits. */
export const SINGLE_PHASE_BUDGET = {
  enthalpyKJPerKg: SINGLE_PHASE_TOLERANCES.enthalpyKJPerKg / 2,
  entropyKJPerKgK: SINGLE_PHASE_TOLERANCES.entropyKJPerKgK / 2,
  densityRelative: SINGLE_PHASE_TOLERANCES.densityRelative / 2,
  temperatureK: SINGLE_PHASE_TOLERANCES.temperatureK / 2,
} as const;
