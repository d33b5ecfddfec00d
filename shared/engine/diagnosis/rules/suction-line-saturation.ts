import { FLOODBACK_SUPERHEAT_K, SENSOR_TOLERANCE_K } from "../diagnosis-limits.ts";
import { cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(["S17"])}; vapour cannot be colder than its saturation temperature (${cite(["S1"])}); sensor allowance ${SENSOR_TOLERANCE_K} K ${cite(["S10"])}`;

/**
 * Suction line colder than saturation (impossible) or so close to it that liquid may reach
 * the compressor.
 */
export const suctionLineSaturationRule: DiagnosisRule = {
  id: "suction-line-saturation",
  description: "Suction line temperature below saturation is impossible; superheat under 2.8 K risks floodback",
  source: SOURCE,
  evaluate(snapshot) {
    const exclusion = snapshot.superheatExcluded;
    if (exclusion) {
      return {
        findings: [],
        warnings: [{ code: exclusion.code, severity: "invalid-data", field: exclusion.field, message: exclusion.reason, source: SOURCE }],
      };
    }
    const superheat = snapshot.superheatK;
    if (superheat === null || superheat >= FLOODBACK_SUPERHEAT_K) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "low-superheat-floodback",
          severity: "danger",
          field: "suctionLineTempC",
          message: `Superheat ${formatTenths(superheat)} K is under ${FLOODBACK_SUPERHEAT_K} K: liquid may be reaching the compressor; do not add refrigerant`,
          source: SOURCE,
        },
      ],
    };
  },
};
