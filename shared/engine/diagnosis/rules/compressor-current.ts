import { CURRENT_RATIO_BAND, CURRENT_RATIO_FULL_STRENGTH } from "../diagnosis-limits.ts";
import { COMMON_PRACTICE, cite } from "../sources.ts";
import { formatHundredths } from "../format-hundredths.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

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
    const amps = compressorAmps.toFixed(1);
    const finding = bandedFinding({
      ruleId: this.id,
      reading: "compressorCurrentRatio",
      value: ratio,
      unit: "× RLA",
      band: CURRENT_RATIO_BAND,
      fullStrength: CURRENT_RATIO_FULL_STRENGTH,
      feature: "compressorCurrent",
      family: snapshot.meteringFamily,
      messages: {
        low: () => `Compressor draws ${amps} A, ${formatHundredths(ratio)} × RLA: little refrigerant is being pumped`,
        normal: () => `Compressor draws ${amps} A, ${formatHundredths(ratio)} × RLA: within its rating`,
        high: () => `Compressor draws ${amps} A, ${formatHundredths(ratio)} × RLA: above its rating — high head pressure or high load; investigate`,
      },
      source: SOURCE,
    });
    return { findings: [finding], warnings: [] };
  },
};
