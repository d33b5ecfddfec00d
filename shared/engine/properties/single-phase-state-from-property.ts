import { invertPhaseGrid } from "./invert-phase-grid.ts";
import { phaseGridRows } from "./phase-grid-rows.ts";
import { phaseGridState, type SinglePhaseState } from "./phase-grid-state.ts";
import { PropertyRangeError } from "./property-range-error.ts";
import { requireSinglePhasePressure } from "./require-single-phase-pressure.ts";
import { resolveSinglePhaseTable } from "./resolve-single-phase-table.ts";
import { saturationTemperature } from "./saturation-temperature.ts";

const LABEL = { enthalpy: ["enthalpy", "kJ/kg", 2], entropy: ["entropy", "kJ/(kg·K)", 4] } as const;

/**
 * Single-phase state at a pressure from its enthalpy or entropy (the shared body of
 * singlePhaseStateFromEnthalpy and singlePhaseStateFromEntropy): the vapour grid when the
 * value is at or above that of saturated vapour at p, the liquid grid when at or below that of
 * saturated liquid, a clear error in between (a two-phase mixture).
 *
 * @param refrigerant ASHRAE designation
 * @param pressureKPa kPa absolute
 * @param property "enthalpy" (kJ/kg) or "entropy" (kJ/(kg·K))
 * @param value the known enthalpy or entropy
 * @returns the state, its temperature found by inverting the table
 * @throws PropertyRangeError TABLE_NOT_LOADED, NOT_FINITE, BELOW_RANGE, ABOVE_RANGE or INSIDE_DOME
 * @example singlePhaseStateFromProperty("R134a", 1000, "enthalpy", 441.5).temperatureC // ≈ 59.97
 */
export function singlePhaseStateFromProperty(
  refrigerant: string,
  pressureKPa: number,
  property: "enthalpy" | "entropy",
  value: number,
): SinglePhaseState {
  const table = resolveSinglePhaseTable(refrigerant);
  requireSinglePhasePressure(table, pressureKPa);
  const [name, unit, digits] = LABEL[property];
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new PropertyRangeError(
      "NOT_FINITE",
      refrigerant,
      `${refrigerant}: the ${name} must be a number in ${unit} (got ${String(value)})`,
    );
  }
  for (const grid of [table.vapour, table.liquid]) {
    if (pressureKPa < grid.minimumPressureKPa || pressureKPa > grid.maximumPressureKPa) continue;
    const rows = phaseGridRows(grid, pressureKPa);
    const reduced = invertPhaseGrid(grid, rows, property, value);
    if (reduced === "beyond-bound") {
      throw new PropertyRangeError(
        grid.phase === "vapour" ? "ABOVE_RANGE" : "BELOW_RANGE",
        refrigerant,
        `${refrigerant} ${grid.phase} with ${name} ${value.toFixed(digits)} ${unit} at ${pressureKPa.toFixed(1)} kPa absolute lies beyond ${grid.boundC} °C, the end of the single-phase table`,
      );
    }
    if (reduced === "saturation-side") continue;
    const saturationC = saturationTemperature(refrigerant, pressureKPa, grid.phase === "vapour" ? "dew" : "bubble");
    return phaseGridState(grid, rows, pressureKPa, saturationC, reduced);
  }
  throw new PropertyRangeError(
    "INSIDE_DOME",
    refrigerant,
    `${refrigerant} with ${name} ${value.toFixed(digits)} ${unit} at ${pressureKPa.toFixed(1)} kPa absolute is a two-phase mixture (between saturated liquid and saturated vapour), not a single-phase state`,
  );
}
