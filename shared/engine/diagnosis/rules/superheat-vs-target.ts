import { cite } from "../sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule, EvidenceProfile } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

/**
 * Fixed metering devices cannot adjust, so superheat carries the charge signal: high →
 * short of charge (or restricted), low → overcharged or starved of air [S10][S17][S21].
 */
export const FIXED_SUPERHEAT_PROFILE: EvidenceProfile = {
  normal: [-1, 1, -1],
  undercharged: [-0.8, -0.3, 1],
  "restricted-metering": [-0.6, 0, 0.8],
  overcharged: [1, -0.3, -0.8],
  "low-evaporator-airflow": [0.8, 0, -0.6],
  "weak-compressor": [0.4, 0, -0.3],
};

/**
 * A TXV/EEV holds superheat, so it says little about charge; high superheat means the valve
 * is wide open and still starving (restriction or severe undercharge), low means overfeeding
 * or little load [S11][S14][S21].
 */
export const VALVE_SUPERHEAT_PROFILE: EvidenceProfile = {
  normal: [-0.5, 0.5, -0.5],
  "restricted-metering": [-0.4, 0, 0.8],
  undercharged: [-0.3, 0, 0.6],
  overcharged: [0.3, 0, -0.3],
  "low-evaporator-airflow": [0.5, 0, -0.3],
  "weak-compressor": [0.4, 0, -0.3],
};

const SOURCE = cite(["S10", "S17", "S21", "S22", "S23"]);
/** Built once rather than per warning (performance). */
const TARGET_UNAVAILABLE_SOURCE = cite(["S10", "S17", "S18", "S19"]);

const FIXED_MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Superheat ${value} K is below its target ${band} K: too much refrigerant for the load, or too little air over the evaporator`,
  normal: (value, band) => `Superheat ${value} K sits in its target ${band} K`,
  high: (value, band) => `Superheat ${value} K is above its target ${band} K: the evaporator is starved — short of charge or restricted`,
};

const VALVE_MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Superheat ${value} K is below ${band} K: the valve is overfeeding (bulb contact, low load or low airflow)`,
  normal: (value, band) => `Superheat ${value} K sits in ${band} K: the valve is controlling; subcooling carries the charge signal`,
  high: (value, band) => `Superheat ${value} K is above ${band} K: the valve cannot feed enough — restriction or a large shortage of charge`,
};

/** Superheat against its target band, weighted by metering device. */
export const superheatVsTargetRule: DiagnosisRule = {
  id: "superheat-vs-target",
  description: "Superheat (dew point at suction) against its target band; weighs heavily on fixed metering devices",
  source: SOURCE,
  evaluate(snapshot) {
    const superheat = snapshot.superheatK;
    if (superheat === null || snapshot.superheatExcluded) return NO_OUTPUT;
    const band = snapshot.superheatTarget;
    if (!band) {
      return {
        findings: [
          {
            ruleId: this.id,
            reading: "superheatK",
            value: superheat,
            unit: "K",
            direction: "not-judged",
            pointsTo: [],
            message: `Superheat ${formatTenths(superheat)} K is not judged: ${snapshot.superheatTargetNote ?? "no target"}`,
            source: SOURCE,
          },
        ],
        warnings: [
          {
            code: "fixed-orifice-target-unavailable",
            severity: "caution",
            field: "returnAirWetBulbC",
            message: snapshot.superheatTargetNote ?? "No superheat target",
            source: TARGET_UNAVAILABLE_SOURCE,
          },
        ],
      };
    }
    const fixed = snapshot.meteringFamily === "fixed";
    const finding = bandedFinding({
      ruleId: this.id,
      reading: "superheatK",
      value: superheat,
      unit: "K",
      band,
      profile: fixed ? FIXED_SUPERHEAT_PROFILE : VALVE_SUPERHEAT_PROFILE,
      messages: fixed ? FIXED_MESSAGES : VALVE_MESSAGES,
      source: `${SOURCE}; band: ${band.source}`,
    });
    return { findings: [finding], warnings: [] };
  },
};
