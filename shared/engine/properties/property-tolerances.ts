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
