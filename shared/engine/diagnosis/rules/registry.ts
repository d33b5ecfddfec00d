/**
 * The diagnosis rules in evaluation order: data-quality checks first (they only warn), then the
 * superheat/subcooling rules that carry the charge signal, then the supporting readings.
 * `diagnose()` runs every rule on the snapshot and sums the evidence of their findings.
 */
import type { DiagnosisRule } from "../types.ts";
import { compressionRatioRule } from "./compression-ratio.ts";
import { compressorCurrentRule } from "./compressor-current.ts";
import { condenserApproachRule } from "./condenser-approach.ts";
import { condensingOverAmbientRule } from "./condensing-over-ambient.ts";
import { dischargeLineSaturationRule } from "./discharge-line-saturation.ts";
import { dischargeLineTemperatureRule } from "./discharge-line-temperature.ts";
import { evaporatorTemperatureDifferenceRule } from "./evaporator-temperature-difference.ts";
import { highHeadPairingRule } from "./high-head-pairing.ts";
import { liquidLineSaturationRule } from "./liquid-line-saturation.ts";
import { liquidTemperatureLocationRule } from "./liquid-temperature-location.ts";
import { outsideTableRule } from "./outside-table.ts";
import { runTimeRule } from "./run-time.ts";
import { subcoolingVsTargetRule } from "./subcooling-vs-target.ts";
import { suctionLineSaturationRule } from "./suction-line-saturation.ts";
import { superheatSubcoolingPairingRule } from "./superheat-subcooling-pairing.ts";
import { superheatVsTargetRule } from "./superheat-vs-target.ts";
import { supplyAirRule } from "./supply-air.ts";
import { temperatureSplitRule } from "./temperature-split.ts";
import { weakCompressorPairingRule } from "./weak-compressor-pairing.ts";

export const DIAGNOSIS_RULES: readonly DiagnosisRule[] = Object.freeze([
  runTimeRule,
  outsideTableRule,
  liquidTemperatureLocationRule,
  suctionLineSaturationRule,
  liquidLineSaturationRule,
  dischargeLineSaturationRule,
  dischargeLineTemperatureRule,
  supplyAirRule,
  superheatVsTargetRule,
  subcoolingVsTargetRule,
  superheatSubcoolingPairingRule,
  evaporatorTemperatureDifferenceRule,
  temperatureSplitRule,
  condensingOverAmbientRule,
  highHeadPairingRule,
  weakCompressorPairingRule,
  condenserApproachRule,
  compressionRatioRule,
  compressorCurrentRule,
]);
