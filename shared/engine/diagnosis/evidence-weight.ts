import type { EvidenceState, Finding } from "../../schemas/diagnosis.ts";

/**
 * The weight one finding gives one state: positive supports it, negative speaks against it, 0
 * when the finding says nothing about it.
 *
 * @throws never
 * @example evidenceWeight({ …, pointsTo: [{ state: "undercharged", weight: 0.8 }] }, "undercharged") // 0.8
 */
export function evidenceWeight(finding: Finding, state: EvidenceState): number {
  const pointsTo = finding.pointsTo;
  // Hot path (once per finding and state): an indexed loop, index < pointsTo.length.
  for (let index = 0; index < pointsTo.length; index += 1)
    if (pointsTo[index]!.state === state) return pointsTo[index]!.weight;
  return 0;
}
