/**
 * Equation-of-state toolkit used at generation time (scripts/build-tables.ts),
 * in tests and in the benchmark. Never bundled into the browser.
 *
 * For a later multi-fluid mixture model: `compileResidualHelmholtz` gives each
 * component's α^r(τ, δ) with all first and second derivatives, evaluated at the
 * mixture's reduced variables; `compileIdealHelmholtz` gives the ideal-gas part.
 */
export { compileResidualHelmholtz, createResidualDerivatives } from "./residual-helmholtz.ts";
export type { ResidualDerivatives, ResidualHelmholtz } from "./residual-helmholtz.ts";
export { compileIdealHelmholtz } from "./ideal-helmholtz.ts";
export type { IdealDerivatives, IdealHelmholtz } from "./ideal-helmholtz.ts";
export { HyperDual } from "./hyper-dual.ts";
export { createHelmholtzEos } from "./helmholtz-eos.ts";
export type { EosState, HelmholtzEos } from "./helmholtz-eos.ts";
export { createSuperancillary, chebyshevSum } from "./superancillary.ts";
export type { SuperancillaryCurve } from "./superancillary.ts";
export { createAncillary } from "./ancillary.ts";
export type { AncillaryCurve } from "./ancillary.ts";
export { solvePhaseEquilibrium } from "./phase-equilibrium.ts";
export { createFluidModel } from "./fluid-model.ts";
export type { FluidModel } from "./fluid-model.ts";
export { saturationStateAt, saturationTemperatureAt, SuperancillaryMismatchError } from "./saturation-state.ts";
export type { SaturationState, SaturationOptions } from "./saturation-state.ts";
export { applyIirReference, IIR_TEMPERATURE_K } from "./reference-state.ts";
export {
  listReferenceDesignations,
  readReferenceFluid,
  readReferenceManifest,
  referencePackExists,
  referenceRoot,
  repoRoot,
  requireReferencePack,
} from "./load-reference.ts";
export type * from "./reference-types.ts";
