import { upperFirst } from "../../../format/upper-first.ts";
import { formatTenths } from "../format-tenths.ts";
import { COMMON_PRACTICE } from "../../sources/marks.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `comfort return air about 18–30 °C, cool rooms −2 to +10 °C, freezers −18 to −25 °C (${COMMON_PRACTICE})`;

const WORDS: Record<string, string> = {
  "comfort-cooling": "comfort cooling",
  "heat-pump": "a heat pump",
  "medium-temperature-refrigeration": "medium-temperature refrigeration",
  "low-temperature-refrigeration": "low-temperature refrigeration",
  "process-chilling": "process chilling",
};

/**
 * Says which application's bands were used when none was recorded, and warns when the return
 * (room) temperature does not fit the recorded application — a cool room judged as comfort
 * cooling would pass a coil 20 K below the room.
 */
export const applicationFitRule: DiagnosisRule = {
  id: "application-fit",
  description: "Says when the application was inferred, and when the return air does not fit the recorded application",
  source: SOURCE,
  evaluate(snapshot) {
    const returnAir = snapshot.input.returnAirDryBulbC;
    if (snapshot.applicationBasis === "inferred-from-return-air" && returnAir !== undefined) {
      return {
        findings: [],
        warnings: [
          {
            code: "application-assumed",
            severity: "caution",
            field: "application",
            message: `No application is recorded for this unit: judged as ${WORDS[snapshot.application]} from the ${formatTenths(returnAir)} °C return air; set it on the equipment`,
            source: SOURCE,
          },
        ],
      };
    }
    if (snapshot.applicationBasis !== "equipment" || returnAir === undefined) return NO_OUTPUT;
    const { min, max } = snapshot.limits.returnRangeC;
    if (returnAir >= min && returnAir <= max) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "application-mismatch",
          severity: "caution",
          field: "returnAirDryBulbC",
          message: `${upperFirst(snapshot.limits.returnWords)} ${formatTenths(returnAir)} °C does not fit ${WORDS[snapshot.application]} (${min} to ${max} °C): check the probe and the unit's application — the bands used are that application's`,
          source: SOURCE,
        },
      ],
    };
  },
};
