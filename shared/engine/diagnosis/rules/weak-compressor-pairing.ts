import { bandDeviation } from "../band-deviation.ts";
import { COMFORT_RETURN_AIR_MIN_C, CONDENSING_OVER_AMBIENT_BAND, EVAPORATOR_TD_BAND } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** Full weight of the high-suction-with-low-head pattern. */
const PATTERN_WEIGHT = 1.2;
const SOURCE = cite(["S122", "S29", "S21"]);

/** Suction high and head low together: the compressor cannot pull its pressure difference. */
export const weakCompressorPairingRule: DiagnosisRule = {
  id: "weak-compressor-pairing",
  description: "Low head with high suction points to a compressor that is not pumping (leaking valves, worn)",
  source: SOURCE,
  evaluate(snapshot) {
    const { evaporatorTemperatureDifferenceK, condensingOverAmbientK } = snapshot;
    if (
      evaporatorTemperatureDifferenceK === null || condensingOverAmbientK === null ||
      (snapshot.input.returnAirDryBulbC ?? 0) < COMFORT_RETURN_AIR_MIN_C
    ) {
      return NO_OUTPUT;
    }
    const suctionHigh = -Math.min(0, bandDeviation(evaporatorTemperatureDifferenceK, EVAPORATOR_TD_BAND));
    const headLow = -Math.min(0, bandDeviation(condensingOverAmbientK, CONDENSING_OVER_AMBIENT_BAND));
    if (suctionHigh === 0 || headLow === 0) return NO_OUTPUT;
    const weight = PATTERN_WEIGHT * deviationStrength(suctionHigh) * deviationStrength(headLow);
    return {
      findings: [
        {
          ruleId: this.id,
          reading: "condensingOverAmbientK",
          value: condensingOverAmbientK,
          unit: "K",
          direction: "low",
          pointsTo: [{ state: "weak-compressor", weight }],
          message: `Low head (condensing ${formatTenths(condensingOverAmbientK)} K over ambient) with high suction (evaporator TD ${formatTenths(evaporatorTemperatureDifferenceK)} K): the compressor is not pumping — check valves, reversing valve or bypass`,
          source: SOURCE,
        },
      ],
      warnings: [],
    };
  },
};
