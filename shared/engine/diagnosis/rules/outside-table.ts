import { COMMON_PRACTICE } from "../sources.ts";
import type { DiagnosisRule } from "../types.ts";

/** Reports readings the refrigerant's saturation table does not cover (never extrapolated). */
export const outsideTableRule: DiagnosisRule = {
  id: "outside-table",
  description: "A pressure outside the refrigerant's saturation table gives no saturation temperature",
  source: `property tables never extrapolate (${COMMON_PRACTICE})`,
  evaluate(snapshot) {
    return {
      findings: [],
      warnings: snapshot.outsideTable.map((exclusion) => ({
        code: exclusion.code,
        severity: "invalid-data" as const,
        field: exclusion.field,
        message: exclusion.reason,
        source: this.source,
      })),
    };
  },
};
