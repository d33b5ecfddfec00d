import { CHARGE_STATES, type Finding, type RankedState } from "../../schemas/diagnosis.ts";

type State = RankedState["state"];

/** Scores at or below this are rounding left-overs of cancelling weights, not evidence. */
const SCORE_EPSILON = 1e-9;
/** The states evidence can point to, in `CHARGE_STATES` order ("normal" first). */
const EVIDENCE_STATES = CHARGE_STATES.filter((state): state is State => state !== "insufficient-data");
if (EVIDENCE_STATES.length !== 9)
  throw new Error("rankChargeStates requires the nine evidence states of CHARGE_STATES");
/**
 * The nine state names all differ in length, so a name's length is its index (one array read
 * instead of a hashed string lookup per evidence entry, about fifty per diagnosis; performance).
 * Checked here: a new state of a length already taken would fail at load, not mis-rank.
 */
const INDEX_BY_LENGTH: number[] = [];
for (const [index, state] of EVIDENCE_STATES.entries()) {
  if (INDEX_BY_LENGTH[state.length] !== undefined)
    throw new Error("rankChargeStates requires state names of distinct lengths");
  INDEX_BY_LENGTH[state.length] = index;
}

const byScoreDescending = (first: RankedState, second: RankedState) => second.score - first.score;

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
  const scores = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  // Hot path: indexes stay below their arrays' lengths, and every state's length is in
  // INDEX_BY_LENGTH (built from the same nine states) with an index below nine.
  for (let findingIndex = 0; findingIndex < findings.length; findingIndex += 1) {
    const pointsTo = findings[findingIndex]!.pointsTo;
    for (let evidenceIndex = 0; evidenceIndex < pointsTo.length; evidenceIndex += 1) {
      const evidence = pointsTo[evidenceIndex]!;
      scores[INDEX_BY_LENGTH[evidence.state.length]!]! += evidence.weight;
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
