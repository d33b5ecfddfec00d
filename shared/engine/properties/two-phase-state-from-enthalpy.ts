import { PropertyRangeError } from "./property-range-error.ts";
import { saturatedPhasesAtPressure } from "./saturated-phases-at-pressure.ts";

export interface TwoPhaseState {
  phase: "two-phase";
  /** kPa absolute */
  pressureKPa: number;
  /** vapour mass fraction, 0 … 1 */
  quality: number;
  /** °C (linear in enthalpy between bubble and dew for blends) */
  temperatureC: number;
  bubbleC: number;
  dewC: number;
  /** kJ/kg */
  enthalpyKJPerKg: number;
  saturatedLiquidEnthalpyKJPerKg: number;
  saturatedVapourEnthalpyKJPerKg: number;
}

/**
 * A two-phase (liquid + vapour) state at a pressure from its enthalpy: the vapour mass fraction
 * (quality) x = (h − h′)/(h″ − h′), with h′ the saturated liquid (bubble point) and h″ the
 * saturated vapour (dew point) at the pressure — the lever rule on a pressure–enthalpy diagram
 * (e.g. Çengel & Boles, Thermodynamics, ch. 3). Used for the evaporator inlet after the
 * expansion valve, where h is that of the liquid entering it.
 *
 * The temperature of a pure fluid is its saturation temperature. A zeotropic blend warms from
 * its bubble point (x = 0) to its dew point (x = 1) as it boils; the temperature given here is
 * interpolated linearly in enthalpy between the two, a common approximation of that glide
 * (the true curve bends slightly; exact only at x = 0 and 1).
 *
 * @param refrigerant ASHRAE designation
 * @param pressureKPa kPa absolute, inside both phase grids of the single-phase table
 * @param enthalpyKJPerKg kJ/kg (IIR reference), between h′ and h″ at the pressure
 * @returns quality (0–1), temperature (°C, see above), bubble and dew temperatures, h′ and h″
 * @throws PropertyRangeError TABLE_NOT_LOADED, NOT_FINITE, BELOW_RANGE or ABOVE_RANGE for the
 *   pressure; INVALID_POINT when the enthalpy lies outside the two-phase region
 * @example twoPhaseStateFromEnthalpy("R134a", 292.8, 256.4).quality // ≈ 0.28 (0 °C, h of liquid at 40 °C)
 */
export function twoPhaseStateFromEnthalpy(
  refrigerant: string,
  pressureKPa: number,
  enthalpyKJPerKg: number,
): TwoPhaseState {
  const { liquid, vapour } = saturatedPhasesAtPressure(refrigerant, pressureKPa);
  if (!(enthalpyKJPerKg >= liquid.enthalpyKJPerKg && enthalpyKJPerKg <= vapour.enthalpyKJPerKg)) {
    throw new PropertyRangeError(
      Number.isFinite(enthalpyKJPerKg) ? "INVALID_POINT" : "NOT_FINITE",
      refrigerant,
      `${refrigerant} at ${pressureKPa.toFixed(1)} kPa absolute: an enthalpy of ${Number(enthalpyKJPerKg).toFixed(2)} kJ/kg is not two-phase (saturated liquid ${liquid.enthalpyKJPerKg.toFixed(2)}, saturated vapour ${vapour.enthalpyKJPerKg.toFixed(2)} kJ/kg)`,
    );
  }
  const quality = (enthalpyKJPerKg - liquid.enthalpyKJPerKg) / (vapour.enthalpyKJPerKg - liquid.enthalpyKJPerKg);
  return {
    phase: "two-phase",
    pressureKPa,
    quality,
    temperatureC: liquid.temperatureC + quality * (vapour.temperatureC - liquid.temperatureC),
    bubbleC: liquid.temperatureC,
    dewC: vapour.temperatureC,
    enthalpyKJPerKg,
    saturatedLiquidEnthalpyKJPerKg: liquid.enthalpyKJPerKg,
    saturatedVapourEnthalpyKJPerKg: vapour.enthalpyKJPerKg,
  };
}
