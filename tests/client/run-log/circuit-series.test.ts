import { describe, expect, it } from "vitest";
import { diagnose, saturationPressure, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import type { Adjustment, Reading } from "@shared/schemas/visits.ts";
import { circuitSeries } from "@/features/run-log/utils/circuit-series.ts";

const gauge = (temperatureC: number, point: "bubble" | "dew") => saturationPressure("R407C", temperatureC, point) - STANDARD_ATMOSPHERE_KPA;

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
  return { id, visitId: "v", circuit: 1, takenAt: new Date(Date.UTC(2026, 11, 1, 10, minute)).toISOString(), note: null, input, result: diagnose(input), recordedBy: null, voided };
}

const VOID = { at: "2026-12-01T10:30:00.000Z", by: { id: "00000000-0000-4000-8000-000000000001", name: "Sam Toko" }, reason: "Probe on the wrong pipe" };

describe("circuitSeries", () => {
  it("leaves voided readings and adjustments out of the series, the chart and the settled test", () => {
    const readings = [reading("a", 0, 12), reading("b", 5, 30, VOID), reading("c", 10, 12.2)];
    const adjustments: Adjustment[] = [
      { id: "x", circuit: 1, at: "2026-12-01T10:07:00.000Z", kind: "metering", description: "Opened the TXV", amountKg: null, movementId: null, recordedBy: null, voided: VOID },
    ];
    const series = circuitSeries(readings, adjustments, 1);
    expect(series.readings.map((entry) => entry.id)).toEqual(["a", "c"]);
    expect(series.points).toHaveLength(2);
    expect(series.adjustments).toEqual([]);
    // The voided 30 °C suction line (an 18 K jump in superheat) does not unsettle the circuit.
    expect(series.trend?.changeOverWindow.superheatK).toBeCloseTo(0.2, 6);
  });
});
