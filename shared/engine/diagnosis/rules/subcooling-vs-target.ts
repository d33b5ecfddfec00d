import { cite } from "../sources.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/** TXV/EEV: charged to subcooling, so subcooling carries the charge signal [S9][S11][S14]. */
export const VALVE_SUBCOOLING_PROFILE: EvidenceProfile = {
  normal: [-1, 1, -1],
  undercharged: [1.2, -0.3, -1],
  overcharged: [-1, -0.3, 1.2],
  "restricted-metering": [-0.8, 0, 0.6],
  "condenser-airflow": [0.4, 0, -0.3],
  "weak-compressor": [0, 0, 0.3],
  "non-condensables": [0, 0, 0.3],
};

/**
 * Fixed devices: subcooling still shows the liquid stored in the condenser but is secondary
 * to superheat; low subcooling with high superheat is undercharge, normal/high subcooling with
 * high superheat is a restriction [S21][S24][S25].
 */
export const FIXED_SUBCOOLING_PROFILE: EvidenceProfile = {
  normal: [-0.5, 0.5, -0.5],
  undercharged: [0.7, 0, -0.7],
  overcharged: [-0.7, 0, 0.7],
  "restricted-metering": [-0.8, 0, 0.5],
  "condenser-airflow": [0.4, 0, -0.3],
  "weak-compressor": [0, 0, 0.3],
  "non-condensables": [0, 0, 0.3],
};

const SOURCE = cite(["S9", "S11", "S14", "S21", "S24"]);

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Subcooling ${value} K is below ${band} K: little liquid is held in the condenser — short of charge, or the condenser is not condensing`,
  normal: (value, band) => `Subcooling ${value} K sits in ${band} K`,
  high: (value, band) => `Subcooling ${value} K is above ${band} K: liquid is backing up in the condenser — overcharged or restricted downstream`,
};

/** Subcooling (bubble point at liquid pressure) against its target band, weighted by metering device. */
export const subcoolingVsTargetRule: DiagnosisRule = {
  id: "subcooling-vs-target",
  description: "Subcooling (bubble point at liquid pressure) against its target band; the charge signal on TXV/EEV",
  source: SOURCE,
  evaluate(snapshot) {
    const band = snapshot.subcoolingTarget;
    if (snapshot.subcoolingExcluded) {
      return {
        findings: [
          {
            ruleId: this.id,
            reading: "liquidLineTempC",
            value: snapshot.input.liquidLineTempC,
            unit: "°C",
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
    const valve = snapshot.meteringFamily === "expansion-valve";
    const finding = bandedFinding({
      ruleId: this.id,
      reading: "subcoolingK",
      value: subcooling,
      unit: "K",
      band,
      profile: valve ? VALVE_SUBCOOLING_PROFILE : FIXED_SUBCOOLING_PROFILE,
      messages: MESSAGES,
      source: `${SOURCE}; band: ${band.source}`,
    });
    return { findings: [finding], warnings: [] };
  },
};
