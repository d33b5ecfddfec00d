import type {
  Application,
  DiagnosisInput,
  DiagnosisResult,
  DiagnosisWarning,
  Finding,
  MeteringDevice,
  SuctionTempLocation,
  TargetBand,
  WarningCode,
} from "../../schemas/diagnosis.ts";
import type { ApplicationLimits, DischargeLineLimits } from "./diagnosis-limits.ts";
import type { MeteringFamily } from "./signature-table.ts";

/** Why a derived value is not used for the verdict. */
export interface Exclusion {
  code: WarningCode;
  field: string;
  reason: string;
}

/**
 * Everything the rules read: the validated readings plus every derived value, computed once
 * by `buildDiagnosisSnapshot` through the engine's functions. Rules never recompute these.
 * Temperatures °C, differences K, pressures kPa (absolute where named so).
 */
export interface DiagnosisSnapshot {
  input: DiagnosisInput;
  /** Judge the compressor from the measured cycle too (see `diagnose` options). */
  withMeasuredCycle: boolean;
  meteringDevice: MeteringDevice;
  /** TXV/EEV hold superheat; fixed orifice and capillary do not (TRADE.md §2 notes). */
  meteringFamily: MeteringFamily;
  application: Application;
  applicationBasis: DiagnosisResult["applicationBasis"];
  /** The application's bands. */
  limits: ApplicationLimits;
  dischargeLimits: DischargeLineLimits;
  suctionTempLocation: SuctionTempLocation | null;
  /** How far the superheat band was moved for where it was read, K (negative: down; 0: not moved). */
  suctionLineAllowanceK: number;
  atmosphericPressureKPa: number;
  suctionPressureKPaAbs: number;
  liquidPressureKPaAbs: number;
  dischargePressureKPaAbs: number | null;
  evaporatingTempC: number | null;
  evaporatingBubbleTempC: number | null;
  condensingTempC: number | null;
  condensingDewTempC: number | null;
  /** Dew point at the discharge pressure (or liquid pressure when no discharge gauge), °C. */
  dischargeDewTempC: number | null;
  /** Mid-glide (mean) evaporating and condensing temperatures, °C: coil temperature differences use these. */
  evaporatingMeanTempC: number | null;
  condensingMeanTempC: number | null;
  glideK: number | null;
  condenserGlideK: number | null;
  /** The liquid (high side) pressure is above the critical pressure: a gas cooler (R744). */
  transcritical: boolean;
  superheatK: number | null;
  /** Saturation (bubble) − liquid temperature even when not valid as subcooling, K. */
  liquidSideDifferenceK: number | null;
  subcoolingK: number | null;
  /** Superheat exists but must not drive the verdict (impossible reading). */
  superheatExcluded: Exclusion | null;
  subcoolingExcluded: Exclusion | null;
  dischargeLineExcluded: Exclusion | null;
  /** Readings that fell outside the refrigerant's table, with the engine's message. */
  outsideTable: Exclusion[];
  superheatTarget: TargetBand | null;
  /** Why there is no superheat target, or why a formula target is not to be charged by. */
  superheatTargetNote: string | null;
  subcoolingTarget: TargetBand | null;
  /** Subcooling below this (target − 1 K) with high superheat reads as a shortage, K. */
  subcoolingPivotK: number | null;
  /** Expected liquid line − outdoor air band. */
  condenserApproachTarget: TargetBand;
  /** Expected return − supply split band, when there is one. */
  temperatureSplitTarget: TargetBand | null;
  returnAirWetBulbC: number | null;
  wetBulbBasis: "measured" | "from-relative-humidity" | null;
  temperatureSplitK: number | null;
  condenserApproachK: number | null;
  condensingOverAmbientK: number | null;
  evaporatorTemperatureDifferenceK: number | null;
  /** Discharge line − dew point at the discharge (or liquid) pressure, K. */
  dischargeSuperheatK: number | null;
  /**
   * Discharge line temperature the rules judge, °C: the one entered, or a "liquid" temperature
   * that was in fact read on the discharge line; null when none or impossible.
   */
  dischargeLineTempC: number | null;
  compressionRatio: number | null;
  compressionRatioBasis: "discharge" | "liquid" | null;
  compressorCurrentRatio: number | null;
}

export interface RuleOutput {
  readonly findings: readonly Finding[];
  readonly warnings: readonly DiagnosisWarning[];
}

/** One diagnostic rule: pure snapshot → findings and warnings. */
export interface DiagnosisRule {
  id: string;
  /** One line: what the rule checks. */
  description: string;
  /** Source tag(s) with title, or "common practice" / "memory". */
  source: string;
  evaluate(snapshot: DiagnosisSnapshot): RuleOutput;
}
