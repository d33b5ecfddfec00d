import type { ChargeDeviation } from "../../schemas/diagnosis.ts";
import { formatHundredths } from "../diagnosis/format-hundredths.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import type { DiagnosisSnapshot } from "../diagnosis/types.ts";
import {
  GENERIC_RANGE_SHARE,
  GENERIC_SLOPE_UNCERTAINTY,
  RANGE_SHARE_PER_K_BEYOND,
  REFERENCE_CONDITION_TOLERANCE_K,
  REFERENCE_RANGE_SHARE,
  REFERENCE_SLOPE_UNCERTAINTY,
  SATURATED_EXTRA_SHORT_SHARE,
  SATURATED_SUBCOOLING_K,
  SENSOR_SUBCOOLING_K,
  VALVE_PAST_BAND_SUPERHEAT_RATIO,
  VIRTUAL_CHARGE_SOURCE,
} from "./charge-deviation-limits.ts";
import { defaultChargeCoefficients } from "./default-charge-coefficients.ts";
import { virtualChargeFraction, type VirtualChargeCoefficients } from "./virtual-charge-fraction.ts";

export interface ChargeDeviationEstimate {
  chargeDeviation: ChargeDeviation | null;
  /** Why there is no estimate (null when there is one). */
  chargeDeviationNote: string | null;
}

const RECEIVER_APPLICATIONS: ReadonlySet<string> = new Set([
  "medium-temperature-refrigeration",
  "low-temperature-refrigeration",
  "process-chilling",
]);

function none(note: string): ChargeDeviationEstimate {
  return { chargeDeviation: null, chargeDeviationNote: note };
}

/** Rounds to 0.05 kg: a scale reads to 10 g, the estimate is nowhere near that. */
function roundKg(kg: number): number {
  return Math.round(kg * 20) / 20;
}

/**
 * How far the circuit's charge is from its correct charge, kg, with a range, by the virtual
 * refrigerant charge relation (`virtualChargeFraction`): against the circuit's own reference
 * point when it has one (narrow range), else against its targets with the default coefficients
 * (`defaultChargeCoefficients`, wide range). Null with the reason when the readings cannot
 * support an estimate: no correct charge, capillary (critically charged), a refrigeration or
 * process circuit (a receiver or flooded condenser holds a varying amount of liquid the
 * subcooling does not see), transcritical, no valid subcooling, or a fixed device without its
 * superheat.
 *
 * The range: with a reference point, a share of the charge plus the sensors' error on the
 * subcooling plus a share of the estimate (one point fixes the offset, not the slope); generic, a
 * wider share of the charge plus a wider share of the estimate; reaching further short when the
 * subcooling is about zero (it cannot show a larger shortage). Sized on the charge-inventory
 * model (`npm run validate:charge`, README "Charge deviation validation").
 *
 * Units: kg out, negative when short; lowKg ≤ kg ≤ highKg; never below the whole charge missing.
 * Source: `VIRTUAL_CHARGE_SOURCE`.
 *
 * @throws never
 * @example estimateChargeDeviation(snapshot).chargeDeviation // { kg: -0.45, lowKg: -0.75, highKg: -0.1, basis: "generic", … } for a 3 kg R410A TXV circuit with 7.5 m of line reading 2 K against a 6 K target (tests/engine/charge)
 */
export function estimateChargeDeviation(snapshot: DiagnosisSnapshot): ChargeDeviationEstimate {
  const input = snapshot.input;
  const chargeKg = input.chargeKg;
  if (chargeKg === undefined)
    return none(
      "Enter the circuit's correct charge (nameplate plus the line-set adjustment) for an estimate in kilograms",
    );
  if (input.meteringDevice === "capillary")
    return none(
      "No estimate for a capillary circuit: it is critically charged, a few grams move its readings, so weigh the charge in",
    );
  if (RECEIVER_APPLICATIONS.has(snapshot.application))
    return none(
      "No estimate for a refrigeration or process circuit: a receiver or flooded condenser holds liquid the subcooling does not show; charge to the sight glass or receiver level, or weigh",
    );
  if (snapshot.transcritical) return none("No estimate above the critical point: a gas cooler has no subcooling");
  const subcooling = snapshot.subcoolingK;
  if (subcooling === null || snapshot.subcoolingExcluded !== null)
    return none(
      `No estimate without a valid subcooling${snapshot.subcoolingExcluded ? ` (${snapshot.subcoolingExcluded.reason})` : ""}`,
    );
  const superheat = snapshot.superheatExcluded === null ? snapshot.superheatK : null;
  const family = snapshot.meteringFamily;
  if (family === "fixed" && superheat === null)
    return none("No estimate for a fixed metering device without a valid superheat: the charge shows in both");

  const reference = input.chargeReference;
  let referenceSubcooling: number;
  let referenceSuperheat: number | null;
  let basis: ChargeDeviation["basis"];
  if (reference) {
    referenceSubcooling = reference.subcoolingK;
    referenceSuperheat = reference.superheatK;
    basis = "unit-reference";
  } else {
    const subcoolingTarget = snapshot.subcoolingTarget;
    const superheatTarget = snapshot.superheatTarget;
    if (subcoolingTarget === null)
      return none("No estimate without a subcooling target or the circuit's reference point");
    if (family === "fixed" && superheatTarget === null)
      return none(
        `No estimate for a fixed metering device without its superheat target${snapshot.superheatTargetNote ? ` (${snapshot.superheatTargetNote})` : ""}`,
      );
    referenceSubcooling = subcoolingTarget.targetK;
    referenceSuperheat = superheatTarget?.targetK ?? null;
    basis = "generic";
  }

  const coefficients: VirtualChargeCoefficients = defaultChargeCoefficients(
    family,
    referenceSubcooling,
    chargeKg,
    input.liquidLineLengthM,
  );
  // A valve holds its superheat until it runs out of range: only the superheat above the band moves with the charge.
  let superheatDeviation = 0;
  if (superheat !== null && referenceSuperheat !== null) {
    if (family === "fixed") superheatDeviation = superheat - referenceSuperheat;
    else {
      const top = snapshot.superheatTarget?.highK ?? referenceSuperheat;
      if (superheat > top) {
        superheatDeviation = superheat - top;
        coefficients.superheatToSubcooling = VALVE_PAST_BAND_SUPERHEAT_RATIO;
      }
    }
  }
  const fraction = virtualChargeFraction(subcooling - referenceSubcooling, superheatDeviation, coefficients);
  const kg = Math.max(fraction * chargeKg, -chargeKg);

  let halfRangeKg: number;
  if (basis === "unit-reference") {
    halfRangeKg =
      REFERENCE_RANGE_SHARE * chargeKg +
      (SENSOR_SUBCOOLING_K / coefficients.kChK) * chargeKg +
      REFERENCE_SLOPE_UNCERTAINTY * Math.abs(kg);
    const outdoorNow = input.outdoorAirDryBulbC;
    const outdoorThen = reference?.outdoorAirDryBulbC;
    if (outdoorNow !== undefined && outdoorThen !== null && outdoorThen !== undefined) {
      const beyond = Math.abs(outdoorNow - outdoorThen) - REFERENCE_CONDITION_TOLERANCE_K;
      if (beyond > 0) halfRangeKg += beyond * RANGE_SHARE_PER_K_BEYOND * chargeKg;
    }
  } else {
    halfRangeKg = GENERIC_SLOPE_UNCERTAINTY * Math.abs(kg) + GENERIC_RANGE_SHARE * chargeKg;
  }
  // A saturated condenser outlet hides how much further short the charge is: reach lower.
  const extraShortKg = subcooling <= SATURATED_SUBCOOLING_K ? SATURATED_EXTRA_SHORT_SHARE * chargeKg : 0;
  const against =
    basis === "unit-reference"
      ? `the circuit's own reference point (subcooling ${formatTenths(referenceSubcooling)} K${referenceSuperheat === null ? "" : `, superheat ${formatTenths(referenceSuperheat)} K`})`
      : `its targets with default coefficients (subcooling ${formatTenths(referenceSubcooling)} K${referenceSuperheat === null || family !== "fixed" ? "" : `, superheat ${formatTenths(referenceSuperheat)} K`}): a wide range until the circuit has its own reference point`;
  return {
    chargeDeviation: {
      kg: roundKg(kg),
      lowKg: roundKg(Math.max(kg - halfRangeKg - extraShortKg, -chargeKg)),
      highKg: roundKg(kg + halfRangeKg),
      basis,
      source: `${VIRTUAL_CHARGE_SOURCE}; measured against ${against}; k_ch ${formatTenths(coefficients.kChK)} K for the whole ${formatHundredths(chargeKg)} kg charge`,
    },
    chargeDeviationNote: null,
  };
}
