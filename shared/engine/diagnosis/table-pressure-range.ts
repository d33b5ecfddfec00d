import { getRefrigerant } from "../properties/get-refrigerant.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";

export interface TablePressureRange {
  minimumKPaAbs: number;
  maximumKPaAbs: number;
  minimumC: number;
  maximumC: number;
}

/** Both points per refrigerant id: keyed by the id alone so a lookup builds no key string
 * (performance: five lookups per diagnosis). */
const ranges = new Map<string, Partial<Record<"bubble" | "dew", TablePressureRange>>>();

/**
 * The saturation pressures covered by a refrigerant's table for one saturation point: the
 * pressures at its lowest and highest table temperature (`getRefrigerant(id).validRange`).
 * Lets the diagnosis tell "outside the table" before asking for a saturation temperature,
 * instead of paying for a thrown error on every such reading. Memoised per refrigerant and
 * point (the tables never change at run time).
 *
 * Units: kPa absolute, °C.
 *
 * @throws {PropertyRangeError} UNKNOWN_REFRIGERANT for an id without a table
 * @example tablePressureRange("R32", "dew").minimumC // -60
 */
export function tablePressureRange(refrigerant: string, point: "bubble" | "dew"): TablePressureRange {
  const byPoint = ranges.get(refrigerant);
  let range = byPoint?.[point];
  if (!range) {
    const { minimumC, maximumC } = getRefrigerant(refrigerant).validRange;
    range = Object.freeze({
      minimumKPaAbs: saturationPressure(refrigerant, minimumC, point),
      maximumKPaAbs: saturationPressure(refrigerant, maximumC, point),
      minimumC,
      maximumC,
    });
    // Stored only once the table is known, so unknown ids never grow the memo.
    if (byPoint) byPoint[point] = range;
    else ranges.set(refrigerant, { [point]: range });
  }
  return range;
}
