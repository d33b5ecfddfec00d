import {
  APPLICATIONS,
  CHARGE_REFERENCE_LIMITS,
  DIAGNOSIS_FIELD_RANGES,
  DiagnosisInputSchema,
  LIQUID_TEMP_LOCATIONS,
  METERING_DEVICES,
  STANDARD_ATMOSPHERE_KPA,
  SUCTION_TEMP_LOCATIONS,
  WET_BULB_ABOVE_DRY_BULB_TOLERANCE_K,
  type ChargeReference,
  type DiagnosisInput,
  type DiagnosisInputDraft,
} from "../../schemas/diagnosis.ts";
import { isCleanText } from "../../schemas/text.ts";

const RANGES = DIAGNOSIS_FIELD_RANGES;

/** The fields this check reads and range-checks, in schema order. */
const CHECKED_FIELDS = [
  "refrigerant",
  "meteringDevice",
  "suctionPressureKPa",
  "suctionLineTempC",
  "suctionTempLocation",
  "liquidPressureKPa",
  "liquidLineTempC",
  "liquidTempLocation",
  "dischargePressureKPa",
  "dischargeLineTempC",
  "returnAirDryBulbC",
  "returnAirWetBulbC",
  "returnAirRelativeHumidity",
  "supplyAirDryBulbC",
  "outdoorAirDryBulbC",
  "compressorAmps",
  "compressorRla",
  "targetSuperheatK",
  "targetSubcoolingK",
  "atmosphericPressureKPa",
  "runMinutes",
  "application",
  "liquidLineLengthM",
  "chargeKg",
  "chargeReference",
] as const;
// A field or range added to the schema but not here would make this check looser than the
// schema: fail at start-up instead of accepting readings the schema refuses.
const UNRANGED_FIELDS: readonly string[] = ["refrigerant", "meteringDevice", "liquidTempLocation", "suctionTempLocation", "application", "chargeReference"];
if (
  Object.keys(DiagnosisInputSchema.shape).join() !== CHECKED_FIELDS.join() ||
  Object.keys(RANGES).join() !== CHECKED_FIELDS.filter((field) => !UNRANGED_FIELDS.includes(field)).join()
) {
  throw new Error("fastParseDiagnosisInput requires the same fields and ranges as DiagnosisInputSchema");
}
const METERING_DEVICE_SET: ReadonlySet<unknown> = new Set(METERING_DEVICES);
const LIQUID_TEMP_LOCATION_SET: ReadonlySet<unknown> = new Set(LIQUID_TEMP_LOCATIONS);
const SUCTION_TEMP_LOCATION_SET: ReadonlySet<unknown> = new Set(SUCTION_TEMP_LOCATIONS);
const APPLICATION_SET: ReadonlySet<unknown> = new Set(APPLICATIONS);

/** `z.number()` accepts finite numbers only (zod 4 refuses NaN and ±Infinity). */
function isFiniteNumber(value: unknown): value is number {
  return typeof value === "number" && Number.isFinite(value);
}

/** The schema's range check of one reading (an absent reading passes). */
function outsideRange(value: number | undefined, range: { min: number; minExclusive?: boolean; max: number }): boolean {
  if (value === undefined) return false;
  return (range.minExclusive ? value <= range.min : value < range.min) || value > range.max;
}

function isOptionalFiniteNumber(value: unknown): value is number | undefined {
  return value === undefined || isFiniteNumber(value);
}

const inside = (value: unknown, min: number, max: number): value is number => isFiniteNumber(value) && value >= min && value <= max;

/**
 * ChargeReferenceSchema's checks (`REFERENCE_LIMITS` are its bounds): the six figures, the two
 * air temperatures nullable; unknown keys dropped. Null when the schema would refuse it.
 */
function fastParseChargeReference(value: unknown): ChargeReference | null {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return null;
  const reference = value as Record<string, unknown>;
  const { subcoolingK, superheatK, evaporatingTempC, condensingTempC, outdoorAirDryBulbC, returnAirDryBulbC } = reference;
  const { differenceK, temperatureC } = CHARGE_REFERENCE_LIMITS;
  if (
    !inside(subcoolingK, differenceK.min, differenceK.max) ||
    !inside(superheatK, differenceK.min, differenceK.max) ||
    !inside(evaporatingTempC, temperatureC.min, temperatureC.max) ||
    !inside(condensingTempC, temperatureC.min, temperatureC.max) ||
    (outdoorAirDryBulbC !== null && !inside(outdoorAirDryBulbC, temperatureC.min, temperatureC.max)) ||
    (returnAirDryBulbC !== null && !inside(returnAirDryBulbC, temperatureC.min, temperatureC.max))
  ) {
    return null;
  }
  return { subcoolingK, superheatK, evaporatingTempC, condensingTempC, outdoorAirDryBulbC, returnAirDryBulbC };
}

/**
 * Fast acceptance check of one circuit's readings: answers the validated readings exactly as
 * `DiagnosisInputSchema.parse` would (refrigerant trimmed, unknown keys dropped) when the input
 * passes every check of that schema (types, ranges, vacuum limit, cross-field rules), and null
 * otherwise. Why: the zod parse alone cost about 4 µs of the 5 µs `diagnose()` budget. The
 * schema stays the only source of the ranges and of every message: on null the caller runs
 * the schema, which gives the field messages (or accepts the input after all, so a check here
 * that is stricter than the schema cannot change a result; one that is looser would, which
 * tests/engine/diagnosis/fast-parse-diagnosis-input.test.ts guards against with random inputs).
 *
 * Units: as `DiagnosisInputSchema` (kPa gauge, °C, K, %, A, minutes); valid range: any value.
 * Source: the contract in shared/schemas/diagnosis.ts, check for check.
 *
 * @throws never
 * @example fastParseDiagnosisInput({ refrigerant: " R410A", meteringDevice: "txv", suctionPressureKPa: 820, suctionLineTempC: 13, liquidPressureKPa: 2650, liquidLineTempC: 38 })?.refrigerant // "R410A"
 */
export function fastParseDiagnosisInput(input: DiagnosisInputDraft | unknown): DiagnosisInput | null {
  // z.object: any non-null, non-array object; fields are read through the prototype chain too.
  if (typeof input !== "object" || input === null || Array.isArray(input)) return null;
  const draft = input as Record<string, unknown>;

  const refrigerant = draft.refrigerant;
  if (typeof refrigerant !== "string") return null;
  const trimmed = refrigerant.trim();
  if (trimmed.length < 1 || !isCleanText(trimmed)) return null;
  const meteringDevice = draft.meteringDevice;
  if (!METERING_DEVICE_SET.has(meteringDevice)) return null;
  const liquidTempLocation = draft.liquidTempLocation;
  if (liquidTempLocation !== undefined && !LIQUID_TEMP_LOCATION_SET.has(liquidTempLocation)) return null;
  const suctionTempLocation = draft.suctionTempLocation;
  if (suctionTempLocation !== undefined && !SUCTION_TEMP_LOCATION_SET.has(suctionTempLocation)) return null;
  const application = draft.application;
  if (application !== undefined && !APPLICATION_SET.has(application)) return null;
  const chargeReference = draft.chargeReference === undefined ? undefined : fastParseChargeReference(draft.chargeReference);
  if (chargeReference === null) return null;

  const {
    suctionPressureKPa,
    suctionLineTempC,
    liquidPressureKPa,
    liquidLineTempC,
    dischargePressureKPa,
    dischargeLineTempC,
    returnAirDryBulbC,
    returnAirWetBulbC,
    returnAirRelativeHumidity,
    supplyAirDryBulbC,
    outdoorAirDryBulbC,
    compressorAmps,
    compressorRla,
    targetSuperheatK,
    targetSubcoolingK,
    atmosphericPressureKPa,
    runMinutes,
    liquidLineLengthM,
    chargeKg,
  } = draft;
  if (
    !isFiniteNumber(suctionPressureKPa) ||
    !isFiniteNumber(suctionLineTempC) ||
    !isFiniteNumber(liquidPressureKPa) ||
    !isFiniteNumber(liquidLineTempC) ||
    !isOptionalFiniteNumber(dischargePressureKPa) ||
    !isOptionalFiniteNumber(dischargeLineTempC) ||
    !isOptionalFiniteNumber(returnAirDryBulbC) ||
    !isOptionalFiniteNumber(returnAirWetBulbC) ||
    !isOptionalFiniteNumber(returnAirRelativeHumidity) ||
    !isOptionalFiniteNumber(supplyAirDryBulbC) ||
    !isOptionalFiniteNumber(outdoorAirDryBulbC) ||
    !isOptionalFiniteNumber(compressorAmps) ||
    !isOptionalFiniteNumber(compressorRla) ||
    !isOptionalFiniteNumber(targetSuperheatK) ||
    !isOptionalFiniteNumber(targetSubcoolingK) ||
    !isOptionalFiniteNumber(atmosphericPressureKPa) ||
    !isOptionalFiniteNumber(runMinutes) ||
    !isOptionalFiniteNumber(liquidLineLengthM) ||
    !isOptionalFiniteNumber(chargeKg)
  ) {
    return null;
  }

  // One object literal with every key, so the rules always see the same object shape.
  const parsed: DiagnosisInput = {
    refrigerant: trimmed,
    meteringDevice: meteringDevice as DiagnosisInput["meteringDevice"],
    suctionPressureKPa,
    suctionLineTempC,
    suctionTempLocation: suctionTempLocation as DiagnosisInput["suctionTempLocation"],
    liquidPressureKPa,
    liquidLineTempC,
    liquidTempLocation: liquidTempLocation as DiagnosisInput["liquidTempLocation"],
    dischargePressureKPa,
    dischargeLineTempC,
    returnAirDryBulbC,
    returnAirWetBulbC,
    returnAirRelativeHumidity,
    supplyAirDryBulbC,
    outdoorAirDryBulbC,
    compressorAmps,
    compressorRla,
    targetSuperheatK,
    targetSubcoolingK,
    atmosphericPressureKPa,
    runMinutes,
    application: application as DiagnosisInput["application"],
    liquidLineLengthM,
    chargeKg,
    chargeReference,
  };

  // The schema's refinement, check for check, without building any message. Field by field
  // rather than a loop over the ranges: a loop needs a keyed read per field (performance).
  if (
    outsideRange(suctionPressureKPa, RANGES.suctionPressureKPa) ||
    outsideRange(suctionLineTempC, RANGES.suctionLineTempC) ||
    outsideRange(liquidPressureKPa, RANGES.liquidPressureKPa) ||
    outsideRange(liquidLineTempC, RANGES.liquidLineTempC) ||
    outsideRange(dischargePressureKPa, RANGES.dischargePressureKPa) ||
    outsideRange(dischargeLineTempC, RANGES.dischargeLineTempC) ||
    outsideRange(returnAirDryBulbC, RANGES.returnAirDryBulbC) ||
    outsideRange(returnAirWetBulbC, RANGES.returnAirWetBulbC) ||
    outsideRange(returnAirRelativeHumidity, RANGES.returnAirRelativeHumidity) ||
    outsideRange(supplyAirDryBulbC, RANGES.supplyAirDryBulbC) ||
    outsideRange(outdoorAirDryBulbC, RANGES.outdoorAirDryBulbC) ||
    outsideRange(compressorAmps, RANGES.compressorAmps) ||
    outsideRange(compressorRla, RANGES.compressorRla) ||
    outsideRange(targetSuperheatK, RANGES.targetSuperheatK) ||
    outsideRange(targetSubcoolingK, RANGES.targetSubcoolingK) ||
    outsideRange(atmosphericPressureKPa, RANGES.atmosphericPressureKPa) ||
    outsideRange(runMinutes, RANGES.runMinutes) ||
    outsideRange(liquidLineLengthM, RANGES.liquidLineLengthM) ||
    outsideRange(chargeKg, RANGES.chargeKg)
  ) {
    return null;
  }
  const vacuumGauge = -(atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA);
  if (suctionPressureKPa <= vacuumGauge || liquidPressureKPa <= vacuumGauge) return null;
  if (
    dischargePressureKPa !== undefined &&
    (dischargePressureKPa <= vacuumGauge || dischargePressureKPa <= suctionPressureKPa)
  ) {
    return null;
  }
  if (suctionPressureKPa >= liquidPressureKPa) return null;
  if (
    returnAirWetBulbC !== undefined &&
    returnAirDryBulbC !== undefined &&
    returnAirWetBulbC > returnAirDryBulbC + WET_BULB_ABOVE_DRY_BULB_TOLERANCE_K
  ) {
    return null;
  }
  if (returnAirRelativeHumidity !== undefined && returnAirDryBulbC === undefined) return null;
  return parsed;
}
