import convert from "convert-units";

/**
 * The engine's one door to the convert-units package (decision 043): every factor between
 * display units comes from its tables (https://github.com/convert-units/convert-units, 2.x),
 * none is written by hand. The other unit modules call this rather than the package, so a
 * change of library, or of how it is called, happens here alone.
 *
 * One overload per measure, so TypeScript refuses a conversion between two measures
 * (°C to Pa) that the package would only refuse at run time.
 *
 * @param value a number in `from` units (the callers check it is finite)
 * @param from the package's abbreviation of the source unit ("C", "kPa", "mm"…)
 * @param to the package's abbreviation of the target unit, of the same measure
 * @returns the value in `to` units, exactly as `convert(value).from(from).to(to)` gives it
 * @throws Error from convert-units for an unknown unit or two different measures
 * @example convertMeasure(101.325, "kPa", "psi") // ≈ 14.696
 */
export function convertMeasure(value: number, from: convert.Temperature, to: convert.Temperature): number;
export function convertMeasure(value: number, from: convert.Pressure, to: convert.Pressure): number;
export function convertMeasure(value: number, from: convert.Distance, to: convert.Distance): number;
export function convertMeasure(value: number, from: convert.Unit, to: convert.Unit): number {
  return convert(value).from(from).to(to);
}
