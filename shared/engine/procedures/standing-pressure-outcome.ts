import type { StandingPressureInput, StandingPressureResult } from "../../schemas/procedures.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";
import { judgeStandingPressure } from "./judge-standing-pressure.ts";

/** Which reading a standing-pressure check cannot be judged on, and why, in a technician's words. */
export interface StandingPressureProblem {
  field: "refrigerant" | "standingGaugeKPa" | "equalisedTempC";
  message: string;
}

/**
 * judgeStandingPressure, with a reading outside the refrigerant's table returned as a problem
 * on the field that caused it instead of thrown: the server answers it as a 400 on that field
 * and the form shows it beside the input, so both must name the same one.
 *
 * @example standingPressureOutcome({ refrigerant: "R410A", standingGaugeKPa: 1750, equalisedTempC: 25 }) // { result: { verdict: "fail", … } }
 * @example standingPressureOutcome({ refrigerant: "R410A", standingGaugeKPa: 1750, equalisedTempC: 90 }) // { problem: { field: "equalisedTempC", … } }
 */
export function standingPressureOutcome(
  input: StandingPressureInput,
): { result: StandingPressureResult } | { problem: StandingPressureProblem } {
  try {
    return { result: judgeStandingPressure(input) };
  } catch (error) {
    if (error instanceof RangeError)
      return {
        problem: {
          field: "standingGaugeKPa",
          message: "The standing pressure is below a perfect vacuum: check the gauge reading",
        },
      };
    if (!(error instanceof PropertyRangeError)) throw error;
    if (error.code === "UNKNOWN_REFRIGERANT") return { problem: { field: "refrigerant", message: error.message } };
    // The engine looks the temperature up first; if that lookup alone succeeds, the pressure is the one outside the table.
    return {
      problem: { field: temperatureInTable(input) ? "standingGaugeKPa" : "equalisedTempC", message: error.message },
    };
  }
}

function temperatureInTable({ refrigerant, equalisedTempC }: StandingPressureInput): boolean {
  try {
    saturationPressure(refrigerant, equalisedTempC, "bubble");
    saturationPressure(refrigerant, equalisedTempC, "dew");
    return true;
  } catch (error) {
    if (error instanceof PropertyRangeError) return false;
    throw error;
  }
}
