import type { Finding } from "../../../schemas/diagnosis.ts";
import { bandDeviation } from "../band-deviation.ts";
import type { Band } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { evidenceFromDeviation } from "../evidence-from-deviation.ts";
import { formatTenths } from "../format-tenths.ts";
import type { EvidenceProfile } from "../types.ts";

export type Message = (value: string, band: string) => string;

export interface BandedReading {
  ruleId: string;
  reading: string;
  value: number;
  unit: string;
  band: Band;
  /** The band as text ("8.0–13.0"), when the rule has it ready; else formatted here. */
  bandText?: string;
  profile: EvidenceProfile;
  /** Sentence per direction, given the value and band as text with one decimal. */
  messages: { low: Message; normal: Message; high: Message };
  source: string;
}

/**
 * A finding for a reading judged against a band: direction, graded evidence from the rule's
 * profile, and the rule's sentence with the numbers filled in (one decimal).
 *
 * @throws {RangeError} when the band is inverted
 * @example bandedFinding({ ruleId: "x", reading: "superheatK", value: 12, unit: "K", band: { lowK: 5, highK: 11 }, profile: {}, messages, source }).direction // "high"
 */
export function bandedFinding(spec: BandedReading): Finding {
  const deviation = bandDeviation(spec.value, spec.band);
  const direction = deviation < 0 ? "low" : deviation > 0 ? "high" : "normal";
  const message = spec.messages[direction](formatTenths(spec.value), spec.bandText ?? formatTenths(spec.band.lowK) + "–" + formatTenths(spec.band.highK));
  return {
    ruleId: spec.ruleId,
    reading: spec.reading,
    value: spec.value,
    unit: spec.unit,
    direction,
    pointsTo: evidenceFromDeviation(deviation, deviationStrength(deviation), spec.profile),
    message,
    source: spec.source,
  };
}
