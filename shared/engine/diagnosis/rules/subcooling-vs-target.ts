import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(DIAGNOSIS_SOURCES, ["S9", "S11", "S14", "S21", "S24"]);

const MESSAGES: BandedReading["messages"] = {
  low: (value, band) => `Subcooling ${value} K is below ${band} K: little liquid is held in the condenser`,
  normal: (value, band) => `Subcooling ${value} K sits in ${band} K`,
  high: (value, band) =>
    `Subcooling ${value} K is above ${band} K: liquid is backing up in the condenser (too much refrigerant, a restriction downstream) — or air in the circuit makes the gauge read high`,
};

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
    const finding = bandedFinding(
      {
        ruleId: this.id,
        reading: "subcoolingK",
        value: subcooling,
        unit: "K",
        band,
        feature: "subcooling",
        family: snapshot.meteringFamily,
        pivot: snapshot.subcoolingPivotK ?? band.targetK,
        messages: MESSAGES,
        source: SOURCE,
      },
      snapshot,
    );
    return { findings: [finding], warnings: [] };
  },
};
