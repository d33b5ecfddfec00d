/**
 * Numbers shown and typed in the user's display units; storage stays SI-metric. What a number is
 * (its `Quantity`) comes from the catalogue of reading fields (shared/schemas/reading-fields.ts).
 * Charge (kg) and line length (m) are shown metric whatever the display units: the display
 * settings have no mass or length unit yet.
 */
import type { Quantity } from "@shared/schemas/reading-fields.ts";
import { parseDecimal } from "@/components/ui/field/number-input.tsx";
import {
  DIFFERENCE_LABEL,
  differenceToDisplay,
  formatNumber,
  GAUGE_LABEL,
  gaugeFromDisplay,
  gaugeToDisplay,
  PRESSURE_DECIMALS,
  TEMPERATURE_LABEL,
  temperatureFromDisplay,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";

export function unitLabel(quantity: Quantity, units: DisplayUnits): string {
  switch (quantity) {
    case "pressure":
      return GAUGE_LABEL[units.pressure];
    case "temperature":
      return TEMPERATURE_LABEL[units.temperature];
    case "difference":
      return DIFFERENCE_LABEL[units.temperature];
    case "current":
      return "A";
    case "minutes":
      return "min";
    case "percent":
      return "%";
    case "mass":
      return "kg";
    case "length":
      return "m";
  }
}

/** SI value → the text shown, without the unit. */
export function formatQuantity(value: number, quantity: Quantity, units: DisplayUnits, atmosphericKPa: number): string {
  switch (quantity) {
    case "pressure":
      return formatNumber(gaugeToDisplay(value, units.pressure, atmosphericKPa), PRESSURE_DECIMALS[units.pressure]);
    case "temperature":
      return formatNumber(temperatureToDisplay(value, units.temperature), 1);
    case "difference":
      return formatNumber(differenceToDisplay(value, units.temperature), 1);
    default:
      return String(value);
  }
}

/** "4.5 K", "−1.2 °C", "890 kPa g". */
export function withUnit(
  value: number | null,
  quantity: Quantity,
  units: DisplayUnits,
  atmosphericKPa: number,
): string {
  if (value === null) return "none";
  return `${formatQuantity(value, quantity, units, atmosphericKPa)} ${unitLabel(quantity, units)}`;
}

/** Display value → SI; a temperature difference in °F is divided by 1.8 (1 K = 1.8 °F of difference). */
export function toSi(value: number, quantity: Quantity, units: DisplayUnits, atmosphericKPa: number): number {
  switch (quantity) {
    case "pressure":
      return gaugeFromDisplay(value, units.pressure, atmosphericKPa);
    case "temperature":
      return temperatureFromDisplay(value, units.temperature);
    case "difference":
      return units.temperature === "C" ? value : value / 1.8;
    default:
      return value;
  }
}

/** What was typed → SI number, undefined for blank, or "invalid". */
export function parseQuantity(
  text: string,
  quantity: Quantity,
  units: DisplayUnits,
  atmosphericKPa: number,
): number | undefined | "invalid" {
  const parsed = parseDecimal(text);
  if (parsed === undefined || parsed === "invalid") return parsed;
  return toSi(parsed, quantity, units, atmosphericKPa);
}
