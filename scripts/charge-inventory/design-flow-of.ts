import { saturatedPhasesAtPressure, singlePhaseState } from "../../shared/engine/index.ts";
import type { ChargeCircuit, InventoryConditions } from "./charge-circuit.ts";
import { operatingPointAt, type DesignFlow } from "./operating-point-at.ts";

/**
 * The design point's flow figures (`DesignFlow`): the operating point at the design conditions
 * and design subcooled share, before any device closure, gives the metering device's flow
 * factor √(ρ_inlet·Δp)·(1 + b·SC) and the evaporator's two-phase enthalpy rise, against which
 * every other point scales its flow and duty.
 *
 * Units: kJ/kg; flow factor in √(kg/m³·kPa) (only its ratios are used).
 *
 * @throws PropertyRangeError when the design point leaves the property tables
 */
export function designFlowOf(circuit: ChargeCircuit, conditions: InventoryConditions): DesignFlow {
  const point = operatingPointAt(circuit, conditions, circuit.designSubcooledShare, null);
  const refrigerant = circuit.refrigerant;
  const liquid =
    point.subcoolingK > 0.01
      ? singlePhaseState(refrigerant, point.condensingPressureKPa, point.liquidLineC)
      : saturatedPhasesAtPressure(refrigerant, point.condensingPressureKPa).liquid;
  const low = saturatedPhasesAtPressure(refrigerant, point.evaporatingPressureKPa);
  const orificeGain =
    circuit.meteringDevice === "fixed-orifice" ? 1 + circuit.orificeSubcoolingGainPerK * point.subcoolingK : 1;
  return {
    flowFactor:
      Math.sqrt(liquid.densityKgPerM3 * (point.condensingPressureKPa - point.evaporatingPressureKPa)) * orificeGain,
    twoPhaseEnthalpyRiseKJPerKg: low.vapour.enthalpyKJPerKg - liquid.enthalpyKJPerKg,
  };
}
