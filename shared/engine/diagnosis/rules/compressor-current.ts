import { CURRENT_RATIO_BAND, CURRENT_RATIO_FULL_STRENGTH } from "../diagnosis-limits.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../../sources/marks.ts";
import { formatHundredths } from "../format-hundredths.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S39", "S21"])}; ${COMMON_PRACTICE}`;

/** Compressor running current against RLA (RLA is a rating, not the expected running current). */
const MESSAGES: BandedReading["messages"] = {
  low: (_value, _band, { input, compressorCurrentRatio }) =>
    `Compressor draws ${input.compressorAmps!.toFixed(1)} A, ${formatHundredths(compressorCurrentRatio!)} × RLA: little refrigerant is being pumped`,
  normal: (_value, _band, { input, compressorCurrentRatio }) =>
    `Compressor draws ${input.compressorAmps!.toFixed(1)} A, ${formatHundredths(compressorCurrentRatio!)} × RLA: within its rating`,
  high: (_value, _band, { input, compressorCurrentRatio }) =>
    `Compressor draws ${input.compressorAmps!.toFixed(1)} A, ${formatHundredths(compressorCurrentRatio!)} × RLA: above its rating — high head pressure or high load; investigate`,
};

export const compressorCurrentRule: DiagnosisRule = {
  id: "compressor-current",
  description:
    "Compressor current above RLA points to high load (head pressure); far below it, to little refrigerant pumped",
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
    const finding = bandedFinding(
      {
        ruleId: this.id,
        reading: "compressorCurrentRatio",
        value: ratio,
        unit: "× RLA",
        band: CURRENT_RATIO_BAND,
        fullStrength: CURRENT_RATIO_FULL_STRENGTH,
        feature: "compressorCurrent",
        family: snapshot.meteringFamily,
        messages: MESSAGES,
        source: SOURCE,
      },
      snapshot,
    );
    return { findings: [finding], warnings: [] };
  },
};
