/**
 * The physical picture of each fault, for generating readings that a real circuit would give:
 * per application the healthy operating point, per fault how it moves. Written from the
 * symptom table (TRADE.md §2 [S21]–[S24], [S27]–[S30]) and the bands of §3, independently of the
 * engine's weights: the validation run (`npm run validate:diagnosis`) measures the engine
 * against these, and the casebook draws its practice cases from them.
 *
 * Moves of the coil and split temperature differences are in "band units" of the application
 * (half the width of its band), so that one description serves a comfort coil (19 ± 5 K) and a
 * freezer coil (6 ± 2 K) alike. Condensing is moved in kelvin scaled the same way.
 */
import type { Application, EvidenceState } from "../../schemas/diagnosis.ts";

export type Range = readonly [low: number, high: number];

/** The healthy operating point of one application. */
export interface OperatingPoint {
  outdoorC: Range;
  /** Return air (room air, entering fluid), °C. */
  returnC: Range;
  /** Wet-bulb depression of the return air, K (comfort only; null: no wet bulb taken). */
  wetBulbDepressionK: Range | null;
  /** Return − mean evaporating temperature, K. */
  evaporatorTdK: Range;
  /** Mean condensing − outdoor, K. */
  condensingOverAmbientK: Range;
  /** Return − supply, K (comfort: added to the psychrometric target). */
  splitK: Range;
  /** Evaporator-outlet superheat a TXV/EEV holds, K. */
  valveSuperheatK: Range;
  /** Subcooling target, K (the maker's figure when the nameplate has one). */
  subcoolingTargetK: Range;
  /** Discharge line − dew point at discharge pressure, K. */
  dischargeSuperheatK: Range;
  /** Superheat target of a capillary system in this application, K (no chart applies). */
  capillarySuperheatTargetK: number | null;
}

export const OPERATING_POINTS: Readonly<Record<Application, OperatingPoint>> = {
  "comfort-cooling": {
    outdoorC: [24, 38],
    returnC: [23, 27],
    wetBulbDepressionK: [4.5, 8],
    evaporatorTdK: [17, 21],
    condensingOverAmbientK: [10.5, 14.5],
    splitK: [-0.8, 0.8],
    valveSuperheatK: [4, 5.5],
    subcoolingTargetK: [4.5, 7],
    dischargeSuperheatK: [25, 35],
    capillarySuperheatTargetK: null,
  },
  "heat-pump": {
    outdoorC: [24, 36],
    returnC: [23, 26],
    wetBulbDepressionK: [4.5, 8],
    evaporatorTdK: [17, 21],
    condensingOverAmbientK: [10.5, 14.5],
    splitK: [-0.8, 0.8],
    valveSuperheatK: [4, 5.5],
    subcoolingTargetK: [4.5, 7],
    dischargeSuperheatK: [25, 35],
    capillarySuperheatTargetK: null,
  },
  "medium-temperature-refrigeration": {
    outdoorC: [18, 34],
    returnC: [1, 5],
    wetBulbDepressionK: null,
    evaporatorTdK: [6, 8],
    condensingOverAmbientK: [12, 16],
    splitK: [3.4, 4.6],
    valveSuperheatK: [5, 6.2],
    subcoolingTargetK: [3.5, 5.5],
    dischargeSuperheatK: [35, 45],
    capillarySuperheatTargetK: 5,
  },
  "low-temperature-refrigeration": {
    outdoorC: [18, 32],
    returnC: [-23, -18],
    wetBulbDepressionK: null,
    evaporatorTdK: [5.3, 6.7],
    condensingOverAmbientK: [12, 16],
    splitK: [2.8, 3.7],
    valveSuperheatK: [2.6, 3.4],
    subcoolingTargetK: [3.5, 5.5],
    dischargeSuperheatK: [38, 48],
    capillarySuperheatTargetK: 4,
  },
  "process-chilling": {
    outdoorC: [22, 36],
    returnC: [11, 14],
    wetBulbDepressionK: null,
    evaporatorTdK: [6.8, 8.2],
    condensingOverAmbientK: [12, 16],
    splitK: [4.4, 5.6],
    valveSuperheatK: [4.4, 5.6],
    subcoolingTargetK: [4.8, 6.2],
    dischargeSuperheatK: [25, 35],
    capillarySuperheatTargetK: null,
  },
};

/**
 * How a fault moves the operating point. Coil TD, split and condensing moves are in band units
 * (see above); superheat is absolute for valves (a valve wide open, or overfeeding) and relative
 * to target for fixed devices; subcooling relative to its target.
 */
export interface FaultMove {
  evaporatorTdUnits: Range;
  condensingUnits: Range;
  splitUnits: Range;
  /** Valve superheat at the evaporator outlet, K; null: the healthy range. */
  valveSuperheatK: Range | null;
  /** Fixed-device superheat minus its target, K. */
  fixedSuperheatFromTargetK: Range;
  /** Superheat whatever the device, K (an overfeeding valve or oversized orifice floods the coil). */
  anyDeviceSuperheatK: Range | null;
  /** Subcooling minus its target, K. */
  subcoolingFromTargetK: Range;
  /** Compressor current ÷ its healthy value. */
  currentFactor: Range;
  /** Added to the healthy discharge superheat, K. */
  dischargeSuperheatAddK: Range;
  /**
   * Non-condensable gas in the condenser: its partial pressure raises the gauge reading above
   * the refrigerant's own condensing pressure, worth this many band units of condensing.
   */
  nonCondensableUnits: Range | null;
}

const NONE: Range = [0, 0];

export const FAULT_MOVES: Readonly<Record<EvidenceState, FaultMove>> = {
  normal: {
    evaporatorTdUnits: NONE,
    condensingUnits: NONE,
    splitUnits: NONE,
    valveSuperheatK: null,
    fixedSuperheatFromTargetK: [-1.2, 1.2],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [-0.8, 0.8],
    currentFactor: [1, 1],
    dischargeSuperheatAddK: NONE,
    nonCondensableUnits: null,
  },
  undercharged: {
    evaporatorTdUnits: [1.6, 2.4],
    condensingUnits: [-1.8, -1.2],
    splitUnits: [-2, -1.2],
    valveSuperheatK: [12, 20],
    fixedSuperheatFromTargetK: [8, 13],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [-5, -3.5],
    currentFactor: [0.7, 0.85],
    dischargeSuperheatAddK: [10, 20],
    nonCondensableUnits: null,
  },
  overcharged: {
    evaporatorTdUnits: [-0.8, -0.4],
    condensingUnits: [0.8, 1.3],
    splitUnits: [-0.5, 0],
    valveSuperheatK: null,
    fixedSuperheatFromTargetK: [-7, -4.5],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [7, 10],
    currentFactor: [1.1, 1.2],
    dischargeSuperheatAddK: [-5, 0],
    nonCondensableUnits: null,
  },
  "restricted-metering": {
    evaporatorTdUnits: [1.6, 2.4],
    condensingUnits: [-0.6, 0],
    splitUnits: [-2, -1.2],
    valveSuperheatK: [12, 20],
    fixedSuperheatFromTargetK: [9, 14],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [2, 5],
    currentFactor: [0.75, 0.85],
    dischargeSuperheatAddK: [15, 25],
    nonCondensableUnits: null,
  },
  "low-evaporator-airflow": {
    evaporatorTdUnits: [1.6, 2.6],
    condensingUnits: [-0.6, -0.2],
    splitUnits: [1.6, 2.4],
    valveSuperheatK: null,
    fixedSuperheatFromTargetK: [-6.5, -4],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [-0.8, 1],
    currentFactor: [0.85, 0.95],
    dischargeSuperheatAddK: [-10, -5],
    nonCondensableUnits: null,
  },
  "overfeeding-metering": {
    evaporatorTdUnits: [-0.6, 0],
    condensingUnits: [-0.2, 0.2],
    splitUnits: [-0.6, 0],
    valveSuperheatK: [0.1, 1.2],
    fixedSuperheatFromTargetK: NONE,
    anyDeviceSuperheatK: [0.1, 1.2],
    subcoolingFromTargetK: [-0.8, 0.8],
    currentFactor: [0.95, 1.05],
    dischargeSuperheatAddK: [-18, -10],
    nonCondensableUnits: null,
  },
  "condenser-airflow": {
    evaporatorTdUnits: [-0.6, -0.2],
    condensingUnits: [2, 3],
    splitUnits: [-0.4, 0],
    valveSuperheatK: null,
    fixedSuperheatFromTargetK: [-2, 0],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [-2, 0],
    currentFactor: [1.12, 1.25],
    dischargeSuperheatAddK: [5, 15],
    nonCondensableUnits: null,
  },
  "non-condensables": {
    evaporatorTdUnits: [-0.4, 0],
    condensingUnits: [0.4, 0.8],
    splitUnits: [-0.4, 0],
    valveSuperheatK: null,
    fixedSuperheatFromTargetK: [-1.5, 1.5],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [-0.8, 0.8],
    currentFactor: [1.08, 1.18],
    dischargeSuperheatAddK: [5, 15],
    nonCondensableUnits: [1.6, 2.6],
  },
  "weak-compressor": {
    evaporatorTdUnits: [-2, -1.4],
    condensingUnits: [-1.8, -1.2],
    splitUnits: [-2, -1.4],
    valveSuperheatK: null,
    fixedSuperheatFromTargetK: [-4, -1],
    anyDeviceSuperheatK: null,
    subcoolingFromTargetK: [-1, 1.5],
    currentFactor: [0.55, 0.68],
    dischargeSuperheatAddK: [5, 20],
    nonCondensableUnits: null,
  },
};

/** Half-widths of each application's bands, K: one "band unit" (see above). */
export const BAND_UNITS: Readonly<Record<Application, { evaporatorTdK: number; splitK: number; condensingK: number }>> =
  {
    "comfort-cooling": { evaporatorTdK: 5, splitK: 2.5, condensingK: 4.2 },
    "heat-pump": { evaporatorTdK: 5, splitK: 2.5, condensingK: 4.2 },
    "medium-temperature-refrigeration": { evaporatorTdK: 3, splitK: 2, condensingK: 5.3 },
    "low-temperature-refrigeration": { evaporatorTdK: 2, splitK: 1.75, condensingK: 5.3 },
    "process-chilling": { evaporatorTdK: 2.5, splitK: 2, condensingK: 5.3 },
  };
