/**
 * Multi-fluid (GERG-type) Helmholtz mixture model of the refrigerant blends
 * (reference README §7): reducing functions, departure functions, fugacities, bubble
 * and dew points, critical point. Generation time and tests only; never bundled.
 */
export { readBinaryPairs, readBlends, readDepartureFunctions } from "./mixture-data.ts";
export type { BinaryPairRecord, BlendRecord, DepartureFunctionRecord } from "./mixture-data.ts";
export { createReducingFunctions } from "./reducing-functions.ts";
export type { PairReducingParameters, ReducingFunctions, ReducingValues } from "./reducing-functions.ts";
export { compileDepartureFunction } from "./departure-function.ts";
export { createMixtureComponent, createMixtureModel, matchPairs, MIXTURE_GAS_CONSTANT } from "./mixture-model.ts";
export type { MixtureComponent, MixtureModel, MixturePair, MixturePhase, MixtureResidual } from "./mixture-model.ts";
export {
  coldStart,
  ENVELOPE_TOLERANCE,
  envelopeSlope,
  envelopeUnknowns,
  solveEnvelopePoint,
} from "./envelope-point.ts";
export type { EnvelopeKind, EnvelopePoint, EnvelopeSpecification, EnvelopeStart } from "./envelope-point.ts";
export { blendCoverageGap, createBlendModel } from "./blend-model.ts";
export type { BlendModel } from "./blend-model.ts";
export {
  applyBlendIirReference,
  blendCriticalPoint,
  blendPointAtPressure,
  blendSaturationState,
  traceSaturationCurve,
} from "./blend-saturation.ts";
export type { BlendCriticalPoint } from "./blend-saturation.ts";
export { solveLinearSystem } from "./solve-linear-system.ts";
