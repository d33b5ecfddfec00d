import { bandDeviation } from "../band-deviation.ts";
import { CONDENSING_OVER_AMBIENT_BAND } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { evidenceFromDeviation } from "../evidence-from-deviation.ts";
import { cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

/**
 * With high head pressure, subcooling tells the causes apart: low → poor condenser airflow
 * (liquid is not condensed) [S21]; normal → non-condensables taking condenser volume
 * [S27][S28]; high → overcharge filling the condenser with liquid [S23].
 */
export const HIGH_HEAD_BY_SUBCOOLING: EvidenceProfile = {
  "condenser-airflow": [0.8, 0.2, 0],
  "non-condensables": [0, 0.6, 0.4],
  overcharged: [0, 0, 0.6],
};

const SOURCE = `${cite(["S21", "S23", "S27", "S28"])}; confirm non-condensables with a standing-pressure test`;

/** High head pressure read with subcooling: condenser airflow, non-condensables or overcharge. */
export const highHeadPairingRule: DiagnosisRule = {
  id: "high-head-pairing",
  description: "High condensing-over-ambient with low subcooling is condenser airflow, normal subcooling non-condensables, high subcooling overcharge",
  source: SOURCE,
  evaluate(snapshot) {
    const { condensingOverAmbientK, subcoolingK, subcoolingTarget } = snapshot;
    if (condensingOverAmbientK === null || subcoolingK === null || !subcoolingTarget || snapshot.subcoolingExcluded) {
      return NO_OUTPUT;
    }
    const headDeviation = bandDeviation(condensingOverAmbientK, CONDENSING_OVER_AMBIENT_BAND);
    if (headDeviation <= 0) return NO_OUTPUT;
    const headStrength = deviationStrength(headDeviation);
    const subcoolingDeviation = bandDeviation(subcoolingK, subcoolingTarget);
    const pointsTo = evidenceFromDeviation(subcoolingDeviation, deviationStrength(subcoolingDeviation), HIGH_HEAD_BY_SUBCOOLING).map(
      (evidence) => ({ state: evidence.state, weight: evidence.weight * headStrength }),
    );
    const word = subcoolingDeviation < 0 ? "low" : subcoolingDeviation > 0 ? "high" : "normal";
    const cause =
      word === "low"
        ? "the condenser is not rejecting heat — clean the coil, check the fan"
        : word === "normal"
          ? "something other than liquid takes condenser space — suspect air or nitrogen (confirm with a standing-pressure test)"
          : "liquid fills the condenser — too much refrigerant";
    return {
      findings: [
        {
          ruleId: this.id,
          reading: "condensingOverAmbientK",
          value: condensingOverAmbientK,
          unit: "K",
          direction: "high",
          pointsTo,
          message: `High head pressure with ${word} subcooling (${formatTenths(subcoolingK)} K): ${cause}`,
          source: SOURCE,
        },
      ],
      warnings: [],
    };
  },
};
