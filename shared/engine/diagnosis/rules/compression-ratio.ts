import { HIGH_COMPRESSION_RATIO, LOW_COMPRESSION_RATIO } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { MEMORY, cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** Ratio below the low limit at which the evidence reaches full strength. */
const FULL_STRENGTH_RATIO_BELOW = 0.5;
const SOURCE = cite(["S38", "S29"]);
/** Built once rather than per warning (performance). */
const HIGH_RATIO_SOURCE = `${MEMORY}; ${cite(["S38"])}`;

/** Compression ratio: too low means the compressor is not pumping; very high strains a single stage. */
export const compressionRatioRule: DiagnosisRule = {
  id: "compression-ratio",
  description: `Compression ratio under ${LOW_COMPRESSION_RATIO}:1 points to a weak compressor; over ${HIGH_COMPRESSION_RATIO}:1 expect hot discharge`,
  source: SOURCE,
  evaluate(snapshot) {
    const ratio = snapshot.compressionRatio;
    if (ratio === null) return NO_OUTPUT;
    const basis = snapshot.compressionRatioBasis === "liquid" ? " (from liquid pressure)" : "";
    if (ratio < LOW_COMPRESSION_RATIO) {
      const strength = deviationStrength(LOW_COMPRESSION_RATIO - ratio, FULL_STRENGTH_RATIO_BELOW);
      return {
        findings: [
          {
            ruleId: this.id,
            reading: "compressionRatio",
            value: ratio,
            unit: ":1",
            direction: "low",
            pointsTo: [{ state: "weak-compressor", weight: 0.8 * strength }],
            message: `Compression ratio ${ratio.toFixed(2)}:1${basis} is below ${LOW_COMPRESSION_RATIO}:1: the compressor is not building a normal pressure difference`,
            source: SOURCE,
          },
        ],
        warnings: [],
      };
    }
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
    return NO_OUTPUT;
  },
};
