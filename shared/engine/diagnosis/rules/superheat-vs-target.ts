import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import { formatTenths } from "../format-tenths.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(DIAGNOSIS_SOURCES, ["S10", "S17", "S21", "S22", "S23"]);
/** Built once rather than per warning (performance). */
const TARGET_UNAVAILABLE_SOURCE = cite(DIAGNOSIS_SOURCES, ["S10", "S17", "S18", "S19"]);

const FIXED_MESSAGES: BandedReading["messages"] = {
  low: (value, band) =>
    `Superheat ${value} K is below its target ${band} K: the coil is flooding — too much refrigerant, too little air, or an oversized orifice`,
  normal: (value, band) => `Superheat ${value} K sits in its target ${band} K`,
  high: (value, band) =>
    `Superheat ${value} K is above its target ${band} K: the evaporator is starved — short of charge or restricted`,
};

const VALVE_MESSAGES: BandedReading["messages"] = {
  low: (value, band) =>
    `Superheat ${value} K is below ${band} K: the valve is overfeeding (bulb contact or position, stuck open) or the coil has little load`,
  normal: (value, band) =>
    `Superheat ${value} K sits in ${band} K: the valve is controlling; subcooling carries the charge signal`,
  high: (value, band) =>
    `Superheat ${value} K is above ${band} K: the valve is wide open and still starving the coil — short of charge or restricted`,
};

/** Superheat against its target band; the charge signal of fixed metering devices. */
export const superheatVsTargetRule: DiagnosisRule = {
  id: "superheat-vs-target",
  description: "Superheat (dew point at suction) against its target band; the charge signal of fixed metering devices",
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
    const finding = bandedFinding(
      {
        ruleId: this.id,
        reading: "superheatK",
        value: superheat,
        unit: "K",
        band,
        feature: "superheat",
        family: snapshot.meteringFamily,
        messages: fixed ? FIXED_MESSAGES : VALVE_MESSAGES,
        source: SOURCE,
      },
      snapshot,
    );
    return { findings: [finding], warnings: [] };
  },
};
