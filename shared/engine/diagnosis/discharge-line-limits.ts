import type { Application } from "../../schemas/diagnosis.ts";
import {
  APPLICATION_LIMITS,
  HOT_DISCHARGE_REFRIGERANTS,
  HOT_DISCHARGE_SOURCE,
  type DischargeLineLimits,
} from "./diagnosis-limits.ts";

/** Built once per refrigerant and application (performance: no key strings per call). */
const memo = new Map<string, Map<Application, DischargeLineLimits>>();

/**
 * Discharge line temperatures for a refrigerant in an application: where "elevated" starts and
 * the limit to stay under (measured within about 15 cm of the compressor). The application sets
 * the base (comfort air conditioning 90 °C elevated, refrigeration 95–100 °C; limit 107 °C,
 * 225 °F [S13][S37]); refrigerants with a high heat of compression (R32, R22, R717, R744) run
 * hotter, so their elevated threshold is raised and ammonia and CO₂ get their own limits.
 *
 * Units: °C. Source: TRADE.md §3 [S13][S37]; refrigerant adjustments from memory.
 *
 * @throws never
 * @example dischargeLineLimits("R32", "comfort-cooling").elevatedC // 102
 */
export function dischargeLineLimits(refrigerant: string, application: Application): DischargeLineLimits {
  let byApplication = memo.get(refrigerant);
  if (!byApplication) {
    byApplication = new Map();
    memo.set(refrigerant, byApplication);
  }
  let limits = byApplication.get(application);
  if (!limits) {
    const base = APPLICATION_LIMITS[application].dischargeLine;
    const hot = HOT_DISCHARGE_REFRIGERANTS[refrigerant];
    const limitC = hot?.limitC ?? base.limitC;
    limits = hot
      ? Object.freeze({
          elevatedC: Math.min(limitC - 3, base.elevatedC + hot.elevatedAddK),
          limitC,
          source: `${base.source}; ${HOT_DISCHARGE_SOURCE}`,
        })
      : base;
    byApplication.set(application, limits);
  }
  return limits;
}
