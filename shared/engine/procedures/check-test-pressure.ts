import type { Verdict } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { limitSource } from "./limit-source.ts";
import { TEST_PRESSURE_LIMITS, type TestPressureLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S57", "S63", "S64"]);

/**
 * Checks a nitrogen test pressure against the rated (maximum allowable, PS) pressure of the
 * lowest-rated component in the part of the system under test: never exceed it; isolate or
 * remove parts that cannot take the test [S57][S63][S64]. Above the limit fails; at or below
 * passes. Oxygen, air and mixtures containing them must never be the test gas [S61].
 *
 * @param input test pressure and rated pressure of the lowest-rated component, both kPa gauge (> 0)
 * @param limits organisation override of TEST_PRESSURE_LIMITS (maxFractionOfRated, default 1)
 * @returns verdict, reason and source
 * @throws RangeError "checkTestPressure requires ..." for non-finite or non-positive pressures
 * @example checkTestPressure({ testGaugeKPa: 3800, ratedKPa: 4150 }).verdict // "pass"
 */
export function checkTestPressure(
  input: { testGaugeKPa: number; ratedKPa: number },
  limits?: Partial<TestPressureLimits>,
): Verdict {
  const { testGaugeKPa, ratedKPa } = input;
  if (!Number.isFinite(testGaugeKPa) || !(testGaugeKPa > 0))
    throw new RangeError("checkTestPressure requires a test pressure above 0 kPa gauge");
  if (!Number.isFinite(ratedKPa) || !(ratedKPa > 0))
    throw new RangeError("checkTestPressure requires a rated pressure above 0 kPa gauge");
  const { limits: applied, overridden } = resolveLimits(TEST_PRESSURE_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const limitKPa = ratedKPa * applied.maxFractionOfRated;
  if (testGaugeKPa > limitKPa) {
    return {
      verdict: "fail",
      reason: `Test pressure ${formatTenths(testGaugeKPa)} kPa is above the ${formatTenths(limitKPa)} kPa limit of the lowest-rated component: lower it or isolate that component`,
      source,
    };
  }
  return {
    verdict: "pass",
    reason: `Test pressure ${formatTenths(testGaugeKPa)} kPa is within the ${formatTenths(limitKPa)} kPa limit of the lowest-rated component`,
    source,
  };
}
