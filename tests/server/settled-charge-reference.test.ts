import { describe, expect, it } from "vitest";
import { settledChargeReference } from "@server/visits/settled-charge-reference.ts";
import { diagnose, saturationPressure, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";

const MINUTE = 60_000;
const START = Date.parse("2026-07-05T01:00:00Z");
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Math.round(saturationPressure("R410A", temperatureC, point) - STANDARD_ATMOSPHERE_KPA);

/** An R410A TXV reading (no glide, so superheat and subcooling are the line temperatures' offsets). */
function reading(minutes: number, superheatK: number, subcoolingK: number, outdoorAirDryBulbC = 30) {
  const input: DiagnosisInput = {
    refrigerant: "R410A",
    meteringDevice: "txv",
    suctionPressureKPa: gauge(7, "dew"),
    suctionLineTempC: 7 + superheatK,
    liquidPressureKPa: gauge(43, "bubble"),
    liquidLineTempC: 43 - subcoolingK,
    atmosphericPressureKPa: STANDARD_ATMOSPHERE_KPA,
    runMinutes: 20 + minutes,
    outdoorAirDryBulbC,
    returnAirDryBulbC: 24,
  };
  return {
    id: `00000000-0000-4000-8000-${String(minutes).padStart(12, "0")}`,
    takenAt: new Date(START + minutes * MINUTE),
    input,
    result: diagnose(input),
  };
}

describe("settledChargeReference", () => {
  it("gives nothing while the circuit is still moving after the weigh-in", () => {
    const runLog = {
      weighedInAt: new Date(START),
      adjustments: [],
      readings: [reading(0, 12, 1), reading(3, 9, 3), reading(6, 6, 5)],
    };
    expect(settledChargeReference(runLog)).toBeNull();
  });

  it("averages the settled window (the run log's 5-minute rule, common practice) into the reference point", () => {
    const runLog = {
      weighedInAt: new Date(START),
      adjustments: [],
      readings: [reading(0, 12, 1), reading(4, 6, 5, 30), reading(7, 6.4, 5.4, 31), reading(10, 6.2, 5.2, 32)],
    };
    const settled = settledChargeReference(runLog);
    // Window: back to the reading at or before 10 − 5 min (minute 4) through minute 10.
    expect(settled).toMatchObject({ readingId: runLog.readings[3]!.id, readingCount: 3 });
    expect(settled!.values.superheatK).toBeCloseTo(6.2, 1);
    expect(settled!.values.subcoolingK).toBeCloseTo(5.2, 1);
    expect(settled!.values.evaporatingTempC).toBeCloseTo(7, 1);
    expect(settled!.values.condensingTempC).toBeCloseTo(43, 1);
    expect(settled!.values).toMatchObject({ outdoorAirDryBulbC: 31, returnAirDryBulbC: 24 });
  });

  it("judges settling again from an adjustment made after the weigh-in", () => {
    const runLog = {
      weighedInAt: new Date(START),
      adjustments: [{ at: new Date(START + 5 * MINUTE), description: "Condenser fan speed corrected" }],
      readings: [reading(0, 6, 5), reading(3, 6, 5), reading(6, 6, 5), reading(9, 6, 5)],
    };
    // Steady, but only 3 min of readings since the adjustment and 3 min before it: no 5-minute window.
    expect(settledChargeReference(runLog)).toBeNull();
  });
});
