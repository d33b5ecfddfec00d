import type { Expectation } from "./signature-table.ts";

/** Penalty for an expected symptom that did not show (the reading sat in its band). */
const MISSING_SYMPTOM = -0.3;
/** Reward for a reading in its band where "normal" was expected. */
const IN_BAND = 0.5;
/** How fast "normal" turns against a reading outside its band: −1 at 60 % strength. */
const OUT_OF_BAND_SLOPE = 2.5;
/**
 * Floor of "normal" for a reading far outside its band: one reading that is plainly wrong must
 * outweigh several in band (a coil 20 K below a cool room is not normal because head and
 * subcooling are).
 */
const FAR_OUT_OF_BAND = -2;
/** Reward for a reading in its band where "normal or high/low" was expected. */
const ALLOWED_IN_BAND = 0.3;

/**
 * How well a reading matches what a state expects of it, from −1 (contradicts; −2 for a
 * reading far outside the band where "normal" was expected) to +1 (the symptom in full). `bandStrength` is the reading's signed distance outside its band as a
 * strength (−1 … 0 … +1; 0 anywhere inside the band); `pivotDeviation` is its signed distance
 * from a pivot value, scaled to −1 … +1, used by the "below-pivot" / "above-pivot" cells.
 *
 * Every function here is continuous, and "low", "high", "low-or-normal", "normal-or-high" and
 * the pivots are monotonic in the reading, so more of a symptom never makes its state less
 * likely (what the property tests check).
 *
 * Units: dimensionless. Source: the shape is Satura's own (common practice for reading a
 * symptom table); the tables it reads are TRADE.md §2.
 *
 * @throws never
 * @example signatureMatch("high", 1, 0) // 1
 */
export function signatureMatch(expect: Expectation, bandStrength: number, pivotDeviation: number): number {
  switch (expect) {
    case "high":
      return bandStrength >= 0
        ? MISSING_SYMPTOM + (1 - MISSING_SYMPTOM) * bandStrength
        : MISSING_SYMPTOM + (1 + MISSING_SYMPTOM) * bandStrength;
    case "low":
      return bandStrength <= 0
        ? MISSING_SYMPTOM - (1 - MISSING_SYMPTOM) * bandStrength
        : MISSING_SYMPTOM - (1 + MISSING_SYMPTOM) * bandStrength;
    case "normal":
      return Math.max(FAR_OUT_OF_BAND, IN_BAND - OUT_OF_BAND_SLOPE * Math.abs(bandStrength));
    case "normal-or-high":
      return bandStrength >= 0 ? ALLOWED_IN_BAND : ALLOWED_IN_BAND + (1 + ALLOWED_IN_BAND) * bandStrength;
    case "low-or-normal":
      return bandStrength <= 0 ? ALLOWED_IN_BAND : ALLOWED_IN_BAND - (1 + ALLOWED_IN_BAND) * bandStrength;
    case "above-pivot":
      return pivotDeviation;
    case "below-pivot":
      return -pivotDeviation;
  }
}
