import psychrolib from "psychrolib";
import { moistAirState } from "./moist-air-state.ts";

export interface AirSideCapacity {
  /** kg dry air per second */
  dryAirMassFlowKgPerS: number;
  /** kW */
  sensibleKW: number;
  /** kW; null without the supply air's humidity */
  totalKW: number | null;
}

/**
 * Cooling capacity of an evaporator coil measured on the air side: the dry-air mass flow
 * (volumetric airflow at the return-air state ÷ its specific volume) times the fall in moist-air
 * enthalpy across the coil, Q = ṁ_da·(h_return − h_supply) (ASHRAE Handbook—Fundamentals ch. 1;
 * psychrolib). Without the supply air's humidity only the sensible part is known, taken at the
 * return air's humidity ratio, Q_s = ṁ_da·(h(T_r, W_r) − h(T_s, W_r)); the latent part then stays
 * unknown and the total is null.
 *
 * Units: m³/s, °C, percent, kPa absolute → kg/s, kW.
 * Valid range: air temperatures −50…70 °C; airflow > 0.
 *
 * @throws {RangeError} for an airflow ≤ 0 or air readings outside moistAirState's range
 * @example airSideCapacity({ airflowM3PerS: 0.4, returnDryBulbC: 26.7, returnWetBulbC: 19.4, supplyDryBulbC: 14, supplyWetBulbC: 13, atmosphericKPa: 101.325 }).totalKW // ≈ 8.58 (kW; sensible ≈ 6.03)
 */
export function airSideCapacity(input: {
  airflowM3PerS: number;
  returnDryBulbC: number;
  returnWetBulbC?: number;
  returnRelativeHumidityPercent?: number;
  supplyDryBulbC: number;
  supplyWetBulbC?: number;
  atmosphericKPa: number;
}): AirSideCapacity {
  const { airflowM3PerS, returnDryBulbC, supplyDryBulbC, atmosphericKPa } = input;
  if (!Number.isFinite(airflowM3PerS) || !(airflowM3PerS > 0))
    throw new RangeError("airSideCapacity requires an airflow above zero");
  const returnHumidity =
    input.returnWetBulbC !== undefined
      ? { wetBulbC: input.returnWetBulbC }
      : input.returnRelativeHumidityPercent !== undefined
        ? { relativeHumidityPercent: input.returnRelativeHumidityPercent }
        : null;
  // Without any humidity the air is taken as dry: the sensible heat barely depends on it.
  const returnAir = moistAirState(returnDryBulbC, returnHumidity ?? { relativeHumidityPercent: 1e-6 }, atmosphericKPa);
  const dryAirMassFlowKgPerS = airflowM3PerS / returnAir.specificVolumeM3PerKgDryAir;
  // h(T_s, W_r): the supply temperature at the return air's humidity ratio (no moisture removed)
  moistAirState(supplyDryBulbC, { relativeHumidityPercent: 50 }, atmosphericKPa); // range check of the supply reading
  psychrolib.SetUnitSystem(psychrolib.SI);
  const supplyAtReturnHumidity =
    (psychrolib.GetMoistAirEnthalpy(supplyDryBulbC, returnAir.humidityRatio) as number) / 1000;
  const sensibleDrop = returnAir.enthalpyKJPerKgDryAir - supplyAtReturnHumidity;
  let totalKW: number | null = null;
  if (input.supplyWetBulbC !== undefined && returnHumidity !== null) {
    const supplyAir = moistAirState(supplyDryBulbC, { wetBulbC: input.supplyWetBulbC }, atmosphericKPa);
    totalKW = dryAirMassFlowKgPerS * (returnAir.enthalpyKJPerKgDryAir - supplyAir.enthalpyKJPerKgDryAir);
  }
  return { dryAirMassFlowKgPerS, sensibleKW: dryAirMassFlowKgPerS * sensibleDrop, totalKW };
}
