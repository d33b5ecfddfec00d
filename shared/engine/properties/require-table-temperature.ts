import { PropertyRangeError } from "./property-range-error.ts";
import type { CompiledRefrigerant } from "./resolve-refrigerant.ts";

/**
 * Checks that a temperature is a finite number inside a refrigerant's table.
 *
 * @param refrigerant compiled table
 * @param temperatureC °C
 * @returns nothing; returns normally when the temperature can be looked up
 * @throws PropertyRangeError NOT_FINITE, BELOW_RANGE or ABOVE_RANGE with a technician-readable message
 * @example requireTableTemperature(resolveRefrigerant("R32"), -80) // throws "R32 below -60 °C is outside the table …"
 */
export function requireTableTemperature(refrigerant: CompiledRefrigerant, temperatureC: number): void {
  // Fast path first: this runs on every lookup, so no message is built unless it throws.
  if (
    typeof temperatureC === "number" &&
    temperatureC >= refrigerant.minimumC &&
    temperatureC <= refrigerant.maximumC
  ) {
    return;
  }
  const { id } = refrigerant.info;
  if (typeof temperatureC !== "number" || !Number.isFinite(temperatureC)) {
    throw new PropertyRangeError(
      "NOT_FINITE",
      id,
      `${id}: the temperature must be a number in °C (got ${String(temperatureC)})`,
    );
  }
  const covers = `the table covers ${refrigerant.minimumC} to ${refrigerant.maximumC} °C`;
  if (temperatureC < refrigerant.minimumC) {
    throw new PropertyRangeError(
      "BELOW_RANGE",
      id,
      `${id} below ${refrigerant.minimumC} °C is outside the table (${covers})`,
    );
  }
  const critical = refrigerant.info.criticalPoint.temperatureC;
  throw new PropertyRangeError(
    "ABOVE_RANGE",
    id,
    `${id} above ${refrigerant.maximumC} °C is outside the table (${covers}; critical point ${critical} °C, no liquid above it)`,
  );
}
