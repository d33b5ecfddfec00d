/**
 * Settling assessment benchmark (issue 16): `assessTrend` over one circuit's run log of 10 000
 * readings that carry their stored results, as GET /api/equipment/:id, the weigh-in calibration
 * and the run log call it. Target: under 20 ms whether the circuit settles or never does (a
 * never-settled log once took 24.6 s and held every other request for as long). Figures only.
 */
import { absoluteToGauge, assessTrend, diagnose, saturationPressure } from "../shared/engine/index.ts";
import type { TrendReading } from "../shared/schemas/diagnosis.ts";
import { registerBench } from "./bench-registry.ts";

const READINGS = 10_000;
const TARGET_MS = 20;
/** A logger writing every 2 s: 150 readings in each 5-minute window, the dense end of real imports. */
const INTERVAL_SECONDS = 2;
const REPEATS = 30;

const START = Date.parse("2026-11-30T20:00:00Z");
const suctionKPa = absoluteToGauge(saturationPressure("R410A", 7, "dew"));
const liquidKPa = absoluteToGauge(saturationPressure("R410A", 46, "bubble"));

/** A run log of R410A TXV readings whose superheat follows `superheatAt(minute)`, each with its stored result. */
function runLog(superheatAt: (minute: number) => number): TrendReading[] {
  return Array.from({ length: READINGS }, (_, index) => {
    const minute = (index * INTERVAL_SECONDS) / 60;
    const input = {
      refrigerant: "R410A",
      meteringDevice: "txv" as const,
      suctionPressureKPa: suctionKPa,
      suctionLineTempC: 7 + superheatAt(minute),
      liquidPressureKPa: liquidKPa,
      liquidLineTempC: 40,
      runMinutes: 30 + minute,
    };
    return { takenAt: new Date(START + index * INTERVAL_SECONDS * 1000).toISOString(), input, result: diagnose(input) };
  });
}

/** Best wall time of `REPEATS` calls after one warm-up, ms. */
function bestMilliseconds(series: readonly TrendReading[], expectSettled: boolean): number {
  if (assessTrend(series).settled !== expectSettled) throw new Error(`trend bench: expected settled=${expectSettled}`);
  let best = Infinity;
  for (let repeat = 0; repeat < REPEATS; repeat++) {
    const start = process.hrtime.bigint();
    assessTrend(series);
    best = Math.min(best, Number(process.hrtime.bigint() - start) / 1e6);
  }
  return best;
}

function report(label: string, milliseconds: number): void {
  const verdict = milliseconds < TARGET_MS ? "under" : "ABOVE";
  console.log(
    `${label.padEnd(52)} ${milliseconds.toFixed(2).padStart(8)} ms   target ${TARGET_MS} ms   ratio ${(milliseconds / TARGET_MS).toFixed(2)} (${verdict})`,
  );
}

registerBench("settling assessment (assessTrend)", () => {
  // Never settles: superheat swings ±2 K on a 4-minute period, so every window moves over 1 K.
  const unsettled = runLog((minute) => 6 + 2 * Math.sin((2 * Math.PI * minute) / 4));
  // Settles: superheat decays from 15 K to 5 K with a 3-minute time constant.
  const settled = runLog((minute) => 5 + 10 * Math.exp(-minute / 3));
  report(`assessTrend, ${READINGS.toLocaleString("en")} unsettled readings`, bestMilliseconds(unsettled, false));
  report(`assessTrend, ${READINGS.toLocaleString("en")} settled readings`, bestMilliseconds(settled, true));
});
