import { PropertyRangeError } from "../../shared/engine/index.ts";
import type { ChargeCircuit, InventoryConditions, OperatingPoint } from "./charge-circuit.ts";
import { operatingPointAt, type DesignFlow } from "./operating-point-at.ts";

/** Largest condenser outlet quality the search goes to: past it the circuit is far beyond any charge test. */
const MAX_OUTLET_QUALITY = 0.6;
/** The condenser keeps at least this share condensing, and at least half its design two-phase share (the head at most doubles its lift over the outdoor air). */
const MIN_TWO_PHASE_SHARE = 0.2;
const BISECTION_STEPS = 60;

/**
 * The operating point at which the circuit holds `chargeKg`: bisection on the charge coordinate
 * of `operatingPointAt` (condenser subcooled share, or outlet quality when negative), whose
 * inventory rises with it (more liquid stored in the condenser, and a fixed orifice fed more
 * liquid floods more of the evaporator).
 *
 * Units: kg in.
 *
 * @returns the point, or null when the charge lies outside what the model can hold (an empty
 *   condenser past 60 % outlet quality, or a condenser over four-fifths full of liquid)
 * @throws PropertyRangeError when a point leaves the property tables
 */
export function solveOperatingPoint(
  circuit: ChargeCircuit,
  conditions: InventoryConditions,
  chargeKg: number,
  design: DesignFlow,
): OperatingPoint | null {
  let low = -MAX_OUTLET_QUALITY;
  const designTwoPhaseShare = 1 - circuit.desuperheatingShare - circuit.designSubcooledShare;
  let high = 1 - circuit.desuperheatingShare - Math.max(MIN_TWO_PHASE_SHARE, designTwoPhaseShare / 2);
  // A head pressure past the property tables (near the critical point) counts as "holds more than
  // any charge": the search then stays below it, and a charge that needs it has no point.
  const held = (coordinate: number) => {
    try {
      return operatingPointAt(circuit, conditions, coordinate, design).inventory.totalKg;
    } catch (error) {
      if (error instanceof PropertyRangeError) return Infinity;
      throw error;
    }
  };
  if (held(low) > chargeKg || held(high) < chargeKg) return null;
  for (let step = 0; step < BISECTION_STEPS; step += 1) {
    const middle = (low + high) / 2;
    if (held(middle) < chargeKg) low = middle;
    else high = middle;
  }
  return Number.isFinite(held(low)) ? operatingPointAt(circuit, conditions, low, design) : null;
}
