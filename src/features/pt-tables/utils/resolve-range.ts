import { parseDecimal } from "@/components/ui/field/number-input.tsx";
import {
  temperatureFromDisplay,
  TEMPERATURE_LABEL,
  formatNumber,
  temperatureToDisplay,
  type TemperatureDisplayUnit,
} from "@/lib/units/display-units.ts";
import { MAX_ROWS } from "./saturation-rows.ts";

export type ResolvedRange = { ok: true; fromC: number; toC: number } | { ok: false; message: string };

/** Checks a typed range against the refrigerant's table, in the user's unit. */
export function resolveRange(
  fromText: string,
  toText: string,
  stepK: number,
  unit: TemperatureDisplayUnit,
  limits: { minimumC: number; maximumC: number },
): ResolvedRange {
  const from = parseDecimal(fromText);
  const to = parseDecimal(toText);
  if (from === undefined || to === undefined) return { ok: false, message: "Enter both ends of the range" };
  if (from === "invalid" || to === "invalid")
    return { ok: false, message: "The range must be numbers, e.g. -40 and 60" };
  const fromC = temperatureFromDisplay(from, unit);
  const toC = temperatureFromDisplay(to, unit);
  const show = (celsius: number) =>
    `${formatNumber(temperatureToDisplay(celsius, unit), 1)} ${TEMPERATURE_LABEL[unit]}`;
  if (fromC >= toC) return { ok: false, message: "“From” must be below “To”" };
  if (fromC < limits.minimumC - 1e-9 || toC > limits.maximumC + 1e-9) {
    return { ok: false, message: `This table runs from ${show(limits.minimumC)} to ${show(limits.maximumC)}` };
  }
  if ((toC - fromC) / stepK + 1 > MAX_ROWS)
    return { ok: false, message: `That is more than ${MAX_ROWS} rows: use a larger step` };
  return { ok: true, fromC, toC };
}
