import { COMFORT_RETURN_AIR_MIN_C, EVAPORATOR_TD_BAND, EVAPORATOR_TD_SOURCE } from "../diagnosis-limits.ts";
import { formatTenths } from "../format-tenths.ts";
import { cite } from "../sources.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/**
 * Large TD = suction low for the load (starved or airflow-poor coil); small TD = suction high
 * (compressor not pumping, or overfed coil) [S21][S122]. Comfort-cooling value, from memory.
 */
export const EVAPORATOR_TD_PROFILE: EvidenceProfile = {
  "weak-compressor": [0.6, 0, -0.3],
  overcharged: [0.4, 0, -0.3],
  "low-evaporator-airflow": [-0.3, 0, 0.6],
  "restricted-metering": [-0.3, 0, 0.5],
  undercharged: [-0.3, 0, 0.4],
  normal: [-0.4, 0, -0.4],
};

const SOURCE = `${cite(["S21", "S122"])}; ${EVAPORATOR_TD_SOURCE}`;
const BAND_TEXT = `${formatTenths(EVAPORATOR_TD_BAND.lowK)}–${formatTenths(EVAPORATOR_TD_BAND.highK)}`;

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Evaporator TD ${value} K is below ${band} K: suction is high for the load — compressor not pumping, or the coil is overfed`,
  normal: (value, band) => `Evaporator TD ${value} K sits in ${band} K: suction pressure suits the load`,
  high: (value, band) => `Evaporator TD ${value} K is above ${band} K: suction is low for the load — starved coil or poor airflow`,
};

/** Return air dry bulb minus evaporating temperature: a proxy for "suction low / high". */
export const evaporatorTemperatureDifferenceRule: DiagnosisRule = {
  id: "evaporator-temperature-difference",
  description: "Return air minus evaporating temperature shows whether suction is low or high for the load (comfort cooling)",
  source: SOURCE,
  evaluate(snapshot) {
    const difference = snapshot.evaporatorTemperatureDifferenceK;
    // Comfort-cooling value: skip refrigeration coils (return air below the comfort range).
    if (difference === null || (snapshot.input.returnAirDryBulbC ?? 0) < COMFORT_RETURN_AIR_MIN_C) return NO_OUTPUT;
    return {
      findings: [
        bandedFinding({
          ruleId: this.id,
          reading: "evaporatorTemperatureDifferenceK",
          value: difference,
          unit: "K",
          band: EVAPORATOR_TD_BAND,
          bandText: BAND_TEXT,
          profile: EVAPORATOR_TD_PROFILE,
          messages: MESSAGES,
          source: SOURCE,
        }),
      ],
      warnings: [],
    };
  },
};
