import { PropertyRangeError } from "./property-range-error.ts";

export type SaturationPoint = "bubble" | "dew";

/**
 * Checks the `point` option of a saturation lookup.
 *
 * @param id refrigerant id (for the message)
 * @param point "bubble" (liquid side, for subcooling) or "dew" (vapour side, for superheat)
 * @returns nothing; returns normally for a valid point
 * @throws PropertyRangeError INVALID_POINT for anything else
 * @example requireSaturationPoint("R407C", "mid") // throws
 */
export function requireSaturationPoint(id: string, point: unknown): asserts point is SaturationPoint {
  if (point !== "bubble" && point !== "dew") {
    throw new PropertyRangeError(
      "INVALID_POINT",
      id,
      `${id}: the saturation point must be "bubble" or "dew" (got ${String(point)})`,
    );
  }
}
