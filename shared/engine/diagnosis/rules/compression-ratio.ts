import { HIGH_COMPRESSION_RATIO, LOW_COMPRESSION_RATIO } from "../diagnosis-limits.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { MEMORY } from "../../sources/marks.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule, DiagnosisSnapshot } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** Ratio below the low limit at which the evidence reaches full strength. */
const FULL_STRENGTH_RATIO_BELOW = 0.5;
const SOURCE = cite(DIAGNOSIS_SOURCES, ["S38", "S29"]);
/** Built once rather than per warning (performance). */
const HIGH_RATIO_SOURCE = `${MEMORY}; ${cite(DIAGNOSIS_SOURCES, ["S38"])}`;
/** Only the low side is judged as evidence; the high side is a caution. */
const BAND = { lowK: LOW_COMPRESSION_RATIO, highK: Number.POSITIVE_INFINITY };

/** Compression ratio: too low means the compressor is not pumping; very high strains a single stage. */
const basisOf = (snapshot: DiagnosisSnapshot) =>
  snapshot.compressionRatioBasis === "liquid" ? " (from liquid pressure)" : "";

const MESSAGES: BandedReading["messages"] = {
  low: (_value, _band, snapshot) =>
    `Compression ratio ${snapshot.compressionRatio!.toFixed(2)}:1${basisOf(snapshot)} is below ${LOW_COMPRESSION_RATIO}:1: the compressor is not building a normal pressure difference`,
  normal: (_value, _band, snapshot) =>
    `Compression ratio ${snapshot.compressionRatio!.toFixed(2)}:1${basisOf(snapshot)}`,
  high: (_value, _band, snapshot) => `Compression ratio ${snapshot.compressionRatio!.toFixed(2)}:1${basisOf(snapshot)}`,
};

export const compressionRatioRule: DiagnosisRule = {
  id: "compression-ratio",
  description: `Compression ratio under ${LOW_COMPRESSION_RATIO}:1 points to a weak compressor; over ${HIGH_COMPRESSION_RATIO}:1 expect hot discharge`,
  source: SOURCE,
  evaluate(snapshot) {
    const ratio = snapshot.compressionRatio;
    if (ratio === null || snapshot.transcritical) return NO_OUTPUT;
    if (ratio >= LOW_COMPRESSION_RATIO && ratio <= HIGH_COMPRESSION_RATIO) return NO_OUTPUT;
    const basis = basisOf(snapshot);
    // In its band the ratio says little; only a low ratio is evidence (weak compressor).
    if (ratio > HIGH_COMPRESSION_RATIO) {
      return {
        findings: [],
        warnings: [
          {
            code: "compression-ratio-high",
            severity: "caution",
            field: "suctionPressureKPa",
            message: `Compression ratio ${formatTenths(ratio)}:1${basis} is above ${HIGH_COMPRESSION_RATIO}:1: expect high discharge temperatures on a single-stage compressor`,
            source: HIGH_RATIO_SOURCE,
          },
        ],
      };
    }
    const finding = bandedFinding(
      {
        ruleId: this.id,
        reading: "compressionRatio",
        value: ratio,
        unit: ":1",
        band: BAND,
        bandText: `${LOW_COMPRESSION_RATIO}`,
        fullStrength: FULL_STRENGTH_RATIO_BELOW,
        feature: "compressionRatio",
        family: snapshot.meteringFamily,
        messages: MESSAGES,
        source: SOURCE,
      },
      snapshot,
    );
    return { findings: [finding], warnings: [] };
  },
};
