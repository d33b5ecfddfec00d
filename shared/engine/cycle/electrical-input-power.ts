/**
 * Electrical input power of a compressor from its running current, supply voltage and power
 * factor: P = V·I·cos φ on a single-phase supply, P = √3·V_LL·I·cos φ on a balanced three-phase
 * supply with the line-to-line voltage (IEC 60050-131 active power; any electrical-engineering
 * text, e.g. Hughes, Electrical and Electronic Technology, ch. on three-phase systems).
 *
 * Units: A, V, dimensionless power factor (0–1] → kW.
 * Valid range: current ≥ 0, voltage > 0, 0 < power factor ≤ 1, phases 1 or 3.
 *
 * @throws {RangeError} "electricalInputPower requires ..." for a value outside its range
 * @example electricalInputPower({ currentA: 10, voltageV: 400, powerFactor: 0.85, phases: 3 }) // ≈ 5.889 (kW)
 */
export function electricalInputPower(input: {
  currentA: number;
  voltageV: number;
  powerFactor: number;
  phases: 1 | 3;
}): number {
  const { currentA, voltageV, powerFactor, phases } = input;
  if (!Number.isFinite(currentA) || currentA < 0)
    throw new RangeError("electricalInputPower requires a current of zero or more");
  if (!Number.isFinite(voltageV) || !(voltageV > 0))
    throw new RangeError("electricalInputPower requires a voltage above zero");
  if (!Number.isFinite(powerFactor) || !(powerFactor > 0) || powerFactor > 1) {
    throw new RangeError("electricalInputPower requires a power factor above 0 and at most 1");
  }
  if (phases !== 1 && phases !== 3) throw new RangeError("electricalInputPower requires 1 or 3 phases");
  return ((phases === 3 ? Math.sqrt(3) : 1) * voltageV * currentA * powerFactor) / 1000;
}
