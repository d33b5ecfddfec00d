/**
 * Limits and bands used by the diagnosis rules, each with its source (TRADE.md tags). Values
 * from °F sources are plain conversions (1 K = 1.8 °F of difference). Code and tests import
 * these; nothing else hard-codes them.
 */
import { COMMON_PRACTICE, MEMORY, cite } from "./sources.ts";

/** A closed band of temperature difference, K. */
export interface Band {
  lowK: number;
  highK: number;
}

// ---- Superheat and subcooling targets (TRADE.md §1.3, §1.4) ------------------------------------

/**
 * Default evaporator superheat band for TXV/EEV circuits without a maker's target, K:
 * 1.7–6.7 K is the refrigeration range, 5.6 K average [S15]; suction superheat should not be
 * below 2.8 K at the compressor [S17]; one split-AC maker specifies 3.9–5 K [S9].
 * We take 2.8–6.7 K, nominal 5 K.
 */
export const EXPANSION_VALVE_SUPERHEAT_BAND: Band & { targetK: number } = { lowK: 2.8, highK: 6.7, targetK: 5 };
export const EXPANSION_VALVE_SUPERHEAT_SOURCE = cite(["S15", "S17", "S9"], COMMON_PRACTICE);

/**
 * Default subcooling band without a maker's target, K: residential TXV AC commonly 8–15 °F
 * (4.4–8.3 K); under 5 °F (2.8 K) suggests undercharge, over 20 °F (11 K) overcharge [S14].
 */
export const DEFAULT_SUBCOOLING_BAND: Band & { targetK: number } = { lowK: 4.4, highK: 8.3, targetK: 6.4 };
export const DEFAULT_SUBCOOLING_SOURCE = cite(["S14"], COMMON_PRACTICE);

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
export const FIXED_ORIFICE_TARGET_SOURCE = `${cite(["S10", "S17", "S18", "S19"])}; linear formula commonly taught in trade training (${MEMORY})`;

// ---- Deviation strength ---------------------------------------------------------------------------

/**
 * Distance beyond a band edge at which a deviation counts at full strength, K. Between the
 * edge and this distance the evidence ramps up linearly; chosen equal to the fixed-orifice
 * pass tolerance (2.8 K [S10]) so that "one tolerance outside the band" is a clear signal.
 */
export const FULL_STRENGTH_DEVIATION_K = 2.8;

// ---- Air and condenser (TRADE.md §3) ----------------------------------------------------------------

/** Evaporator air split (return − supply), comfort cooling, K: 14–23 °F [S33]. */
export const TEMPERATURE_SPLIT_BAND: Band = { lowK: 8, highK: 13 };
/**
 * Evaporator temperature difference (return-air dry bulb − evaporating dew point), comfort
 * cooling, K: about 35 °F (19 K) (memory). We allow ±5 K around it before pointing anywhere.
 */
export const EVAPORATOR_TD_BAND: Band = { lowK: 14, highK: 24 };
export const EVAPORATOR_TD_SOURCE = `evaporator TD about 19 K for comfort cooling (${MEMORY}); ±5 K band (${COMMON_PRACTICE})`;
/**
 * Condensing temperature over ambient (CTOA), air-cooled, K: 16 SEER+ ≈ 8.3 K … ≤ 10 SEER ≈
 * 16.7 K [S26].
 */
export const CONDENSING_OVER_AMBIENT_BAND: Band = { lowK: 8.3, highK: 16.7 };

// ---- Compressor and discharge (TRADE.md §3) ---------------------------------------------------------

/** Keep the discharge line below this temperature, °C (225 °F) [S13][S37]. */
export const DISCHARGE_LINE_LIMIT_C = 107;
/** Typical healthy AC discharge line in hot weather 71–82 °C [S37]; above this counts as elevated. */
export const DISCHARGE_LINE_ELEVATED_C = 90;
/** Below this compression ratio a compressor is not pumping: comfort AC 2.3–3.5, modern 2–3 [S38]. */
export const LOW_COMPRESSION_RATIO = 2;
/** Above about 10:1 expect high discharge temperatures on a single stage (memory/practice). */
export const HIGH_COMPRESSION_RATIO = 10;
/** Running current above RLA needs investigation [S39] (practice). */
export const HIGH_CURRENT_RATIO = 1;
/** Running current below half of RLA at full load suggests a light or unloaded compressor (practice). */
export const LOW_CURRENT_RATIO = 0.5;

// ---- Data quality --------------------------------------------------------------------------------

/**
 * Allowance for clamp sensors and gauges before a line temperature is called impossible, K:
 * sensors are ice-bath checked to ±1 °F (0.6 K) [S10]; gauges add a little more.
 */
export const SENSOR_TOLERANCE_K = 1;
/** Superheat below this at the compressor risks liquid floodback, K (5 °F) [S17]. */
export const FLOODBACK_SUPERHEAT_K = 2.8;
/** Fewer minutes of running than this and readings are still drifting (practice; PRODUCT.md). */
export const MIN_RUN_MINUTES = 10;
/**
 * Return air at or above this is occupied-space air, so the comfort-cooling bands (air split,
 * evaporator TD) apply; below it the coil is taken to be refrigeration and they are skipped, °C
 * (common practice: comfort return air is about 18–30 °C).
 */
export const COMFORT_RETURN_AIR_MIN_C = 18;
