import { describe, expect, it } from "vitest";
import {
  absoluteToGauge,
  assessTrend,
  DiagnosisInputError,
  saturationPressure,
  SETTLED_MAX_CHANGE_K,
  SETTLED_WINDOW_MINUTES,
} from "@shared/engine/index";

const START = Date.parse("2026-03-02T09:00:00+10:00");
const suction = absoluteToGauge(saturationPressure("R410A", 7, "dew"));
const liquid = absoluteToGauge(saturationPressure("R410A", 46, "bubble"));

/** One reading at `minute` with the given superheat and subcooling (R410A TXV, 7 °C / 46 °C). */
function reading(
  minute: number,
  superheatK: number,
  subcoolingK: number,
  extra: { adjustment?: string; runMinutes?: number } = {},
) {
  return {
    takenAt: new Date(START + minute * 60_000).toISOString(),
    input: {
      refrigerant: "R410A",
      meteringDevice: "txv" as const,
      suctionPressureKPa: suction,
      suctionLineTempC: 7 + superheatK,
      liquidPressureKPa: liquid,
      liquidLineTempC: 46 - subcoolingK,
      ...(extra.runMinutes === undefined ? {} : { runMinutes: extra.runMinutes }),
    },
    ...(extra.adjustment === undefined ? {} : { adjustment: extra.adjustment }),
  };
}

/** Superheat settling exponentially from 15 K to 5 K with a 3-minute time constant. */
const settling = Array.from({ length: 21 }, (_, minute) =>
  reading(minute, 5 + 10 * Math.exp(-minute / 3), 6 - 3 * Math.exp(-minute / 3)),
);

describe("assessTrend", () => {
  it("states its criterion: < 1 K over the last 5 minutes (TRADE.md §1.5 [S10][S20]; limits common practice)", () => {
    const result = assessTrend(settling);
    expect(result.criterion).toMatchObject({
      windowMinutes: SETTLED_WINDOW_MINUTES,
      maxChangeK: SETTLED_MAX_CHANGE_K,
      minRunMinutes: 10,
    });
    expect(result.criterion.source).toMatch(/\[S10\]/);
  });

  it("calls an exponentially settling circuit settled once the last 5 minutes moved under 1 K", () => {
    const result = assessTrend(settling);
    expect(result.settled).toBe(true);
    expect(result.lastSettled?.index).toBe(20);
    expect(result.changeOverWindow.superheatK!).toBeLessThan(1);
    // Computed: the superheat slope at 18 min is −(10/3)·e^(−6) ≈ −0.008 K/min.
    expect(Math.abs(result.rate.superheatKPerMin!)).toBeLessThan(0.05);
    expect(result.latest.chargeState).toBe("normal");
  });

  it("is not settled early in the same run, and finds the first settled point later", () => {
    const early = assessTrend(settling.slice(0, 9));
    expect(early.settled).toBe(false);
    expect(early.reason).toMatch(/Still moving/);
    expect(early.rate.superheatKPerMin!).toBeLessThan(0);
  });

  it("measures a steady drift as the rate of change in K/min", () => {
    const drifting = Array.from({ length: 11 }, (_, minute) => reading(minute, 12 - 0.5 * minute, 6));
    const result = assessTrend(drifting);
    expect(result.settled).toBe(false);
    expect(result.rate.superheatKPerMin!).toBeCloseTo(-0.5, 6);
    expect(result.rate.subcoolingKPerMin!).toBeCloseTo(0, 6);
    expect(result.lastSettled).toBeNull();
  });

  it("restarts the window after an adjustment and keeps the last settled result from before it", () => {
    const adjusted = [
      ...settling,
      reading(21, 9, 3, { adjustment: "added 0.3 kg" }),
      reading(22, 8, 3.5),
      reading(23, 7.5, 4),
    ];
    const result = assessTrend(adjusted);
    expect(result.settled).toBe(false);
    expect(result.reason).toMatch(/since the last adjustment/);
    expect(result.minutesObserved).toBeCloseTo(2, 9);
    expect(result.lastSettled?.index).toBe(20);
  });

  it("is not settled while the recorded run time is under 10 minutes", () => {
    const steady = Array.from({ length: 8 }, (_, minute) => reading(minute, 5, 6, { runMinutes: minute + 1 }));
    const result = assessTrend(steady);
    expect(result.settled).toBe(false);
    expect(result.reason).toMatch(/10 min/);
  });

  it("needs the readings to span the whole window", () => {
    expect(assessTrend([reading(0, 5, 6), reading(3, 5, 6)]).settled).toBe(false);
    expect(assessTrend([reading(0, 5, 6), reading(5, 5.2, 6)]).settled).toBe(true);
  });

  it("refuses readings out of time order with a field message", () => {
    try {
      assessTrend([reading(5, 5, 6), reading(2, 5, 6)]);
      throw new Error("expected a DiagnosisInputError");
    } catch (error) {
      expect(error).toBeInstanceOf(DiagnosisInputError);
      expect((error as DiagnosisInputError).fieldErrors["1.takenAt"]?.[0]).toMatch(/time order/);
    }
  });
});
