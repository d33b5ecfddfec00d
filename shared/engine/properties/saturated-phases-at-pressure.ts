import { phaseGridRows } from "./phase-grid-rows.ts";
import { phaseGridState, type SinglePhaseState } from "./phase-grid-state.ts";
import { PropertyRangeError } from "./property-range-error.ts";
import { requireSinglePhasePressure } from "./require-single-phase-pressure.ts";
import { resolveSinglePhaseTable } from "./resolve-single-phase-table.ts";
import { saturationTemperature } from "./saturation-temperature.ts";

export interface SaturatedPhases {
  liquid: SinglePhaseState;
  vapour: SinglePhaseState;
}

/**
 * Saturated liquid (bubble point) and saturated vapour (dew point) of a refrigerant at one
 * pressure, from the edges (r = 0) of its single-phase table: the end points of the two-phase
 * line at that pressure on a pressure–enthalpy diagram, consistent with singlePhaseState on
 * either side. For a blend the two temperatures differ by the glide.
 *
 * @param refrigerant ASHRAE designation
 * @param pressureKPa kPa absolute, inside both phase grids of the single-phase table
 * @returns liquid and vapour states (phase, °C, kJ/kg, kJ/(kg·K), kg/m³)
 * @throws PropertyRangeError TABLE_NOT_LOADED, NOT_FINITE, BELOW_RANGE or ABOVE_RANGE
 * @example saturatedPhasesAtPressure("R134a", 292.8).vapour.enthalpyKJPerKg // ≈ 398.6 (kJ/kg at 0 °C)
 */
export function saturatedPhasesAtPressure(refrigerant: string, pressureKPa: number): SaturatedPhases {
  const table = resolveSinglePhaseTable(refrigerant);
  requireSinglePhasePressure(table, pressureKPa);
  const [vapour, liquid] = [table.vapour, table.liquid].map((grid) => {
    if (pressureKPa < grid.minimumPressureKPa || pressureKPa > grid.maximumPressureKPa) {
      throw new PropertyRangeError(
        pressureKPa < grid.minimumPressureKPa ? "BELOW_RANGE" : "ABOVE_RANGE",
        refrigerant,
        `${refrigerant} saturated ${grid.phase} at ${pressureKPa.toFixed(1)} kPa absolute is outside the single-phase table (${grid.minimumPressureKPa.toFixed(1)} to ${grid.maximumPressureKPa.toFixed(0)} kPa absolute)`,
      );
    }
    const saturationC = saturationTemperature(refrigerant, pressureKPa, grid.phase === "vapour" ? "dew" : "bubble");
    return phaseGridState(grid, phaseGridRows(grid, pressureKPa), pressureKPa, saturationC, 0);
  }) as [SinglePhaseState, SinglePhaseState];
  return { liquid, vapour };
}
