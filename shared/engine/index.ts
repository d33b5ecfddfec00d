/**
 * Public entry point of the Satura engine: the only module src/ and server/ import from.
 */

// Refrigerant properties (tables generated from published equations of state)
export { listRefrigerants } from "./properties/list-refrigerants.ts";
export { getRefrigerant } from "./properties/get-refrigerant.ts";
export type { RefrigerantInfo } from "./properties/resolve-refrigerant.ts";
export { saturationPressure } from "./properties/saturation-pressure.ts";
export { saturationTemperature } from "./properties/saturation-temperature.ts";
export { saturatedState } from "./properties/saturated-state.ts";
export type { SaturatedState } from "./properties/saturated-state.ts";
export type { SaturationPoint } from "./properties/require-saturation-point.ts";
export { PropertyRangeError } from "./properties/property-range-error.ts";
export type { PropertyErrorCode } from "./properties/property-range-error.ts";
export { RefrigerantTableSchema } from "./properties/refrigerant-table-schema.ts";
export type { RefrigerantTable } from "./properties/refrigerant-table-schema.ts";
export {
  INTERPOLATION_TOLERANCE_K,
  KELVIN_OFFSET,
  STANDARD_ATMOSPHERE_KPA,
} from "./properties/property-tolerances.ts";
export { relativeDifference } from "./properties/relative-difference.ts";

// Units for display (convert-units inside; SI-metric in the engine)
export { gaugeToAbsolute } from "./units/gauge-to-absolute.ts";
export { absoluteToGauge } from "./units/absolute-to-gauge.ts";
export { convertPressure, PRESSURE_UNITS } from "./units/convert-pressure.ts";
export type { PressureUnit } from "./units/convert-pressure.ts";
export { convertTemperature, TEMPERATURE_UNITS } from "./units/convert-temperature.ts";
export type { TemperatureUnit } from "./units/convert-temperature.ts";
export { convertTemperatureDifference } from "./units/convert-temperature-difference.ts";
export { pressureToDisplay } from "./units/pressure-to-display.ts";
export type { PressureScale } from "./units/pressure-to-display.ts";
export { pressureFromDisplay } from "./units/pressure-from-display.ts";
