import type {
  DiagnosisInput,
  DiagnosisWarning,
  EvidenceState,
  Finding,
  MeteringDevice,
  TargetBand,
  WarningCode,
} from "../../schemas/diagnosis.ts";

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
  meteringDevice: MeteringDevice;
  /** TXV/EEV hold superheat; fixed orifice and capillary do not (TRADE.md §2 notes). */
  meteringFamily: "expansion-valve" | "fixed";
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
  glideK: number | null;
  condenserGlideK: number | null;
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
  returnAirWetBulbC: number | null;
  wetBulbBasis: "measured" | "from-relative-humidity" | null;
  temperatureSplitK: number | null;
  condenserApproachK: number | null;
  condensingOverAmbientK: number | null;
  evaporatorTemperatureDifferenceK: number | null;
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

/**
 * Evidence weights of one state against a reading's deviation from its band:
 * [well below the band, inside the band, well above the band]. Between the band edge and full
 * strength the weight moves linearly from `inside` to the outer value.
 */
export type EvidenceProfile = Partial<Record<EvidenceState, readonly [below: number, inside: number, above: number]>>;
