/**
 * Procedures engine benchmark: µs per call of the checks a visit stores on every save
 * (imbalance and its verdict, insulation, pressure-test correction, a 30-reading decay
 * analysis, cylinder fill limit with its property lookup). No target: these run once per
 * saved record; figures only, to notice a regression.
 */
import {
  analyseDecay,
  cylinderFillLimit,
  judgeInsulationResistance,
  judgeVoltageImbalance,
  pressureTestResult,
  voltageImbalance,
} from "../shared/engine/index.ts";
import { nanosecondsPerCall, registerBench } from "./bench-registry.ts";

const ITERATIONS = 100_000;

function report(label: string, nanoseconds: number): void {
  console.log(`${label.padEnd(52)} ${(nanoseconds / 1000).toFixed(3).padStart(7)} µs`);
}

registerBench("procedures", () => {
  const decay = Array.from({ length: 30 }, (_, i) => ({ minutes: i, microns: 300 + 1200 * (1 - Math.exp(-i / 5)) }));
  report(
    "voltageImbalance + judgeVoltageImbalance",
    nanosecondsPerCall(
      (i) => (judgeVoltageImbalance(voltageImbalance([400 + (i % 7), 405, 398])).verdict === "pass" ? 1 : 0),
      ITERATIONS,
    ),
  );
  report(
    "judgeInsulationResistance",
    nanosecondsPerCall(
      (i) => judgeInsulationResistance({ megohms: 1 + (i % 5), testVoltageV: 500, kind: "compressor" }).minimumMegohms,
      ITERATIONS,
    ),
  );
  report(
    "pressureTestResult",
    nanosecondsPerCall(
      (i) =>
        pressureTestResult({
          startGaugeKPa: 3800,
          startTempC: 27,
          endGaugeKPa: 3730 - (i % 10),
          endTempC: 20,
          allowedDropKPa: 0,
        }).correctedDropKPa,
      ITERATIONS,
    ),
  );
  report(
    "analyseDecay, 30 readings",
    nanosecondsPerCall(
      (i) => analyseDecay(decay, { holdMicrons: 500 + (i % 3) }).riseRateMicronsPerMinute,
      ITERATIONS / 4,
    ),
  );
  report(
    "cylinderFillLimit (R410A at 54 °C)",
    nanosecondsPerCall(
      (i) => cylinderFillLimit({ waterCapacityKg: 11 + (i % 3), refrigerant: "R410A" }).maxContentsKg,
      ITERATIONS / 4,
    ),
  );
});
