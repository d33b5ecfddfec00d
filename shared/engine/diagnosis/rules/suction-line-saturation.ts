import { EVAPORATOR_OUTLET_FLOODBACK_K, FLOODBACK_SUPERHEAT_K, SENSOR_TOLERANCE_K } from "../diagnosis-limits.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S17"])}; vapour cannot be colder than its saturation temperature (${cite(DIAGNOSIS_SOURCES, ["S1"])}); sensor allowance ${SENSOR_TOLERANCE_K} K ${cite(DIAGNOSIS_SOURCES, ["S10"])}`;
const GLIDE_SOURCE = `between bubble and dew point a blend is still boiling (${cite(DIAGNOSIS_SOURCES, ["S1", "S2"])}); ${cite(DIAGNOSIS_SOURCES, ["S17"])}`;

/**
 * Suction line colder than saturation (impossible), inside a blend's glide (still boiling: liquid
 * leaves the coil), or so close to saturation that liquid may reach the compressor: at the
 * compressor under 2.8 K [S17], at the evaporator outlet within a sensor's tolerance of zero.
 */
export const suctionLineSaturationRule: DiagnosisRule = {
  id: "suction-line-saturation",
  description:
    "Suction line below saturation is impossible; inside the glide or with superheat near zero, liquid is leaving the coil",
  source: SOURCE,
  evaluate(snapshot) {
    const exclusion = snapshot.superheatExcluded;
    if (exclusion) {
      return {
        findings: [],
        warnings: [
          {
            code: exclusion.code,
            severity: "invalid-data",
            field: exclusion.field,
            message: exclusion.reason,
            source: SOURCE,
          },
        ],
      };
    }
    const superheat = snapshot.superheatK;
    if (superheat === null) return NO_OUTPUT;
    const line = snapshot.input.suctionLineTempC;
    const bubble = snapshot.evaporatingBubbleTempC;
    const dew = snapshot.evaporatingTempC;
    if (superheat < 0 && bubble !== null && dew !== null && dew - bubble > SENSOR_TOLERANCE_K) {
      return {
        findings: [],
        warnings: [
          {
            code: "suction-inside-glide",
            severity: "danger",
            field: "suctionLineTempC",
            message: `Suction line ${formatTenths(line)} °C lies between the bubble point ${formatTenths(bubble)} °C and the dew point ${formatTenths(dew)} °C: the blend is still boiling there, so liquid is leaving the evaporator; do not add refrigerant`,
            source: GLIDE_SOURCE,
          },
        ],
      };
    }
    const atEvaporator = snapshot.suctionTempLocation === "evaporator-outlet";
    // Unstated, the reading may be either: never call a superheat inside its own band (a
    // freezer valve holds about 2.8 K [S15]) a floodback.
    const threshold = atEvaporator
      ? EVAPORATOR_OUTLET_FLOODBACK_K
      : snapshot.suctionTempLocation === null
        ? Math.min(FLOODBACK_SUPERHEAT_K, snapshot.superheatTarget?.lowK ?? FLOODBACK_SUPERHEAT_K)
        : FLOODBACK_SUPERHEAT_K;
    if (superheat >= threshold) return NO_OUTPUT;
    return {
      findings: [],
      warnings: [
        {
          code: "low-superheat-floodback",
          severity: "danger",
          field: "suctionLineTempC",
          message: atEvaporator
            ? `Superheat ${formatTenths(superheat)} K at the evaporator outlet is all but zero: liquid is leaving the coil and may reach the compressor; do not add refrigerant`
            : `Superheat ${formatTenths(superheat)} K is under ${formatTenths(threshold)} K: liquid may be reaching the compressor; do not add refrigerant`,
          source: SOURCE,
        },
      ],
    };
  },
};
