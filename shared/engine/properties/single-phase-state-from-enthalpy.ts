import type { SinglePhaseState } from "./phase-grid-state.ts";
import { singlePhaseStateFromProperty } from "./single-phase-state-from-property.ts";

/**
 * Superheated vapour or subcooled liquid at a pressure with a given enthalpy: its temperature,
 * entropy and density (the inverse of singlePhaseState in T). Used for the state after a
 * throttling or a known heat transfer, and to read a temperature off a pressure–enthalpy
 * diagram. Same table, reference state and accuracy as singlePhaseState; the temperature error
 * is the enthalpy error divided by c_p (within 0.02 K, see the table's `accuracy`).
 *
 * @param refrigerant ASHRAE designation
 * @param pressureKPa kPa absolute, inside the table's rows
 * @param enthalpyKJPerKg kJ/kg (IIR reference): above saturated vapour or below saturated liquid at p
 * @returns the state with its temperature (°C)
 * @throws PropertyRangeError TABLE_NOT_LOADED, NOT_FINITE, BELOW_RANGE, ABOVE_RANGE, or
 *   INSIDE_DOME when the enthalpy lies between saturated liquid and vapour at p
 * @example singlePhaseStateFromEnthalpy("R134a", 1000, 441.5).temperatureC // ≈ 59.97 (°C)
 */
export function singlePhaseStateFromEnthalpy(
  refrigerant: string,
  pressureKPa: number,
  enthalpyKJPerKg: number,
): SinglePhaseState {
  return singlePhaseStateFromProperty(refrigerant, pressureKPa, "enthalpy", enthalpyKJPerKg);
}
