import { HIGH_CURRENT_RATIO, LOW_CURRENT_RATIO } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { COMMON_PRACTICE, cite } from "../sources.ts";
import { formatHundredths } from "../format-hundredths.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** Current-ratio distance at which the evidence reaches full strength. */
const FULL_STRENGTH_RATIO = 0.2;
const SOURCE = `${cite(["S39", "S21"])}; ${COMMON_PRACTICE}`;

/** Compressor running current against RLA (RLA is a rating, not the expected running current). */
export const compressorCurrentRule: DiagnosisRule = {
  id: "compressor-current",
  description: "Compressor current above RLA points to high load (head pressure); far below it, to little refrigerant pumped",
  source: SOURCE,
  evaluate(snapshot) {
    const { compressorAmps, compressorRla } = snapshot.input;
    if (compressorAmps === undefined) return NO_OUTPUT;
    const ratio = snapshot.compressorCurrentRatio;
    if (ratio === null || compressorRla === undefined) {
      return {
        findings: [],
        warnings: [
          {
            code: "no-current-rating",
            severity: "caution",
            field: "compressorRla",
            message: "Compressor current was entered without the nameplate RLA, so it is not judged",
            source: SOURCE,
          },
        ],
      };
    }
    if (ratio > HIGH_CURRENT_RATIO) {
      const strength = deviationStrength(ratio - HIGH_CURRENT_RATIO, FULL_STRENGTH_RATIO);
      return {
        findings: [
          {
            ruleId: this.id,
            reading: "compressorCurrentRatio",
            value: ratio,
            unit: "× RLA",
            source: SOURCE,
            direction: "high",
            pointsTo: [
              { state: "condenser-airflow", weight: 0.4 * strength },
              { state: "non-condensables", weight: 0.4 * strength },
              { state: "overcharged", weight: 0.4 * strength },
            ],
            message: `Compressor draws ${formatTenths(compressorAmps)} A, ${formatHundredths(ratio)} × RLA: above its rating — high head pressure or high load; investigate`,
          },
        ],
        warnings: [],
      };
    }
    if (ratio < LOW_CURRENT_RATIO) {
      const strength = deviationStrength(LOW_CURRENT_RATIO - ratio, FULL_STRENGTH_RATIO);
      return {
        findings: [
          {
            ruleId: this.id,
            reading: "compressorCurrentRatio",
            value: ratio,
            unit: "× RLA",
            source: SOURCE,
            direction: "low",
            pointsTo: [
              { state: "weak-compressor", weight: 0.3 * strength },
              { state: "undercharged", weight: 0.2 * strength },
              { state: "restricted-metering", weight: 0.2 * strength },
            ],
            message: `Compressor draws ${formatTenths(compressorAmps)} A, ${formatHundredths(ratio)} × RLA: little refrigerant is being pumped`,
          },
        ],
        warnings: [],
      };
    }
    return {
      findings: [{ ruleId: this.id, reading: "compressorCurrentRatio", value: ratio, unit: "× RLA", source: SOURCE, direction: "normal", pointsTo: [], message: `Compressor draws ${formatTenths(compressorAmps)} A, ${formatHundredths(ratio)} × RLA: within its rating` }],
      warnings: [],
    };
  },
};
