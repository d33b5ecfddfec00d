import {
  type DiagnosisInput,
  type DiagnosisResult,
  type DiagnosisWarning,
  type EvidenceState,
  type Finding,
  type LeftOutReading,
  type RankedState,
} from "../../schemas/diagnosis.ts";
import { estimateChargeDeviation } from "../charge/estimate-charge-deviation.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { buildDiagnosisSnapshot } from "./build-diagnosis-snapshot.ts";
import { chargeStateText } from "../../content/charge-states.ts";
import { DiagnosisInputError } from "./diagnosis-input-error.ts";
import { MIN_RUN_MINUTES, NO_CHARGE_SIGNAL_CONFIDENCE, UNSETTLED_CONFIDENCE_FLOOR } from "./diagnosis-limits.ts";
import { evidenceWeight } from "./evidence-weight.ts";
import { rankChargeStates } from "./rank-charge-states.ts";
import { DIAGNOSIS_RULES } from "./rules/registry.ts";
import { cite } from "../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";
import { summarizeVerdict } from "./summarize-verdict.ts";
import type { DiagnosisSnapshot } from "./types.ts";

/**
 * Smallest winning score for a verdict: below it the evidence is too thin and the result is
 * "insufficient-data" (score 0.5 ≈ confidence 0.39; about half of one full-strength reading).
 */
export const MIN_VERDICT_SCORE = 0.5;
/**
 * Smallest winning score when the metering family's charge signal (superheat on a fixed device,
 * subcooling on a TXV/EEV) could not be judged: the other readings must agree more strongly.
 */
export const MIN_VERDICT_SCORE_WITHOUT_CHARGE_SIGNAL = 1.5;

/**
 * The rule that carries the charge signal per metering family: a fixed device is charged by
 * superheat [S10][S17], a TXV/EEV by subcooling [S9][S11][S14].
 */
const PRIMARY_RULE = { fixed: "superheat-vs-target", "expansion-valve": "subcooling-vs-target" } as const;
/** States that say the charge is right or wrong: a fixed device without its superheat target can name none of them (weigh in [S10]). */
const CHARGE_VERDICTS: ReadonlySet<EvidenceState> = new Set(["normal", "undercharged", "overcharged"]);
const JUDGED = new Set<Finding["direction"]>(["low", "normal", "high"]);
/**
 * Kilograms read from the subcooling and superheat hold only when the charge is the fault: a weak
 * compressor or a dirty condenser moves them too. Charge is judged once airflow and the other
 * faults are right (Title 24 RA3 verifies airflow before the charge [S10], from memory; common
 * practice).
 */
const OTHER_FAULT_SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S10"])}, from memory; ${COMMON_PRACTICE}`;
const NO_SIGNAL_SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S9", "S10", "S11"])}; judging from the remaining readings (${COMMON_PRACTICE})`;

/** Confidence multiplier for the run time: readings drift for 10–15 min after a start [S10][S20]. */
function settlingFactor(runMinutes: number | undefined): number {
  if (runMinutes === undefined || runMinutes >= MIN_RUN_MINUTES) return 1;
  return UNSETTLED_CONFIDENCE_FLOOR + ((1 - UNSETTLED_CONFIDENCE_FLOOR) * Math.max(0, runMinutes)) / MIN_RUN_MINUTES;
}

function readingsLeftOut(snapshot: DiagnosisSnapshot): LeftOutReading[] {
  const left: LeftOutReading[] = [];
  for (const exclusion of [snapshot.superheatExcluded, snapshot.subcoolingExcluded, snapshot.dischargeLineExcluded]) {
    if (exclusion) left.push({ field: exclusion.field, reason: exclusion.reason });
  }
  for (const exclusion of snapshot.outsideTable) left.push({ field: exclusion.field, reason: exclusion.reason });
  return left;
}

/** Options of `diagnose()`. */
export interface DiagnoseOptions {
  /**
   * Judge the compressor from the measured cycle too (its apparent isentropic efficiency), when
   * the refrigerant's single-phase table is loaded. The run log asks for it (server and browser
   * both load the table first); worked cases and the casebook judge the saturation readings only.
   */
  withMeasuredCycle?: boolean;
}

/**
 * Charge diagnosis of one running circuit: saturation temperatures (dew point at suction,
 * bubble point at the liquid pressure), superheat, subcooling, glide, their targets, the air
 * and condenser values, and the state of the circuit with its evidence and warnings.
 *
 * How: every derived value is computed once into a snapshot through the property engine,
 * each rule of `DIAGNOSIS_RULES` judges one reading against its band (the equipment's
 * application sets the bands) and the signature table (signature-table.ts,
 * docs/diagnosis-signatures.md) turns it into evidence for every state;
 * `rankChargeStates` sums the evidence. The verdict is the best-supported state, except that:
 * a danger warning (liquid floodback, a suction below the table, a discharge line past its
 * limit) never ends as "normal"; a fixed device without its superheat target names no charge
 * state (weigh in [S10]); without the family's charge signal the other readings must agree
 * more strongly, "normal" cannot be confirmed, and the confidence is lowered; a short run time lowers the confidence. Below the
 * threshold the verdict is "insufficient-data". Symptom patterns: TRADE.md §2 [S21]–[S24].
 *
 * With `withMeasuredCycle` (and the refrigerant's single-phase table loaded) the compressor's
 * apparent isentropic efficiency joins the evidence. With the circuit's correct charge
 * (`chargeKg`, and `chargeReference` when the circuit has its own reference point) the result
 * says how many kilograms the charge is off (`chargeDeviation`, see estimateChargeDeviation); beside
 * a verdict naming another fault it adds the caution `charge-estimate-beside-other-fault`.
 *
 * The readings must already be validated by `DiagnosisInputSchema` at the boundary they came
 * through (the API, the run-log form, `parseDiagnosisInput`; README decision 034): the engine
 * trusts its typed input and does not check it again. Stored inputs were validated when saved.
 *
 * Units: kPa gauge, °C in; °C, K, ratios out (see `DiagnosisResultSchema`).
 *
 * @throws {DiagnosisInputError} when the refrigerant has no table (message on `refrigerant`)
 * @example diagnose({ refrigerant: "R410A", meteringDevice: "txv", suctionPressureKPa: 820, suctionLineTempC: 13, liquidPressureKPa: 2650, liquidLineTempC: 38 }).chargeState
 */
export function diagnose(input: DiagnosisInput, options: DiagnoseOptions = {}): DiagnosisResult {
  let snapshot;
  try {
    snapshot = buildDiagnosisSnapshot(input, options.withMeasuredCycle === true);
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
  let danger = false;
  // Hot path: indexed loops over arrays (no iterators); each `!` reads an index below its array's length.
  for (let ruleIndex = 0; ruleIndex < DIAGNOSIS_RULES.length; ruleIndex += 1) {
    const output = DIAGNOSIS_RULES[ruleIndex]!.evaluate(snapshot);
    const ruleFindings = output.findings;
    for (let index = 0; index < ruleFindings.length; index += 1) {
      const finding = ruleFindings[index]!;
      findings.push(finding);
      if (finding.ruleId === primaryRule && JUDGED.has(finding.direction)) judged = true;
    }
    const ruleWarnings = output.warnings;
    for (let index = 0; index < ruleWarnings.length; index += 1) {
      warnings.push(ruleWarnings[index]!);
      if (ruleWarnings[index]!.severity === "danger") danger = true;
    }
  }

  const quality = settlingFactor(input.runMinutes) * (judged ? 1 : NO_CHARGE_SIGNAL_CONFIDENCE);
  const ranked: RankedState[] = [];
  for (const entry of rankChargeStates(findings)) {
    // A danger never ends as "normal"; it is not offered as an alternative either.
    if (danger && entry.state === "normal") continue;
    ranked.push(quality === 1 ? entry : { ...entry, confidence: entry.confidence * quality });
  }
  const chargeVerdictAllowed = judged || snapshot.meteringFamily === "expansion-valve";
  const minimum = judged ? MIN_VERDICT_SCORE : MIN_VERDICT_SCORE_WITHOUT_CHARGE_SIGNAL;
  let verdict: RankedState | null = null;
  for (const entry of ranked) {
    if (!chargeVerdictAllowed && CHARGE_VERDICTS.has(entry.state)) continue;
    // Without the charge signal a fault can still be named on strong evidence, but "the charge
    // is right" cannot be confirmed.
    if (!judged && entry.state === "normal") continue;
    if (entry.score >= minimum) verdict = entry;
    break;
  }

  if (verdict) {
    if (!judged) {
      const missing = snapshot.meteringFamily === "fixed" ? "superheat" : "subcooling";
      const why =
        snapshot.meteringFamily === "fixed"
          ? (snapshot.superheatExcluded?.reason ?? snapshot.superheatTargetNote)
          : snapshot.subcoolingExcluded?.reason;
      warnings.push({
        code: "judged-without-charge-signal",
        severity: "caution",
        field: missing === "superheat" ? "suctionLineTempC" : "liquidLineTempC",
        message: `Judged without ${missing}, which carries the charge signal of this metering device${why ? ` (${why.charAt(0).toLowerCase()}${why.slice(1)})` : ""}: the verdict rests on the other readings and its confidence is lowered`,
        source: NO_SIGNAL_SOURCE,
      });
    }
    // The headline's signature first, then the evidence that supports it most.
    const state = verdict.state;
    // Insertion sort by weight for the verdict, strongest first, stable: a dozen findings, and
    // no typed arrays or comparator closures to allocate (performance).
    const weights: number[] = [];
    for (let index = 0; index < findings.length; index += 1) {
      const finding = findings[index]!;
      const weight = evidenceWeight(finding, state);
      let position = index; // 0 < position ≤ index below: weights and findings both hold position − 1
      while (position > 0 && weights[position - 1]! < weight) {
        weights[position] = weights[position - 1]!;
        findings[position] = findings[position - 1]!;
        position -= 1;
      }
      weights[position] = weight;
      findings[position] = finding;
    }
    findings.unshift(summarizeVerdict(state, findings, weights));
  }

  const chargeState = verdict ? verdict.state : "insufficient-data";
  const charge = estimateChargeDeviation(snapshot);
  if (charge.chargeDeviation !== null && verdict && !CHARGE_VERDICTS.has(verdict.state)) {
    warnings.push({
      code: "charge-estimate-beside-other-fault",
      severity: "caution",
      field: "chargeKg",
      message: `The kilograms assume the charge is the only fault, but the readings point at another (${chargeStateText[verdict.state].title.toLowerCase()}), which moves the subcooling and superheat too: put it right first, then judge the charge again`,
      source: OTHER_FAULT_SOURCE,
    });
  }

  return {
    refrigerant: input.refrigerant,
    meteringDevice: input.meteringDevice,
    application: snapshot.application,
    applicationBasis: snapshot.applicationBasis,
    atmosphericPressureKPa: snapshot.atmosphericPressureKPa,
    suctionTempLocation: snapshot.suctionTempLocation,
    suctionLineAllowanceK: snapshot.suctionLineAllowanceK,
    evaporatingTempC: snapshot.evaporatingTempC,
    evaporatingBubbleTempC: snapshot.evaporatingBubbleTempC,
    condensingTempC: snapshot.condensingTempC,
    condensingDewTempC: snapshot.condensingDewTempC,
    glideK: snapshot.glideK,
    condenserGlideK: snapshot.condenserGlideK,
    superheatK: snapshot.superheatK,
    subcoolingK: snapshot.subcoolingK,
    targets: {
      superheat: snapshot.superheatTarget,
      subcooling: snapshot.subcoolingTarget,
      temperatureSplit: snapshot.temperatureSplitTarget,
      condenserApproach: snapshot.condenserApproachTarget,
    },
    returnAirWetBulbC: snapshot.returnAirWetBulbC,
    wetBulbBasis: snapshot.wetBulbBasis,
    temperatureSplitK: snapshot.temperatureSplitK,
    condenserApproachK: snapshot.condenserApproachK,
    condensingOverAmbientK: snapshot.condensingOverAmbientK,
    evaporatorTemperatureDifferenceK: snapshot.evaporatorTemperatureDifferenceK,
    dischargeSuperheatK: snapshot.dischargeSuperheatK,
    dischargeLineLimits: snapshot.dischargeLimits,
    compressionRatio: snapshot.compressionRatio,
    compressionRatioBasis: snapshot.compressionRatioBasis,
    compressorCurrentRatio: snapshot.compressorCurrentRatio,
    chargeState,
    confidence: verdict ? verdict.confidence : 0,
    alternatives: verdict ? ranked.filter((entry) => entry !== verdict) : ranked,
    readingsLeftOut: readingsLeftOut(snapshot),
    ...charge,
    findings,
    warnings,
  };
}
