import { STANDARD_ATMOSPHERE_KPA, type DiagnosisInput, type TargetBand } from "../../schemas/diagnosis.ts";
import { getRefrigerant } from "../properties/get-refrigerant.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { gaugeToAbsolute } from "../units/gauge-to-absolute.ts";
import {
  APPLICATION_LIMITS,
  CONDENSER_APPROACH_SOURCE,
  CONDENSER_APPROACH_TOLERANCE_K,
  SENSOR_TOLERANCE_K,
  SPLIT_TARGET_MODEL,
  SUBCOOLING_PIVOT_BELOW_TARGET_K,
} from "./diagnosis-limits.ts";
import { dischargeLineLimits } from "./discharge-line-limits.ts";
import { formatTenths } from "./format-tenths.ts";
import { inferApplication } from "./infer-application.ts";
import { meteringFamilyOf } from "./metering-family-of.ts";
import { targetTemperatureSplit } from "./psychrometrics/target-temperature-split.ts";
import { wetBulbFromRelativeHumidity } from "./psychrometrics/wet-bulb-from-relative-humidity.ts";
import { selectSubcoolingTarget } from "./select-subcooling-target.ts";
import { selectSuperheatTarget } from "./select-superheat-target.ts";
import { suctionLineAllowance } from "./suction-line-allowance.ts";
import { tablePressureRange } from "./table-pressure-range.ts";
import type { DiagnosisSnapshot, Exclusion } from "./types.ts";

const SPLIT_SOURCE = SPLIT_TARGET_MODEL.source;
/** The one refrigerant run above its critical point in service (CO₂ gas coolers). */
const TRANSCRITICAL_REFRIGERANT = "R744";

function difference(first: number | null | undefined, second: number | null | undefined): number | null {
  return first === null || first === undefined || second === null || second === undefined ? null : first - second;
}

function mean(first: number | null, second: number | null): number | null {
  return first === null || second === null ? null : (first + second) / 2;
}

/** Saturation temperature, or null with an `outsideTable` entry (once per field) when the
 * pressure is outside the table; unknown refrigerants still throw. */
function saturationOrExclusion(
  refrigerant: string,
  field: string,
  pressureKPaAbs: number,
  point: "bubble" | "dew",
  outsideTable: Exclusion[],
): number | null {
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
      outsideTable.push({
        code: "outside-table",
        field,
        reason: `${error.message}: no saturation temperature for this reading`,
      });
    }
    return null;
  }
}

/**
 * Expected liquid line − outdoor air: condensing over ambient minus subcooling (TRADE.md §3
 * [S26]). For a blend the liquid leaves from the bubble point, half the condensing glide below
 * the mid-glide temperature the condensing band is read with, so half the glide comes off too.
 */
function approachTarget(
  condensing: { lowK: number; highK: number },
  subcoolingTargetK: number,
  condenserGlideK: number | null,
): TargetBand {
  const expected = (condensing.lowK + condensing.highK) / 2 - (condenserGlideK ?? 0) / 2 - subcoolingTargetK;
  return {
    targetK: expected,
    lowK: expected - CONDENSER_APPROACH_TOLERANCE_K,
    highK: expected + CONDENSER_APPROACH_TOLERANCE_K,
    basis: "formula",
    source: CONDENSER_APPROACH_SOURCE,
  };
}

/** The expected air (or fluid) split: psychrometric for comfort coils with a wet bulb, else the application's band. */
function splitTarget(
  snapshotApplication: DiagnosisSnapshot["application"],
  returnDryBulbC: number | undefined,
  wetBulbC: number | null,
  atmosphereKPa: number,
): TargetBand | null {
  const comfort = snapshotApplication === "comfort-cooling" || snapshotApplication === "heat-pump";
  if (comfort && returnDryBulbC !== undefined && wetBulbC !== null) {
    const target = targetTemperatureSplit(returnDryBulbC, wetBulbC, atmosphereKPa);
    if (target !== null) {
      const tolerance = SPLIT_TARGET_MODEL.toleranceK;
      return {
        targetK: target,
        lowK: Math.max(0, target - tolerance),
        highK: target + tolerance,
        basis: "formula",
        source: SPLIT_SOURCE,
      };
    }
  }
  const band = APPLICATION_LIMITS[snapshotApplication].temperatureSplit;
  return {
    targetK: (band.lowK + band.highK) / 2,
    lowK: band.lowK,
    highK: band.highK,
    basis: "common-practice",
    source: band.source,
  };
}

/**
 * Computes every derived value of one circuit's validated readings, once, for the rules:
 * saturation temperatures through the property engine (dew point at suction, bubble point at
 * the liquid pressure; both points for glide and the mid-glide means the coil differences use),
 * superheat and subcooling, the application (recorded, or inferred from the return air) and its
 * bands, the target bands (superheat moved for where it was read), the wet bulb (measured, or
 * from relative humidity via psychrolib at the site's atmospheric pressure), the air split
 * target, air and condenser differences, discharge superheat, compression ratio and current
 * ratio. It also decides which values must not be used: a "liquid" temperature taken on the
 * discharge line, a line colder (suction, discharge) or warmer (liquid, beyond the dew point)
 * than physics allows, a high side above the critical pressure (gas cooler), and pressures
 * outside the refrigerant's table (TRADE.md §1.1–1.2).
 *
 * Units: kPa gauge and °C in; °C, K, kPa abs out.
 *
 * @throws {PropertyRangeError} UNKNOWN_REFRIGERANT for an id without a table (other property
 *   errors become `outsideTable` entries)
 * @example buildDiagnosisSnapshot(input).superheatK
 */
export function buildDiagnosisSnapshot(input: DiagnosisInput, withMeasuredCycle = false): DiagnosisSnapshot {
  const atmosphericPressureKPa = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const refrigerant = input.refrigerant;
  const info = getRefrigerant(refrigerant);
  const outsideTable: Exclusion[] = [];
  const { application, basis: applicationBasis } = inferApplication(input.application, input.returnAirDryBulbC);
  const limits = APPLICATION_LIMITS[application];

  const suctionPressureKPaAbs = gaugeToAbsolute(input.suctionPressureKPa, atmosphericPressureKPa);
  const liquidPressureKPaAbs = gaugeToAbsolute(input.liquidPressureKPa, atmosphericPressureKPa);
  const dischargePressureKPaAbs =
    input.dischargePressureKPa === undefined
      ? null
      : gaugeToAbsolute(input.dischargePressureKPa, atmosphericPressureKPa);
  // Above the critical pressure there is no condensing at all: R744 gas coolers run there by
  // design; for any other refrigerant such a reading is outside the table.
  const criticalKPa = info.criticalPoint.pressureKPa;
  const transcritical = refrigerant === TRANSCRITICAL_REFRIGERANT && liquidPressureKPaAbs > criticalKPa;

  // Superheat from the dew point, subcooling from the bubble point (TRADE.md §1.1 [S1][S2][S3]).
  // A pure refrigerant (or azeotrope) has one saturation curve: one lookup per pressure.
  const oneCurve = info.kind !== "blend";
  const evaporatingTempC = saturationOrExclusion(
    refrigerant,
    "suctionPressureKPa",
    suctionPressureKPaAbs,
    "dew",
    outsideTable,
  );
  const evaporatingBubbleTempC = oneCurve
    ? evaporatingTempC
    : saturationOrExclusion(refrigerant, "suctionPressureKPa", suctionPressureKPaAbs, "bubble", outsideTable);
  const condensingTempC = transcritical
    ? null
    : saturationOrExclusion(refrigerant, "liquidPressureKPa", liquidPressureKPaAbs, "bubble", outsideTable);
  const condensingDewTempC = transcritical
    ? null
    : oneCurve
      ? condensingTempC
      : saturationOrExclusion(refrigerant, "liquidPressureKPa", liquidPressureKPaAbs, "dew", outsideTable);
  const dischargeDewTempC =
    dischargePressureKPaAbs === null || (transcritical && dischargePressureKPaAbs > criticalKPa)
      ? condensingDewTempC
      : saturationOrExclusion(refrigerant, "dischargePressureKPa", dischargePressureKPaAbs, "dew", outsideTable);

  // Superheat: suction line − dew point. A vapour line below the bubble point is impossible.
  let superheatK = difference(input.suctionLineTempC, evaporatingTempC);
  let superheatExcluded: Exclusion | null = null;
  if (
    superheatK !== null &&
    evaporatingBubbleTempC !== null &&
    input.suctionLineTempC < evaporatingBubbleTempC - SENSOR_TOLERANCE_K
  ) {
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
  // A "liquid" temperature tagged as taken on the discharge line that is a plausible discharge
  // reading still tells the discharge temperature: judge with it when none was entered.
  let dischargeLineTempC = input.dischargeLineTempC;
  const onDischargeLine = (input.liquidTempLocation ?? "liquid-line") === "discharge-line";
  if (transcritical) {
    subcoolingExcluded = {
      code: "transcritical-gas-cooler",
      field: "liquidPressureKPa",
      reason: `${refrigerant} at ${formatTenths(liquidPressureKPaAbs)} kPa absolute is above its critical pressure ${formatTenths(criticalKPa)} kPa: the high side is a transcritical gas cooler, where nothing condenses, so subcooling does not apply; judge it by the gas cooler outlet temperature and the maker's high-side pressure`,
    };
    subcoolingK = null;
  } else if (onDischargeLine) {
    subcoolingK = null;
    const dew = dischargeDewTempC;
    if (dew !== null && input.liquidLineTempC < dew - SENSOR_TOLERANCE_K) {
      const looksLike =
        condensingTempC === null
          ? ""
          : `; if it was taken on the liquid line, mark it so and the subcooling is ${formatTenths(condensingTempC - input.liquidLineTempC)} K`;
      subcoolingExcluded = {
        code: "subcooling-on-discharge-line",
        field: "liquidTempLocation",
        reason: `A discharge line carries superheated gas and cannot be ${formatTenths(dew - input.liquidLineTempC)} K colder than the dew point ${formatTenths(dew)} °C at its pressure: ${formatTenths(input.liquidLineTempC)} °C cannot have been read on the discharge line${looksLike}. Subcooling is not used`,
      };
    } else {
      const detail =
        dew === null
          ? ""
          : ` (line ${formatTenths(input.liquidLineTempC)} °C − dew point ${formatTenths(dew)} °C = ${formatTenths(input.liquidLineTempC - dew)} K is discharge superheat, not subcooling)`;
      subcoolingExcluded = {
        code: "subcooling-on-discharge-line",
        field: "liquidTempLocation",
        reason: `The temperature was taken on the discharge line, which carries superheated vapour${detail}: subcooling is not valid and is left out of the verdict, which rests on the other readings; take it on the liquid line at the condenser outlet`,
      };
      dischargeLineTempC ??= input.liquidLineTempC;
    }
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
  if (
    input.dischargeLineTempC !== undefined &&
    dischargeDewTempC !== null &&
    input.dischargeLineTempC < dischargeDewTempC - SENSOR_TOLERANCE_K
  ) {
    dischargeLineExcluded = {
      code: "discharge-below-saturation",
      field: "dischargeLineTempC",
      reason: `Discharge line ${input.dischargeLineTempC.toFixed(1)} °C is below the dew point ${dischargeDewTempC.toFixed(1)} °C at discharge pressure, which is impossible for discharge gas: check the probe; the reading is not used`,
    };
    dischargeLineTempC = undefined;
  }

  let returnAirWetBulbC: number | null = null;
  let wetBulbBasis: DiagnosisSnapshot["wetBulbBasis"] = null;
  if (input.returnAirWetBulbC !== undefined) {
    returnAirWetBulbC = input.returnAirWetBulbC;
    wetBulbBasis = "measured";
  } else if (input.returnAirRelativeHumidity !== undefined && input.returnAirDryBulbC !== undefined) {
    returnAirWetBulbC = wetBulbFromRelativeHumidity(
      input.returnAirDryBulbC,
      input.returnAirRelativeHumidity,
      atmosphericPressureKPa,
    );
    wetBulbBasis = "from-relative-humidity";
  }

  const suctionTempLocation = input.suctionTempLocation ?? null;
  const allowanceK = suctionTempLocation === null ? 0 : suctionLineAllowance(input.liquidLineLengthM);
  const superheatChoice = selectSuperheatTarget(
    input.meteringDevice,
    input.targetSuperheatK,
    returnAirWetBulbC,
    input.outdoorAirDryBulbC,
    {
      application,
      ...(suctionTempLocation === null ? {} : { suctionTempLocation }),
      allowanceK,
    },
  );
  const subcoolingTarget = selectSubcoolingTarget(input.targetSubcoolingK, application);
  const liquidOnLiquidLine = !onDischargeLine && !transcritical && subcoolingExcluded === null;
  const evaporatingMeanTempC = mean(evaporatingTempC, evaporatingBubbleTempC);
  const condensingMeanTempC = mean(condensingTempC, condensingDewTempC);

  return {
    input,
    withMeasuredCycle,
    meteringDevice: input.meteringDevice,
    meteringFamily: meteringFamilyOf(input.meteringDevice),
    application,
    applicationBasis,
    limits,
    dischargeLimits: dischargeLineLimits(refrigerant, application),
    suctionTempLocation,
    suctionLineAllowanceK: superheatChoice.shiftK,
    atmosphericPressureKPa,
    suctionPressureKPaAbs,
    liquidPressureKPaAbs,
    dischargePressureKPaAbs,
    evaporatingTempC,
    evaporatingBubbleTempC,
    condensingTempC,
    condensingDewTempC,
    dischargeDewTempC,
    evaporatingMeanTempC,
    condensingMeanTempC,
    glideK: difference(evaporatingTempC, evaporatingBubbleTempC),
    condenserGlideK: difference(condensingDewTempC, condensingTempC),
    transcritical,
    superheatK,
    liquidSideDifferenceK,
    subcoolingK,
    superheatExcluded,
    subcoolingExcluded,
    dischargeLineExcluded,
    outsideTable,
    superheatTarget: superheatChoice.band,
    superheatTargetNote: superheatChoice.note,
    subcoolingTarget,
    subcoolingPivotK: subcoolingTarget.targetK - SUBCOOLING_PIVOT_BELOW_TARGET_K,
    condenserApproachTarget: approachTarget(
      limits.condensingOverAmbient,
      subcoolingTarget.targetK,
      difference(condensingDewTempC, condensingTempC),
    ),
    temperatureSplitTarget: splitTarget(
      application,
      input.returnAirDryBulbC,
      returnAirWetBulbC,
      atmosphericPressureKPa,
    ),
    returnAirWetBulbC,
    wetBulbBasis,
    temperatureSplitK: difference(input.returnAirDryBulbC, input.supplyAirDryBulbC),
    condenserApproachK: liquidOnLiquidLine ? difference(input.liquidLineTempC, input.outdoorAirDryBulbC) : null,
    condensingOverAmbientK: difference(condensingMeanTempC, input.outdoorAirDryBulbC),
    evaporatorTemperatureDifferenceK: difference(input.returnAirDryBulbC, evaporatingMeanTempC),
    dischargeSuperheatK: difference(dischargeLineTempC, dischargeDewTempC),
    dischargeLineTempC: dischargeLineTempC ?? null,
    compressionRatio: (dischargePressureKPaAbs ?? liquidPressureKPaAbs) / suctionPressureKPaAbs,
    compressionRatioBasis: dischargePressureKPaAbs === null ? "liquid" : "discharge",
    compressorCurrentRatio:
      input.compressorAmps !== undefined && input.compressorRla !== undefined
        ? input.compressorAmps / input.compressorRla
        : null,
  };
}
