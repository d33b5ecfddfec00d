import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `discharge gas is superheated vapour, so its line cannot be colder than the dew point at discharge pressure (${cite(DIAGNOSIS_SOURCES, ["S1", "S13"])})`;

/** Discharge line colder than the condensing dew point: impossible, the reading is not used. */
export const dischargeLineSaturationRule: DiagnosisRule = {
  id: "discharge-line-saturation",
  description: "Discharge line temperature below the dew point at discharge pressure is impossible",
  source: SOURCE,
  evaluate(snapshot) {
    const exclusion = snapshot.dischargeLineExcluded;
    if (!exclusion) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: exclusion.code,
          severity: "invalid-data",
          field: exclusion.field,
          message: exclusion.reason,
          source: SOURCE,
        },
      ],
    };
  },
};
