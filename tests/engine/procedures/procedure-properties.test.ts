import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  analyseDecay,
  annualLeakRate,
  currentImbalance,
  EVACUATION_LIMITS,
  judgeCylinderFill,
  judgeVoltageImbalance,
  KELVIN_OFFSET,
  pressureTestResult,
  refrigerantBalance,
  relativeDifference,
  voltageImbalance,
} from "@shared/engine/index";

const SEVERITY = { pass: 0, warn: 1, fail: 2 } as const;
const volts = fc.double({ min: 1, max: 15_000, noNaN: true });
const threePhase = fc.tuple(volts, volts, volts);

describe("procedure properties", () => {
  it("imbalance is 0 for equal phases (NEMA MG-1 definition)", () => {
    fc.assert(fc.property(volts, (v) => voltageImbalance([v, v, v]) === 0));
  });

  it("imbalance is scale-invariant: a 230 V and a 400 V supply with the same proportions read the same", () => {
    fc.assert(
      fc.property(threePhase, fc.double({ min: 1e-3, max: 1e3, noNaN: true }), ([a, b, c], scale) => {
        const base = voltageImbalance([a, b, c]);
        const scaled = voltageImbalance([a * scale, b * scale, c * scale]);
        return Math.abs(scaled - base) <= 1e-9 * Math.max(1, base);
      }),
    );
  });

  it("imbalance does not depend on which phase is which, and the current formula is the same", () => {
    fc.assert(
      fc.property(threePhase, ([a, b, c]) => {
        const base = voltageImbalance([a, b, c]);
        return [
          voltageImbalance([b, c, a]),
          voltageImbalance([c, a, b]),
          voltageImbalance([b, a, c]),
          currentImbalance([a, b, c]),
        ].every((other) => Math.abs(other - base) <= 1e-9 * Math.max(1, base));
      }),
    );
  });

  it("imbalance of three phases lies between 0 and 200 % (one phase carrying everything)", () => {
    fc.assert(
      fc.property(fc.tuple(fc.double({ min: 0, max: 1e4, noNaN: true }), volts, volts), (phases) => {
        const percent = voltageImbalance(phases);
        return percent >= 0 && percent <= 200 + 1e-9;
      }),
    );
  });

  it("the voltage-imbalance verdict never improves as the imbalance grows", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 50, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), (x, y) => {
        const [low, high] = x <= y ? [x, y] : [y, x];
        return SEVERITY[judgeVoltageImbalance(low).verdict] <= SEVERITY[judgeVoltageImbalance(high).verdict];
      }),
    );
  });

  it("the pressure correction is exact when nothing leaks (Charles's law at fixed volume [S65])", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 5000, noNaN: true }),
        fc.double({ min: -20, max: 50, noNaN: true }),
        fc.double({ min: -20, max: 50, noNaN: true }),
        fc.double({ min: 60, max: 110, noNaN: true }),
        (startGaugeKPa, startTempC, endTempC, atmosphericPressureKPa) => {
          // Independent statement of the law: p/T constant on the absolute scales.
          const endAbs =
            ((startGaugeKPa + atmosphericPressureKPa) / (startTempC + KELVIN_OFFSET)) * (endTempC + KELVIN_OFFSET);
          const result = pressureTestResult({
            startGaugeKPa,
            startTempC,
            endGaugeKPa: Math.max(0, endAbs - atmosphericPressureKPa),
            endTempC,
            allowedDropKPa: 1e-6,
            atmosphericPressureKPa,
          });
          if (endAbs - atmosphericPressureKPa < 0) return true;
          return Math.abs(result.correctedDropKPa) <= 1e-9 * endAbs && result.pass;
        },
      ),
    );
  });

  it("a lower end reading never turns a failed hold into a pass", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 4000, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (start, lost, allowed) => {
          const base = { startGaugeKPa: start, startTempC: 20, endTempC: 22, allowedDropKPa: allowed };
          const better = pressureTestResult({ ...base, endGaugeKPa: start });
          const worse = pressureTestResult({ ...base, endGaugeKPa: Math.max(0, start - lost) });
          return worse.correctedDropKPa >= better.correctedDropKPa && (!better.pass ? !worse.pass : true);
        },
      ),
    );
  });

  const decaySamples = fc
    .array(fc.tuple(fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 0, max: 20_000, noNaN: true })), {
      minLength: 2,
      maxLength: 15,
    })
    .map((steps) => {
      let minutes = 0;
      return steps.map(([gap, microns]) => ({ minutes: (minutes += gap), microns }));
    });

  it("the decay verdict is never 'held' when the final reading is above the hold limit", () => {
    fc.assert(
      fc.property(decaySamples, fc.double({ min: 100, max: 2000, noNaN: true }), (samples, holdMicrons) => {
        const result = analyseDecay(samples, { holdMicrons });
        return !(result.finalMicrons > holdMicrons && result.verdict === "held");
      }),
    );
  });

  it("the decay verdict is 'held' exactly when every reading stays at or under the hold limit", () => {
    fc.assert(
      fc.property(decaySamples, (samples) => {
        const held = samples.every((sample) => sample.microns <= EVACUATION_LIMITS.targetMicrons);
        return (analyseDecay(samples).verdict === "held") === held;
      }),
    );
  });

  it("a decay test ending above the 5000-micron leak threshold is always a leak [S54]", () => {
    fc.assert(
      fc.property(decaySamples, (samples) => {
        const result = analyseDecay(samples);
        return result.finalMicrons <= EVACUATION_LIMITS.leakRiseMicrons || result.verdict === "leak";
      }),
    );
  });

  it("a straight-line rise above the hold limit is never read as moisture (a leak into vacuum rises at a constant rate)", () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 500, noNaN: true }), fc.integer({ min: 3, max: 12 }), (rate, count) => {
        const samples = Array.from({ length: count }, (_, i) => ({ minutes: 2 * i, microns: 600 + rate * 2 * i }));
        return analyseDecay(samples).verdict === "leak";
      }),
    );
  });

  it("the cylinder verdict never improves as the contents grow", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (x, y, maxContentsKg) => {
          const [low, high] = x <= y ? [x, y] : [y, x];
          return (
            SEVERITY[judgeCylinderFill({ contentsKg: low, maxContentsKg }).verdict] <=
            SEVERITY[judgeCylinderFill({ contentsKg: high, maxContentsKg }).verdict]
          );
        },
      ),
    );
  });

  it("the refrigerant balance closes: recovered + shortfall = nameplate, final − difference = nameplate", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (nameplateKg, recoveredKg, addedKg, reusedShare) => {
          const result = refrigerantBalance({ nameplateKg, recoveredKg, addedKg, reusedKg: recoveredKg * reusedShare });
          return (
            relativeDifference(result.shortfallKg + recoveredKg, nameplateKg) < 1e-9 &&
            relativeDifference(result.finalChargeKg - result.differenceFromNameplateKg, nameplateKg) < 1e-9
          );
        },
      ),
    );
  });

  it("the leak rate as a percentage halves when the charge doubles, and the kg rate does not change", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.integer({ min: 1, max: 3000 }),
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        (addedKg, days, nameplateKg) => {
          const events = [
            { date: "2024-01-01", addedKg: 1 },
            { date: new Date(Date.UTC(2024, 0, 1 + days)).toISOString().slice(0, 10), addedKg },
          ];
          const single = annualLeakRate(events, nameplateKg);
          const double = annualLeakRate(events, 2 * nameplateKg);
          return (
            single.kgPerYear === double.kgPerYear &&
            Math.abs(single.percentOfChargePerYear - 2 * double.percentOfChargePerYear) <=
              1e-9 * Math.max(1, single.percentOfChargePerYear)
          );
        },
      ),
    );
  });

  it("never mutates its inputs", () => {
    const samples = Object.freeze([
      Object.freeze({ minutes: 0, microns: 300 }),
      Object.freeze({ minutes: 5, microns: 700 }),
      Object.freeze({ minutes: 10, microns: 800 }),
    ]);
    expect(() => analyseDecay(samples, Object.freeze({ holdMicrons: 500 }))).not.toThrow();
    expect(() => voltageImbalance(Object.freeze([400, 410, 395]) as unknown as [number, number, number])).not.toThrow();
  });
});
