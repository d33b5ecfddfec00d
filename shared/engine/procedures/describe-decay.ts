import type { DecayWording, VacuumUnit } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { micronsToPa } from "./microns-to-pa.ts";

/**
 * Words a decay-test verdict in the unit the technician reads the gauge in (microns or
 * pascals), from the figures analyseDecay kept. The sentence says "rose above" the hold limit
 * only when the pull-down had reached it; a pull-down that never got there is said so.
 * 1 micron = 1 mTorr = 0.133322 Pa [S60].
 *
 * @param wording the figures from analyseDecay(...).wording
 * @param unit "micron" (default) or "Pa"
 * @returns the reason sentence, e.g. "Held: stayed at or under 500 microns for 20.0 min (final 455 microns); tight and dry."
 * @throws never
 * @example describeDecay(analyseDecay(samples).wording!, "Pa") // "Held: stayed at or under 66.7 Pa for …"
 */
export function describeDecay(wording: DecayWording, unit: VacuumUnit = "micron"): string {
  const { holdMicrons, leakRiseMicrons, startMicrons, finalMicrons, minutes } = wording;
  // Microns are whole numbers on a gauge; pascals need a tenth (500 µm is 66.7 Pa).
  const bare = (microns: number) =>
    unit === "micron" ? String(Math.round(microns)) : formatTenths(micronsToPa(microns));
  const unitWord = unit === "micron" ? "microns" : "Pa";
  const value = (microns: number) => `${bare(microns)} ${unitWord}`;
  const rateValue =
    unit === "micron" ? wording.riseRateMicronsPerMinute : micronsToPa(wording.riseRateMicronsPerMinute);
  const rate = `${formatTenths(rateValue)} ${unit === "micron" ? "µm" : "Pa"}/min`;
  const span = `${formatTenths(minutes)} min`;
  const short =
    wording.shortOfMinutes !== null
      ? ` The test lasted only ${span}; makers ask for ${wording.shortOfMinutes}–20 minutes.`
      : "";

  switch (wording.case) {
    case "held":
      return `Held: stayed at or under ${value(holdMicrons)} for ${span} (final ${value(finalMicrons)}); tight and dry.${short}`;
    case "leak-past-threshold":
      return `Leak: rose to ${value(finalMicrons)}, past ${value(leakRiseMicrons)}, in ${span} (still rising ${rate}); find the leak and pressure test again.${short}`;
    case "moisture-never-reached":
    case "moisture-rose":
    case "moisture-stayed-above": {
      const what =
        wording.case === "moisture-never-reached"
          ? `started at ${value(startMicrons)} (the pull-down never reached ${value(holdMicrons)}) and ${wording.risen ? "levelled off" : "stayed"} at ${value(finalMicrons)}`
          : wording.case === "moisture-rose"
            ? `rose above ${value(holdMicrons)} and levelled off at ${value(finalMicrons)}`
            : `stayed above ${value(holdMicrons)} without rising (${value(finalMicrons)})`;
      return `Moisture: ${what} within ${span}; the system looks tight but wet: evacuate longer (triple evacuate, warm cold spots).${short}`;
    }
    case "leak-still-rising": {
      const why = wording.twoReadingsOnly
        ? "; with only two readings a levelling-off cannot be seen, so take more readings"
        : "";
      return `Leak: still rising at ${rate} after ${span} (final ${value(finalMicrons)}) without levelling off${why}; find the leak and pressure test again.${short}`;
    }
  }
}
