import { MIN_RUN_MINUTES } from "../diagnosis-limits.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../../sources/marks.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S10", "S20"])}; ${MIN_RUN_MINUTES}-minute minimum: ${COMMON_PRACTICE}`;

/** Warns when the compressor has run too briefly for readings to have settled. */
export const runTimeRule: DiagnosisRule = {
  id: "run-time",
  description: `Readings taken before ${MIN_RUN_MINUTES} minutes of running have not settled`,
  source: SOURCE,
  evaluate(snapshot) {
    const minutes = snapshot.input.runMinutes;
    if (minutes === undefined || minutes >= MIN_RUN_MINUTES) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "short-run-time",
          severity: "caution",
          field: "runMinutes",
          message: `The unit has run ${minutes.toFixed(0)} min: pressures and temperatures drift for 10–15 min after a start or an adjustment; wait (Title 24 reads at 15 min) before deciding`,
          source: SOURCE,
        },
      ],
    };
  },
};
