import { PropertyRangeError } from "./property-range-error.ts";
import type { CompiledSinglePhaseTable } from "./single-phase-registry.ts";

const formatKPa = (value: number) => (value >= 100 ? value.toFixed(0) : value.toPrecision(3));

/**
 * Checks a pressure for a single-phase lookup: a finite number inside the rows of at least
 * one phase of the refrigerant's single-phase table.
 *
 * @param table compiled single-phase table
 * @param pressureKPa kPa absolute
 * @returns nothing; returns normally when one of the phase grids covers the pressure
 * @throws PropertyRangeError NOT_FINITE, BELOW_RANGE or ABOVE_RANGE with a technician-readable message
 * @example requireSinglePhasePressure(resolveSinglePhaseTable("R32"), 20000) // throws ABOVE_RANGE
 */
export function requireSinglePhasePressure(table: CompiledSinglePhaseTable, pressureKPa: number): void {
  const { id, vapour, liquid } = table;
  if (typeof pressureKPa !== "number" || !Number.isFinite(pressureKPa)) {
    throw new PropertyRangeError(
      "NOT_FINITE",
      id,
      `${id}: the pressure must be a number in kPa absolute (got ${String(pressureKPa)})`,
    );
  }
  const lowest = Math.min(vapour.minimumPressureKPa, liquid.minimumPressureKPa);
  const highest = Math.max(vapour.maximumPressureKPa, liquid.maximumPressureKPa);
  if (pressureKPa < lowest) {
    throw new PropertyRangeError(
      "BELOW_RANGE",
      id,
      `${id} below ${formatKPa(lowest)} kPa absolute is outside the single-phase table (check that the pressure is absolute, not gauge)`,
    );
  }
  if (pressureKPa > highest) {
    throw new PropertyRangeError(
      "ABOVE_RANGE",
      id,
      `${id} above ${formatKPa(highest)} kPa absolute is outside the single-phase table (it stops short of the critical point, where properties change too steeply to tabulate)`,
    );
  }
}
