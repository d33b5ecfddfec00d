import { CHARGE_STATES, type Finding, type RankedState } from "../../schemas/diagnosis.ts";

/** Scores at or below this are rounding left-overs of cancelling weights, not evidence. */
const SCORE_EPSILON = 1e-9;

/**
 * Sums the evidence of all findings per state and ranks the states, most likely first.
 * A state's score is the sum of its weights floored at 0; its confidence is 1 − e^(−score),
 * so it depends only on that state's own evidence (adding evidence for one fault never changes
 * another fault's confidence) and rises monotonically with its score. Ties keep the order of
 * `CHARGE_STATES` ("normal" first). States without positive evidence are left out.
 *
 * Units: dimensionless.
 *
 * @throws never
 * @example rankChargeStates([{ …, pointsTo: [{ state: "undercharged", weight: 1 }] }]) // [{ state: "undercharged", score: 1, confidence: 0.632 }]
 */
export function rankChargeStates(findings: readonly Finding[]): RankedState[] {
  const scores = new Map<RankedState["state"], number>();
  for (const finding of findings) {
    for (const evidence of finding.pointsTo) {
      scores.set(evidence.state, (scores.get(evidence.state) ?? 0) + evidence.weight);
    }
  }
  const ranked: RankedState[] = [];
  for (const state of CHARGE_STATES) {
    if (state === "insufficient-data") continue;
    const score = scores.get(state) ?? 0;
    if (score > SCORE_EPSILON) ranked.push({ state, score, confidence: 1 - Math.exp(-score) });
  }
  // Array.prototype.sort is stable, so equal scores keep CHARGE_STATES order.
  ranked.sort((first, second) => second.score - first.score);
  return ranked;
}
