/**
 * IIR enthalpy/entropy reference (reference README §6): h' = 200 kJ/kg and
 * s' = 1 kJ/(kg·K) for the saturated liquid at 0 °C (bubble point for blends).
 * A constant shift of h and s leaves saturation states unchanged.
 */
import type { FluidModel } from "./fluid-model.ts";
import { saturationStateAt } from "./saturation-state.ts";

export const IIR_TEMPERATURE_K = 273.15;
export const IIR_LIQUID_ENTHALPY_J_PER_KG = 200_000;
export const IIR_LIQUID_ENTROPY_J_PER_KG_K = 1_000;

/**
 * Sets the model's enthalpy and entropy offsets so that it follows the IIR convention.
 * @param model fluid model (mutated: eos.enthalpyOffset / eos.entropyOffset)
 * @returns the applied shifts in kJ/kg and kJ/(kg·K) (R717: about −145.675 and −0.48349)
 * @throws Error when the 0 °C saturation solve fails
 * @example applyIirReference(createFluidModel(readReferenceFluid("R717"))).enthalpyShiftKJPerKg // ≈ -145.675
 */
export function applyIirReference(model: FluidModel): { enthalpyShiftKJPerKg: number; entropyShiftKJPerKgK: number } {
  const M = model.eos.molarMass;
  model.eos.enthalpyOffset = 0;
  model.eos.entropyOffset = 0;
  const state = saturationStateAt(model, IIR_TEMPERATURE_K);
  const dh = IIR_LIQUID_ENTHALPY_J_PER_KG * M - state.liquidEnthalpy;
  const ds = IIR_LIQUID_ENTROPY_J_PER_KG_K * M - state.liquidEntropy;
  model.eos.enthalpyOffset = dh;
  model.eos.entropyOffset = ds;
  return { enthalpyShiftKJPerKg: dh / M / 1000, entropyShiftKJPerKgK: ds / M / 1000 };
}
