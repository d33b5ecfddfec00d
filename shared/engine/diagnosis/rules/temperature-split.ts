import { COMFORT_RETURN_AIR_MIN_C, TEMPERATURE_SPLIT_BAND } from "../diagnosis-limits.ts";
import { formatTenths } from "../format-tenths.ts";
import { cite } from "../sources.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** High split: too little air over the coil; low split: too little refrigeration effect [S21][S33]. */
export const TEMPERATURE_SPLIT_PROFILE: EvidenceProfile = {
  "low-evaporator-airflow": [-0.4, 0, 0.8],
  undercharged: [0.3, 0, -0.2],
  "restricted-metering": [0.3, 0, -0.2],
  "weak-compressor": [0.3, 0, -0.2],
  "condenser-airflow": [0.1, 0, 0],
  "non-condensables": [0.1, 0, 0],
  normal: [-0.4, 0.2, -0.8],
};

const SOURCE = cite(["S33", "S21"]);
const BAND_TEXT = `${formatTenths(TEMPERATURE_SPLIT_BAND.lowK)}–${formatTenths(TEMPERATURE_SPLIT_BAND.highK)}`;

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Air split ${value} K is below ${band} K: the coil is doing little cooling (humid air also lowers the split)`,
  normal: (value, band) => `Air split ${value} K sits in ${band} K`,
  high: (value, band) => `Air split ${value} K is above ${band} K: too little air over the evaporator — filter, coil or fan`,
};

/** Air temperature split across the evaporator against the comfort-cooling band. */
export const temperatureSplitRule: DiagnosisRule = {
  id: "temperature-split",
  description: "Return minus supply air across the evaporator against 8–13 K (comfort cooling)",
  source: SOURCE,
  evaluate(snapshot) {
    const split = snapshot.temperatureSplitK;
    // Comfort-cooling band: skip refrigeration coils (return air below the comfort range).
    if (split === null || split < 0 || (snapshot.input.returnAirDryBulbC ?? 0) < COMFORT_RETURN_AIR_MIN_C) return NO_OUTPUT;
    return {
      findings: [
        bandedFinding({
          ruleId: this.id,
          reading: "temperatureSplitK",
          value: split,
          unit: "K",
          band: TEMPERATURE_SPLIT_BAND,
          bandText: BAND_TEXT,
          profile: TEMPERATURE_SPLIT_PROFILE,
          messages: MESSAGES,
          source: SOURCE,
        }),
      ],
      warnings: [],
    };
  },
};
