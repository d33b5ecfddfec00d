import { STANDARD_ATMOSPHERE_KPA, type DiagnosisInput } from "../../schemas/diagnosis.ts";
import { gaugeToAbsolute } from "../units/gauge-to-absolute.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { SENSOR_TOLERANCE_K } from "./diagnosis-limits.ts";
import { formatTenths } from "./format-tenths.ts";
import { tablePressureRange } from "./table-pressure-range.ts";
import { wetBulbFromRelativeHumidity } from "./psychrometrics/wet-bulb-from-relative-humidity.ts";
import { selectSubcoolingTarget } from "./select-subcooling-target.ts";
import { selectSuperheatTarget } from "./select-superheat-target.ts";
import type { DiagnosisSnapshot, Exclusion } from "./types.ts";

function difference(first: number | null | undefined, second: number | null | undefined): number | null {
  return first === null || first === undefined || second === null || second === undefined ? null : first - second;
}

/** Saturation temperature, or null with an `outsideTable` entry (once per field) when the
 * pressure is outside the table; unknown refrigerants still throw. */
function saturationOrExclusion(refrigerant: string, field: string, pressureKPaAbs: number, point: "bubble" | "dew", outsideTable: Exclusion[]): number | null {
  const range = tablePressureRange(refrigerant, point);
  if (!(pressureKPaAbs >= range.minimumKPaAbs && pressureKPaAbs <= range.maximumKPaAbs)) {
    if (!outsideTable.some((exclusion) => exclusion.field === field)) {
      const below = pressureKPaAbs < range.minimumKPaAbs;
      const limit = below
        ? `below ${formatTenths(range.minimumKPaAbs)} kPa absolute (${range.minimumC} °C)`
        : `above ${formatTenths(range.maximumKPaAbs)} kPa absolute (${range.maximumC} °C, near the critical point)`;
      outsideTable.push({
        code: "outside-table",
        field,
        reason: `${refrigerant} at ${formatTenths(pressureKPaAbs)} kPa absolute is ${limit}, outside the table: no saturation temperature for this reading`,
      });
    }
    return null;
  }
  try {
    return saturationTemperature(refrigerant, pressureKPaAbs, point);
  } catch (error) {
    if (!(error instanceof PropertyRangeError) || error.code === "UNKNOWN_REFRIGERANT") throw error;
    if (!outsideTable.some((exclusion) => exclusion.field === field)) {
      outsideTable.push({ code: "outside-table", field, reason: `${error.message}: no saturation temperature for this reading` });
    }
    return null;
  }
}

/**
 * Computes every derived value of one circuit's validated readings, once, for the rules:
 * saturation temperatures through the property engine (dew point at suction, bubble point at
 * the liquid pressure; both points for glide), superheat and subcooling, the target bands, the
 * wet bulb (measured, or from relative humidity via psychrolib at the site's atmospheric
 * pressure), air and condenser differences, compression ratio and current ratio. It also
 * decides which values must not be used: a "liquid" temperature taken on the discharge line,
 * a line colder (suction, discharge) or warmer (liquid, beyond the dew point) than physics
 * allows, and pressures outside the refrigerant's table (TRADE.md §1.1–1.2).
 *
 * Units: kPa gauge and °C in; °C, K, kPa abs out.
 *
 * @throws {PropertyRangeError} UNKNOWN_REFRIGERANT for an id without a table (other property
 *   errors become `outsideTable` entries)
 * @example buildDiagnosisSnapshot(input).superheatK
 */
export function buildDiagnosisSnapshot(input: DiagnosisInput): DiagnosisSnapshot {
  const atmosphericPressureKPa = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const refrigerant = input.refrigerant;
  const outsideTable: Exclusion[] = [];

  const suctionPressureKPaAbs = gaugeToAbsolute(input.suctionPressureKPa, atmosphericPressureKPa);
  const liquidPressureKPaAbs = gaugeToAbsolute(input.liquidPressureKPa, atmosphericPressureKPa);
  const dischargePressureKPaAbs =
    input.dischargePressureKPa === undefined ? null : gaugeToAbsolute(input.dischargePressureKPa, atmosphericPressureKPa);

  // Superheat from the dew point, subcooling from the bubble point (TRADE.md §1.1 [S1][S2][S3]).
  const evaporatingTempC = saturationOrExclusion(refrigerant, "suctionPressureKPa", suctionPressureKPaAbs, "dew", outsideTable);
  const evaporatingBubbleTempC = saturationOrExclusion(refrigerant, "suctionPressureKPa", suctionPressureKPaAbs, "bubble", outsideTable);
  const condensingTempC = saturationOrExclusion(refrigerant, "liquidPressureKPa", liquidPressureKPaAbs, "bubble", outsideTable);
  const condensingDewTempC = saturationOrExclusion(refrigerant, "liquidPressureKPa", liquidPressureKPaAbs, "dew", outsideTable);
  const dischargeDewTempC =
    dischargePressureKPaAbs === null ? condensingDewTempC : saturationOrExclusion(refrigerant, "dischargePressureKPa", dischargePressureKPaAbs, "dew", outsideTable);

  // Superheat: suction line − dew point. A vapour line below the bubble point is impossible.
  let superheatK = difference(input.suctionLineTempC, evaporatingTempC);
  let superheatExcluded: Exclusion | null = null;
  if (superheatK !== null && evaporatingBubbleTempC !== null && input.suctionLineTempC < evaporatingBubbleTempC - SENSOR_TOLERANCE_K) {
    superheatExcluded = {
      code: "suction-below-saturation",
      field: "suctionLineTempC",
      reason: `Suction line ${input.suctionLineTempC.toFixed(1)} °C is below the saturation temperature ${evaporatingBubbleTempC.toFixed(1)} °C at the suction pressure, which is impossible: check the probe contact and the gauge; superheat is not used`,
    };
    superheatK = null;
  }

  // Subcooling: bubble point − liquid line, only where the pipe really carries liquid.
  const liquidSideDifferenceK = difference(condensingTempC, input.liquidLineTempC);
  let subcoolingK = liquidSideDifferenceK;
  let subcoolingExcluded: Exclusion | null = null;
  if ((input.liquidTempLocation ?? "liquid-line") === "discharge-line") {
    const detail =
      liquidSideDifferenceK === null
        ? ""
        : ` (bubble point ${condensingTempC!.toFixed(1)} °C − line ${input.liquidLineTempC.toFixed(1)} °C = ${liquidSideDifferenceK.toFixed(1)} K is discharge superheat, not subcooling)`;
    subcoolingExcluded = {
      code: "subcooling-on-discharge-line",
      field: "liquidTempLocation",
      reason: `The temperature was taken on the discharge line, which carries superheated vapour${detail}: subcooling is not valid and is left out of the verdict; take it on the liquid line at the condenser outlet`,
    };
    subcoolingK = null;
  } else if (condensingDewTempC !== null && input.liquidLineTempC > condensingDewTempC + SENSOR_TOLERANCE_K) {
    subcoolingExcluded = {
      code: "liquid-above-saturation",
      field: "liquidLineTempC",
      reason: `Liquid line ${input.liquidLineTempC.toFixed(1)} °C is above the dew point ${condensingDewTempC.toFixed(1)} °C at the liquid pressure, so that pipe carries vapour: wrong pipe or wrong pressure; subcooling is not used`,
    };
    subcoolingK = null;
  }

  // Discharge gas is superheated: its line cannot be colder than the dew point at its pressure.
  let dischargeLineExcluded: Exclusion | null = null;
  if (input.dischargeLineTempC !== undefined && dischargeDewTempC !== null && input.dischargeLineTempC < dischargeDewTempC - SENSOR_TOLERANCE_K) {
    dischargeLineExcluded = {
      code: "discharge-below-saturation",
      field: "dischargeLineTempC",
      reason: `Discharge line ${input.dischargeLineTempC.toFixed(1)} °C is below the dew point ${dischargeDewTempC.toFixed(1)} °C at discharge pressure, which is impossible for discharge gas: check the probe; the reading is not used`,
    };
  }

  let returnAirWetBulbC: number | null = null;
  let wetBulbBasis: DiagnosisSnapshot["wetBulbBasis"] = null;
  if (input.returnAirWetBulbC !== undefined) {
    returnAirWetBulbC = input.returnAirWetBulbC;
    wetBulbBasis = "measured";
  } else if (input.returnAirRelativeHumidity !== undefined && input.returnAirDryBulbC !== undefined) {
    returnAirWetBulbC = wetBulbFromRelativeHumidity(input.returnAirDryBulbC, input.returnAirRelativeHumidity, atmosphericPressureKPa);
    wetBulbBasis = "from-relative-humidity";
  }

  const superheatChoice = selectSuperheatTarget(input.meteringDevice, input.targetSuperheatK, returnAirWetBulbC, input.outdoorAirDryBulbC);
  const fixed = input.meteringDevice === "fixed-orifice" || input.meteringDevice === "capillary";
  const liquidOnLiquidLine = subcoolingExcluded?.code !== "subcooling-on-discharge-line";

  return {
    input,
    meteringDevice: input.meteringDevice,
    meteringFamily: fixed ? "fixed" : "expansion-valve",
    atmosphericPressureKPa,
    suctionPressureKPaAbs,
    liquidPressureKPaAbs,
    dischargePressureKPaAbs,
    evaporatingTempC,
    evaporatingBubbleTempC,
    condensingTempC,
    condensingDewTempC,
    dischargeDewTempC,
    glideK: difference(evaporatingTempC, evaporatingBubbleTempC),
    condenserGlideK: difference(condensingDewTempC, condensingTempC),
    superheatK,
    liquidSideDifferenceK,
    subcoolingK,
    superheatExcluded,
    subcoolingExcluded,
    dischargeLineExcluded,
    outsideTable,
    superheatTarget: superheatChoice.band,
    superheatTargetNote: superheatChoice.note,
    subcoolingTarget: selectSubcoolingTarget(input.targetSubcoolingK),
    returnAirWetBulbC,
    wetBulbBasis,
    temperatureSplitK: difference(input.returnAirDryBulbC, input.supplyAirDryBulbC),
    condenserApproachK: liquidOnLiquidLine ? difference(input.liquidLineTempC, input.outdoorAirDryBulbC) : null,
    condensingOverAmbientK: difference(condensingTempC, input.outdoorAirDryBulbC),
    evaporatorTemperatureDifferenceK: difference(input.returnAirDryBulbC, evaporatingTempC),
    compressionRatio: (dischargePressureKPaAbs ?? liquidPressureKPaAbs) / suctionPressureKPaAbs,
    compressionRatioBasis: dischargePressureKPaAbs === null ? "liquid" : "discharge",
    compressorCurrentRatio:
      input.compressorAmps !== undefined && input.compressorRla !== undefined ? input.compressorAmps / input.compressorRla : null,
  };
}
