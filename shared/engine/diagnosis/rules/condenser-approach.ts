import { SENSOR_TOLERANCE_K } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(["S26", "S34"]);

/** A liquid line colder than the air cooling it needs a restriction (or a bad probe). */
export const condenserApproachRule: DiagnosisRule = {
  id: "condenser-approach",
  description: "Liquid line colder than the outdoor air entering the condenser points to a restriction upstream or a bad probe",
  source: SOURCE,
  evaluate(snapshot) {
    const approach = snapshot.condenserApproachK;
    if (approach === null || snapshot.subcoolingExcluded || approach >= -SENSOR_TOLERANCE_K) return NO_OUTPUT;
    const strength = deviationStrength(approach + SENSOR_TOLERANCE_K);
    return {
      findings: [
        {
          ruleId: this.id,
          reading: "condenserApproachK",
          value: approach,
          unit: "K",
          direction: "low",
          pointsTo: [{ state: "restricted-metering", weight: 0.5 * strength }],
          message: `Liquid line is ${formatTenths(-approach)} K colder than the outdoor air: only a pressure drop (restriction) upstream of the probe can do that — or the probe is wrong`,
          source: SOURCE,
        },
      ],
      warnings: [
        {
          code: "liquid-colder-than-outdoor-air",
          severity: "caution",
          field: "liquidLineTempC",
          message: `Liquid line ${formatTenths(snapshot.input.liquidLineTempC)} °C is colder than the outdoor air ${formatTenths(snapshot.input.outdoorAirDryBulbC ?? Number.NaN)} °C: check the probe, then look for a restriction (cold spot, sweat) before the probe`,
          source: SOURCE,
        },
      ],
    };
  },
};
