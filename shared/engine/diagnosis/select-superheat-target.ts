import type { Application, MeteringDevice, SuctionTempLocation, TargetBand } from "../../schemas/diagnosis.ts";
import {
  APPLICATION_LIMITS,
  FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K,
  FIXED_ORIFICE_TARGET_SOURCE,
  NAMEPLATE_TARGET_TOLERANCE_K,
  NAMEPLATE_TARGET_TOLERANCE_SOURCE,
  SUCTION_LINE_ALLOWANCE,
} from "./diagnosis-limits.ts";
import { fixedOrificeTargetSuperheat } from "./fixed-orifice-target-superheat.ts";
import { formatTenths } from "./format-tenths.ts";
import { cite } from "../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../sources/diagnosis-sources.ts";

// The band sources never change: built once here instead of on every call (performance).
const FIXED_NAMEPLATE_SOURCE = `maker's target; ±${FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K} K installer tolerance ${cite(DIAGNOSIS_SOURCES, ["S10", "S17", "S18"])}`;
const VALVE_NAMEPLATE_SOURCE = `maker's target; ±${NAMEPLATE_TARGET_TOLERANCE_K} K: ${NAMEPLATE_TARGET_TOLERANCE_SOURCE}`;
const FORMULA_SOURCE = `SH = 1.5 × WB − 0.5 × DB − 4.4, ±${FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K} K: ${FIXED_ORIFICE_TARGET_SOURCE}`;
const NO_CHART_NOTE =
  "Charging charts for fixed metering devices are made for comfort air conditioning: a refrigeration or process capillary system is charged by weight or to the maker's superheat; superheat is not judged";

export interface SuperheatTargetChoice {
  band: TargetBand | null;
  /** Why there is no band, or a caution about the band used; null when nothing to say. */
  note: string | null;
  /** How far the band was moved for where superheat was read, K (negative: down; 0: not moved). */
  shiftK: number;
}

export interface SuperheatTargetOptions {
  /** The equipment's application (default comfort cooling). */
  application?: Application;
  /** Where the suction temperature was taken; unstated, no allowance is applied. */
  suctionTempLocation?: SuctionTempLocation;
  /** Line-set allowance between evaporator outlet and outdoor unit, K (see `suctionLineAllowance`). */
  allowanceK?: number;
}

/** The application's default TXV/EEV band, built once and shared (performance). */
const valveBands = new Map<Application, TargetBand>();
function valveBand(application: Application): TargetBand {
  let band = valveBands.get(application);
  if (!band) {
    const { lowK, highK, targetK, source } = APPLICATION_LIMITS[application].valveSuperheat;
    band = Object.freeze({ targetK, lowK, highK, basis: "common-practice" as const, source });
    valveBands.set(application, band);
  }
  return band;
}

/** Moves a band by the line-set allowance and says so in its source. */
function shifted(band: TargetBand, byK: number, where: string): TargetBand {
  if (byK === 0) return band;
  return {
    ...band,
    targetK: band.targetK + byK,
    lowK: Math.max(0, band.lowK + byK),
    highK: band.highK + byK,
    source: `${band.source}; ${byK > 0 ? "+" : "−"}${formatTenths(Math.abs(byK))} K for a reading at the ${where} (${SUCTION_LINE_ALLOWANCE.source})`,
  };
}

/**
 * Chooses the superheat band a measured superheat is judged against.
 *
 * - A maker's target (nameplate, manual or the unit's own chart) always wins; the unit's chart
 *   overrides the formula [S17][S18]. TXV/EEV: target ± 1.7 K; fixed: target ± 2.8 K [S10].
 * - TXV/EEV without one: the application's band (comfort 2.8–6.7 K [S15][S17][S9], medium-
 *   temperature refrigeration about 5.6 K, low temperature about 2.8 K [S15]).
 * - Fixed orifice / capillary without one: `fixedOrificeTargetSuperheat` from return-air wet
 *   bulb and outdoor dry bulb, ± 2.8 K [S10], for comfort cooling only (the charts are made for
 *   air conditioning); none outside the chart range or below 2.8 K.
 *
 * Where superheat was read moves the band: a TXV band (evaporator outlet) read at the outdoor
 * unit rises by the line-set allowance; a fixed-device chart target (outdoor unit) read at the
 * evaporator outlet falls by it. Unstated, each is read at its own reference point.
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
  options: SuperheatTargetOptions = {},
): SuperheatTargetChoice {
  const fixed = meteringDevice === "fixed-orifice" || meteringDevice === "capillary";
  const limits = APPLICATION_LIMITS[options.application ?? "comfort-cooling"];
  const allowance = options.allowanceK ?? 0;
  // Valve bands are evaporator-outlet values; fixed-device targets are outdoor-unit values.
  const shift = !options.suctionTempLocation
    ? 0
    : fixed
      ? options.suctionTempLocation === "evaporator-outlet"
        ? -allowance
        : 0
      : options.suctionTempLocation === "outdoor-unit"
        ? allowance
        : 0;
  const where = options.suctionTempLocation === "outdoor-unit" ? "outdoor unit" : "evaporator outlet";

  if (nameplateTargetK !== undefined) {
    const tolerance = fixed ? FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K : NAMEPLATE_TARGET_TOLERANCE_K;
    const source = fixed ? FIXED_NAMEPLATE_SOURCE : VALVE_NAMEPLATE_SOURCE;
    const band: TargetBand = {
      targetK: nameplateTargetK,
      lowK: Math.max(0, nameplateTargetK - tolerance),
      highK: nameplateTargetK + tolerance,
      basis: "nameplate",
      source,
    };
    return { band: shifted(band, shift, where), note: null, shiftK: shift };
  }
  if (!fixed) {
    const band = shifted(valveBand(options.application ?? "comfort-cooling"), shift, where);
    return { band, note: null, shiftK: shift };
  }
  if (!limits.fixedOrificeChart) return { band: null, note: NO_CHART_NOTE, shiftK: 0 };
  if (returnAirWetBulbC === null || outdoorAirDryBulbC === undefined) {
    return {
      band: null,
      note: "A fixed metering device needs the return air wet bulb (or dry bulb and humidity) and the outdoor dry bulb for its target superheat; superheat is not judged",
      shiftK: 0,
    };
  }
  const target = fixedOrificeTargetSuperheat(returnAirWetBulbC, outdoorAirDryBulbC);
  if (target.status !== "ok") return { band: null, note: target.reason, shiftK: 0 };
  const tolerance = FIXED_ORIFICE_SUPERHEAT_TOLERANCE_K;
  const band: TargetBand = {
    targetK: target.targetK,
    lowK: target.targetK - tolerance,
    highK: target.targetK + tolerance,
    basis: "formula",
    source: FORMULA_SOURCE,
  };
  return { band: shifted(band, shift, where), note: null, shiftK: shift };
}
