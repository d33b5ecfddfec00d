import {
  DiagnosisInputSchema,
  type DiagnosisInput,
  type DiagnosisInputDraft,
  type DiagnosisResult,
  type DiagnosisWarning,
  type Finding,
} from "../../schemas/diagnosis.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { buildDiagnosisSnapshot } from "./build-diagnosis-snapshot.ts";
import { DiagnosisInputError } from "./diagnosis-input-error.ts";
import { fastParseDiagnosisInput } from "./fast-parse-diagnosis-input.ts";
import { rankChargeStates } from "./rank-charge-states.ts";
import { DIAGNOSIS_RULES } from "./rules/registry.ts";

/**
 * Smallest winning score for a verdict: below it the evidence is too thin and the result is
 * "insufficient-data" (score 0.5 ≈ confidence 0.39; about half of one full-strength reading).
 */
export const MIN_VERDICT_SCORE = 0.5;

/**
 * The rule that carries the charge signal per metering family: a fixed device is charged by
 * superheat [S10][S17], a TXV/EEV by subcooling [S9][S11][S14]. Without that reading judged
 * against a target there is no verdict (weigh in the charge instead).
 */
const PRIMARY_RULE = { fixed: "superheat-vs-target", "expansion-valve": "subcooling-vs-target" } as const;

/**
 * Charge diagnosis of one running circuit: saturation temperatures (dew point at suction,
 * bubble point at the liquid pressure), superheat, subcooling, glide, their targets, the air
 * and condenser values, and the charge state with its evidence and warnings.
 *
 * How: the readings are validated (`DiagnosisInputSchema`, after `fastParseDiagnosisInput`
 * has accepted the valid ones faster), every derived value is computed once into a snapshot
 * through the property engine, each rule of `DIAGNOSIS_RULES` turns the
 * snapshot into findings (each pointing to states with a weight) and warnings, and
 * `rankChargeStates` sums the evidence. The top state wins if its score reaches
 * `MIN_VERDICT_SCORE` and the metering device's charge signal (superheat for fixed devices,
 * subcooling for TXV/EEV) was judged against a target; otherwise the verdict is
 * "insufficient-data". Symptom patterns: TRADE.md §2 [S21][S22][S23][S24].
 *
 * Units: kPa gauge, °C in; °C, K, ratios out (see `DiagnosisResultSchema`).
 *
 * @throws {DiagnosisInputError} when the readings are invalid or impossible (field messages),
 *   or the refrigerant is unknown
 * @example diagnose({ refrigerant: "R410A", meteringDevice: "txv", suctionPressureKPa: 820, suctionLineTempC: 13, liquidPressureKPa: 2650, liquidLineTempC: 38 }).chargeState
 */
export function diagnose(input: DiagnosisInputDraft): DiagnosisResult {
  // Performance: the hand-written check accepts valid readings without zod's cost; anything it
  // refuses goes through the schema, which stays the source of every message.
  let data: DiagnosisInput | null = fastParseDiagnosisInput(input);
  if (data === null) {
    const parsed = DiagnosisInputSchema.safeParse(input);
    if (!parsed.success) throw DiagnosisInputError.fromZodError(parsed.error);
    data = parsed.data;
  }
  let snapshot;
  try {
    snapshot = buildDiagnosisSnapshot(data);
  } catch (error) {
    if (error instanceof PropertyRangeError && error.code === "UNKNOWN_REFRIGERANT") {
      throw new DiagnosisInputError({ refrigerant: [error.message] });
    }
    throw error;
  }

  const findings: Finding[] = [];
  const warnings: DiagnosisWarning[] = [];
  // Indexed loops and no callback: this runs for every rule on every call (performance).
  const primaryRule = PRIMARY_RULE[snapshot.meteringFamily];
  let judged = false;
  for (let ruleIndex = 0; ruleIndex < DIAGNOSIS_RULES.length; ruleIndex += 1) {
    const output = DIAGNOSIS_RULES[ruleIndex]!.evaluate(snapshot);
    const ruleFindings = output.findings;
    for (let index = 0; index < ruleFindings.length; index += 1) {
      const finding = ruleFindings[index]!;
      findings.push(finding);
      if (finding.ruleId === primaryRule && (finding.direction === "low" || finding.direction === "normal" || finding.direction === "high")) judged = true;
    }
    const ruleWarnings = output.warnings;
    for (let index = 0; index < ruleWarnings.length; index += 1) warnings.push(ruleWarnings[index]!);
  }

  const ranked = rankChargeStates(findings);
  const top = ranked[0];
  const verdict = judged && top !== undefined && top.score >= MIN_VERDICT_SCORE ? top : null;

  return {
    refrigerant: data.refrigerant,
    meteringDevice: data.meteringDevice,
    evaporatingTempC: snapshot.evaporatingTempC,
    evaporatingBubbleTempC: snapshot.evaporatingBubbleTempC,
    condensingTempC: snapshot.condensingTempC,
    condensingDewTempC: snapshot.condensingDewTempC,
    glideK: snapshot.glideK,
    condenserGlideK: snapshot.condenserGlideK,
    superheatK: snapshot.superheatK,
    subcoolingK: snapshot.subcoolingK,
    targets: { superheat: snapshot.superheatTarget, subcooling: snapshot.subcoolingTarget },
    returnAirWetBulbC: snapshot.returnAirWetBulbC,
    wetBulbBasis: snapshot.wetBulbBasis,
    temperatureSplitK: snapshot.temperatureSplitK,
    condenserApproachK: snapshot.condenserApproachK,
    condensingOverAmbientK: snapshot.condensingOverAmbientK,
    evaporatorTemperatureDifferenceK: snapshot.evaporatorTemperatureDifferenceK,
    compressionRatio: snapshot.compressionRatio,
    compressionRatioBasis: snapshot.compressionRatioBasis,
    compressorCurrentRatio: snapshot.compressorCurrentRatio,
    chargeState: verdict ? verdict.state : "insufficient-data",
    confidence: verdict ? verdict.confidence : 0,
    alternatives: verdict ? ranked.slice(1) : ranked,
    findings,
    warnings,
  };
}
