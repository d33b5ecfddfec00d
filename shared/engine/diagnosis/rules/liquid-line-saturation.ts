import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../../sources/marks.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `negative subcooling means vapour or flash gas at the measuring point, or the wrong pipe (${cite(DIAGNOSIS_SOURCES, ["S1", "S2"])}; ${COMMON_PRACTICE})`;
/** Built once rather than per warning (performance). */
const FLASH_GAS_SOURCE = `${SOURCE}; ${cite(DIAGNOSIS_SOURCES, ["S22"])}`;

/** Liquid line warmer than its bubble point: flash gas, or vapour (wrong pipe) beyond the dew point. */
export const liquidLineSaturationRule: DiagnosisRule = {
  id: "liquid-line-saturation",
  description: "Liquid line warmer than its bubble point means flash gas, or the wrong pipe when beyond the dew point",
  source: SOURCE,
  evaluate(snapshot) {
    const exclusion = snapshot.subcoolingExcluded;
    if (exclusion?.code === "liquid-above-saturation") {
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
    }
    const subcooling = snapshot.subcoolingK;
    if (subcooling === null || subcooling >= 0) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "liquid-above-saturation",
          severity: "caution",
          field: "liquidLineTempC",
          message: `Liquid line is ${formatTenths(-subcooling)} K above its bubble point: no subcooling, so flash gas reaches the metering device (short of charge or a restriction upstream); check the probe is on the liquid line`,
          source: FLASH_GAS_SOURCE,
        },
      ],
    };
  },
};
