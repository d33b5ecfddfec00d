import { COMMON_PRACTICE } from "../../sources/marks.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** Supply air warmer than return air: the coil is not cooling (or the probes are swapped). */
export const supplyAirRule: DiagnosisRule = {
  id: "supply-air",
  description: "Supply air warmer than return air means no cooling, or swapped probes",
  source: COMMON_PRACTICE,
  evaluate(snapshot) {
    const split = snapshot.temperatureSplitK;
    if (split === null || split >= 0) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "supply-warmer-than-return",
          severity: "caution",
          field: "supplyAirDryBulbC",
          message:
            snapshot.application === "heat-pump"
              ? `Supply air is ${formatTenths(-split)} K warmer than return air: the heat pump is heating. Satura judges heat pumps in cooling mode (where makers give the charging figures); check in cooling, or weigh in the charge`
              : `Supply air is ${formatTenths(-split)} K warmer than return air: check the probes are not swapped and the unit is in cooling`,
          source: COMMON_PRACTICE,
        },
      ],
    };
  },
};
