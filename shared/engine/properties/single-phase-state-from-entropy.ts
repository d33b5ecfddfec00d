import type { SinglePhaseState } from "./phase-grid-state.ts";
import { singlePhaseStateFromProperty } from "./single-phase-state-from-property.ts";

/**
 * Superheated vapour or subcooled liquid at a pressure with a given entropy: its temperature,
 * enthalpy and density. The isentropic end of a compression: the state at discharge pressure
 * with the suction entropy gives h₂s for the isentropic efficiency. Same table, reference state
 * and accuracy as singlePhaseState; the temperature error is the entropy error × T / c_p
 * (within 0.02 K, see the table's `accuracy`).
 *
 * @param refrigerant ASHRAE designation
 * @param pressureKPa kPa absolute, inside the table's rows
 * @param entropyKJPerKgK kJ/(kg·K) (IIR reference)
 * @returns the state with its temperature (°C)
 * @throws PropertyRangeError TABLE_NOT_LOADED, NOT_FINITE, BELOW_RANGE, ABOVE_RANGE, or
 *   INSIDE_DOME when the entropy lies between saturated liquid and vapour at p
 * @example singlePhaseStateFromEntropy("R134a", 1000, 1.7476).temperatureC // ≈ 49.8 (°C, superheated vapour)
 */
export function singlePhaseStateFromEntropy(
  refrigerant: string,
  pressureKPa: number,
  entropyKJPerKgK: number,
): SinglePhaseState {
  return singlePhaseStateFromProperty(refrigerant, pressureKPa, "entropy", entropyKJPerKgK);
}
