/**
 * Limits and bands used by the diagnosis rules, each with its source (TRADE.md tags). Values
 * from °F sources are plain conversions (1 K = 1.8 °F of difference). Code and tests import
 * these; nothing else hard-codes them. The per-application bands are in `APPLICATION_LIMITS`;
 * docs/diagnosis-signatures.md explains how the rules read them.
 */
import type { Application } from "../../schemas/diagnosis.ts";
import { cite } from "../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE, MEMORY } from "../sources/marks.ts";

/** A closed band of temperature difference, K (or of a ratio, where a rule says so). */
export interface Band {
  lowK: number;
  highK: number;
}

/** A band with the reason it is what it is. */
export interface SourcedBand extends Band {
  source: string;
}

// ---- Superheat and subcooling targets (TRADE.md §1.3, §1.4) ------------------------------------

/**
 * Default subcooling band without a maker's target, K: residential TXV AC commonly 8–15 °F
 * (4.4–8.3 K); under 5 °F (2.8 K) suggests undercharge, over 20 °F (11 K) overcharge [S14].
 */
export const DEFAULT_SUBCOOLING_BAND: Band & { targetK: number } = { lowK: 4.4, highK: 8.3, targetK: 6.4 };
export const DEFAULT_SUBCOOLING_SOURCE = cite(DIAGNOSIS_SOURCES, ["S14"], COMMON_PRACTICE);

/** Tolerance around a maker's subcooling or TXV superheat target, ±K: Title 24 ±3 °F. */
export const NAMEPLATE_TARGET_TOLERANCE_K = 1.7;
export const NAMEPLATE_TARGET_TOLERANCE_SOURCE = `Title 24 subcooling tolerance ±3 °F (${MEMORY}); applied to TXV superheat targets too (${COMMON_PRACTICE})`;

/** Fixed-orifice superheat pass tolerance, ±K: installer ±5 °F [S10]. */
export const FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K = 2.8;
/** Below this target superheat there is no valid superheat test: weigh in instead, K [S10][S17][S18]. */
export const MIN_VALID_TARGET_SUPERHEAT_K = 2.8;
/** Charging-chart input range, return-air wet bulb °C [S17][S18]. */
export const FIXED_ORIFICE_WET_BULB_RANGE_C = { min: 10, max: 24 } as const;
/** Charging-chart input range, outdoor dry bulb °C [S17][S18]; Title 24 needs ≥ 12.8 °C [S19]. */
export const FIXED_ORIFICE_OUTDOOR_RANGE_C = { min: 13, max: 46 } as const;
export const FIXED_ORIFICE_TARGET_SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S10", "S17", "S18", "S19"])}; linear formula commonly taught in trade training (${MEMORY})`;

/**
 * Below this subcooling difference from its target (K), a circuit with high superheat is short
 * of charge rather than restricted: a restriction backs liquid up into the condenser, so its
 * subcooling sits at or above target [S24][S25]; one kelvin inside the ±1.7 K tolerance
 * (common practice).
 */
export const SUBCOOLING_PIVOT_BELOW_TARGET_K = 1;

// ---- Suction line allowance (where superheat was measured) -----------------------------------------

/**
 * Superheat read at the outdoor unit exceeds the evaporator-outlet superheat by the suction line's
 * pressure drop (lines are sized for about 1 K of saturation-temperature drop: ASHRAE Handbook—
 * Refrigeration, refrigerant piping, memory) and its heat gain through the insulation
 * (common practice). Allowance = base + per metre × liquid line length, capped.
 */
export const SUCTION_LINE_ALLOWANCE = {
  baseK: 0.5,
  perMetreK: 0.1,
  maxK: 4,
  /** Line set assumed when none is recorded, m: the usual rating length of 7.5 m (memory). */
  defaultLengthM: 7.5,
  source: `suction line sized for about 1 K saturation drop (ASHRAE Handbook—Refrigeration, ${MEMORY}) plus insulated-line heat gain (${COMMON_PRACTICE})`,
} as const;

// ---- Deviation strength ---------------------------------------------------------------------------

/**
 * Distance beyond a band edge at which a deviation counts at full strength, K. Between the
 * edge and this distance the evidence ramps up linearly; chosen equal to the fixed-orifice
 * pass tolerance (2.8 K [S10]) so that "one tolerance outside the band" is a clear signal.
 */
export const FULL_STRENGTH_DEVIATION_K = 2.8;

// ---- Per application (TRADE.md §1.3, §3) -------------------------------------------------------

/** Frozen all the way down: the bands are shared by every diagnosis and must never change. */
function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object" && !Object.isFrozen(value)) {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

/**
 * Half-width of the condenser approach band around its expected value, K. Approach =
 * condensing over ambient − subcooling (TRADE.md §3 [S26]); ±3 K covers the spread of condenser
 * efficiencies within one application (common practice).
 */
export const CONDENSER_APPROACH_TOLERANCE_K = 3;
export const CONDENSER_APPROACH_SOURCE = `condensing over ambient minus subcooling ${cite(DIAGNOSIS_SOURCES, ["S26"])} (computed): the middle of the application's condensing band minus the subcooling target, ±3 K (${COMMON_PRACTICE}); approach charging ${cite(DIAGNOSIS_SOURCES, ["S34"])}`;

/** Discharge line temperatures of one application, °C. */
export interface DischargeLineLimits {
  /** Upper end of what a healthy circuit of this kind runs at. */
  elevatedC: number;
  /** Keep the line below this: oil breakdown margin. */
  limitC: number;
  source: string;
}

/** The bands every coil, air and compressor check uses for one kind of equipment. */
export interface ApplicationLimits {
  /** Words for the return air in messages: "return air", "room air", "entering water". */
  returnWords: string;
  /** TXV/EEV evaporator-outlet superheat without a maker's target, K. */
  valveSuperheat: SourcedBand & { targetK: number };
  /** Subcooling without a maker's target, K. */
  subcooling: SourcedBand & { targetK: number };
  /** Return (room, entering fluid) temperature − mean evaporating temperature, K. */
  evaporatorTd: SourcedBand;
  /** Return − supply split when no psychrometric target applies, K. */
  temperatureSplit: SourcedBand;
  /** Mean condensing temperature − outdoor air, K (air-cooled). */
  condensingOverAmbient: SourcedBand;
  /**
   * Liquid line temperature − outdoor air, K: about condensing-over-ambient minus subcooling, so
   * the expected value is the middle of `condensingOverAmbient` minus the subcooling target, ±
   * `CONDENSER_APPROACH_TOLERANCE_K` (see `expectedCondenserApproach`).
   */
  dischargeLine: DischargeLineLimits;
  /** Return (room, fluid) temperatures that fit this application, °C (outside: a caution). */
  returnRangeC: { min: number; max: number };
  /** Fixed-orifice charging charts are made for comfort air conditioning only [S10][S17][S18]. */
  fixedOrificeChart: boolean;
}

const COMFORT: ApplicationLimits = {
  returnWords: "return air",
  valveSuperheat: {
    lowK: 2.8,
    highK: 6.7,
    targetK: 5,
    source: cite(DIAGNOSIS_SOURCES, ["S15", "S17", "S9"], COMMON_PRACTICE),
  },
  subcooling: { ...DEFAULT_SUBCOOLING_BAND, source: DEFAULT_SUBCOOLING_SOURCE },
  evaporatorTd: {
    lowK: 14,
    highK: 24,
    source: `evaporator TD about 19 K for comfort cooling (${MEMORY}); ±5 K band (${COMMON_PRACTICE})`,
  },
  temperatureSplit: { lowK: 8, highK: 13, source: cite(DIAGNOSIS_SOURCES, ["S33"]) },
  condensingOverAmbient: {
    lowK: 8.3,
    highK: 16.7,
    source: `${cite(DIAGNOSIS_SOURCES, ["S26"])} (16 SEER+ 8.3 K … ≤ 10 SEER 16.7 K)`,
  },
  dischargeLine: {
    elevatedC: 90,
    limitC: 107,
    source: `${cite(DIAGNOSIS_SOURCES, ["S13", "S37"])}: healthy AC 71–82 °C in hot weather, keep below 107 °C (225 °F); 90 °C elevated (${COMMON_PRACTICE})`,
  },
  returnRangeC: { min: 15, max: 40 },
  fixedOrificeChart: true,
};

/**
 * Refrigeration circuits often store liquid in a receiver, which keeps condenser subcooling small
 * whatever the charge: 2–7 K without a maker's target (common practice; TRADE.md §1.3 gives no
 * refrigeration figure).
 */
const REFRIGERATION_SUBCOOLING = {
  lowK: 2,
  highK: 7,
  targetK: 4.5,
  source: `refrigeration condensers with receivers hold 2–7 K (${COMMON_PRACTICE})`,
} as const;

const REFRIGERATION_CONDENSER = {
  condensingOverAmbient: {
    lowK: 8.3,
    highK: 19,
    source: `${cite(DIAGNOSIS_SOURCES, ["S35"])}: air-cooled refrigeration condensers 11–19 K; high-efficiency units from 8.3 K ${cite(DIAGNOSIS_SOURCES, ["S26"])}`,
  },
} as const;

/** Bands by application; sources per band. */
export const APPLICATION_LIMITS: Readonly<Record<Application, ApplicationLimits>> = deepFreeze({
  "comfort-cooling": COMFORT,
  // Heat pumps are judged in cooling mode, where their charge is checked (makers' charging
  // tables are for cooling; in heating mode weigh in) (common practice).
  "heat-pump": COMFORT,
  "medium-temperature-refrigeration": {
    returnWords: "room air",
    valveSuperheat: {
      lowK: 3,
      highK: 7.3,
      targetK: 5.6,
      source: `${cite(DIAGNOSIS_SOURCES, ["S15"])}: medium temperature about 5.6 K (10 °F); ±1.7 K (${COMMON_PRACTICE})`,
    },
    subcooling: REFRIGERATION_SUBCOOLING,
    evaporatorTd: {
      lowK: 4,
      highK: 10,
      source: `${cite(DIAGNOSIS_SOURCES, ["S15"])}: coil TD by room humidity, about 8–18 °F (4.4–10 K)`,
    },
    temperatureSplit: { lowK: 2, highK: 6, source: `air on − air off a cool-room coil 2–6 K (${MEMORY})` },
    ...REFRIGERATION_CONDENSER,
    dischargeLine: {
      elevatedC: 95,
      limitC: 107,
      source: `${cite(DIAGNOSIS_SOURCES, ["S13"])}: keep below 107 °C; refrigeration runs higher compression ratios, 95 °C elevated (${COMMON_PRACTICE})`,
    },
    returnRangeC: { min: -5, max: 15 },
    fixedOrificeChart: false,
  },
  "low-temperature-refrigeration": {
    returnWords: "room air",
    valveSuperheat: {
      lowK: 1.7,
      highK: 4.5,
      targetK: 2.8,
      source: `${cite(DIAGNOSIS_SOURCES, ["S15"])}: low temperature about 2.8 K (5 °F), range from 1.7 K`,
    },
    subcooling: REFRIGERATION_SUBCOOLING,
    evaporatorTd: {
      lowK: 4,
      highK: 8,
      source: `${cite(DIAGNOSIS_SOURCES, ["S15"])}: freezer coils run about 10 °F (5.6 K) TD; ±2 K (${COMMON_PRACTICE})`,
    },
    temperatureSplit: { lowK: 1.5, highK: 5, source: `air on − air off a freezer coil 1.5–5 K (${MEMORY})` },
    ...REFRIGERATION_CONDENSER,
    dischargeLine: {
      elevatedC: 100,
      limitC: 107,
      source: `${cite(DIAGNOSIS_SOURCES, ["S13"])}: keep below 107 °C; single-stage low temperature runs hot, 100 °C elevated (${COMMON_PRACTICE})`,
    },
    returnRangeC: { min: -40, max: -8 },
    fixedOrificeChart: false,
  },
  "process-chilling": {
    returnWords: "entering water",
    valveSuperheat: { lowK: 3, highK: 7, targetK: 5, source: `chiller TXV superheat 3–7 K (${COMMON_PRACTICE})` },
    subcooling: { lowK: 3, highK: 8, targetK: 5.5, source: `air-cooled chiller condensers 3–8 K (${COMMON_PRACTICE})` },
    evaporatorTd: {
      lowK: 5,
      highK: 10,
      source: `entering fluid − evaporating about 5–10 K: a 5 K fluid range plus a 2–5 K approach (${COMMON_PRACTICE})`,
    },
    temperatureSplit: {
      lowK: 3,
      highK: 7,
      source: `entering − leaving fluid about 5 K at design flow (12 → 7 °C rating conditions, ${MEMORY})`,
    },
    ...REFRIGERATION_CONDENSER,
    dischargeLine: {
      elevatedC: 95,
      limitC: 107,
      source: `${cite(DIAGNOSIS_SOURCES, ["S13"])}: keep below 107 °C; 95 °C elevated (${COMMON_PRACTICE})`,
    },
    returnRangeC: { min: -15, max: 30 },
    fixedOrificeChart: false,
  },
});

/**
 * Refrigerants with a high heat of compression run hotter discharge lines than R410A at the same
 * duty: R32 about 10–20 K hotter, R22 about 10 K, ammonia and CO₂ far hotter (memory). Added
 * to the application's elevated threshold, K; `limitC` overrides the 107 °C limit.
 */
export const HOT_DISCHARGE_REFRIGERANTS: Readonly<Record<string, { elevatedAddK: number; limitC?: number }>> = {
  R32: { elevatedAddK: 12 },
  R22: { elevatedAddK: 8 },
  R717: { elevatedAddK: 30, limitC: 135 },
  R744: { elevatedAddK: 30, limitC: 140 },
};
export const HOT_DISCHARGE_SOURCE = `hotter-running refrigerants: R32, R22, R717, R744 (${MEMORY}); ammonia and CO₂ compressor limits from makers' data (${MEMORY})`;

/**
 * Discharge superheat (discharge line − dew point at discharge pressure) below this means the
 * compressor is hardly heating its gas: liquid is returning to it, K (about 20 °F; common practice,
 * memory). Below the danger value the floodback is all but certain.
 */
export const LOW_DISCHARGE_SUPERHEAT_K = 15;
export const DANGER_DISCHARGE_SUPERHEAT_K = 8;

// ---- Air split target (comfort cooling) ---------------------------------------------------------

/**
 * Psychrometric target split for comfort cooling: the coil takes the nominal capacity out of
 * air moving at about 400 cfm per ton (54 L/s per kW [S33]), along the line from the return air
 * to an apparatus dew point of about 11 °C (comfort coils run at 10–13 °C, memory), never more
 * than 85 % of the way (bypass factor at least 0.15, common practice). ±2.5 K pass band:
 * half the width of the usual 8–13 K split [S33].
 */
export const SPLIT_TARGET_MODEL = {
  airflowLitresPerSecondPerKW: 54,
  apparatusDewPointC: 11,
  maxContactFactor: 0.85,
  toleranceK: 2.5,
  /** Density of return air used with the nominal airflow, kg/m³ (standard air). */
  airDensityKgPerM3: 1.2,
  source: `${cite(DIAGNOSIS_SOURCES, ["S33"])}; coil line to an 11 °C apparatus dew point (${MEMORY}); ±2.5 K (${COMMON_PRACTICE})`,
} as const;

// ---- Compressor ---------------------------------------------------------------------------------

/** Below this compression ratio a compressor is not pumping: comfort AC 2.3–3.5, modern 2–3 [S38]. */
export const LOW_COMPRESSION_RATIO = 2;
/** Above about 10:1 expect high discharge temperatures on a single stage (memory/practice). */
export const HIGH_COMPRESSION_RATIO = 10;
/**
 * Running current ÷ RLA of a healthy compressor at load, about 0.55–1.0: above RLA needs
 * investigating [S39]; far below it little refrigerant is pumped (common practice).
 */
export const CURRENT_RATIO_BAND: Band = { lowK: 0.55, highK: 1 };
/** Ratio distance at which a current deviation counts in full. */
export const CURRENT_RATIO_FULL_STRENGTH = 0.2;
/**
 * Apparent isentropic efficiency from the discharge line: healthy scroll and reciprocating
 * compressors about 0.6–0.75 (memory), a hermetic's motor heat reading it lower; below 0.45 the
 * gas is taking far more work than it should — re-compressed through leaking valves (common
 * practice). Only the low side is judged; full strength at 0.30.
 */
export const COMPRESSOR_EFFICIENCY_BAND: Band = { lowK: 0.45, highK: Number.POSITIVE_INFINITY };
export const COMPRESSOR_EFFICIENCY_FULL_STRENGTH = 0.15;
export const COMPRESSOR_EFFICIENCY_SOURCE = `apparent isentropic efficiency of healthy compressors about 0.6–0.75 (${MEMORY}); below 0.45 re-compressed gas (${COMMON_PRACTICE}); ${cite(DIAGNOSIS_SOURCES, ["S21", "S29"])}`;

// ---- Data quality --------------------------------------------------------------------------------

/**
 * Allowance for clamp sensors and gauges before a line temperature is called impossible, K:
 * sensors are ice-bath checked to ±1 °F (0.6 K) [S10]; gauges add a little more.
 */
export const SENSOR_TOLERANCE_K = 1;
/** Superheat below this at the compressor (outdoor unit) risks liquid floodback, K (5 °F) [S17]. */
export const FLOODBACK_SUPERHEAT_K = 2.8;
/**
 * At the evaporator outlet superheat this close to zero means liquid is leaving the coil, K:
 * within a sensor's tolerance of saturation [S10].
 */
export const EVAPORATOR_OUTLET_FLOODBACK_K = 1;
/** Fewer minutes of running than this and readings are still drifting (practice; PRODUCT.md). */
export const MIN_RUN_MINUTES = 10;
/**
 * Confidence multiplier at a run time of zero, rising linearly to 1 at `MIN_RUN_MINUTES`: a reading
 * taken before the circuit has settled can move by several kelvin (Title 24 waits 15 min [S10]).
 */
export const UNSETTLED_CONFIDENCE_FLOOR = 0.5;
/** Confidence multiplier when the metering family's charge signal could not be judged. */
export const NO_CHARGE_SIGNAL_CONFIDENCE = 0.75;
