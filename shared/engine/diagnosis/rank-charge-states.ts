import { CHARGE_STATES, type Finding, type RankedState } from "../../schemas/diagnosis.ts";

type State = RankedState["state"];

/** Scores at or below this are rounding left-overs of cancelling weights, not evidence. */
const SCORE_EPSILON = 1e-9;
/** The states evidence can point to, in `CHARGE_STATES` order ("normal" first). */
const EVIDENCE_STATES = CHARGE_STATES.filter((state): state is State => state !== "insufficient-data");
if (EVIDENCE_STATES.length !== 9) throw new Error("rankChargeStates requires the nine evidence states of CHARGE_STATES");
const STATE_COUNT = EVIDENCE_STATES.length;
const STATE_INDEX = new Map<State, number>(EVIDENCE_STATES.map((state, index) => [state, index]));

const byScoreDescending = (first: RankedState, second: RankedState) => second.score - first.score;

/**
 * Sums the evidence of all findings per state and ranks the states, most likely first. A
 * finding whose `pointsTo` lists all nine states lists them in `CHARGE_STATES` order (as
 * `evidenceFromSignature` does); shorter lists may come in any order.
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
  const scores = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  for (let findingIndex = 0; findingIndex < findings.length; findingIndex += 1) {
    const pointsTo = findings[findingIndex]!.pointsTo;
    if (pointsTo.length === STATE_COUNT && pointsTo[0]!.state === "normal" && pointsTo[STATE_COUNT - 1]!.state === "weak-compressor") {
      // Signature evidence lists every state in CHARGE_STATES order: add by position, no
      // string lookups (about a hundred entries per diagnosis; performance).
      for (let index = 0; index < STATE_COUNT; index += 1) scores[index]! += pointsTo[index]!.weight;
      continue;
    }
    for (let evidenceIndex = 0; evidenceIndex < pointsTo.length; evidenceIndex += 1) {
      const evidence = pointsTo[evidenceIndex]!;
      scores[STATE_INDEX.get(evidence.state)!]! += evidence.weight;
    }
  }
  const ranked: RankedState[] = [];
  for (let index = 0; index < EVIDENCE_STATES.length; index += 1) {
    const score = scores[index]!;
    if (score > SCORE_EPSILON) ranked.push({ state: EVIDENCE_STATES[index]!, score, confidence: 1 - Math.exp(-score) });
  }
  // Array.prototype.sort is stable, so equal scores keep CHARGE_STATES order.
  ranked.sort(byScoreDescending);
  return ranked;
}
