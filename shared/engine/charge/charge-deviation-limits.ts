import { MEMORY } from "../diagnosis/sources.ts";

/**
 * The virtual refrigerant charge (VRC) method: the charge relative to a reference charge is
 * linear in the subcooling deviation and, where the superheat moves with the charge (fixed
 * metering, or a valve past its range), in the superheat deviation, with coefficients from a
 * reference point. Equations as recalled from the papers, not re-read here.
 */
export const VIRTUAL_CHARGE_SOURCE = `virtual refrigerant charge method: H. Li and J. E. Braun, "Development, evaluation, and demonstration of a virtual refrigerant charge sensor", HVAC&R Research 15(1), 2009, and W. Kim and J. E. Braun's later Purdue evaluations with default parameters (equations ${MEMORY.replace("memory", "from memory")})`;

/**
 * Share of the charge held as subcooled liquid in the condenser at the reference point of a
 * unit with a short line set: losing about this share of the charge empties the subcooling
 * zone, so the subcooling falls to zero. About a quarter for air-cooled split and packaged
 * units (from memory, unverified; common practice: 1 K of subcooling per 4–5 % of charge at 5–6 K target).
 */
export const SUBCOOLED_SHARE_OF_CHARGE = 0.25;
/** The generic coefficient never falls below this reference subcooling, K (a 1 K target would make every kelvin a quarter of the charge). */
export const MIN_REFERENCE_SUBCOOLING_K = 4;
/**
 * Liquid held per metre of liquid line, kg/m: a 3/8 in (9.5 mm) line of a high-pressure blend,
 * as makers' line-set charge adjustments give it (common practice, about 0.05 kg/m).
 * It is charge the subcooling does not see, so a long line set dilutes the coefficient.
 */
export const LIQUID_LINE_KG_PER_M = 0.05;
/**
 * Superheat-to-subcooling coefficient ratio k_sh/k_sc for a fixed metering device: superheat
 * rises several kelvin for each kelvin the subcooling falls as the charge drops (from memory, unverified).
 * A TXV or EEV holds superheat in its band, so the term counts only above the band (the valve
 * is wide open and can no longer hide the shortage).
 */
export const SUPERHEAT_TO_SUBCOOLING_RATIO = -0.2;
/**
 * Range of the estimate, as a share of the correct charge. With the unit's own reference point
 * the papers report about ±10 % of the charge (from memory, unverified); ±6 % plus the sensors' 0.5 K on the
 * subcooling is used here. With generic coefficients the slope itself is uncertain: ±40 % of
 * the estimate plus ±10 % of the charge.
 */
export const REFERENCE_RANGE_SHARE = 0.06;
export const SENSOR_SUBCOOLING_K = 0.5;
export const GENERIC_SLOPE_UNCERTAINTY = 0.4;
export const GENERIC_RANGE_SHARE = 0.1;
/** Outdoor-air difference from the reference point that the method absorbs, K; each kelvin beyond widens the range by 1 % of the charge (common practice). */
export const REFERENCE_CONDITION_TOLERANCE_K = 5;
export const RANGE_SHARE_PER_K_BEYOND = 0.01;
