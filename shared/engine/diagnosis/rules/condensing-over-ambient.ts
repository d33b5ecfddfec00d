import { CONDENSING_OVER_AMBIENT_BAND } from "../diagnosis-limits.ts";
import { formatTenths } from "../format-tenths.ts";
import { cite } from "../sources.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** High CTOA = head pressure high for the weather; low = head low [S21][S26][S122]. */
export const CONDENSING_OVER_AMBIENT_PROFILE: EvidenceProfile = {
  "condenser-airflow": [-0.4, 0, 0.8],
  "non-condensables": [-0.3, 0, 0.6],
  overcharged: [-0.3, 0, 0.4],
  "weak-compressor": [0.5, 0, -0.3],
  undercharged: [0.4, 0, -0.3],
  "restricted-metering": [0.2, 0, 0],
  normal: [-0.4, 0.2, -0.8],
};

const SOURCE = cite(["S26", "S21", "S122"]);
const BAND_TEXT = `${formatTenths(CONDENSING_OVER_AMBIENT_BAND.lowK)}–${formatTenths(CONDENSING_OVER_AMBIENT_BAND.highK)}`;

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Condensing only ${value} K over outdoor air (expected ${band} K): head pressure is low — short of charge or the compressor is not pumping`,
  normal: (value, band) => `Condensing ${value} K over outdoor air sits in ${band} K`,
  high: (value, band) => `Condensing ${value} K over outdoor air is above ${band} K: head pressure is high — dirty condenser, fan, air in the system or too much charge`,
};

/** Condensing temperature over outdoor ambient: is head pressure right for the weather? */
export const condensingOverAmbientRule: DiagnosisRule = {
  id: "condensing-over-ambient",
  description: "Condensing temperature over outdoor air against 8.3–16.7 K (air-cooled, by efficiency class)",
  source: SOURCE,
  evaluate(snapshot) {
    const difference = snapshot.condensingOverAmbientK;
    if (difference === null) return NO_OUTPUT;
    return {
      findings: [
        bandedFinding({
          ruleId: this.id,
          reading: "condensingOverAmbientK",
          value: difference,
          unit: "K",
          band: CONDENSING_OVER_AMBIENT_BAND,
          bandText: BAND_TEXT,
          profile: CONDENSING_OVER_AMBIENT_PROFILE,
          messages: MESSAGES,
          source: SOURCE,
        }),
      ],
      warnings: [],
    };
  },
};
