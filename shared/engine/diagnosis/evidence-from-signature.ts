import { CHARGE_STATES, type Evidence, type EvidenceState } from "../../schemas/diagnosis.ts";
import { signatureCell } from "./signature-cell.ts";
import { signatureMatch } from "./signature-match.ts";
import type { MeteringFamily, SignatureCell, SignatureFeature } from "./signature-table.ts";

const EVIDENCE_STATES = CHARGE_STATES.filter((state): state is EvidenceState => state !== "insufficient-data");

/** The table's cells per feature and family, in state order, built once (performance). */
const compiled = new Map<string, readonly (readonly [EvidenceState, SignatureCell])[]>();

function cellsOf(feature: SignatureFeature, family: MeteringFamily) {
  const key = family === "fixed" ? feature + "|f" : feature;
  let cells = compiled.get(key);
  if (!cells) {
    const list: (readonly [EvidenceState, SignatureCell])[] = [];
    for (const state of EVIDENCE_STATES) {
      const found = signatureCell(state, feature, family);
      if (found) list.push([state, found]);
    }
    cells = list;
    compiled.set(key, cells);
  }
  return cells;
}

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
export function evidenceFromSignature(feature: SignatureFeature, family: MeteringFamily, bandStrength: number, pivotDeviation: number): Evidence[] {
  const cells = cellsOf(feature, family);
  const evidence: Evidence[] = [];
  for (let index = 0; index < cells.length; index += 1) {
    const [state, found] = cells[index]!;
    const weight = found.weight * signatureMatch(found.expect, bandStrength, pivotDeviation);
    if (weight !== 0) evidence.push({ state, weight });
  }
  return evidence;
}
