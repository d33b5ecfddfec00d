import { DISCHARGE_LINE_ELEVATED_C, DISCHARGE_LINE_LIMIT_C } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { cite } from "../sources.ts";
import type { DiagnosisRule } from "../types.ts";
import type { Evidence } from "../../../schemas/diagnosis.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(["S13", "S37"]);
/** Elevated-to-limit span over which the evidence reaches full strength, K. */
const RAMP_K = DISCHARGE_LINE_LIMIT_C - DISCHARGE_LINE_ELEVATED_C;

/** Hot discharge line: elevated above typical values, dangerous above the oil-breakdown margin. */
export const dischargeLineTemperatureRule: DiagnosisRule = {
  id: "discharge-line-temperature",
  description: `Discharge line above ${DISCHARGE_LINE_ELEVATED_C} °C is elevated; above ${DISCHARGE_LINE_LIMIT_C} °C it risks oil breakdown`,
  source: SOURCE,
  evaluate(snapshot) {
    const temperature = snapshot.input.dischargeLineTempC;
    if (temperature === undefined || snapshot.dischargeLineExcluded) return NO_OUTPUT;
    const warnings =
      temperature > DISCHARGE_LINE_LIMIT_C
        ? [
            {
              code: "discharge-temperature-high" as const,
              severity: "danger" as const,
              field: "dischargeLineTempC",
              message: `Discharge line ${Math.round(temperature)} °C is above ${DISCHARGE_LINE_LIMIT_C} °C: the discharge valve runs about 42 K hotter and oil starts to break down; find the cause before running on`,
              source: SOURCE,
            },
          ]
        : [];
    if (temperature <= DISCHARGE_LINE_ELEVATED_C) {
      return {
        findings: [
          {
            ruleId: this.id,
            reading: "dischargeLineTempC",
            value: temperature,
            unit: "°C",
            direction: "normal",
            pointsTo: [],
            message: `Discharge line ${Math.round(temperature)} °C is not elevated (healthy AC runs about 71–82 °C in hot weather)`,
            source: SOURCE,
          },
        ],
        warnings,
      };
    }
    const strength = deviationStrength(temperature - DISCHARGE_LINE_ELEVATED_C, RAMP_K);
    const pointsTo: Evidence[] = [
      { state: "restricted-metering", weight: 0.3 * strength },
      { state: "non-condensables", weight: 0.3 * strength },
      { state: "weak-compressor", weight: 0.3 * strength },
      { state: "undercharged", weight: 0.2 * strength },
      { state: "condenser-airflow", weight: 0.2 * strength },
      { state: "normal", weight: -0.3 * strength },
    ];
    return {
      findings: [
        {
          ruleId: this.id,
          reading: "dischargeLineTempC",
          value: temperature,
          unit: "°C",
          direction: "high",
          pointsTo,
          message: `Discharge line ${Math.round(temperature)} °C is hotter than usual: high superheat at suction, high head or re-compressed gas`,
          source: SOURCE,
        },
      ],
      warnings,
    };
  },
};
