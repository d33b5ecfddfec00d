import { fixedOrificeTargetSuperheat } from "../../shared/engine/index.ts";
import { DESIGN_CONDITIONS, type ChargeCircuit, type InventoryMeteringDevice } from "./charge-circuit.ts";

/** Liquid line inner diameters, m: 1/4, 5/16 and 3/8 in copper (0.76 mm wall) — common line sets. */
const LIQUID_LINE_INNER_DIAMETERS_M = [0.00483, 0.00643, 0.008];

/** Share of circuits whose label gives no target subcooling. */
const NO_NAMEPLATE_TARGET_SHARE = 0.25;

/** Share of the condenser the subcooled zone takes per kelvin of design subcooling (from memory: ε-NTU of a round-tube coil's last passes). */
export const SUBCOOLED_SHARE_PER_K: readonly [number, number] = [0.015, 0.03];

/**
 * Draws one plausible split air conditioner for the charge-inventory model. Ranges are from
 * memory of residential and light-commercial units (2–14 kW), not from a product list:
 * condenser 1.5–5 L (microchannel to round-tube), evaporator 1–3 L, line set 3–25 m, condensing
 * 8–14 K over outdoor air, evaporating 15–21 K under return air, subcooled zone 1.5–3 % of the
 * condenser per kelvin of design subcooling, superheated zone 1.5–2.5 % of the evaporator per
 * kelvin of design superheat, valve reserve 1.15–1.5, orifice gain 1–2 % per kelvin.
 * The nameplate target subcooling differs from the circuit's own by up to ±1.5 K (a label is
 * written for a nominal unit and line set; Title 24 accepts ±1.7 K around it, from memory);
 * one label in four gives none (as the diagnosis validation draws them).
 * Design subcooling: TXV/EEV 4–8 K (nameplate targets, TRADE.md §1.3); fixed orifice 3–6 K.
 * Design superheat: TXV/EEV 4–7 K; fixed orifice the charging-chart target at the design point
 * (`fixedOrificeTargetSuperheat`, TRADE.md §1.4), so the correct charge reads on target there.
 *
 * The subcooled share per kelvin sets how many kilograms a kelvin of subcooling is worth (the
 * slope k_ch the estimate must know), so the validation can be rerun with another range to see
 * how much the figures rest on it.
 *
 * @param random uniform [0, 1) source (seededRandom for a repeatable run)
 * @param subcooledSharePerK low and high of the subcooled zone's share per kelvin
 */
export function drawChargeCircuit(
  refrigerant: string,
  meteringDevice: InventoryMeteringDevice,
  random: () => number,
  subcooledSharePerK: readonly [number, number] = SUBCOOLED_SHARE_PER_K,
): ChargeCircuit {
  const between = (low: number, high: number) => low + (high - low) * random();
  const fixed = meteringDevice === "fixed-orifice";
  const designSubcoolingK = fixed ? between(3, 6) : between(4, 8);
  const chart = fixedOrificeTargetSuperheat(DESIGN_CONDITIONS.returnWetBulbC, DESIGN_CONDITIONS.outdoorAirC);
  const designSuperheatK = fixed && chart.status === "ok" ? chart.targetK : between(4, 7);
  const evaporatorTemperatureDifferenceK = between(15, 21);
  return {
    refrigerant,
    meteringDevice,
    condenserVolumeM3: between(1.5, 5) / 1000,
    evaporatorVolumeM3: between(1, 3) / 1000,
    liquidLineLengthM: between(3, 25),
    liquidLineInnerDiameterM:
      LIQUID_LINE_INNER_DIAMETERS_M[Math.floor(random() * LIQUID_LINE_INNER_DIAMETERS_M.length)]!,
    suctionLineInnerDiameterM: between(0.011, 0.0175),
    compressorAllowanceKg: between(0.08, 0.3),
    desuperheatingShare: between(0.05, 0.12),
    condensingOverAmbientK: between(Math.max(8, designSubcoolingK + 3), 14),
    evaporatorTemperatureDifferenceK,
    designSubcoolingK,
    designSubcooledShare: designSubcoolingK * between(subcooledSharePerK[0], subcooledSharePerK[1]),
    nameplateSubcoolingOffsetK: random() < NO_NAMEPLATE_TARGET_SHARE ? null : between(-1.5, 1.5),
    designSuperheatK,
    designSuperheatedShare: designSuperheatK * between(0.015, 0.025),
    valveReserve: between(1.15, 1.5),
    orificeSubcoolingGainPerK: between(0.01, 0.02),
    voidFraction: "zivi",
  };
}
