import type { DiagnosisInput, MeteringDevice } from "../../schemas/diagnosis.ts";
import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";

/** A case written by intent: the saturation temperatures and differences a technician would find. */
export interface CaseDesign {
  refrigerant: string;
  meteringDevice: MeteringDevice;
  /** Intended dew point at the suction pressure, °C. */
  evaporatingDewC: number;
  /** Intended bubble point at the liquid pressure, °C. */
  condensingBubbleC: number;
  /** Intended superheat and subcooling, K: the line temperatures follow from them. */
  superheatK: number;
  subcoolingK: number;
  /** Gauge resolution, kPa: pressures are rounded to it (1 kPa on a digital manifold, common practice). */
  pressureResolutionKPa?: number;
  /** Other readings (air, electrical, targets); may override the derived line temperatures. */
  readings?: Partial<DiagnosisInput>;
}

const round = (value: number, step: number) =>
  Number((Math.round(value / step) * step).toFixed(Math.max(0, Math.ceil(-Math.log10(step)))));

/**
 * Readings of a physically consistent case from its intent: the suction gauge pressure is the
 * dew pressure at the intended evaporating temperature and the liquid gauge pressure the
 * bubble pressure at the intended condensing temperature (property engine, converted to gauge
 * at the case's atmosphere), rounded to the gauge's resolution; line temperatures are the
 * saturation temperatures plus superheat and minus subcooling, rounded to 0.1 °C.
 *
 * Units: °C, K in; kPa gauge and °C out. Range: saturation temperatures inside the
 * refrigerant's table. Source: TRADE.md §1.1 (dew for suction, bubble for liquid [S1][S2][S3]).
 *
 * @throws {PropertyRangeError} when a saturation temperature is outside the refrigerant's table
 * @example designCaseInput({ refrigerant: "R410A", meteringDevice: "txv", evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 5, subcoolingK: 6 }).suctionPressureKPa // 890
 */
export function designCaseInput(design: CaseDesign): DiagnosisInput {
  const atmosphere = design.readings?.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const resolution = design.pressureResolutionKPa ?? 1;
  const suction = saturationPressure(design.refrigerant, design.evaporatingDewC, "dew") - atmosphere;
  const liquid = saturationPressure(design.refrigerant, design.condensingBubbleC, "bubble") - atmosphere;
  return {
    refrigerant: design.refrigerant,
    meteringDevice: design.meteringDevice,
    suctionPressureKPa: round(suction, resolution),
    suctionLineTempC: round(design.evaporatingDewC + design.superheatK, 0.1),
    liquidPressureKPa: round(liquid, resolution),
    liquidLineTempC: round(design.condensingBubbleC - design.subcoolingK, 0.1),
    ...design.readings,
  };
}
