import type { ChargeDeviation } from "../../schemas/diagnosis.ts";

export interface ChargeToAdd {
  /** Amount to add, kg; negative means that much to recover. */
  kg: number;
  /** The estimate's range turned the same way, kg to add: lowKg ≤ kg ≤ highKg. */
  lowKg: number;
  highKg: number;
}

/** −0 reads as "−0.00 kg" on screen: a deviation of exactly nothing is nothing to add. */
const flip = (kg: number) => (kg === 0 ? 0 : -kg);

/**
 * Charge to add, the question a casebook case asks (issue 14): the engine's charge deviation
 * turned round, since a technician at the unit thinks in what to put in, not in what is
 * missing. A deviation of −0.55 kg (range −0.80 to −0.35) is 0.55 kg to add (0.35 to 0.80); an
 * overcharge gives a negative amount, to recover.
 *
 * Units: kg in and out. Range: any `ChargeDeviation` (lowKg ≤ kg ≤ highKg).
 * Source: the deviation's own (virtual refrigerant charge method, Li & Braun 2009).
 *
 * @throws never
 * @example chargeToAdd({ kg: -0.55, lowKg: -0.8, highKg: -0.35, basis: "unit-reference", source: "" }) // { kg: 0.55, lowKg: 0.35, highKg: 0.8 }
 */
export function chargeToAdd(deviation: ChargeDeviation): ChargeToAdd {
  return { kg: flip(deviation.kg), lowKg: flip(deviation.highKg), highKg: flip(deviation.lowKg) };
}
