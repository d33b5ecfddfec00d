import { type EvidenceState, type Finding } from "../../schemas/diagnosis.ts";
import { chargeStateText } from "../../content/charge-states.ts";
import { evidenceWeight } from "./evidence-weight.ts";
import { SIGNATURES } from "./signature-table.ts";

/** What each judged reading is called in a summary, by direction. */
const WORDS: Readonly<Record<string, { low: string; normal: string; high: string }>> = {
  superheatK: { low: "superheat low", normal: "superheat on target", high: "superheat high" },
  subcoolingK: { low: "subcooling low", normal: "subcooling on target", high: "subcooling high" },
  evaporatorTemperatureDifferenceK: { low: "suction high for the load", normal: "suction right for the load", high: "suction low for the load" },
  condensingOverAmbientK: { low: "head low for the weather", normal: "head right for the weather", high: "head high for the weather" },
  condenserApproachK: { low: "liquid close to the outdoor air", normal: "condenser approach normal", high: "condenser approach high" },
  temperatureSplitK: { low: "small split across the coil", normal: "split on target", high: "large split across the coil" },
  compressorCurrentRatio: { low: "low compressor current", normal: "current within rating", high: "current above RLA" },
  dischargeLineTempC: { low: "discharge barely superheated", normal: "discharge temperature normal", high: "hot discharge line" },
  compressionRatio: { low: "low compression ratio", normal: "normal compression ratio", high: "high compression ratio" },
  suctionPressureKPa: { low: "suction below the table", normal: "suction pressure", high: "suction pressure" },
};


/**
 * The first evidence line: the verdict's signature in words, made from the judged readings that
 * support it (strongest first), so the headline and the list beneath it always agree.
 *
 * @throws never
 * @example summarizeVerdict("undercharged", findings).message // "Matches Undercharged: superheat high, subcooling low, suction low for the load"
 */
export function summarizeVerdict(state: EvidenceState, findings: readonly Finding[]): Finding {
  const supporting = findings
    .map((finding) => ({ finding, weight: evidenceWeight(finding, state) }))
    .filter(({ finding, weight }) => weight > 0 && WORDS[finding.reading] !== undefined && (finding.direction === "low" || finding.direction === "high" || finding.direction === "normal"))
    .sort((first, second) => second.weight - first.weight);
  const parts = supporting.slice(0, 5).map(({ finding }) => WORDS[finding.reading]![finding.direction as "low" | "normal" | "high"]);
  return {
    ruleId: "signature",
    reading: "chargeState",
    value: supporting.reduce((sum, { weight }) => sum + weight, 0),
    unit: "score",
    direction: "summary",
    pointsTo: [],
    message: `Matches ${chargeStateText[state].title.toLowerCase()}: ${parts.length > 0 ? parts.join(", ") : "the readings in their bands"}`,
    source: `signature table (docs/diagnosis-signatures.md): ${SIGNATURES[state].source}`,
  };
}
