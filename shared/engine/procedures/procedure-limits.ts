/**
 * Limits used by the procedure checks (electrical, pressure test, evacuation, refrigerant,
 * charging), each with its source by the tags of the trade research notes' source list (titles
 * in procedure-sources.ts). Every judging function takes an optional partial override of its
 * own group, so an organisation can set its own figure where codes or makers differ; nothing
 * else hard-codes these numbers.
 */

// ---- Electrical (trade notes §3, §9) ---------------------------------------------------------------

/**
 * Three-phase voltage imbalance, percent of the mean (NEMA MG-1 definition).
 * HVAC equipment makers allow at most 2 % [S41][S42]; NEMA MG-1 recommends ≤ 1 % at the motor
 * terminals (derate above 1 %) and no operation above 5 % [S43][S44].
 */
export const VOLTAGE_IMBALANCE_LIMITS = {
  /** Up to this the supply passes (makers' maximum) [S41][S42]. */
  passUpToPercent: 2,
  /** Above this the motor must not be run (NEMA MG-1) [S43][S44]. */
  failAbovePercent: 5,
  /** NEMA MG-1 recommendation at the motor terminals, mentioned in the reason [S43][S44]. */
  recommendedPercent: 1,
};
export type VoltageImbalanceLimits = typeof VOLTAGE_IMBALANCE_LIMITS;

/** Supply voltage while running: within ±10 % of the nameplate [S40] (also common practice). */
export const SUPPLY_VOLTAGE_LIMITS = {
  maxDeviationPercent: 10,
};
export type SupplyVoltageLimits = typeof SUPPLY_VOLTAGE_LIMITS;

/**
 * Insulation resistance to earth, MΩ.
 * Wiring: not less than 1 MΩ (AS/NZS 3000 Wiring Rules, Section 8 verification [S47], weak
 * source), tested at 500 V d.c. (memory).
 * Hermetic compressors: one maker calls anything below 2 MΩ pin-to-shell a ground fault [S48];
 * a scroll maker accepts readings down to 0.5 MΩ because the motor sits in refrigerant and oil
 * [S49]. So: below 0.5 fail, 0.5 up to 2 warn (check the maker's figure, run the crankcase
 * heater and re-test), 2 and above pass.
 * Motors (fans, pumps): below the 1 MΩ wiring minimum fail [S47]; IEEE 43 gives 5 MΩ for
 * random-wound machines below 1 kV (memory), so 1 up to 5 warn, 5 and above pass.
 */
export const INSULATION_LIMITS = {
  wiringMinimumMegohms: 1,
  wiringTestVoltageV: 500,
  compressorFailBelowMegohms: 0.5,
  compressorPassFromMegohms: 2,
  motorFailBelowMegohms: 1,
  motorPassFromMegohms: 5,
};
export type InsulationLimits = typeof INSULATION_LIMITS;

/**
 * Three-phase winding resistance balance, largest deviation from the mean, percent.
 * Lead-to-lead within about 2 % of the average [S44]; small hermetic compressors "within a few
 * percent" (memory), taken here as up to 5 % = warn; beyond fail.
 */
export const WINDING_BALANCE_LIMITS = {
  passWithinPercent: 2,
  warnWithinPercent: 5,
};
export type WindingBalanceLimits = typeof WINDING_BALANCE_LIMITS;

/**
 * Single-phase compressor windings read C–R (run), C–S (start) and R–S (both in series): R–S
 * equals C–R + C–S and the start winding reads higher than the run winding ([S46]; memory).
 * The sum may miss by the meter's lead and contact resistance, so a mismatch within 5 % of
 * R–S or 0.2 Ω (whichever is larger) passes, up to 10 % warns (re-clean the terminals and
 * measure again), beyond fails (an open, shorted or grounded winding, or misread terminals).
 * The 5 %, 10 % and 0.2 Ω figures are this engine's choice (common practice, no published figure).
 */
export const SINGLE_PHASE_WINDING_LIMITS = {
  passWithinPercent: 5,
  warnWithinPercent: 10,
  meterAllowanceOhms: 0.2,
};
export type SinglePhaseWindingLimits = typeof SINGLE_PHASE_WINDING_LIMITS;

/**
 * Running current against the nameplate, percent of RLA (compressors) or FLA (fans).
 * Compressors: amps above RLA need investigation [S39] (weak); RLA = MCC ÷ 1.56 (UL) or ÷ 1.4
 * (some makers) [S39], so above 140 % of RLA the compressor is past the lower of the two
 * maximum continuous currents: fail.
 * Fans: should not exceed FLA (× service factor where stated) (common practice); above FLA
 * warn, above FLA × 1.15 (a usual service factor, memory) fail.
 */
export const RUNNING_CURRENT_LIMITS = {
  compressorWarnAbovePercent: 100,
  compressorFailAbovePercent: 140,
  fanWarnAbovePercent: 100,
  fanFailAbovePercent: 115,
};
export type RunningCurrentLimits = typeof RUNNING_CURRENT_LIMITS;

/**
 * A running current is not plausible above this many times the nameplate rating: a motor draws
 * its most with a locked rotor, typically about 5–7 × RLA (memory), so a higher figure is a
 * misplaced decimal point or a clamp on the wrong range. Checked while typing, never refused.
 */
export const MAX_PLAUSIBLE_TIMES_RATED = 8;

/** Current imbalance limit, percent: max 10 % (one compressor maker) [S45]. Shown only. */
export const CURRENT_IMBALANCE_MAX_PERCENT = 10;

// ---- Pressure test (trade notes §5) -------------------------------------------------------------------

/**
 * Test pressure against the rated pressure (PS) of the lowest-rated component: never exceed it
 * [S57][S63][S64]. `maxFractionOfRated` 1 means "up to PS"; an organisation may lower it.
 */
export const TEST_PRESSURE_LIMITS = {
  maxFractionOfRated: 1,
};
export type TestPressureLimits = typeof TEST_PRESSURE_LIMITS;

/**
 * Allowed drop over a pressure test's hold when the organisation sets none, kPa: "no drop"
 * [S53][S67], read as no drop beyond what a gauge and a thermometer can resolve — 1 kPa of gauge
 * resolution plus ±0.5 K of temperature uncertainty at about 14 kPa/K near 4 MPa (trade notes
 * §5.3) is about 10 kPa (this app's choice; common practice leaves it to the gauge). A test
 * record keeps the allowance it was judged by, so this is the default a new record starts from.
 */
export const PRESSURE_HOLD_LIMITS = {
  allowedDropKPa: 10,
};
export type PressureHoldLimits = typeof PRESSURE_HOLD_LIMITS;

// ---- Evacuation (trade notes §4) ------------------------------------------------------------------------

/**
 * Evacuation and decay test.
 * Target 500 microns, the industry norm [S4], held at or below it after valving off for 15–20
 * minutes [S52][S53]. A rise that levels off is moisture, one that keeps rising is a leak
 * [S58][S55]; a heat-pump maker reads "rises and holds near 5000 µm" as moisture and "keeps
 * rising above 5000 µm" as a leak [S54], so 5000 µm is the leak threshold.
 * `levelledRatio`: the curve has levelled off when its rise rate over the later half of the
 * readings is at most this fraction of the rate over the earlier half. A leak into a vacuum
 * is a choked flow (constant mass rate, straight-line rise, ratio ≈ 1); moisture boiling off
 * approaches the vapour pressure and flattens (ratio → 0). 0.25 is this engine's choice
 * (common practice reading of the curve shapes, no published figure).
 * `flatRiseMicronsPerMinute`: a later-half rise no faster than this counts as level whatever
 * the earlier rate (gauge resolution; this engine's choice).
 */
export const EVACUATION_LIMITS = {
  targetMicrons: 500,
  leakRiseMicrons: 5000,
  levelledRatio: 0.25,
  flatRiseMicronsPerMinute: 2,
};
export type EvacuationLimits = typeof EVACUATION_LIMITS;

// ---- Refrigerant (trade notes §6) -----------------------------------------------------------------------

/**
 * Recovery cylinder fill: at most 80 % of the internal volume with liquid at the hottest
 * temperature the cylinder may see, 54 °C (130 °F) in the worked example [S79]; [S78] (weak).
 * Warn from 90 % of that mass limit (this engine's choice, so the warning comes before the
 * limit as the product brief asks).
 */
export const CYLINDER_FILL_LIMITS = {
  liquidVolumeFraction: 0.8,
  referenceTempC: 54,
  warnFromFractionOfLimit: 0.9,
};
export type CylinderFillLimits = typeof CYLINDER_FILL_LIMITS;

// ---- Charging (trade notes §6) --------------------------------------------------------------------------

/**
 * Weighed-in charge against the nameplate (plus line adjustment).
 * Pass within the larger of the scale accuracy, about ±28 g (±1 oz) [S11], and 2 % of the
 * expected charge; warn up to 10 % (fine-tune by subcooling or superheat [S11][S10]); beyond
 * fail. The 2 % and 10 % bands are this engine's choice (common practice).
 */
export const CHARGE_LIMITS = {
  scaleToleranceKg: 0.028,
  passWithinPercent: 2,
  warnWithinPercent: 10,
};
export type ChargeLimits = typeof CHARGE_LIMITS;

/** Days in a year for annualised rates (365; leap days ignored). */
export const DAYS_PER_YEAR = 365;
