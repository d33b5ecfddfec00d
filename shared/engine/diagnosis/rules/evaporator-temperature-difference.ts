import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S21", "S122", "S15"])}; mid-glide evaporating temperature for blends`;

/**
 * Return (room, entering fluid) temperature minus the mean evaporating temperature: whether
 * suction is low or high for the load, against the application's own band (comfort about 19 K,
 * a cool room about 4–10 K, a freezer 4–8 K, a chiller 5–10 K).
 */
const MESSAGES: BandedReading["messages"] = {
  low: (value, text, { limits }) =>
    `The coil runs only ${value} K below the ${limits.returnWords} (expected ${text} K): suction is high for the load — a compressor not pumping, or an overfed coil`,
  normal: (value, text, { limits }) =>
    `The coil runs ${value} K below the ${limits.returnWords} (expected ${text} K): suction suits the load`,
  high: (value, text, { limits }) =>
    `The coil runs ${value} K below the ${limits.returnWords} (expected ${text} K): suction is low for the load — a starved coil, or one short of air (dirty, iced, slow fan)`,
};

export const evaporatorTemperatureDifferenceRule: DiagnosisRule = {
  id: "evaporator-temperature-difference",
  description:
    "Return air minus mean evaporating temperature against the application's band: is suction low or high for the load",
  source: SOURCE,
  evaluate(snapshot) {
    const difference = snapshot.evaporatorTemperatureDifferenceK;
    if (difference === null) return NO_OUTPUT;
    const band = snapshot.limits.evaporatorTd;
    return {
      findings: [
        bandedFinding(
          {
            ruleId: this.id,
            reading: "evaporatorTemperatureDifferenceK",
            value: difference,
            unit: "K",
            band,
            feature: "evaporatorTd",
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
