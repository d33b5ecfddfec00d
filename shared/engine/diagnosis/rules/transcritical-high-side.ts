import { COMMON_PRACTICE } from "../../sources/marks.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `above the critical point there is no liquid–vapour boundary, so no condensing and no subcooling (${COMMON_PRACTICE}; the critical point from the refrigerant's equation of state)`;

/** High side above the critical pressure: a transcritical gas cooler (R744), not a condenser. */
export const transcriticalHighSideRule: DiagnosisRule = {
  id: "transcritical-high-side",
  description:
    "A high side above the critical pressure is a transcritical gas cooler: no condensing temperature, no subcooling",
  source: SOURCE,
  evaluate(snapshot) {
    const exclusion = snapshot.subcoolingExcluded;
    if (!snapshot.transcritical || exclusion?.code !== "transcritical-gas-cooler") return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "transcritical-gas-cooler",
          severity: "invalid-data",
          field: exclusion.field,
          message: exclusion.reason,
          source: SOURCE,
        },
      ],
    };
  },
};
