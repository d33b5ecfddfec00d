import type { DiagnosisWarning, Finding } from "../../../schemas/diagnosis.ts";
import { DANGER_DISCHARGE_SUPERHEAT_K, LOW_DISCHARGE_SUPERHEAT_K } from "../diagnosis-limits.ts";
import { deviationStrength } from "../deviation-strength.ts";
import { evidenceFromSignature } from "../evidence-from-signature.ts";
import { formatTenths } from "../format-tenths.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE, MEMORY } from "../../sources/marks.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(DIAGNOSIS_SOURCES, ["S13", "S37"]);
const LOW_SUPERHEAT_SOURCE = `discharge gas only a few kelvin above its dew point means liquid is reaching the compressor (${COMMON_PRACTICE}; ${MEMORY})`;

/**
 * Discharge line temperature: hot above the application's (and refrigerant's) elevated value,
 * dangerous above its limit (oil breakdown); too cool when it sits only a few kelvin above the
 * dew point at discharge pressure, which means liquid is coming back to the compressor.
 */
export const dischargeLineTemperatureRule: DiagnosisRule = {
  id: "discharge-line-temperature",
  description:
    "Discharge line against its refrigerant's and application's limits: hot is a warning, barely superheated means liquid is returning",
  source: SOURCE,
  evaluate(snapshot) {
    const temperature = snapshot.dischargeLineTempC;
    if (temperature === null) return NO_OUTPUT;
    const { elevatedC, limitC, source: limitSource } = snapshot.dischargeLimits;
    const dischargeSuperheat = snapshot.dischargeSuperheatK;
    const warnings: DiagnosisWarning[] = [];
    if (temperature > limitC) {
      warnings.push({
        code: "discharge-temperature-high",
        severity: "danger",
        field: "dischargeLineTempC",
        message: `Discharge line ${Math.round(temperature)} °C is above ${limitC} °C: the discharge valve runs about 42 K hotter and oil starts to break down; find the cause before running on`,
        source: limitSource,
      });
    }
    // Signed strength: + above the elevated value (full at the limit), − when barely superheated.
    let strength = 0;
    if (temperature > elevatedC) strength = deviationStrength(temperature - elevatedC, Math.max(1, limitC - elevatedC));
    else if (dischargeSuperheat !== null && dischargeSuperheat < LOW_DISCHARGE_SUPERHEAT_K) {
      strength = -deviationStrength(
        LOW_DISCHARGE_SUPERHEAT_K - dischargeSuperheat,
        LOW_DISCHARGE_SUPERHEAT_K - DANGER_DISCHARGE_SUPERHEAT_K,
      );
      warnings.push({
        code: "low-discharge-superheat",
        severity: dischargeSuperheat < DANGER_DISCHARGE_SUPERHEAT_K ? "danger" : "caution",
        field: "dischargeLineTempC",
        message: `Discharge line only ${formatTenths(dischargeSuperheat)} K above its dew point: the compressor is barely heating its gas, so liquid is reaching it; do not add refrigerant`,
        source: LOW_SUPERHEAT_SOURCE,
      });
    }
    const direction: Finding["direction"] = strength > 0 ? "high" : strength < 0 ? "low" : "normal";
    const superheatText =
      dischargeSuperheat === null ? "" : `, ${formatTenths(dischargeSuperheat)} K above its dew point`;
    const message =
      direction === "high"
        ? `Discharge line ${Math.round(temperature)} °C is hotter than the ${elevatedC} °C this circuit should run at: high suction superheat, high head or re-compressed gas`
        : direction === "low"
          ? `Discharge line ${Math.round(temperature)} °C${superheatText}: liquid is returning to the compressor`
          : `Discharge line ${Math.round(temperature)} °C${superheatText} is not elevated (below ${elevatedC} °C for this refrigerant and application)`;
    return {
      findings: [
        {
          ruleId: this.id,
          reading: "dischargeLineTempC",
          value: temperature,
          unit: "°C",
          direction,
          pointsTo: evidenceFromSignature("dischargeLine", snapshot.meteringFamily, strength, 0),
          message,
          source: `${SOURCE}; limits: ${limitSource}`,
        },
      ],
      warnings,
    };
  },
};
