import { formatTenths } from "../diagnosis/format-tenths.ts";
import { checkTestPressure } from "./check-test-pressure.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { TEST_PRESSURE_LIMITS, type TestPressureLimits } from "./procedure-limits.ts";
import { resolveLimits } from "./resolve-limits.ts";
import type { LiveNotice } from "./running-current-notice.ts";

const usable = (value: number | null | undefined): value is number =>
  value !== null && value !== undefined && Number.isFinite(value) && value > 0;

/**
 * What to say next to the test-pressure box while the technician types: never exceed the rated
 * (maximum allowable, PS) pressure of the lowest-rated component [S57][S63][S64]. The limit is
 * the lower of the rating typed and the nameplate's, so typing a higher rating over the
 * nameplate does not silence the warning; a typed rating above the nameplate is itself
 * questioned (the nameplate and local codes decide).
 *
 * @param input test pressure, typed rating and the nameplate rating (null when unknown), kPa gauge
 * @param format how a pressure is shown to this technician (their unit); default "1234.0 kPa"
 * @param limits organisation override of TEST_PRESSURE_LIMITS
 * @returns null when within the rating or a figure is missing, otherwise a danger (above the
 *   rating) or caution (rating typed above the nameplate) notice
 * @throws never
 * @example testPressureNotice({ testGaugeKPa: 4500, ratedKPa: 4150, nameplateKPa: 4150 })?.level // "danger"
 */
export function testPressureNotice(
  input: { testGaugeKPa: number | undefined; ratedKPa: number | undefined; nameplateKPa: number | null },
  format: (kPa: number) => string = (kPa) => `${formatTenths(kPa)} kPa`,
  limits?: Partial<TestPressureLimits>,
): LiveNotice | null {
  const { testGaugeKPa, ratedKPa, nameplateKPa } = input;
  const ratings = [ratedKPa, nameplateKPa].filter(usable);
  if (ratings.length === 0) return null;
  const governing = Math.min(...ratings);
  const fromNameplate =
    usable(nameplateKPa) && governing === nameplateKPa && !(usable(ratedKPa) && ratedKPa === governing);
  if (usable(testGaugeKPa)) {
    const check = checkTestPressure({ testGaugeKPa, ratedKPa: governing }, limits);
    if (check.verdict === "fail") {
      const limit = governing * resolveLimits(TEST_PRESSURE_LIMITS, limits).limits.maxFractionOfRated;
      return {
        level: "danger",
        message: `Do not exceed the rated pressure: ${format(testGaugeKPa)} is above the ${format(limit)} limit of the lowest-rated component${fromNameplate ? " on the nameplate" : ""}. Lower the test pressure or isolate that component; the nameplate and local codes decide.`,
        source: check.source,
      };
    }
  }
  if (usable(ratedKPa) && usable(nameplateKPa) && ratedKPa > nameplateKPa) {
    return {
      level: "caution",
      message: `The rated pressure entered, ${format(ratedKPa)}, is above the nameplate's ${format(nameplateKPa)}: the nameplate decides, so test to no more than ${format(nameplateKPa)}.`,
      source: cite(PROCEDURE_SOURCES, ["S57", "S63", "S64"]),
    };
  }
  return null;
}
