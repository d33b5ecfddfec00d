/**
 * A refrigerant circuit as the charge-inventory model sees it: internal volumes, the line set,
 * and its design operating point. Every figure is a plausible split air conditioner's, drawn by
 * `drawChargeCircuit`; none is a specific product's.
 */
export type InventoryMeteringDevice = "txv" | "eev" | "fixed-orifice";

export interface ChargeCircuit {
  refrigerant: string;
  meteringDevice: InventoryMeteringDevice;
  /** Condenser tube-side volume, m³. */
  condenserVolumeM3: number;
  /** Evaporator tube-side volume, m³. */
  evaporatorVolumeM3: number;
  liquidLineLengthM: number;
  liquidLineInnerDiameterM: number;
  /** The suction line runs the liquid line's length plus a metre inside the units. */
  suctionLineInnerDiameterM: number;
  /** Refrigerant dissolved in the compressor oil plus shell vapour, kg; held constant (it moves little with charge). */
  compressorAllowanceKg: number;
  /** Share of the condenser volume that desuperheats the discharge gas. */
  desuperheatingShare: number;
  /** Condensing (bubble) temperature over outdoor air at the design point, K. */
  condensingOverAmbientK: number;
  /** Return air minus evaporating (dew) temperature, K; held per circuit. */
  evaporatorTemperatureDifferenceK: number;
  /** Subcooling at the design point, K, and the share of the condenser volume it takes. */
  designSubcoolingK: number;
  designSubcooledShare: number;
  /**
   * Nameplate target subcooling minus the subcooling this circuit really shows at its correct
   * charge at the design point, K: the label is written for a nominal unit and line set, and
   * installers accept about ±1.7 K around it (Title 24 tolerance, TRADE.md §1.3, from memory).
   * Null when the label gives no target (the engine then falls back on its default band).
   */
  nameplateSubcoolingOffsetK: number | null;
  /** Superheat at the design point, K, and the share of the evaporator volume it takes. */
  designSuperheatK: number;
  designSuperheatedShare: number;
  /** Largest flow of the wide-open valve over the design flow (TXV/EEV only). */
  valveReserve: number;
  /** Fractional rise of a fixed orifice's flow per kelvin of inlet subcooling, 1/K. */
  orificeSubcoolingGainPerK: number;
  /** Void-fraction model of the two-phase zones: Zivi (the model's own) or homogeneous (a check). */
  voidFraction: "zivi" | "homogeneous";
}

/** Air conditions around the circuit, °C. */
export interface InventoryConditions {
  outdoorAirC: number;
  returnAirC: number;
  returnWetBulbC: number;
}

/** The design point: AHRI "A" rating conditions (35 °C outdoor, 26.7 °C / 19.4 °C wet bulb indoor), common practice. */
export const DESIGN_CONDITIONS: InventoryConditions = { outdoorAirC: 35, returnAirC: 26.7, returnWetBulbC: 19.4 };

/** A solved operating point. */
export interface OperatingPoint {
  condensingBubbleC: number;
  condensingPressureKPa: number;
  evaporatingDewC: number;
  evaporatingPressureKPa: number;
  /** 0 when the condenser outlet is two-phase. */
  subcoolingK: number;
  /** Quality at the condenser outlet, 0 while there is subcooling. */
  condenserOutletQuality: number;
  superheatK: number;
  subcooledShare: number;
  superheatedShare: number;
  /** Liquid-line temperature, °C (between bubble and dew for a zeotrope with flash gas). */
  liquidLineC: number;
  /** Refrigerant held, kg, by place. */
  inventory: InventoryBreakdown;
  /** True when the TXV/EEV is wide open and no longer holds its superheat. */
  valveWideOpen: boolean;
}

export interface InventoryBreakdown {
  condenserKg: number;
  liquidLineKg: number;
  evaporatorKg: number;
  suctionLineKg: number;
  compressorKg: number;
  totalKg: number;
}
