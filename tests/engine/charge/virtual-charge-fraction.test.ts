/**
 * The virtual refrigerant charge relation (H. Li and J. E. Braun, HVAC&R Research 15(1), 2009;
 * equation from memory, not re-read):
 *
 *   (m − m_ref)/m_ref = [ (SC − SC_ref) + (k_sh/k_sc)·(SH − SH_ref) ] / k_ch
 *
 * Checked here for its algebra; the size of k_ch and k_sh/k_sc is checked against the
 * charge-inventory model in charge-inventory.test.ts and `npm run validate:charge`.
 */
import { describe, expect, it } from "vitest";
import { virtualChargeFraction } from "@shared/engine/index";

describe("virtualChargeFraction", () => {
  it("gives no deviation at the reference point (the relation's origin, Li & Braun 2009, from memory)", () => {
    expect(virtualChargeFraction(0, 0, { kChK: 25, superheatToSubcooling: -0.2 })).toBe(0);
  });

  it("works the example with a superheat term: (−3 K + (−0.2)·10 K)/25 K = −0.2, a fifth short (algebra of the relation)", () => {
    // −3 + (−0.2 × 10) = −5 K of equivalent subcooling; over k_ch 25 K that is −0.2 of the charge.
    expect(virtualChargeFraction(-3, 10, { kChK: 25, superheatToSubcooling: -0.2 })).toBeCloseTo(-0.2, 12);
  });

  it("is linear in each deviation and odd: doubling both doubles it, negating both negates it (algebra)", () => {
    const coefficients = Object.freeze({ kChK: 30, superheatToSubcooling: -0.1 });
    const once = virtualChargeFraction(2, -4, coefficients);
    expect(once).toBeCloseTo((2 + -0.1 * -4) / 30, 12); // 2.4 / 30 = 0.08
    expect(virtualChargeFraction(4, -8, coefficients)).toBeCloseTo(2 * once, 12);
    expect(virtualChargeFraction(-2, 4, coefficients)).toBeCloseTo(-once, 12);
  });

  it("reads more subcooling as more charge and, with a negative ratio, more superheat as less (sign convention of the relation; common practice: short of charge, low subcooling and high superheat)", () => {
    const coefficients = { kChK: 27, superheatToSubcooling: -0.2 };
    expect(virtualChargeFraction(1, 0, coefficients)).toBeGreaterThan(0);
    expect(virtualChargeFraction(0, 1, coefficients)).toBeLessThan(0);
  });

  it("ignores the superheat when the ratio is 0, as for a valve inside its band (the valve holds the superheat)", () => {
    expect(virtualChargeFraction(-5.4, 12, { kChK: 27, superheatToSubcooling: 0 })).toBeCloseTo(-0.2, 12);
  });

  it("refuses a k_ch that is not above 0", () => {
    expect(() => virtualChargeFraction(1, 0, { kChK: 0, superheatToSubcooling: 0 })).toThrow(RangeError);
    expect(() => virtualChargeFraction(1, 0, { kChK: Number.NaN, superheatToSubcooling: 0 })).toThrow(
      /k_ch must be above 0 K/,
    );
  });
});
