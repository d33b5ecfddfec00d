import { describe, expect, it } from "vitest";
import {
  absoluteToGauge,
  assessTrend,
  diagnose,
  DiagnosisInputError,
  saturationPressure,
  seededRandom,
  SETTLED_MAX_CHANGE_K,
  SETTLED_MAX_RATE_K_PER_MIN,
  SETTLED_WINDOW_MINUTES,
} from "@shared/engine/index.ts";
import type { DiagnosisResult, TrendResult } from "@shared/schemas/diagnosis.ts";

/**
 * The settling criterion written out the plain way, reading by reading, as the run log states
 * it (TRADE.md §1.5 [S10][S20]; window and limits common practice): at each reading, look back
 * to the latest reading at least 5 minutes earlier (never before the last adjustment), take the
 * spread and the ordinary least-squares slope (NIST/SEMATECH e-Handbook §4.1.4.1) of superheat
 * and of subcooling over those readings, and call the circuit settled when the unit has run 10
 * minutes, 5 minutes have been watched, and both moved under 1 K and drift under 0.1 K/min. The
 * last settled reading is found by judging every reading from the latest back. Quadratic on
 * purpose: it is the yardstick for the linear engine.
 */
interface ReferenceReading {
  takenAt: string;
  input: { runMinutes?: number };
  adjustment?: string;
  result: DiagnosisResult;
}

type ReasonKind = "run-time" | "too-short" | "no-values" | "moving" | "drifting" | "settled";

interface ReferenceStatus {
  kind: ReasonKind;
  superheatChangeK: number | null;
  subcoolingChangeK: number | null;
  superheatRate: number | null;
  subcoolingRate: number | null;
  minutesObserved: number;
}

function referenceSlope(x: number[], y: number[]): number {
  const meanX = x.reduce((sum, value) => sum + value, 0) / x.length;
  const meanY = y.reduce((sum, value) => sum + value, 0) / y.length;
  let covariance = 0;
  let varianceX = 0;
  for (let index = 0; index < x.length; index += 1) {
    covariance += (x[index]! - meanX) * (y[index]! - meanY);
    varianceX += (x[index]! - meanX) ** 2;
  }
  return covariance / varianceX;
}

function referenceStatus(readings: readonly ReferenceReading[], last: number): ReferenceStatus {
  const origin = Date.parse(readings[0]!.takenAt);
  const minute = (index: number) => (Date.parse(readings[index]!.takenAt) - origin) / 60_000;
  let start = 0;
  for (let index = last; index >= 0; index -= 1) {
    if (readings[index]!.adjustment !== undefined) {
      start = index;
      break;
    }
  }
  let windowStart = 0;
  for (let index = last; index >= 0; index -= 1) {
    if (minute(last) - minute(index) >= SETTLED_WINDOW_MINUTES) {
      windowStart = index;
      break;
    }
  }
  const first = Math.max(start, windowStart);
  const column = (pick: (result: DiagnosisResult) => number | null) => {
    const x: number[] = [];
    const y: number[] = [];
    for (let index = first; index <= last; index += 1) {
      const value = pick(readings[index]!.result);
      if (value === null) continue;
      x.push(minute(index));
      y.push(value);
    }
    return {
      change: y.length === 0 ? null : Math.max(...y) - Math.min(...y),
      rate: y.length >= 2 ? referenceSlope(x, y) : null,
    };
  };
  const superheat = column((result) => result.superheatK);
  const subcooling = column((result) => result.subcoolingK);
  const minutesObserved = minute(last) - minute(start);
  const figures = {
    superheatChangeK: superheat.change,
    subcoolingChangeK: subcooling.change,
    superheatRate: superheat.rate,
    subcoolingRate: subcooling.rate,
    minutesObserved,
  };
  const runMinutes = readings[last]!.input.runMinutes;
  const kind: ReasonKind =
    runMinutes !== undefined && runMinutes < 10
      ? "run-time"
      : minutesObserved < SETTLED_WINDOW_MINUTES
        ? "too-short"
        : superheat.change === null && subcooling.change === null
          ? "no-values"
          : [superheat.change, subcooling.change].some((change) => change !== null && change >= SETTLED_MAX_CHANGE_K)
            ? "moving"
            : [superheat.rate, subcooling.rate].some(
                  (rate) => rate !== null && Math.abs(rate) >= SETTLED_MAX_RATE_K_PER_MIN,
                )
              ? "drifting"
              : "settled";
  return { kind, ...figures };
}

const REASON_PATTERN: Record<ReasonKind, RegExp> = {
  "run-time": /^The unit has run/,
  "too-short": /^Only .* min of readings/,
  "no-values": /^Neither superheat nor subcooling/,
  moving: /^Still moving/,
  drifting: /^Still drifting/,
  settled: /^Superheat and subcooling each changed less than/,
};

/** The engine's result against the reference: every field equal, slopes to rounding. */
function expectSameAsReference(actual: TrendResult, readings: readonly ReferenceReading[]): ReasonKind {
  const last = readings.length - 1;
  const expected = referenceStatus(readings, last);
  let settledIndex = -1;
  for (let index = last; index >= 0; index -= 1) {
    if (referenceStatus(readings, index).kind === "settled") {
      settledIndex = index;
      break;
    }
  }
  expect(actual.settled).toBe(expected.kind === "settled");
  expect(actual.reason).toMatch(REASON_PATTERN[expected.kind]);
  expect(actual.changeOverWindow).toEqual({
    superheatK: expected.superheatChangeK,
    subcoolingK: expected.subcoolingChangeK,
  });
  expect(actual.minutesObserved).toBe(expected.minutesObserved);
  for (const [rate, reference] of [
    [actual.rate.superheatKPerMin, expected.superheatRate],
    [actual.rate.subcoolingKPerMin, expected.subcoolingRate],
  ] as const) {
    if (reference === null) expect(rate).toBeNull();
    else expect(rate!).toBeCloseTo(reference, 10);
  }
  expect(actual.lastSettled?.index ?? -1).toBe(settledIndex);
  if (settledIndex >= 0) {
    expect(actual.lastSettled!.takenAt).toBe(readings[settledIndex]!.takenAt);
    expect(actual.lastSettled!.result).toBe(readings[settledIndex]!.result);
  }
  expect(actual.latest).toBe(readings[last]!.result);
  return expected.kind;
}

const START = Date.parse("2026-03-02T09:00:00+10:00");
const suctionKPa = absoluteToGauge(saturationPressure("R410A", 7, "dew"));
const liquidKPa = absoluteToGauge(saturationPressure("R410A", 46, "bubble"));
const input = {
  refrigerant: "R410A",
  meteringDevice: "txv" as const,
  suctionPressureKPa: suctionKPa,
  suctionLineTempC: 13,
  liquidPressureKPa: liquidKPa,
  liquidLineTempC: 40,
};
/** A real stored result; each reading of a random log carries a copy with its own superheat and subcooling. */
const template = diagnose(input);

type Shape = "settling" | "steady" | "swinging" | "drifting-near-limit" | "noisy";
const SHAPES: Shape[] = ["settling", "steady", "swinging", "drifting-near-limit", "noisy"];

/** One random run log: irregular times with bursts and gaps, adjustments, missing values, run times. */
function randomRunLog(random: () => number, shape: Shape, length: number): ReferenceReading[] {
  const readings: ReferenceReading[] = [];
  let milliseconds = START;
  const runStart = random() < 0.3 ? undefined : random() * 15;
  // Sometimes a probe gives nothing for whole windows (a gauge set with its clamps off).
  const missing = random();
  const missingShare = missing < 0.45 ? 0 : missing < 0.9 ? random() * 0.3 : 0.97;
  const adjustmentShare = random() < 0.4 ? 0 : random() * 0.03;
  const noiseK = shape === "noisy" ? 0.2 + random() * 0.6 : shape === "steady" ? random() * 0.1 : 0.05;
  // Drift within a hair of the limit either way: the slope decides, not the spread.
  const driftKPerMin = SETTLED_MAX_RATE_K_PER_MIN * (random() < 0.5 ? -1 : 1) * (1 + (random() - 0.5) * 1e-6);
  const driftsInSubcooling = random() < 0.5;
  for (let index = 0; index < length; index += 1) {
    const step = random();
    milliseconds +=
      step < 0.05
        ? 1 + Math.floor(random() * 999)
        : step < 0.08
          ? (5 + random() * 30) * 60_000
          : (5 + random() * 85) * 1000;
    const minute = (milliseconds - START) / 60_000;
    const wave = shape === "swinging" ? 1.5 * Math.sin(minute) : 0;
    const settle = shape === "settling" ? 8 * Math.exp(-minute / (1 + random() * 4)) : 0;
    const drift = shape === "drifting-near-limit" ? driftKPerMin * minute : 0;
    const superheatK =
      random() < missingShare ? null : 6 + settle + wave + (driftsInSubcooling ? 0 : drift) + (random() - 0.5) * noiseK;
    const subcoolingK =
      random() < missingShare ? null : 5 - settle / 3 + (driftsInSubcooling ? drift : 0) + (random() - 0.5) * noiseK;
    readings.push({
      takenAt: new Date(milliseconds).toISOString(),
      input: { ...input, ...(runStart === undefined ? {} : { runMinutes: runStart + minute }) },
      ...(index > 0 && random() < adjustmentShare ? { adjustment: "opened the service valve a quarter turn" } : {}),
      result: { ...template, superheatK, subcoolingK },
    });
  }
  return readings;
}

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const inner of Object.values(value)) deepFreeze(inner);
  }
  return value;
}

describe("assessTrend against the criterion written out reading by reading", () => {
  it("gives the same verdict, figures and last settled reading on 600 seeded random run logs", () => {
    const random = seededRandom(16);
    const kinds: Record<string, number> = {};
    let withLastSettled = 0;
    for (let round = 0; round < 600; round += 1) {
      const shape = SHAPES[round % SHAPES.length]!;
      const readings = deepFreeze(randomRunLog(random, shape, 1 + Math.floor(random() * (random() < 0.5 ? 30 : 300))));
      const actual = assessTrend(readings);
      const kind = expectSameAsReference(actual, readings);
      kinds[kind] = (kinds[kind] ?? 0) + 1;
      if (actual.lastSettled !== null) withLastSettled += 1;
    }
    // The draws reach every branch of the criterion, settled and not, often enough to mean something.
    for (const kind of Object.keys(REASON_PATTERN)) expect(kinds[kind] ?? 0, kind).toBeGreaterThanOrEqual(10);
    expect(withLastSettled).toBeGreaterThanOrEqual(100);
    expect(600 - withLastSettled).toBeGreaterThanOrEqual(100);
  });

  it("agrees on long logs: 2 000 readings a second apart that never settle, and that settle late", () => {
    for (const seed of [1, 2]) {
      const random = seededRandom(seed);
      const readings: ReferenceReading[] = Array.from({ length: 2000 }, (_, index) => {
        const minute = index / 60;
        const superheatK =
          seed === 1 ? 6 + 2 * Math.sin(minute) : 5 + 10 * Math.exp(-minute / 6) + (random() - 0.5) * 0.2;
        return {
          takenAt: new Date(START + index * 1000).toISOString(),
          input: { ...input, runMinutes: 20 + minute },
          result: { ...template, superheatK, subcoolingK: 5 },
        };
      });
      const actual = assessTrend(deepFreeze(readings));
      expectSameAsReference(actual, readings);
      expect(actual.lastSettled === null).toBe(seed === 1);
    }
  });

  it("judges a drift of exactly 0.1 K/min as the full least-squares slope does, to the last digit", () => {
    // y = 0.1·t on whole minutes: the slope lands on the limit within rounding, so the running
    // sums cannot decide and the two-pass slope must.
    const readings: ReferenceReading[] = Array.from({ length: 40 }, (_, minute) => ({
      takenAt: new Date(START + minute * 60_000).toISOString(),
      input: { ...input, runMinutes: 20 + minute },
      result: { ...template, superheatK: 4 + SETTLED_MAX_RATE_K_PER_MIN * minute, subcoolingK: 5 },
    }));
    expectSameAsReference(assessTrend(deepFreeze(readings)), readings);
  });
});

describe("assessTrend on stored results", () => {
  const reading = (minute: number, extra: object = {}) => ({
    takenAt: new Date(START + minute * 60_000).toISOString(),
    input: { ...input, runMinutes: 20 + minute },
    ...extra,
  });

  it("diagnoses a reading that has no stored result, once, as diagnose() does", () => {
    const withResult = Array.from({ length: 8 }, (_, minute) =>
      reading(minute, { result: diagnose(reading(minute).input) }),
    );
    const withoutResult = Array.from({ length: 8 }, (_, minute) => reading(minute));
    expect(assessTrend(withoutResult)).toEqual(assessTrend(withResult));
  });

  it("works out again a stored result from an older engine (no charge estimate field), as the server's upgrade does", () => {
    const { chargeDeviation: _dropped, ...older } = diagnose(input);
    const stale = { ...older, chargeState: "overcharged" };
    const result = assessTrend([reading(0, { result: stale }), reading(6, { result: stale })]);
    expect(result.latest.chargeState).toBe(diagnose(reading(6).input).chargeState);
    expect(result.latest).toHaveProperty("chargeDeviation");
  });

  it("names the reading and field of an input it had to diagnose and could not", () => {
    const bad = [reading(0, { result: template }), { ...reading(1), input: { ...input, suctionPressureKPa: "high" } }];
    try {
      assessTrend(bad);
      throw new Error("expected a DiagnosisInputError");
    } catch (error) {
      expect(error).toBeInstanceOf(DiagnosisInputError);
      expect(Object.keys((error as DiagnosisInputError).fieldErrors)).toContain("1.input.suctionPressureKPa");
    }
  });

  it("refuses a stored result that is not a diagnosis, and an empty adjustment, with the schema's messages", () => {
    expect(() => assessTrend([reading(0, { result: { superheatK: 5 } })])).toThrow(DiagnosisInputError);
    expect(() => assessTrend([reading(0, { result: template, adjustment: "  " })])).toThrow(DiagnosisInputError);
    expect(() => assessTrend([])).toThrow(DiagnosisInputError);
    expect(() => assessTrend([{ ...reading(0, { result: template }), takenAt: "yesterday" }])).toThrow(
      DiagnosisInputError,
    );
  });
});
