/**
 * A blend of blends.tsv as the generator sees it: its components (pure-fluid files of
 * the pack), the pair parameters matched by CAS number, the mixture model and the
 * overall mole fractions (README §7.1: x_i = (w_i/M_i)/Σ w_j/M_j, renormalised).
 */
import { readReferenceFluid, listReferenceDesignations } from "../load-reference.ts";
import type { BinaryPairRecord, BlendRecord, DepartureFunctionRecord } from "./mixture-data.ts";
import {
  createMixtureComponent,
  createMixtureModel,
  matchPairs,
  type MixtureModel,
  type MixturePair,
} from "./mixture-model.ts";

export interface BlendModel {
  readonly designation: string;
  readonly record: BlendRecord;
  readonly model: MixtureModel;
  /** overall mole fractions, Σ = 1 */
  readonly moleFractions: Float64Array;
  /** kg/mol of the blend at its nominal composition */
  readonly molarMass: number;
  /** highest triple point of the components, K */
  readonly minimumTemperature: number;
  readonly pairs: readonly MixturePair[];
}

/** Why a blend of blends.tsv cannot be modelled, or null when it can. */
export function blendCoverageGap(
  record: BlendRecord,
  pairRecords: readonly BinaryPairRecord[],
  departureRecords: readonly DepartureFunctionRecord[],
): string | null {
  const available = new Set(listReferenceDesignations());
  const absent = record.components.filter((c) => !available.has(c));
  if (absent.length > 0) return `no pure-fluid file for ${absent.join(", ")}`;
  const components = record.components.map((c) => readReferenceFluid(c));
  const pseudo = components.filter((file) => file.EOS[0].pseudo_pure);
  if (pseudo.length > 0) return `component ${pseudo[0]!.designation} is itself pseudo-pure`;
  const { missing } = matchPairs(components.map(createMixtureComponent), pairRecords, departureRecords);
  return missing.length > 0 ? `no interaction parameters for ${missing.join(", ")}` : null;
}

/**
 * @param record one blend of blends.tsv
 * @returns its multi-fluid model at the nominal composition
 * @throws Error when a component file or a pair is missing (check blendCoverageGap first)
 * @example createBlendModel(readBlends().find((b) => b.designation === "R454B")!, pairs, departures).moleFractions
 */
export function createBlendModel(
  record: BlendRecord,
  pairRecords: readonly BinaryPairRecord[],
  departureRecords: readonly DepartureFunctionRecord[],
): BlendModel {
  const components = record.components.map((c) => createMixtureComponent(readReferenceFluid(c)));
  const { pairs, missing } = matchPairs(components, pairRecords, departureRecords);
  if (missing.length > 0) throw new Error(`${record.designation}: no interaction parameters for ${missing.join(", ")}`);
  const model = createMixtureModel(components, pairs);
  const moles = record.massPercent.map((w, i) => w / components[i]!.molarMass);
  const total = moles.reduce((sum, value) => sum + value, 0);
  const moleFractions = Float64Array.from(moles, (value) => value / total);
  return {
    designation: record.designation,
    record,
    model,
    moleFractions,
    molarMass: model.molarMass(moleFractions),
    minimumTemperature: Math.max(...components.map((c) => c.minimumTemperature)),
    pairs,
  };
}
