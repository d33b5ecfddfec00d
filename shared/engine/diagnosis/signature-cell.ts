import type { EvidenceState } from "../../schemas/diagnosis.ts";
import { SIGNATURES, type MeteringFamily, type SignatureCell, type SignatureFeature } from "./signature-table.ts";

/**
 * One cell of the signature table: what a reading does under a state, for the metering family
 * at hand, or null when that reading says nothing about the state.
 *
 * @throws never
 * @example signatureCell("undercharged", "subcooling", "expansion-valve") // { expect: "below-pivot", weight: 1.5 }
 */
export function signatureCell(
  state: EvidenceState,
  feature: SignatureFeature,
  family: MeteringFamily,
): SignatureCell | null {
  const entry = SIGNATURES[state].cells[feature];
  if (!entry) return null;
  if ("expect" in entry) return entry;
  return family === "fixed" ? entry.fixed : entry.valve;
}
