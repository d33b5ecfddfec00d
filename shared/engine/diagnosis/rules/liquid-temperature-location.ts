import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S13"])}; subcooling exists only downstream of the condensing section (${cite(DIAGNOSIS_SOURCES, ["S1"])})`;

/** Refuses subcooling when the "liquid" temperature was taken on the discharge line. */
export const liquidTemperatureLocationRule: DiagnosisRule = {
  id: "liquid-temperature-location",
  description: "A temperature from the discharge line carries superheated vapour and cannot give subcooling",
  source: SOURCE,
  evaluate(snapshot) {
    const exclusion = snapshot.subcoolingExcluded;
    if (exclusion?.code !== "subcooling-on-discharge-line") return NO_OUTPUT;
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
