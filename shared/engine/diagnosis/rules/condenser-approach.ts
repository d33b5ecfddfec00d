import { SENSOR_TOLERANCE_K } from "../diagnosis-limits.ts";
import { formatTenths } from "../format-tenths.ts";
import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { TargetBand } from "../../../schemas/diagnosis.ts";
import type { DiagnosisRule, DiagnosisSnapshot, RuleOutput } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(DIAGNOSIS_SOURCES, ["S26", "S34"]);

/**
 * Liquid line minus the outdoor air entering the condenser: how close the condenser brings its
 * liquid to the air cooling it. High: the condenser cannot reject heat (dirty coil, slow fan, hot
 * air recirculating); low: a condenser full of liquid (overcharge); below zero only a pressure
 * drop upstream of the probe (restriction) or a wrong probe can do it.
 */
const MESSAGES: BandedReading["messages"] = {
  low: (value, text) =>
    `Liquid leaves the condenser only ${value} K above the outdoor air (expected ${text} K): the condenser is full of liquid`,
  normal: (value, text) => `Liquid leaves the condenser ${value} K above the outdoor air (expected ${text} K)`,
  high: (value, text) =>
    `Liquid leaves the condenser ${value} K above the outdoor air (expected ${text} K): the condenser is not rejecting its heat — coil, fan or air recirculating`,
};

/**
 * The expected approach, its upper side raised by any subcooling shortfall and its lower side
 * dropped. Approach ≈ condensing over ambient − subcooling, so a liquid line with too little
 * subcooling reads a high approach from a condenser that rejects its heat well; that shortfall is
 * the subcooling rule's evidence (undercharge, restriction), not the condenser's. Only a high
 * approach the short subcooling does not explain points at the condenser. Subcooling above target
 * is left alone: a high computed subcooling with a high approach is what tells air in the system
 * from a dirty coil.
 */
function expectedApproach(snapshot: DiagnosisSnapshot): TargetBand {
  const band = snapshot.condenserApproachTarget;
  const target = snapshot.subcoolingTarget;
  const subcooling = snapshot.subcoolingK;
  if (target === null || subcooling === null || snapshot.subcoolingExcluded !== null) return band;
  const shortfall = target.lowK - subcooling;
  if (shortfall <= 0) return band;
  // A condenser short of subcooling holds no liquid to spare, so a small approach there says the
  // head is near the air (a compressor that no longer pumps, a light load), not that it is full.
  return { ...band, lowK: 0, highK: band.highK + shortfall, targetK: band.targetK + shortfall };
}

export const condenserApproachRule: DiagnosisRule = {
  id: "condenser-approach",
  description:
    "Liquid line minus outdoor air against the application's band: high when the condenser cannot reject heat, low when it is full of liquid",
  source: SOURCE,
  evaluate(snapshot) {
    const approach = snapshot.condenserApproachK;
    if (approach === null) return NO_OUTPUT;
    if (approach < -SENSOR_TOLERANCE_K) return colderThanTheAir(snapshot, approach);
    const band = expectedApproach(snapshot);
    const finding = bandedFinding(
      {
        ruleId: this.id,
        reading: "condenserApproachK",
        value: approach,
        unit: "K",
        band,
        feature: "condenserApproach",
        family: snapshot.meteringFamily,
        pivot: band.targetK,
        messages: MESSAGES,
        source: SOURCE,
      },
      snapshot,
    );
    return { findings: [finding], warnings: [] };
  },
};

/**
 * Liquid colder than the air cooling it, beyond the probes' tolerance: no condenser does that, so
 * the figure is not judged and gives no state any weight (read as "low" it would count for an
 * overcharge). A probe is wrong, or the liquid flashed through a restriction before its probe.
 */
function colderThanTheAir(snapshot: DiagnosisSnapshot, approach: number): RuleOutput {
  return {
    findings: [
      {
        ruleId: condenserApproachRule.id,
        reading: "condenserApproachK",
        value: approach,
        unit: "K",
        direction: "not-judged",
        pointsTo: [],
        message: `Condenser approach ${formatTenths(approach)} K is not judged: no condenser cools its liquid below the air cooling it`,
        source: SOURCE,
      },
    ],
    warnings: [
      {
        code: "liquid-colder-than-outdoor-air",
        severity: "caution",
        field: "liquidLineTempC",
        message: `Liquid line ${formatTenths(snapshot.input.liquidLineTempC)} °C is colder than the outdoor air ${formatTenths(snapshot.input.outdoorAirDryBulbC ?? Number.NaN)} °C: only a pressure drop (restriction) before the probe can do that — check the probe, then look for a cold spot or sweat before it`,
        source: SOURCE,
      },
    ],
  };
}
