import type { Application, TargetBand } from "../../schemas/diagnosis.ts";
import {
  APPLICATION_LIMITS,
  NAMEPLATE_TARGET_TOLERANCE_K,
  NAMEPLATE_TARGET_TOLERANCE_SOURCE,
} from "./diagnosis-limits.ts";

/** Never changes: built once here instead of on every call (performance). */
const NAMEPLATE_SOURCE = `maker's target; ±${NAMEPLATE_TARGET_TOLERANCE_K} K: ${NAMEPLATE_TARGET_TOLERANCE_SOURCE}`;

/** Bands already built, by application (default) or by the maker's target (performance). */
const defaultBands = new Map<Application, TargetBand>();
const nameplateBands = new Map<number, TargetBand>();

/**
 * Chooses the subcooling band: the maker's target ± 1.7 K (Title 24 tolerance, memory) when
 * given — TXV/EEV systems are charged to it [S9][S11][S14] — else the application's band:
 * comfort cooling 4.4–8.3 K [S14], refrigeration with a receiver 2–7 K, chillers 3–8 K
 * (common practice).
 *
 * The band returned is frozen and shared between calls.
 *
 * Units: K.
 *
 * @throws never
 * @example selectSubcoolingTarget(5).lowK // 3.3
 */
export function selectSubcoolingTarget(
  nameplateTargetK: number | undefined,
  application: Application = "comfort-cooling",
): TargetBand {
  if (nameplateTargetK !== undefined) {
    let band = nameplateBands.get(nameplateTargetK);
    if (!band) {
      band = Object.freeze({
        targetK: nameplateTargetK,
        lowK: Math.max(0, nameplateTargetK - NAMEPLATE_TARGET_TOLERANCE_K),
        highK: nameplateTargetK + NAMEPLATE_TARGET_TOLERANCE_K,
        basis: "nameplate" as const,
        source: NAMEPLATE_SOURCE,
      });
      // Nameplate targets are a handful of values per fleet; the cap only guards odd callers.
      if (nameplateBands.size < 1000) nameplateBands.set(nameplateTargetK, band);
    }
    return band;
  }
  let band = defaultBands.get(application);
  if (!band) {
    const { lowK, highK, targetK, source } = APPLICATION_LIMITS[application].subcooling;
    band = Object.freeze({ targetK, lowK, highK, basis: "common-practice" as const, source });
    defaultBands.set(application, band);
  }
  return band;
}
