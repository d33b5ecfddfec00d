/**
 * The diagnosis rules in evaluation order: data-quality checks first (they only warn), then the
 * superheat/subcooling rules that carry the charge signal, then the supporting readings. Each
 * reading rule fills one column of the signature table (signature-table.ts); `diagnose()` runs
 * every rule on the snapshot and sums the evidence of their findings per state.
 */
import type { DiagnosisRule } from "../types.ts";
import { applicationFitRule } from "./application-fit.ts";
import { transcriticalHighSideRule } from "./transcritical-high-side.ts";
import { compressionRatioRule } from "./compression-ratio.ts";
import { compressorCurrentRule } from "./compressor-current.ts";
import { compressorEfficiencyRule } from "./compressor-efficiency.ts";
import { condenserApproachRule } from "./condenser-approach.ts";
import { condensingOverAmbientRule } from "./condensing-over-ambient.ts";
import { dischargeLineSaturationRule } from "./discharge-line-saturation.ts";
import { dischargeLineTemperatureRule } from "./discharge-line-temperature.ts";
import { evaporatorTemperatureDifferenceRule } from "./evaporator-temperature-difference.ts";
import { liquidLineSaturationRule } from "./liquid-line-saturation.ts";
import { liquidTemperatureLocationRule } from "./liquid-temperature-location.ts";
import { outsideTableRule } from "./outside-table.ts";
import { runTimeRule } from "./run-time.ts";
import { subcoolingVsTargetRule } from "./subcooling-vs-target.ts";
import { suctionLineSaturationRule } from "./suction-line-saturation.ts";
import { superheatVsTargetRule } from "./superheat-vs-target.ts";
import { supplyAirRule } from "./supply-air.ts";
import { temperatureSplitRule } from "./temperature-split.ts";

export const DIAGNOSIS_RULES: readonly DiagnosisRule[] = Object.freeze([
  runTimeRule,
  applicationFitRule,
  outsideTableRule,
  transcriticalHighSideRule,
  liquidTemperatureLocationRule,
  suctionLineSaturationRule,
  liquidLineSaturationRule,
  dischargeLineSaturationRule,
  dischargeLineTemperatureRule,
  supplyAirRule,
  superheatVsTargetRule,
  subcoolingVsTargetRule,
  evaporatorTemperatureDifferenceRule,
  temperatureSplitRule,
  condensingOverAmbientRule,
  condenserApproachRule,
  compressionRatioRule,
  compressorCurrentRule,
  compressorEfficiencyRule,
]);
