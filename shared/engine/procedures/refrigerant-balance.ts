import type { RefrigerantBalance } from "../../schemas/procedures.ts";

/**
 * Refrigerant balance of one visit on a circuit that was recovered (emptied into a recovery
 * cylinder) and recharged. Registers record the quantities recovered, reused and added per
 * piece of equipment (EU F-gas records [S83][S106]; US 40 CFR 82.157 [S109]).
 *
 * - shortfallKg = nameplate − recovered: how far short the system was when recovered
 *   (positive = it had lost refrigerant; negative = it held more than the nameplate).
 * - finalChargeKg = reused + added: what the circuit holds after the visit. `reusedKg` is the
 *   part of the recovered refrigerant put back (default 0, all of it kept in the cylinder).
 *   This assumes the circuit was emptied; for a top-up without recovery the remaining charge
 *   is unknown and this balance does not apply.
 * - differenceFromNameplateKg = final − nameplate (line-length adjustment not included; see
 *   `chargeAgainstNameplate` for that).
 *
 * @param input nameplate charge (kg > 0), recovered, added and optional reused mass (kg ≥ 0, reused ≤ recovered)
 * @returns shortfall, final charge and difference from the nameplate, kg
 * @throws RangeError "refrigerantBalance requires ..." for non-finite or negative masses, a nameplate ≤ 0,
 *   or more reused than recovered
 * @example refrigerantBalance({ nameplateKg: 2.4, recoveredKg: 1.6, addedKg: 0.8, reusedKg: 1.6 })
 *   // { shortfallKg: 0.8, finalChargeKg: 2.4, differenceFromNameplateKg: 0 } (to rounding)
 */
export function refrigerantBalance(input: {
  nameplateKg: number;
  recoveredKg: number;
  addedKg: number;
  reusedKg?: number;
}): RefrigerantBalance {
  const { nameplateKg, recoveredKg, addedKg } = input;
  const reusedKg = input.reusedKg ?? 0;
  if ([nameplateKg, recoveredKg, addedKg, reusedKg].some((value) => !Number.isFinite(value) || value < 0)) {
    throw new RangeError("refrigerantBalance requires finite masses of zero or more");
  }
  if (!(nameplateKg > 0)) throw new RangeError("refrigerantBalance requires a nameplate charge above zero");
  if (reusedKg > recoveredKg)
    throw new RangeError("refrigerantBalance requires reused refrigerant no more than was recovered");
  const finalChargeKg = reusedKg + addedKg;
  return {
    shortfallKg: nameplateKg - recoveredKg,
    finalChargeKg,
    differenceFromNameplateKg: finalChargeKg - nameplateKg,
  };
}
