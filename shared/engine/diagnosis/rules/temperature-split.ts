import { cite } from "../../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../../sources/diagnosis-sources.ts";
import type { DiagnosisRule, DiagnosisSnapshot } from "../types.ts";
import { bandedFinding, type BandedReading } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(DIAGNOSIS_SOURCES, ["S33", "S21"]);

/** Temperature split across the evaporator (return − supply) against its expected value. */
const fluidOf = (snapshot: DiagnosisSnapshot) => snapshot.application === "process-chilling";
const what = (snapshot: DiagnosisSnapshot) => (fluidOf(snapshot) ? "Fluid range" : "Air split");

const MESSAGES: BandedReading["messages"] = {
  low: (value, text, snapshot) =>
    `${what(snapshot)} ${value} K is below its target ${text} K: the coil is doing little cooling${fluidOf(snapshot) ? "" : " (humid air also lowers the split)"}`,
  normal: (value, text, snapshot) => `${what(snapshot)} ${value} K sits in its target ${text} K`,
  high: (value, text, snapshot) =>
    `${what(snapshot)} ${value} K is above its target ${text} K: too little ${fluidOf(snapshot) ? "flow" : "air"} over the evaporator — ${fluidOf(snapshot) ? "pump, strainer or valves" : "filter, coil or fan"}`,
};

export const temperatureSplitRule: DiagnosisRule = {
  id: "temperature-split",
  description:
    "Return minus supply across the evaporator against its target: from the return dry and wet bulb for comfort cooling, else the application's band",
  source: SOURCE,
  evaluate(snapshot) {
    const split = snapshot.temperatureSplitK;
    const band = snapshot.temperatureSplitTarget;
    // A negative split is another problem (heating mode, swapped probes): the supply-air rule says so.
    if (split === null || split < 0 || band === null) return NO_OUTPUT;
    return {
      findings: [
        bandedFinding(
          {
            ruleId: this.id,
            reading: "temperatureSplitK",
            value: split,
            unit: "K",
            band,
            feature: "temperatureSplit",
            family: snapshot.meteringFamily,
            messages: MESSAGES,
            source: SOURCE,
          },
          snapshot,
        ),
      ],
      warnings: [],
    };
  },
};
