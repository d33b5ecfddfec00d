import { cite } from "../sources.ts";
import type { DiagnosisRule } from "../types.ts";
import { bandedFinding } from "./banded-finding.ts";
import { NO_OUTPUT } from "./no-output.ts";

const SOURCE = cite(["S33", "S21"]);

/** Temperature split across the evaporator (return − supply) against its expected value. */
export const temperatureSplitRule: DiagnosisRule = {
  id: "temperature-split",
  description: "Return minus supply across the evaporator against its target: from the return dry and wet bulb for comfort cooling, else the application's band",
  source: SOURCE,
  evaluate(snapshot) {
    const split = snapshot.temperatureSplitK;
    const band = snapshot.temperatureSplitTarget;
    // A negative split is another problem (heating mode, swapped probes): the supply-air rule says so.
    if (split === null || split < 0 || band === null) return NO_OUTPUT;
    const fluid = snapshot.application === "process-chilling";
    const what = fluid ? "Fluid range" : "Air split";
    return {
      findings: [
        bandedFinding({
          ruleId: this.id,
          reading: "temperatureSplitK",
          value: split,
          unit: "K",
          band,
          feature: "temperatureSplit",
          family: snapshot.meteringFamily,
          messages: {
            low: (value, text) => `${what} ${value} K is below its target ${text} K: the coil is doing little cooling${fluid ? "" : " (humid air also lowers the split)"}`,
            normal: (value, text) => `${what} ${value} K sits in its target ${text} K`,
            high: (value, text) => `${what} ${value} K is above its target ${text} K: too little ${fluid ? "flow" : "air"} over the evaporator — ${fluid ? "pump, strainer or valves" : "filter, coil or fan"}`,
          },
          source: `${SOURCE}; target: ${band.source}`,
        }),
      ],
      warnings: [],
    };
  },
};
