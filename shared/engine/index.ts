/**
 * Public entry point of the Satura engine: the only module src/ and server/ import from.
 */

// Refrigerant properties (tables generated from published equations of state, loaded per refrigerant)
export { loadRefrigerant } from "./properties/load-refrigerant.ts";
export { loadAllRefrigerants } from "./properties/load-all-refrigerants.ts";
export { isRefrigerantLoaded } from "./properties/is-refrigerant-loaded.ts";
export { listRefrigerants } from "./properties/list-refrigerants.ts";
export { getRefrigerant } from "./properties/get-refrigerant.ts";
export type { RefrigerantInfo } from "./properties/resolve-refrigerant.ts";
export { saturationPressure } from "./properties/saturation-pressure.ts";
export { saturationTemperature } from "./properties/saturation-temperature.ts";
export { saturatedState } from "./properties/saturated-state.ts";
export type { SaturatedState } from "./properties/saturated-state.ts";
export type { SaturationPoint } from "./properties/require-saturation-point.ts";
export { PropertyRangeError } from "./properties/property-range-error.ts";
export type { PropertyErrorCode } from "./properties/property-range-error.ts";
export { RefrigerantTableSchema } from "./properties/refrigerant-table-schema.ts";
export type { RefrigerantTable } from "./properties/refrigerant-table-schema.ts";
export { INTERPOLATION_TOLERANCE_K, KELVIN_OFFSET, STANDARD_ATMOSPHERE_KPA } from "./properties/property-tolerances.ts";
export { relativeDifference } from "./properties/relative-difference.ts";
// Single-phase states (superheated vapour, subcooled liquid): tables loaded per refrigerant
export { registerSinglePhaseTable } from "./properties/single-phase-registry.ts";
export type { SinglePhase } from "./properties/single-phase-registry.ts";
export { isSinglePhaseTableLoaded } from "./properties/is-single-phase-table-loaded.ts";
export { singlePhaseState } from "./properties/single-phase-state.ts";
export type { SinglePhaseState } from "./properties/single-phase-state.ts";
export { singlePhaseStateFromEnthalpy } from "./properties/single-phase-state-from-enthalpy.ts";
export { singlePhaseStateFromEntropy } from "./properties/single-phase-state-from-entropy.ts";
export { SinglePhaseTableSchema, SINGLE_PHASE_TABLE_FORMAT } from "./properties/single-phase-table-schema.ts";
export type { SinglePhaseTable } from "./properties/single-phase-table-schema.ts";
export { SINGLE_PHASE_TOLERANCES } from "./properties/property-tolerances.ts";
export { saturatedPhasesAtPressure } from "./properties/saturated-phases-at-pressure.ts";
export type { SaturatedPhases } from "./properties/saturated-phases-at-pressure.ts";
export { twoPhaseStateFromEnthalpy } from "./properties/two-phase-state-from-enthalpy.ts";
export type { TwoPhaseState } from "./properties/two-phase-state-from-enthalpy.ts";

// Units for display (convert-units inside; SI-metric in the engine)
export { gaugeToAbsolute } from "./units/gauge-to-absolute.ts";
export { atmosphericPressureAtAltitude } from "./units/atmospheric-pressure-at-altitude.ts";
export { absoluteToGauge } from "./units/absolute-to-gauge.ts";
export { convertPressure, PRESSURE_UNITS } from "./units/convert-pressure.ts";
export type { PressureUnit } from "./units/convert-pressure.ts";
export { convertTemperature, TEMPERATURE_UNITS } from "./units/convert-temperature.ts";
export type { TemperatureUnit } from "./units/convert-temperature.ts";
export { convertTemperatureDifference } from "./units/convert-temperature-difference.ts";
export { pressureToDisplay } from "./units/pressure-to-display.ts";
export type { PressureScale } from "./units/pressure-to-display.ts";
export { pressureFromDisplay } from "./units/pressure-from-display.ts";

// The measured cycle (states on the pressure–enthalpy diagram, compressor and coil figures)
export { measuredCycle } from "./cycle/measured-cycle.ts";
export type {
  AirSideFigures,
  CycleFigure,
  CycleNote,
  CycleState,
  CycleStatePoint,
  MeasuredCycle,
  MeasuredCycleExtras,
} from "./cycle/measured-cycle.ts";
export { electricalInputPower } from "./cycle/electrical-input-power.ts";
export { moistAirState } from "./cycle/moist-air-state.ts";
export type { MoistAirState } from "./cycle/moist-air-state.ts";
export { airSideCapacity } from "./cycle/air-side-capacity.ts";
export type { AirSideCapacity } from "./cycle/air-side-capacity.ts";
export * as cycleLimits from "./cycle/cycle-limits.ts";

// Charge diagnosis (superheat, subcooling, targets, findings)
export { diagnose, MIN_VERDICT_SCORE, MIN_VERDICT_SCORE_WITHOUT_CHARGE_SIGNAL } from "./diagnosis/diagnose.ts";
export type { DiagnoseOptions } from "./diagnosis/diagnose.ts";
export { lastAtEachInstant } from "./diagnosis/last-at-each-instant.ts";
export {
  assessTrend,
  SETTLED_WINDOW_MINUTES,
  SETTLED_MAX_CHANGE_K,
  SETTLED_MAX_RATE_K_PER_MIN,
} from "./diagnosis/assess-trend.ts";
export { DiagnosisInputError } from "./diagnosis/diagnosis-input-error.ts";
export { parseDiagnosisInput } from "./diagnosis/parse-diagnosis-input.ts";
export type { FieldErrors } from "./diagnosis/diagnosis-input-error.ts";
export { superheat } from "./diagnosis/superheat.ts";
export { subcooling } from "./diagnosis/subcooling.ts";
export { fixedOrificeTargetSuperheat } from "./diagnosis/fixed-orifice-target-superheat.ts";
export type { FixedOrificeTarget } from "./diagnosis/fixed-orifice-target-superheat.ts";
export { selectSuperheatTarget } from "./diagnosis/select-superheat-target.ts";
export { selectSubcoolingTarget } from "./diagnosis/select-subcooling-target.ts";
export { wetBulbFromRelativeHumidity } from "./diagnosis/psychrometrics/wet-bulb-from-relative-humidity.ts";
export { targetTemperatureSplit } from "./diagnosis/psychrometrics/target-temperature-split.ts";
export { suctionLineAllowance } from "./diagnosis/suction-line-allowance.ts";
export { dischargeLineLimits } from "./diagnosis/discharge-line-limits.ts";
export { inferApplication } from "./diagnosis/infer-application.ts";
export { SIGNATURES, SIGNATURE_FEATURES, EXPECTATIONS } from "./diagnosis/signature-table.ts";
export type {
  Signature,
  SignatureCell,
  SignatureFeature,
  Expectation,
  MeteringFamily,
} from "./diagnosis/signature-table.ts";
export { signatureMatch } from "./diagnosis/signature-match.ts";
export { meteringFamilyOf } from "./diagnosis/metering-family-of.ts";
export { DIAGNOSIS_RULES } from "./diagnosis/rules/registry.ts";
export type { DiagnosisRule, DiagnosisSnapshot } from "./diagnosis/types.ts";
export * as diagnosisLimits from "./diagnosis/diagnosis-limits.ts";

// Casebook (worked cases, scoring, worked solutions, the case generator)
export { seededRandom } from "./casebook/seeded-random.ts";
export { designCaseInput } from "./casebook/design-case-input.ts";
export type { CaseDesign } from "./casebook/design-case-input.ts";
export { expectedAnswers } from "./casebook/expected-answers.ts";
export { scoreAttempt } from "./casebook/score-attempt.ts";
export { chargeToAdd } from "./casebook/charge-to-add.ts";
export type { ChargeToAdd } from "./casebook/charge-to-add.ts";
export { authoredAnswers } from "./casebook/authored-answers.ts";
export { workedSolution } from "./casebook/worked-solution.ts";
export { caseSafetyNotes } from "./casebook/case-safety-notes.ts";
export {
  generateCase,
  GENERATOR_REFRIGERANTS,
  SENSOR_NOISE_K,
  GAUGE_NOISE_FRACTION,
  GAUGE_RESOLUTION_KPA,
  MAX_GENERATOR_DRAWS,
} from "./casebook/generate-case.ts";
export { drawFaultScenario } from "./casebook/draw-fault-scenario.ts";
export type { FaultScenario, FaultScenarioOptions } from "./casebook/draw-fault-scenario.ts";
export { OPERATING_POINTS, FAULT_MOVES, BAND_UNITS } from "./casebook/fault-scenarios.ts";
export type { GeneratedCase, GenerateCaseOptions } from "./casebook/generate-case.ts";

// Procedures (electrical checks, pressure test, evacuation, refrigerant register, charging)
export { voltageImbalance } from "./procedures/voltage-imbalance.ts";
export { currentImbalance } from "./procedures/current-imbalance.ts";
export { judgeVoltageImbalance } from "./procedures/judge-voltage-imbalance.ts";
export { judgeSupplyVoltage } from "./procedures/judge-supply-voltage.ts";
export { judgeInsulationResistance } from "./procedures/judge-insulation-resistance.ts";
export { windingBalance } from "./procedures/winding-balance.ts";
export { singlePhaseWindings } from "./procedures/single-phase-windings.ts";
export { runningCurrent } from "./procedures/running-current.ts";
export { runningCurrentNotice } from "./procedures/running-current-notice.ts";
export type { LiveNotice } from "./procedures/running-current-notice.ts";
export { testPressureNotice } from "./procedures/test-pressure-notice.ts";
export { describeDecay } from "./procedures/describe-decay.ts";
export { pressureTestResult } from "./procedures/pressure-test-result.ts";
export { checkTestPressure } from "./procedures/check-test-pressure.ts";
export { analyseDecay } from "./procedures/analyse-decay.ts";
export { evacuationReached } from "./procedures/evacuation-reached.ts";
export { evacuationResult } from "./procedures/evacuation-result.ts";
export { micronsToPa } from "./procedures/microns-to-pa.ts";
export { paToMicrons } from "./procedures/pa-to-microns.ts";
export { refrigerantBalance } from "./procedures/refrigerant-balance.ts";
export { cylinderFillLimit } from "./procedures/cylinder-fill-limit.ts";
export { judgeCylinderFill } from "./procedures/judge-cylinder-fill.ts";
export { annualLeakRate } from "./procedures/annual-leak-rate.ts";
export { chargeAgainstNameplate } from "./procedures/charge-against-nameplate.ts";
export { judgeLeakSearch } from "./procedures/judge-leak-search.ts";
export {
  judgeStandingPressure,
  NON_CONDENSABLE_EXCESS_K,
  STANDING_PRESSURE_TOLERANCE_K,
} from "./procedures/judge-standing-pressure.ts";
export { standingPressureOutcome } from "./procedures/standing-pressure-outcome.ts";
export type { StandingPressureProblem } from "./procedures/standing-pressure-outcome.ts";
export type { LeakSearchFindings } from "./procedures/judge-leak-search.ts";
export { submitChecklist, CHARGE_MATCH_TOLERANCE_KG } from "./procedures/submit-checklist.ts";
export type { SubmitChecklistInput, SubmitChecklistItem } from "./procedures/submit-checklist.ts";
export { cite } from "./sources/cite.ts";
export type { SourceList } from "./sources/cite.ts";
export { DIAGNOSIS_SOURCES } from "./sources/diagnosis-sources.ts";
export type { DiagnosisSourceTag } from "./sources/diagnosis-sources.ts";
export { PROCEDURE_SOURCES } from "./sources/procedure-sources.ts";
export type { ProcedureSourceTag } from "./sources/procedure-sources.ts";
export {
  VOLTAGE_IMBALANCE_LIMITS,
  SUPPLY_VOLTAGE_LIMITS,
  INSULATION_LIMITS,
  WINDING_BALANCE_LIMITS,
  SINGLE_PHASE_WINDING_LIMITS,
  RUNNING_CURRENT_LIMITS,
  MAX_PLAUSIBLE_TIMES_RATED,
  CURRENT_IMBALANCE_MAX_PERCENT,
  TEST_PRESSURE_LIMITS,
  PRESSURE_HOLD_LIMITS,
  EVACUATION_LIMITS,
  CYLINDER_FILL_LIMITS,
  CHARGE_LIMITS,
} from "./procedures/procedure-limits.ts";
export type {
  PressureHoldLimits,
  VoltageImbalanceLimits,
  SupplyVoltageLimits,
  InsulationLimits,
  WindingBalanceLimits,
  SinglePhaseWindingLimits,
  RunningCurrentLimits,
  TestPressureLimits,
  EvacuationLimits,
  CylinderFillLimits,
  ChargeLimits,
} from "./procedures/procedure-limits.ts";
export { estimateChargeDeviation } from "./charge/estimate-charge-deviation.ts";
export type { ChargeDeviationEstimate } from "./charge/estimate-charge-deviation.ts";
export { virtualChargeFraction } from "./charge/virtual-charge-fraction.ts";
export type { VirtualChargeCoefficients } from "./charge/virtual-charge-fraction.ts";
export { defaultChargeCoefficients } from "./charge/default-charge-coefficients.ts";
export { chargingPlan, CHARGING_PLAN_SOURCE } from "./charge/charging-plan.ts";
export type { ChargingPlan } from "./charge/charging-plan.ts";
export { chargeStepChecks } from "./charge/charge-step-checks.ts";
export type { ChargeStep, ChargeStepCheck, EstimatePoint } from "./charge/charge-step-checks.ts";
