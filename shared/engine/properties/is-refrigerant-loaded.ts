import { isRefrigerantTableLoaded } from "./resolve-refrigerant.ts";

/**
 * Whether a refrigerant's saturation table has been loaded (`loadRefrigerant`), so that its
 * lookups run synchronously.
 *
 * @param id ASHRAE designation, e.g. "R410A"
 * @returns true once its table is registered
 * @throws never
 * @example isRefrigerantLoaded("R410A") // false until `await loadRefrigerant("R410A")`
 */
export function isRefrigerantLoaded(id: string): boolean {
  return isRefrigerantTableLoaded(id);
}
