import { describe, expect, it } from "vitest";
import { diagnose, saturationPressure, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import type { Adjustment, CircuitLog, Reading } from "@shared/schemas/visits.ts";
import { circuitSeries } from "@/features/run-log/utils/circuit-series.ts";

const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  saturationPressure("R407C", temperatureC, point) - STANDARD_ATMOSPHERE_KPA;

function reading(id: string, minute: number, suctionLineTempC: number, voided: Reading["voided"] = null): Reading {
  const input = {
    refrigerant: "R407C",
    meteringDevice: "txv" as const,
    suctionPressureKPa: gauge(6, "dew"),
    suctionLineTempC,
    liquidPressureKPa: gauge(42, "bubble"),
    liquidLineTempC: 37,
    runMinutes: 10 + minute,
  };
  return {
    id,
    visitId: "v",
    circuit: 1,
    takenAt: new Date(Date.UTC(2026, 11, 1, 10, minute)).toISOString(),
    note: null,
    input,
    result: diagnose(input),
    recordedBy: null,
    voided,
  };
}

const VOID = {
  at: "2026-12-01T10:30:00.000Z",
  by: { id: "00000000-0000-4000-8000-000000000001", name: "Sam Toko" },
  reason: "Probe on the wrong pipe",
};

const log = (keyReadings: Reading[], readingCount: number): CircuitLog => ({
  circuit: 1,
  recordCount: readingCount,
  readingCount,
  firstTakenAt: keyReadings[0]?.takenAt ?? null,
  lastTakenAt: keyReadings.at(-1)?.takenAt ?? null,
  olderCursor: null,
  points: keyReadings.map((entry) => ({
    x: (Date.parse(entry.takenAt) - Date.parse(keyReadings[0]!.takenAt)) / 60_000,
    takenAt: entry.takenAt,
    superheatK: entry.result.superheatK,
    subcoolingK: entry.result.subcoolingK,
    evaporatingTempC: entry.result.evaporatingTempC,
    condensingTempC: entry.result.condensingTempC,
  })),
  trend: null,
  keyReadings,
});

describe("circuitSeries", () => {
  it("leaves voided readings and adjustments out, and takes counts and points from the server's log", () => {
    const readings = [reading("a", 0, 12), reading("b", 5, 30, VOID), reading("c", 10, 12.2)];
    const adjustments: Adjustment[] = [
      {
        id: "x",
        circuit: 1,
        at: "2026-12-01T10:07:00.000Z",
        kind: "metering",
        description: "Opened the TXV",
        amountKg: null,
        movementId: null,
        recordedBy: null,
        voided: VOID,
      },
    ];
    const series = circuitSeries({ readings, adjustments, circuitLogs: [log([readings[0]!, readings[2]!], 2)] }, 1);
    expect(series.readings.map((entry) => entry.id)).toEqual(["a", "c"]);
    expect(series.points).toHaveLength(2);
    expect(series.readingCount).toBe(2);
    expect(series.adjustments).toEqual([]);
  });

  it("adds the readings that matter the browser does not hold, in time order, once", () => {
    const first = reading("first", 0, 12);
    const tail = [reading("t1", 50, 12.1), reading("t2", 55, 12.2)];
    const series = circuitSeries({ readings: tail, adjustments: [], circuitLogs: [log([first, ...tail], 600)] }, 1);
    expect(series.readings.map((entry) => entry.id)).toEqual(["first", "t1", "t2"]);
    expect(series.readingCount).toBe(600);
  });

  it("never brings back a reading the browser holds as voided", () => {
    const voided = reading("v", 5, 30, VOID);
    const series = circuitSeries(
      { readings: [voided], adjustments: [], circuitLogs: [log([{ ...voided, voided: null }], 1)] },
      1,
    );
    expect(series.readings).toEqual([]);
  });
});
