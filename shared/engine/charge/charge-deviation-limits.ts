import { MEMORY } from "../sources/marks.ts";

/**
 * The virtual refrigerant charge (VRC) method: the charge relative to a reference charge is
 * linear in the subcooling deviation and, where the superheat moves with the charge (fixed
 * metering, or a valve past its range), in the superheat deviation, with coefficients from a
 * reference point. Equations as recalled from the papers, not re-read here.
 */
export const VIRTUAL_CHARGE_SOURCE = `virtual refrigerant charge method: H. Li and J. E. Braun, "Development, evaluation, and demonstration of a virtual refrigerant charge sensor", HVAC&R Research 15(1), 2009, and W. Kim and J. E. Braun's later Purdue evaluations with default parameters; equations as recalled: ${MEMORY}`;

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
 * Superheat-to-subcooling coefficient ratio k_sh/k_sc for a fixed metering device: each kelvin
 * the superheat rises counts as this many kelvin of subcooling lost. The papers fit it per unit
 * (value from memory, unverified). Tuned against the charge-inventory model
 * (`npm run validate:charge`): while the condenser still holds subcooled liquid the superheat's
 * rise mostly repeats the subcooling's fall (ratio about 0 fits best), once the liquid line
 * flashes it is the only signal (about −0.2 fits best); −0.1 splits them. Was −0.2, which
 * overstated the deviation of fixed-orifice circuits by about a third.
 */
export const SUPERHEAT_TO_SUBCOOLING_RATIO = -0.1;
/**
 * The same ratio for a TXV or EEV, counted only for the superheat above the valve's band (the
 * valve is wide open and can no longer hide the shortage): by then the subcooling is gone and
 * the superheat carries the charge alone (−0.2, from memory; the inventory model would take more).
 */
export const VALVE_PAST_BAND_SUPERHEAT_RATIO = -0.2;
/**
 * Range of the estimate, as a share of the correct charge, sized on the charge-inventory model
 * (`npm run validate:charge`: sensor scatter ±0.5 K, ±1 %; outdoor 25–45 °C) so that it holds the
 * model's truth in about 19 cases in 20 without being fitted tighter than the model deserves.
 * - With the unit's own reference point: ±2 % of the charge, plus the sensors' 0.5 K on the
 *   subcooling, plus 20 % of the estimate: one reference point removes the offset (the nameplate
 *   target is not this circuit's own subcooling) but not the slope k_ch, which stays the default;
 *   the model's circuits spread about ±40 % around it (the papers fit k_ch on two or more charge
 *   levels and report about ±10 % of the charge, from memory, unverified).
 * - Generic: ±6 % of the charge (a nameplate target within the installer's ±1.7 K of the unit's
 *   own, TRADE.md §1.3, or no target at all and the default band) plus 35 % of the estimate.
 * Were ±6 % flat (reference) and ±10 % + 40 % (generic): the flat reference range missed about a
 * third of the deviations of 20 % and more, the generic one was wider than it needed to be.
 */
export const REFERENCE_RANGE_SHARE = 0.02;
export const REFERENCE_SLOPE_UNCERTAINTY = 0.2;
export const SENSOR_SUBCOOLING_K = 0.5;
export const GENERIC_SLOPE_UNCERTAINTY = 0.35;
export const GENERIC_RANGE_SHARE = 0.06;
/**
 * Subcooling at or below which the condenser outlet is taken as saturated, K: the subcooling
 * cannot fall below zero, so past this the charge may be further short than the estimate shows
 * (the liquid line carries flash gas; a valve may still hold its superheat). The low end then
 * reaches this much further, as a share of the charge (the inventory model's circuits lose their
 * subcooling 10–20 % short, and at 30 % short the estimate sits about 10 % of the charge high).
 */
export const SATURATED_SUBCOOLING_K = 1;
export const SATURATED_EXTRA_SHORT_SHARE = 0.1;
/** Outdoor-air difference from the reference point that the method absorbs, K; each kelvin beyond widens the range by 1 % of the charge (common practice). */
export const REFERENCE_CONDITION_TOLERANCE_K = 5;
export const RANGE_SHARE_PER_K_BEYOND = 0.01;
