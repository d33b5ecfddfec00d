/**
 * Typed error thrown by every refrigerant property lookup: unknown refrigerant,
 * input outside the generated table, non-finite input or an invalid option.
 * The message is written for a technician ("R32 below -60 °C is outside the table");
 * `code` is for programs. Lookups never return NaN and never extrapolate.
 *
 * @example
 *   try { saturationPressure("R32", -80) } catch (error) {
 *     if (error instanceof PropertyRangeError) error.code // "BELOW_RANGE"
 *   }
 */
export type PropertyErrorCode =
  | "UNKNOWN_REFRIGERANT"
  | "NOT_FINITE"
  | "BELOW_RANGE"
  | "ABOVE_RANGE"
  | "INVALID_POINT"
  | "INVALID_TABLE"
  /** single-phase lookups: the state lies between the bubble and dew curves */
  | "INSIDE_DOME"
  /** the refrigerant's saturation table (loadRefrigerant) or single-phase table has not been loaded */
  | "TABLE_NOT_LOADED";

export class PropertyRangeError extends Error {
  readonly code: PropertyErrorCode;
  readonly refrigerantId: string;

  constructor(code: PropertyErrorCode, refrigerantId: string, message: string) {
    super(message);
    this.name = "PropertyRangeError";
    this.code = code;
    this.refrigerantId = refrigerantId;
  }
}
