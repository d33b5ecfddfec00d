import { describe, expect, it } from "vitest";
import {
  currentImbalance,
  judgeInsulationResistance,
  judgeSupplyVoltage,
  judgeVoltageImbalance,
  runningCurrent,
  voltageImbalance,
  windingBalance,
} from "@shared/engine/index";

describe("voltageImbalance", () => {
  it("gives 1.96 % for 460/467/450 V: mean 459 V, largest deviation 9 V (NEMA MG-1 definition [S43][S44]; the example usually quoted with it, memory)", () => {
    // By hand: (460 + 467 + 450) / 3 = 459; |450 − 459| = 9; 100 × 9 / 459 = 1.9608 %.
    expect(voltageImbalance(Object.freeze([460, 467, 450]) as [number, number, number])).toBeCloseTo(1.9608, 4);
  });

  it("gives 2.2 % for 221/230/227 V, just over the makers' 2 % (equipment-maker worked example style [S41]; figures from memory, checked by hand)", () => {
    // Mean 226 V; largest deviation 5 V (221); 100 × 5 / 226 = 2.212 %.
    const percent = voltageImbalance([221, 230, 227]);
    expect(percent).toBeCloseTo(2.2124, 4);
    expect(judgeVoltageImbalance(percent).verdict).toBe("warn");
  });

  it("is 0 for three equal voltages and 100 % for a lost phase (400/400/0 V: mean 266.7, deviation 266.7)", () => {
    expect(voltageImbalance([400, 400, 400])).toBe(0);
    expect(voltageImbalance([400, 400, 0])).toBeCloseTo(100, 10);
  });

  it("refuses negative, non-finite or all-zero voltages", () => {
    expect(() => voltageImbalance([400, -1, 400])).toThrow(/voltageImbalance requires/);
    expect(() => voltageImbalance([400, Number.NaN, 400])).toThrow(/voltageImbalance requires/);
    expect(() => voltageImbalance([0, 0, 0])).toThrow(/voltageImbalance requires/);
  });
});

describe("currentImbalance", () => {
  it("uses the same formula on amps: 10/11/9 A → 10 %, the compressor maker's maximum [S45]", () => {
    expect(currentImbalance([10, 11, 9])).toBeCloseTo(10, 10);
  });
});

describe("judgeVoltageImbalance", () => {
  it("passes up to 2 % (HVAC makers [S41][S42]), noting NEMA MG-1's 1 % above 1 %", () => {
    expect(judgeVoltageImbalance(0.5)).toMatchObject({ verdict: "pass" });
    const between = judgeVoltageImbalance(1.96);
    expect(between.verdict).toBe("pass");
    expect(between.reason).toMatch(/NEMA MG-1 recommends 1 %/);
    expect(judgeVoltageImbalance(2)).toMatchObject({ verdict: "pass" });
  });

  it("warns above 2 % and fails above 5 % (NEMA MG-1: no operation above 5 % [S43][S44])", () => {
    expect(judgeVoltageImbalance(2.01).verdict).toBe("warn");
    expect(judgeVoltageImbalance(5).verdict).toBe("warn");
    expect(judgeVoltageImbalance(5.01).verdict).toBe("fail");
  });

  it("names the sources by title, never the research notes' file", () => {
    const { source } = judgeVoltageImbalance(1);
    expect(source).toMatch(/\[S41\] Trane/);
    expect(source).toMatch(/NEMA MG-1/);
    expect(source).not.toMatch(/TRADE/);
  });

  it("applies an organisation's own limit and says so", () => {
    const verdict = judgeVoltageImbalance(1.5, { passUpToPercent: 1 });
    expect(verdict.verdict).toBe("warn");
    expect(verdict.source).toMatch(/^limit set by the organisation/);
  });
});

describe("judgeSupplyVoltage", () => {
  it("passes within ±10 % of the nameplate and fails outside [S40]", () => {
    const within = judgeSupplyVoltage({ measuredV: [410, 398, 405], nameplateV: 400 });
    expect(within.verdict).toBe("pass");
    expect(within.deviationPercent).toEqual([2.5, -0.5, 1.25]);
    expect(judgeSupplyVoltage({ measuredV: [440], nameplateV: 400 }).verdict).toBe("pass");
    const low = judgeSupplyVoltage({ measuredV: [230, 205], nameplateV: 230 });
    expect(low.verdict).toBe("fail");
    expect(low.reason).toMatch(/10\.9 % below/);
  });
});

describe("judgeInsulationResistance", () => {
  it("wiring: 1 MΩ at 500 V d.c. is the AS/NZS 3000 minimum ([S47] weak; 500 V memory)", () => {
    expect(judgeInsulationResistance({ megohms: 1, testVoltageV: 500, kind: "wiring" })).toMatchObject({
      verdict: "pass",
      minimumMegohms: 1,
    });
    expect(judgeInsulationResistance({ megohms: 0.99, testVoltageV: 500, kind: "wiring" }).verdict).toBe("fail");
  });

  it("wiring: a good reading at a lower test voltage is a warning to re-test at 500 V", () => {
    const verdict = judgeInsulationResistance({ megohms: 50, testVoltageV: 250, kind: "wiring" });
    expect(verdict.verdict).toBe("warn");
    expect(verdict.reason).toMatch(/re-test at 500 V/);
  });

  it("hermetic compressor: 2 MΩ and above passes; below 2 MΩ warns (one maker's ground-fault line [S48])", () => {
    expect(judgeInsulationResistance({ megohms: 2, testVoltageV: 500, kind: "compressor" })).toMatchObject({
      verdict: "pass",
      minimumMegohms: 2,
    });
    const low = judgeInsulationResistance({ megohms: 1.9, testVoltageV: 500, kind: "compressor" });
    expect(low.verdict).toBe("warn");
    expect(low.reason).toMatch(/crankcase heater/);
  });

  it("scroll compressor: 0.5 MΩ is still acceptable to the scroll maker [S49] (warn), below it fails", () => {
    expect(judgeInsulationResistance({ megohms: 0.5, testVoltageV: 500, kind: "compressor" }).verdict).toBe("warn");
    expect(judgeInsulationResistance({ megohms: 0.49, testVoltageV: 500, kind: "compressor" }).verdict).toBe("fail");
  });

  it("motor: below 1 MΩ fails [S47]; 1 up to 5 MΩ warns (IEEE 43 random-wound 5 MΩ, memory); 0 MΩ is judged, not refused", () => {
    expect(judgeInsulationResistance({ megohms: 0, testVoltageV: 500, kind: "motor" }).verdict).toBe("fail");
    expect(judgeInsulationResistance({ megohms: 3, testVoltageV: 500, kind: "motor" }).verdict).toBe("warn");
    expect(judgeInsulationResistance({ megohms: 5, testVoltageV: 500, kind: "motor" })).toMatchObject({
      verdict: "pass",
      minimumMegohms: 5,
    });
  });

  it("cites the maker's handbook and the scroll megohm article for compressors", () => {
    const { source } = judgeInsulationResistance({ megohms: 10, testVoltageV: 500, kind: "compressor" });
    expect(source).toMatch(/\[S48\] Tecumseh/);
    expect(source).toMatch(/\[S49\] HVAC School/);
  });
});

describe("windingBalance", () => {
  it("passes within 2 % of the average [S44]: 1.52/1.50/1.55 Ω → 1.75 % (by hand: mean 1.5233, deviation 0.0267)", () => {
    const result = windingBalance([1.52, 1.5, 1.55]);
    expect(result.maxDeviationPercent).toBeCloseTo((100 * (1.55 - 4.57 / 3)) / (4.57 / 3), 10);
    expect(result.maxDeviationPercent).toBeCloseTo(1.75, 2);
    expect(result.verdict).toBe("pass");
  });

  it('warns from 2 % to 5 % (small hermetics "within a few percent", memory) and fails beyond', () => {
    // 1.00/1.00/1.05 Ω: mean 1.01667, deviation 0.03333 → 3.28 %; 1.0/1.0/1.1 Ω: mean 1.0333, deviation 0.0667 → 6.45 %.
    expect(windingBalance([1.0, 1.0, 1.05])).toMatchObject({ verdict: "warn" });
    expect(windingBalance([1.0, 1.0, 1.05]).maxDeviationPercent).toBeCloseTo(3.279, 3);
    expect(windingBalance([1.0, 1.0, 1.1]).verdict).toBe("fail");
    expect(windingBalance([1.0, 1.0, 1.1]).maxDeviationPercent).toBeCloseTo(6.452, 3);
  });

  it("refuses a zero resistance (an open or shorted winding is recorded as a fault, not a number)", () => {
    expect(() => windingBalance([1, 0, 1])).toThrow(/windingBalance requires/);
  });
});

describe("runningCurrent", () => {
  it("compressor: at or under RLA passes, above warns, above 140 % fails (RLA = MCC ÷ 1.4 to 1.56 [S39])", () => {
    const within = runningCurrent({ amps: 9.2, ratedA: 10, kind: "compressor-rla" });
    expect(within.verdict).toBe("pass");
    expect(within.percentOfRated).toBeCloseTo(92, 10);
    expect(runningCurrent({ amps: 11, ratedA: 10, kind: "compressor-rla" }).verdict).toBe("warn");
    expect(runningCurrent({ amps: 14.1, ratedA: 10, kind: "compressor-rla" }).verdict).toBe("fail");
  });

  it("fan: above FLA warns, above FLA × 1.15 fails (common practice; service factor memory)", () => {
    expect(runningCurrent({ amps: 1.0, ratedA: 1.0, kind: "fan-fla" }).verdict).toBe("pass");
    expect(runningCurrent({ amps: 1.1, ratedA: 1.0, kind: "fan-fla" }).verdict).toBe("warn");
    expect(runningCurrent({ amps: 1.2, ratedA: 1.0, kind: "fan-fla" }).verdict).toBe("fail");
  });

  it("warns when no current is measured", () => {
    expect(runningCurrent({ amps: 0, ratedA: 10, kind: "compressor-rla" }).reason).toMatch(/No current measured/);
  });
});
