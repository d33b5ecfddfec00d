import type { Finding } from "../../../schemas/diagnosis.ts";
import { bandDeviation } from "../band-deviation.ts";
import type { Band } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { evidenceFromSignature } from "../evidence-from-signature.ts";
import { formatTenths } from "../format-tenths.ts";
import type { MeteringFamily, SignatureFeature } from "../signature-table.ts";
import type { DiagnosisSnapshot } from "../types.ts";

/** One sentence, given the value and band as text (one decimal) and the snapshot for anything else. */
export type Message = (value: string, band: string, snapshot: DiagnosisSnapshot) => string;

export interface BandedReading {
  ruleId: string;
  reading: string;
  value: number;
  unit: string;
  band: Band;
  /** The band as text ("8.0–13.0"), when the rule has it ready; else formatted here. */
  bandText?: string;
  /** The signature-table column this reading fills, and the circuit's metering family. */
  feature: SignatureFeature;
  family: MeteringFamily;
  /** Distance beyond the band edge that counts in full (default 2.8 K). */
  fullStrength?: number;
  /** Pivot for the "below/above pivot" cells (subcooling only), in the reading's unit. */
  pivot?: number;
  /** Sentence per direction, given the value and band as text with one decimal. */
  messages: { low: Message; normal: Message; high: Message };
  /** The rule's source; the band's own source is added after it when the band has one. */
  source: string;
}

/**
 * Texts of the shared, frozen bands (the application's and the default targets), formatted once:
 * two number formats per finding add up over a dozen findings (performance). Bands made per
 * call are not frozen and are never kept.
 */
const frozenBandTexts = new Map<Band, string>();

function bandTextOf(band: Band): string {
  const cached = frozenBandTexts.get(band);
  if (cached !== undefined) return cached;
  const text = formatTenths(band.lowK) + "–" + formatTenths(band.highK);
  if (Object.isFrozen(band)) frozenBandTexts.set(band, text);
  return text;
}

/** "rule source; band: band source" when the band names its own source. */
function sourceOf(ruleSource: string, band: Band): string {
  const bandSource = (band as { source?: unknown }).source;
  return typeof bandSource === "string" ? `${ruleSource}; band: ${bandSource}` : ruleSource;
}

/**
 * A finding for a reading judged against a band: direction, the evidence the signature table
 * gives each state for it (graded by how far outside the band it lies), and the rule's sentence
 * with the numbers filled in (one decimal).
 *
 * @throws {RangeError} when the band is inverted
 * @example bandedFinding({ ruleId: "x", reading: "superheatK", value: 12, unit: "K", band: { lowK: 5, highK: 11 }, feature: "superheat", family: "fixed", messages, source }, snapshot).direction // "high"
 */
export function bandedFinding(spec: BandedReading, snapshot: DiagnosisSnapshot): Finding {
  const deviation = bandDeviation(spec.value, spec.band);
  const direction = deviation < 0 ? "low" : deviation > 0 ? "high" : "normal";
  const strength = deviationStrength(deviation, spec.fullStrength);
  const bandStrength = deviation < 0 ? -strength : strength;
  const pivotDeviation =
    spec.pivot === undefined
      ? 0
      : Math.sign(spec.value - spec.pivot) * deviationStrength(spec.value - spec.pivot, spec.fullStrength);
  const message = spec.messages[direction](formatTenths(spec.value), spec.bandText ?? bandTextOf(spec.band), snapshot);
  return {
    ruleId: spec.ruleId,
    reading: spec.reading,
    value: spec.value,
    unit: spec.unit,
    direction,
    pointsTo: evidenceFromSignature(spec.feature, spec.family, bandStrength, pivotDeviation),
    message,
    source: sourceOf(spec.source, spec.band),
  };
}
