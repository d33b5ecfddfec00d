import { CHARGE_STATES, type Evidence, type EvidenceState } from "../../schemas/diagnosis.ts";
import { signatureCell } from "./signature-cell.ts";
import { signatureMatch } from "./signature-match.ts";
import {
  SIGNATURE_FEATURES,
  type MeteringFamily,
  type SignatureCell,
  type SignatureFeature,
} from "./signature-table.ts";

const EVIDENCE_STATES = CHARGE_STATES.filter((state): state is EvidenceState => state !== "insufficient-data");

type CompiledCells = readonly (readonly [EvidenceState, SignatureCell])[];

function compile(family: MeteringFamily): Record<SignatureFeature, CompiledCells> {
  const byFeature = {} as Record<SignatureFeature, CompiledCells>;
  for (const feature of SIGNATURE_FEATURES) {
    const list: (readonly [EvidenceState, SignatureCell])[] = [];
    for (const state of EVIDENCE_STATES) {
      const found = signatureCell(state, feature, family);
      if (found) list.push([state, found]);
    }
    byFeature[feature] = list;
  }
  return byFeature;
}

/** The table's cells per family and feature, in state order, built once (performance: no key strings per call). */
const FIXED_CELLS = compile("fixed");
const VALVE_CELLS = compile("expansion-valve");

/**
 * The evidence one judged reading gives each state, read from the signature table: the cell's
 * weight × how well the reading matches the cell's expectation (`signatureMatch`). States the
 * reading says nothing about are left out. See `signatureMatch` for the two deviations.
 *
 * Units: dimensionless weights. Source: the signature table (TRADE.md §2).
 *
 * @throws never
 * @example evidenceFromSignature("superheat", "fixed", 1, 0).find((e) => e.state === "undercharged")?.weight // 1.5
 */
export function evidenceFromSignature(
  feature: SignatureFeature,
  family: MeteringFamily,
  bandStrength: number,
  pivotDeviation: number,
): Evidence[] {
  const cells = (family === "fixed" ? FIXED_CELLS : VALVE_CELLS)[feature];
  const evidence: Evidence[] = [];
  // Hot path (once per rule per diagnosis): an indexed loop, index < cells.length.
  for (let index = 0; index < cells.length; index += 1) {
    const entry = cells[index]!;
    const found = entry[1];
    const weight = found.weight * signatureMatch(found.expect, bandStrength, pivotDeviation);
    if (weight !== 0) evidence.push({ state: entry[0], weight });
  }
  return evidence;
}
