import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { TargetBand } from "../../../schemas/diagnosis.ts";
import { SENSOR_TOLERANCE_K, type Band } from "../diagnosis-limits.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule, DiagnosisSnapshot } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(DIAGNOSIS_SOURCES, ["S9", "S11", "S14", "S21", "S24"]);

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Subcooling ${value} K is below ${band} K: little liquid is held in the condenser`,
  normal: (value, band) => `Subcooling ${value} K sits in ${band} K`,
  high: (value, band) =>
    `Subcooling ${value} K is above ${band} K: liquid is backing up in the condenser (too much refrigerant, a restriction downstream) — or air in the circuit makes the gauge read high`,
};

const REACH_SOURCE = `${SOURCE}; ${cite(DIAGNOSIS_SOURCES, ["S26", "S34"])}`;

const REACH_MESSAGES: BandedReading["messages"] = {
  low: (value, band, snapshot) =>
    `Subcooling ${value} K is below even ${band} K, all the condenser can give with condensing ${formatTenths(reach(snapshot))} K over the outdoor air: little liquid is held in the condenser`,
  normal: (value, band, snapshot) =>
    `Subcooling ${value} K is short of its target, but the liquid already leaves at the outdoor air: with condensing only ${formatTenths(reach(snapshot))} K over it, the condenser cannot give more (${band} K), so this says nothing about the charge`,
  high: MESSAGES.high,
};

/** Condensing (bubble point) over the outdoor air, K: the most subcooling an air-cooled condenser can give. */
function reach(snapshot: DiagnosisSnapshot): number {
  return (snapshot.subcoolingK ?? 0) + (snapshot.condenserApproachK ?? 0);
}

/**
 * The target band, lowered to what the condenser can reach. Its liquid cannot leave colder than
 * the air crossing it (TRADE.md §3, approach [S26][S34]), so subcooling is at most condensing
 * (bubble) minus outdoor air. When the head has fallen near ambient (a compressor that no longer
 * pumps) that can be less than the target: subcooling short of a target it could never reach is
 * not a shortage of liquid. Liquid within `SENSOR_TOLERANCE_K` of the air counts as at the air.
 * A real shortage keeps its liquid well above the air (a large approach), so it still reads low
 * against the lowered band; and with the superheat high the band stands, since the subcooling
 * then separates a shortage from a restriction. Null: the band stands.
 */
function reachableBand(snapshot: DiagnosisSnapshot, band: TargetBand): Band | null {
  if (snapshot.condenserApproachK === null || snapshot.subcoolingK === null) return null;
  if (snapshot.subcoolingK >= band.lowK) return null;
  // With the superheat high the subcooling is what tells a shortage from a restriction
  // [S24][S25]; a starved coil with the head near ambient is a shortage's picture too.
  const superheat = snapshot.superheatExcluded === null ? snapshot.superheatK : null;
  if (superheat !== null && snapshot.superheatTarget !== null && superheat > snapshot.superheatTarget.highK)
    return null;
  const most = reach(snapshot);
  // Condensing below the outdoor air is a wrong reading (or not an air-cooled condenser), not a limit.
  if (most <= 0) return null;
  // Liquid within the sensors' tolerance of the air is as cold as the condenser gets it.
  const floor = Math.max(0, most - SENSOR_TOLERANCE_K);
  if (floor >= band.lowK) return null;
  const drop = band.lowK - floor;
  return { lowK: floor, highK: band.highK - drop };
}

/** Subcooling (bubble point at liquid pressure) against its target band; the charge signal of TXV/EEV circuits. */
export const subcoolingVsTargetRule: DiagnosisRule = {
  id: "subcooling-vs-target",
  description: "Subcooling (bubble point at liquid pressure) against its target band; the charge signal on TXV/EEV",
  source: SOURCE,
  evaluate(snapshot) {
    const band = snapshot.subcoolingTarget;
    if (snapshot.subcoolingExcluded) {
      const field = snapshot.subcoolingExcluded.field;
      return {
        findings: [
          {
            ruleId: this.id,
            reading: field,
            value: field === "liquidPressureKPa" ? snapshot.input.liquidPressureKPa : snapshot.input.liquidLineTempC,
            unit: field === "liquidPressureKPa" ? "kPa" : "°C",
            direction: "excluded",
            pointsTo: [],
            message: `Subcooling is not used: ${snapshot.subcoolingExcluded.reason}`,
            source: SOURCE,
          },
        ],
        warnings: [],
      };
    }
    const subcooling = snapshot.subcoolingK;
    if (subcooling === null || band === null) return NO_OUTPUT;
    const pivot = snapshot.subcoolingPivotK ?? band.targetK;
    const reachable = reachableBand(snapshot, band);
    const finding = bandedFinding(
      {
        ruleId: this.id,
        reading: "subcoolingK",
        value: subcooling,
        unit: "K",
        band: reachable ?? band,
        feature: "subcooling",
        family: snapshot.meteringFamily,
        // The pivot moves down with the band it belongs to.
        pivot: reachable === null ? pivot : pivot - (band.lowK - reachable.lowK),
        messages: reachable === null ? MESSAGES : REACH_MESSAGES,
        source: reachable === null ? SOURCE : REACH_SOURCE,
      },
      snapshot,
    );
    return { findings: [finding], warnings: [] };
  },
};
