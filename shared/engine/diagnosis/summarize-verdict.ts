import { type EvidenceState, type Finding } from "../../schemas/diagnosis.ts";
import { chargeStateText } from "../../content/charge-states.ts";
import { evidenceWeight } from "./evidence-weight.ts";
import { SIGNATURES } from "./signature-table.ts";

/** Titles and sources per state, built once (performance). */
const TITLES = Object.fromEntries(
  Object.entries(chargeStateText).map(([state, text]) => [state, text.title.toLowerCase()]),
) as Record<EvidenceState, string>;
const SOURCES = Object.fromEntries(
  Object.entries(SIGNATURES).map(([state, signature]) => [
    state,
    `signature table (docs/diagnosis-signatures.md): ${signature.source}`,
  ]),
) as Record<EvidenceState, string>;

/** What each judged reading is called in a summary, by direction. */
const WORDS: Readonly<Record<string, { low: string; normal: string; high: string }>> = {
  superheatK: { low: "superheat low", normal: "superheat on target", high: "superheat high" },
  subcoolingK: { low: "subcooling low", normal: "subcooling on target", high: "subcooling high" },
  evaporatorTemperatureDifferenceK: {
    low: "suction high for the load",
    normal: "suction right for the load",
    high: "suction low for the load",
  },
  condensingOverAmbientK: {
    low: "head low for the weather",
    normal: "head right for the weather",
    high: "head high for the weather",
  },
  condenserApproachK: {
    low: "liquid close to the outdoor air",
    normal: "condenser approach normal",
    high: "condenser approach high",
  },
  temperatureSplitK: {
    low: "small split across the coil",
    normal: "split on target",
    high: "large split across the coil",
  },
  compressorCurrentRatio: { low: "low compressor current", normal: "current within rating", high: "current above RLA" },
  dischargeLineTempC: {
    low: "discharge barely superheated",
    normal: "discharge temperature normal",
    high: "hot discharge line",
  },
  compressionRatio: {
    low: "low compression ratio",
    normal: "normal compression ratio",
    high: "high compression ratio",
  },
  compressorEfficiency: {
    low: "compressor working the gas twice",
    normal: "compressor efficiency normal",
    high: "compressor efficiency normal",
  },
  suctionPressureKPa: { low: "suction below the table", normal: "suction pressure", high: "suction pressure" },
};

/**
 * The first evidence line: the verdict's signature in words, made from the judged readings that
 * support it (strongest first; `findings` must come sorted by their weight for `state`, and
 * `weights`, when given, are those weights in the same order), so the headline and the list
 * beneath it always agree.
 *
 * @throws never
 * @example summarizeVerdict("undercharged", findings).message // "Matches Undercharged: superheat high, subcooling low, suction low for the load"
 */
export function summarizeVerdict(
  state: EvidenceState,
  findings: readonly Finding[],
  weights?: ArrayLike<number>,
): Finding {
  // The findings come sorted by their weight for the verdict, strongest first (diagnose()).
  const parts: string[] = [];
  let total = 0;
  // index < findings.length, and `weights`, when given, holds one per finding (contract above).
  for (let index = 0; index < findings.length; index += 1) {
    const finding = findings[index]!;
    const weight = weights ? weights[index]! : evidenceWeight(finding, state);
    if (weight <= 0) continue;
    total += weight;
    const words = WORDS[finding.reading];
    const direction = finding.direction;
    if (
      parts.length < 5 &&
      words !== undefined &&
      (direction === "low" || direction === "high" || direction === "normal")
    )
      parts.push(words[direction]);
  }
  return {
    ruleId: "signature",
    reading: "chargeState",
    value: total,
    unit: "score",
    direction: "summary",
    pointsTo: [],
    message: `Matches ${TITLES[state]}: ${parts.length > 0 ? parts.join(", ") : "the readings in their bands"}`,
    source: SOURCES[state],
  };
}
