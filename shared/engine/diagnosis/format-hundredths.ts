/**
 * Formats a number with exactly two decimals for finding messages ("0.85", "1.10"), rounding
 * half away from zero; a faster stand-in for `toFixed(2)` (see `formatTenths`).
 *
 * Units: any.
 *
 * @throws never; non-finite values come back as "—"
 * @example formatHundredths(1.104) // "1.10"
 */
export function formatHundredths(value: number): string {
  if (!Number.isFinite(value)) return "—";
  const hundredths = Math.round(Math.abs(value) * 100);
  const whole = Math.floor(hundredths / 100);
  const fraction = hundredths - whole * 100;
  const sign = value < 0 && hundredths !== 0 ? "-" : "";
  return sign + whole + "." + (fraction < 10 ? "0" : "") + fraction;
}
