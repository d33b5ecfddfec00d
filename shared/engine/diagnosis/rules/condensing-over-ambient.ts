import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S26", "S21", "S122"])}; mid-glide condensing temperature for blends`;

/** Mean condensing temperature over outdoor ambient: is head pressure right for the weather? */
const MESSAGES: BandedReading["messages"] = {
  low: (value, text) =>
    `Condensing only ${value} K over the outdoor air (expected ${text} K): head pressure is low for the weather`,
  normal: (value, text) => `Condensing ${value} K over the outdoor air sits in ${text} K`,
  high: (value, text) =>
    `Condensing ${value} K over the outdoor air (expected ${text} K): head pressure is high for the weather`,
};

export const condensingOverAmbientRule: DiagnosisRule = {
  id: "condensing-over-ambient",
  description:
    "Mean condensing temperature over outdoor air against the application's band: is head pressure right for the weather",
  source: SOURCE,
  evaluate(snapshot) {
    const difference = snapshot.condensingOverAmbientK;
    if (difference === null) return NO_OUTPUT;
    const band = snapshot.limits.condensingOverAmbient;
    return {
      findings: [
        bandedFinding(
          {
            ruleId: this.id,
            reading: "condensingOverAmbientK",
            value: difference,
            unit: "K",
            band,
            feature: "condensingOverAmbient",
            family: snapshot.meteringFamily,
            messages: MESSAGES,
            source: SOURCE,
          },
          snapshot,
        ),
      ],
      warnings: [],
    };
  },
};
