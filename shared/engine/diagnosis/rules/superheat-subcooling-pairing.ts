import type { Evidence } from "../../../schemas/diagnosis.ts";
import { bandDeviation } from "../band-deviation.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { evidenceFromDeviation } from "../evidence-from-deviation.ts";
import { cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** With high superheat: subcooling low → undercharge, normal/high → restriction [S24][S25]. */
export const HIGH_SUPERHEAT_BY_SUBCOOLING: EvidenceProfile = {
  undercharged: [1, 0, -0.5],
  "restricted-metering": [-0.8, 0.6, 0.8],
};

/**
 * With low superheat: subcooling high → overcharge; normal → low evaporator airflow; high
 * subcooling with low superheat is also the inefficient-compressor pattern [S21].
 * Weights are never negative, so more superheat can only weaken them.
 */
export const LOW_SUPERHEAT_BY_SUBCOOLING: EvidenceProfile = {
  overcharged: [0, 0, 0.8],
  "low-evaporator-airflow": [0.2, 0.5, 0.3],
  "weak-compressor": [0, 0, 0.4],
};

/** Expansion valves hold superheat, so the pairing is weaker evidence there. */
const VALVE_SCALE = 0.6;
const SOURCE = cite(["S21", "S24", "S25"]);

/**
 * Reads superheat and subcooling together: the pair separates undercharge from restriction
 * (both starve the evaporator) and overcharge from low airflow (both flood it).
 */
export const superheatSubcoolingPairingRule: DiagnosisRule = {
  id: "superheat-subcooling-pairing",
  description: "High superheat with low subcooling is undercharge, with normal/high subcooling a restriction; low superheat with high subcooling is overcharge",
  source: SOURCE,
  evaluate(snapshot) {
    const { superheatK, subcoolingK, superheatTarget, subcoolingTarget } = snapshot;
    if (
      superheatK === null || subcoolingK === null || !superheatTarget || !subcoolingTarget ||
      snapshot.superheatExcluded || snapshot.subcoolingExcluded
    ) {
      return NO_OUTPUT;
    }
    const superheatDeviation = bandDeviation(superheatK, superheatTarget);
    if (superheatDeviation === 0) return NO_OUTPUT;
    const superheatStrength = deviationStrength(superheatDeviation);
    const subcoolingDeviation = bandDeviation(subcoolingK, subcoolingTarget);
    const scale = superheatStrength * (snapshot.meteringFamily === "fixed" ? 1 : VALVE_SCALE);
    const high = superheatDeviation > 0;
    const pointsTo: Evidence[] = evidenceFromDeviation(
      subcoolingDeviation,
      deviationStrength(subcoolingDeviation),
      high ? HIGH_SUPERHEAT_BY_SUBCOOLING : LOW_SUPERHEAT_BY_SUBCOOLING,
    ).map((evidence) => ({ state: evidence.state, weight: evidence.weight * scale }));
    const subcoolingWord = subcoolingDeviation < 0 ? "low" : subcoolingDeviation > 0 ? "high" : "normal";
    const message = high
      ? subcoolingWord === "low"
        ? `High superheat with low subcooling (${formatTenths(subcoolingK)} K): the classic shortage of charge`
        : `High superheat with ${subcoolingWord} subcooling (${formatTenths(subcoolingK)} K): liquid is there but not getting through — suspect a restriction (drier, kinked line, metering device)`
      : subcoolingWord === "high"
        ? `Low superheat with high subcooling (${formatTenths(subcoolingK)} K): too much refrigerant`
        : `Low superheat with ${subcoolingWord} subcooling (${formatTenths(subcoolingK)} K): the evaporator is not boiling off its liquid — check airflow and filters`;
    return {
      findings: [
        {
          ruleId: this.id,
          reading: "superheatK",
          value: superheatK,
          unit: "K",
          direction: high ? "high" : "low",
          pointsTo,
          message,
          source: SOURCE,
        },
      ],
      warnings: [],
    };
  },
};
