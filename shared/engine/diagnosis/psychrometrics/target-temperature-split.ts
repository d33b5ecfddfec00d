import psychrolib from "psychrolib";
import { SPLIT_TARGET_MODEL } from "../diagnosis-limits.ts";

/** Return air range the coil model is used for, °C (comfort cooling). */
const RETURN_DRY_BULB_RANGE_C = { min: 18, max: 35 } as const;
/** Specific heat of dry air and of water vapour, kJ/(kg·K) (ASHRAE Handbook—Fundamentals ch. 1). */
const DRY_AIR_CP = 1.006;
const VAPOUR_CP = 1.86;

/** Apparatus dew point's humidity ratio and enthalpy by atmospheric pressure: a handful of sites, computed once each (performance). */
const dewPointByPressure = new Map<number, { ratio: number; enthalpyKJPerKg: number }>();

function apparatusDewPoint(pressurePa: number): { ratio: number; enthalpyKJPerKg: number } {
  let point = dewPointByPressure.get(pressurePa);
  if (!point) {
    const ratio = psychrolib.GetSatHumRatio(SPLIT_TARGET_MODEL.apparatusDewPointC, pressurePa) as number;
    point = {
      ratio,
      enthalpyKJPerKg: (psychrolib.GetMoistAirEnthalpy(SPLIT_TARGET_MODEL.apparatusDewPointC, ratio) as number) / 1000,
    };
    if (dewPointByPressure.size < 1000) dewPointByPressure.set(pressurePa, point);
  }
  return point;
}

/**
 * Target air temperature split (return dry bulb − supply dry bulb) of a comfort-cooling coil,
 * from the return air's dry and wet bulb: the split a healthy coil gives when it removes its
 * nominal capacity from air moving at about 54 L/s per kW (400 cfm per ton [S33]).
 *
 * Model: the air leaves on the straight line from the return state to the coil's apparatus dew
 * point (about 11 °C, saturated), a fraction f of the way, where f makes the enthalpy drop
 * equal to the nominal one (1 kW ÷ (0.054 m³/s × 1.2 kg/m³) = 15.4 kJ/kg), never more than 0.85
 * (bypass factor ≥ 0.15). The split is f × (return − apparatus dew point). Humid air spends
 * more of the capacity on condensing water, so the split falls as the wet bulb rises, as the
 * trade teaches [S33]. A dry coil (return air drier than the apparatus dew point) cools at
 * constant humidity ratio. Moist-air enthalpy and humidity ratio: psychrolib 1.1.1 (ASHRAE
 * Handbook—Fundamentals 2017 ch. 1).
 *
 * Units: °C in, kPa absolute; K out. Valid: return dry bulb 18–35 °C, wet bulb at or below it;
 * null outside (refrigeration coils and process chillers use their own bands).
 *
 * @throws never; returns null outside the valid range
 * @example targetTemperatureSplit(26.7, 19.4, 101.325) // ≈ 10.3 (K)
 */
export function targetTemperatureSplit(
  returnDryBulbC: number,
  returnWetBulbC: number,
  atmosphericPressureKPa: number,
): number | null {
  const { min, max } = RETURN_DRY_BULB_RANGE_C;
  const model = SPLIT_TARGET_MODEL;
  if (!(returnDryBulbC >= min && returnDryBulbC <= max) || !(returnWetBulbC <= returnDryBulbC) || !(returnWetBulbC > 0))
    return null;
  if (!(atmosphericPressureKPa > 0) || returnDryBulbC <= model.apparatusDewPointC) return null;
  psychrolib.SetUnitSystem(psychrolib.SI);
  const pressurePa = atmosphericPressureKPa * 1000;
  const returnRatio = psychrolib.GetHumRatioFromTWetBulb(returnDryBulbC, returnWetBulbC, pressurePa) as number;
  const { ratio: dewPointRatio, enthalpyKJPerKg: dewPointEnthalpy } = apparatusDewPoint(pressurePa);
  const nominalDropKJPerKg = 1 / ((model.airflowLitresPerSecondPerKW / 1000) * model.airDensityKgPerM3);
  const temperatureSpan = returnDryBulbC - model.apparatusDewPointC;
  let fraction: number;
  if (returnRatio <= dewPointRatio) {
    fraction = nominalDropKJPerKg / ((DRY_AIR_CP + VAPOUR_CP * returnRatio) * temperatureSpan);
  } else {
    const returnEnthalpy = (psychrolib.GetMoistAirEnthalpy(returnDryBulbC, returnRatio) as number) / 1000;
    fraction = nominalDropKJPerKg / (returnEnthalpy - dewPointEnthalpy);
  }
  return Math.min(model.maxContactFactor, fraction) * temperatureSpan;
}
