import type { MeteringDevice, TargetBand } from "../../schemas/diagnosis.ts";
import {
  EXPANSION_VALVE_SUPERHEAT_BAND,
  EXPANSION_VALVE_SUPERHEAT_SOURCE,
  FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K,
  FIXED_ORIFICE_TARGET_SOURCE,
  NAMEPLATE_TARGET_TOLERANCE_K,
  NAMEPLATE_TARGET_TOLERANCE_SOURCE,
} from "./diagnosis-limits.ts";
import { fixedOrificeTargetSuperheat } from "./fixed-orifice-target-superheat.ts";
import { cite } from "./sources.ts";

// The band sources never change: built once here instead of on every call (performance).
const FIXED_NAMEPLATE_SOURCE = `maker's target; ±${FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K} K installer tolerance ${cite(["S10", "S17", "S18"])}`;
const VALVE_NAMEPLATE_SOURCE = `maker's target; ±${NAMEPLATE_TARGET_TOLERANCE_K} K: ${NAMEPLATE_TARGET_TOLERANCE_SOURCE}`;
const FORMULA_SOURCE = `SH = 1.5 × WB − 0.5 × DB − 4.4, ±${FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K} K: ${FIXED_ORIFICE_TARGET_SOURCE}`;

export interface SuperheatTargetChoice {
  band: TargetBand | null;
  /** Why there is no band, or a caution about the band used; null when nothing to say. */
  note: string | null;
}

/**
 * Chooses the superheat band a measured superheat is judged against.
 *
 * - A maker's target (nameplate, manual or the unit's own chart) always wins; the unit's chart
 *   overrides the formula [S17][S18]. TXV/EEV: target ± 1.7 K; fixed: target ± 2.8 K [S10].
 * - TXV/EEV without one: the common-practice band 2.8–6.7 K [S15][S17][S9].
 * - Fixed orifice / capillary without one: `fixedOrificeTargetSuperheat` from return-air wet
 *   bulb and outdoor dry bulb, ± 2.8 K [S10]; none outside the chart range or below 2.8 K.
 *
 * Units: K and °C.
 *
 * @throws never
 * @example selectSuperheatTarget("fixed-orifice", undefined, 19, 32).band // { targetK: 8.06, lowK: 5.26, highK: 10.86, basis: "formula", … }
 */
export function selectSuperheatTarget(
  meteringDevice: MeteringDevice,
  nameplateTargetK: number | undefined,
  returnAirWetBulbC: number | null,
  outdoorAirDryBulbC: number | undefined,
): SuperheatTargetChoice {
  const fixed = meteringDevice === "fixed-orifice" || meteringDevice === "capillary";
  if (nameplateTargetK !== undefined) {
    const tolerance = fixed ? FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K : NAMEPLATE_TARGET_TOLERANCE_K;
    const source = fixed ? FIXED_NAMEPLATE_SOURCE : VALVE_NAMEPLATE_SOURCE;
    return {
      band: { targetK: nameplateTargetK, lowK: Math.max(0, nameplateTargetK - tolerance), highK: nameplateTargetK + tolerance, basis: "nameplate", source },
      note: null,
    };
  }
  if (!fixed) {
    const { lowK, highK, targetK } = EXPANSION_VALVE_SUPERHEAT_BAND;
    return {
      band: { targetK, lowK, highK, basis: "common-practice", source: EXPANSION_VALVE_SUPERHEAT_SOURCE },
      note: null,
    };
  }
  if (returnAirWetBulbC === null || outdoorAirDryBulbC === undefined) {
    return {
      band: null,
      note: "A fixed metering device needs the return air wet bulb (or dry bulb and humidity) and the outdoor dry bulb for its target superheat; superheat is not judged",
    };
  }
  const target = fixedOrificeTargetSuperheat(returnAirWetBulbC, outdoorAirDryBulbC);
  if (target.status !== "ok") return { band: null, note: target.reason };
  const tolerance = FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K;
  return {
    band: {
      targetK: target.targetK,
      lowK: target.targetK - tolerance,
      highK: target.targetK + tolerance,
      basis: "formula",
      source: FORMULA_SOURCE,
    },
    note: null,
  };
}
