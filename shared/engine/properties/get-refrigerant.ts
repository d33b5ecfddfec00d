import { resolveRefrigerant, type RefrigerantInfo } from "./resolve-refrigerant.ts";

/**
 * Metadata of one refrigerant: designation, pure or blend, safety class
 * (ASHRAE 34 / ISO 817), GWP100 (IPCC AR4 and AR5, named), critical point, normal
 * boiling point, glide at 0 °C for blends, valid table range and source citation.
 *
 * @param id ASHRAE designation, exact spelling as in the table file names ("R1234ze(E)")
 * @returns frozen metadata object
 * @throws PropertyRangeError UNKNOWN_REFRIGERANT for an id without a table; TABLE_NOT_LOADED before `loadRefrigerant(id)`
 * @example (await loadRefrigerant("R32"), getRefrigerant("R32").safety.class) // "A2L"
 */
export function getRefrigerant(id: string): RefrigerantInfo {
  return resolveRefrigerant(id).info;
}
