import type { PressureTestResult } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { KELVIN_OFFSET, STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMPUTED } from "../sources/marks.ts";

const SOURCE = cite(
  PROCEDURE_SOURCES,
  ["S65", "S74"],
  `ideal-gas correction on absolute pressure and kelvin (${COMPUTED})`,
);

/**
 * Result of a standing nitrogen pressure (tightness) test, corrected for temperature. Nitrogen
 * is an ideal gas at these pressures, so in a fixed volume the absolute pressure follows the
 * absolute temperature: p₂ = p₁ × T₂ / T₁ with p in kPa abs (gauge + atmospheric) and T in
 * kelvin [S65]; REFCOM TB017 covers the same correction [S74].
 *
 * expectedEndGaugeKPa is what the gauge should read at the end temperature if nothing leaked;
 * correctedDropKPa = expectedEnd − end reading (positive = pressure lost beyond the temperature
 * effect, negative = more than expected); pass when correctedDrop ≤ allowedDrop.
 * Also returned: the raw gauge drop, the sensitivity p₁/T₁ in kPa per kelvin (13 kPa/K at
 * 3.8 MPa g and 27 °C, computed), and a verdict with reason and source.
 *
 * @param input start and end gauge pressure (kPa g; start > 0, end ≥ 0), start and end
 *   temperature (°C, ambient or pipe, the same place both times), allowed drop (kPa ≥ 0),
 *   site atmospheric pressure (kPa abs, default 101.325)
 * @returns expected end gauge pressure, corrected drop, pass, gauge drop, sensitivity, verdict
 * @throws RangeError "pressureTestResult requires ..." for non-finite inputs, a start pressure ≤ 0,
 *   a temperature at or below absolute zero, a negative allowed drop or atmospheric pressure ≤ 0
 * @example pressureTestResult({ startGaugeKPa: 3800, startTempC: 27, endGaugeKPa: 3730, endTempC: 20, allowedDropKPa: 0 })
 *   // { expectedEndGaugeKPa: 3709.0…, correctedDropKPa: -21.0…, pass: true, … } — [S65] worked example: no leak
 */
export function pressureTestResult(input: {
  startGaugeKPa: number;
  startTempC: number;
  endGaugeKPa: number;
  endTempC: number;
  allowedDropKPa: number;
  atmosphericPressureKPa?: number;
}): PressureTestResult {
  const { startGaugeKPa, startTempC, endGaugeKPa, endTempC, allowedDropKPa } = input;
  const atmosphere = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const values = [startGaugeKPa, startTempC, endGaugeKPa, endTempC, allowedDropKPa, atmosphere];
  if (values.some((value) => !Number.isFinite(value)))
    throw new RangeError("pressureTestResult requires finite numbers");
  if (!(startGaugeKPa > 0)) throw new RangeError("pressureTestResult requires a start pressure above 0 kPa gauge");
  if (!(atmosphere > 0)) throw new RangeError("pressureTestResult requires an atmospheric pressure above zero");
  if (allowedDropKPa < 0) throw new RangeError("pressureTestResult requires an allowed drop of zero or more");
  const startK = startTempC + KELVIN_OFFSET;
  const endK = endTempC + KELVIN_OFFSET;
  if (!(startK > 0) || !(endK > 0))
    throw new RangeError("pressureTestResult requires temperatures above absolute zero");

  const startAbsKPa = startGaugeKPa + atmosphere;
  const expectedEndGaugeKPa = (startAbsKPa * endK) / startK - atmosphere;
  const correctedDropKPa = expectedEndGaugeKPa - endGaugeKPa;
  const gaugeDropKPa = startGaugeKPa - endGaugeKPa;
  const sensitivityKPaPerK = startAbsKPa / startK;
  const pass = correctedDropKPa <= allowedDropKPa;

  const expected = `expected ${formatTenths(expectedEndGaugeKPa)} kPa at ${formatTenths(endTempC)} °C`;
  const allowed = `${formatTenths(allowedDropKPa)} kPa allowed`;
  let reason: string;
  if (!pass) {
    reason = `Lost pressure: end reading ${formatTenths(endGaugeKPa)} kPa against ${expected}; the corrected drop of ${formatTenths(correctedDropKPa)} kPa is more than the ${allowed}: find the leak`;
  } else if (correctedDropKPa <= 0) {
    reason = `Held: end reading ${formatTenths(endGaugeKPa)} kPa against ${expected}; no loss once corrected for temperature (${formatTenths(-correctedDropKPa)} kPa above expected)`;
  } else {
    reason = `Held: end reading ${formatTenths(endGaugeKPa)} kPa against ${expected}; the corrected drop of ${formatTenths(correctedDropKPa)} kPa is within the ${allowed}`;
  }
  return {
    expectedEndGaugeKPa,
    correctedDropKPa,
    pass,
    gaugeDropKPa,
    sensitivityKPaPerK,
    verdict: pass ? "pass" : "fail",
    reason,
    source: SOURCE,
  };
}
