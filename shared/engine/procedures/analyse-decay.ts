import type { DecayAnalysis, DecayOptions, DecayWording } from "../../schemas/procedures.ts";
import { leastSquaresSlope } from "../diagnosis/least-squares-slope.ts";
import { describeDecay } from "./describe-decay.ts";
import { limitSource } from "./limit-source.ts";
import { EVACUATION_LIMITS } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";
import { requireVacuumSamples } from "./require-vacuum-samples.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(
  PROCEDURE_SOURCES,
  ["S4", "S52", "S53", "S54", "S55", "S58"],
  `levelling-off test (${COMMON_PRACTICE})`,
);
/** Shortest hold makers ask for, minutes [S53] (another asks 20 [S52]). */
const SHORTEST_MAKER_HOLD_MINUTES = 15;

function slopeOf(samples: readonly { minutes: number; microns: number }[]): number {
  return leastSquaresSlope(
    samples.map((sample) => sample.minutes),
    samples.map((sample) => sample.microns),
  );
}

/**
 * Reads a vacuum decay (pressure-rise) test: the readings taken after the pump is valved off.
 *
 * - held: every reading stays at or under the hold limit (default: the 500-micron target;
 *   makers ask for 500 µm held for 15–20 minutes [S52][S53]) — tight and dry.
 * - moisture: the reading rose above the hold limit, then levelled off, and ended at or below
 *   the leak threshold (default 5000 µm [S54]) — tight but wet; evacuate longer [S58][S55].
 * - leak: the reading ended above the leak threshold, or was still rising [S58][S55][S54].
 *
 * Levelling off: the readings are split into an earlier and a later half (sharing the middle
 * reading); each half's rise rate is its least-squares slope. The curve has levelled off when
 * the later rate is at most `levelledRatio` (default 0.25) × the earlier rate, or no faster than
 * `flatRiseMicronsPerMinute` (default 2 µm/min). A leak into a vacuum is a choked flow and
 * rises in a straight line (ratio ≈ 1); moisture approaches its vapour pressure and flattens.
 * With only two readings there is no earlier half: the curve counts as level only if flat.
 * These two figures are this engine's choice (no published number; common practice reading).
 *
 * `riseRateMicronsPerMinute` is the later half's rate: how fast it was still rising when the
 * test ended. The reason notes a test shorter than 15 minutes [S53].
 *
 * @param samples readings after valve-off, in time order: minutes (strictly increasing), microns (≥ 0); at least two
 * @param options targetMicrons (default 500), holdMicrons (default the target), leakRiseMicrons
 *   (default 5000), levelledRatio, flatRiseMicronsPerMinute — any left out take EVACUATION_LIMITS
 * @returns verdict, later-half rise rate (µm/min), final reading (µm), levelledOff, reason (in
 *   microns), source, and the figures the reason is built from (`wording`, for describeDecay)
 * @throws RangeError "analyseDecay requires ..." for fewer than two readings, unsorted or
 *   non-finite readings, or a non-positive or non-finite limit
 * @example analyseDecay([{ minutes: 0, microns: 400 }, { minutes: 10, microns: 430 }, { minutes: 20, microns: 450 }]).verdict // "held"
 */
export function analyseDecay(
  samples: readonly { minutes: number; microns: number }[],
  options: DecayOptions = {},
): DecayAnalysis {
  const { first, last } = requireVacuumSamples(samples, 2, "analyseDecay");
  const { holdMicrons: holdOption, ...limitOptions } = options;
  const { limits, overridden } = resolveLimits(EVACUATION_LIMITS, limitOptions);
  const holdMicrons = holdOption ?? limits.targetMicrons;
  if (
    !Number.isFinite(holdMicrons) ||
    !(holdMicrons > 0) ||
    !(limits.targetMicrons > 0) ||
    !(limits.leakRiseMicrons > 0)
  ) {
    throw new RangeError("analyseDecay requires hold, target and leak limits above zero microns");
  }
  const source = limitSource(SOURCE, overridden || holdOption !== undefined);

  const finalMicrons = last.microns;
  const peakMicrons = Math.max(...samples.map((sample) => sample.microns));
  const middle = Math.floor((samples.length - 1) / 2);
  const earlier = samples.slice(0, middle + 1);
  const later = samples.slice(middle);
  const riseRateMicronsPerMinute = slopeOf(later);
  const earlierRate = earlier.length >= 2 ? slopeOf(earlier) : null;
  const levelledOff =
    riseRateMicronsPerMinute <= limits.flatRiseMicronsPerMinute ||
    (earlierRate !== null && riseRateMicronsPerMinute <= limits.levelledRatio * earlierRate);

  const minutes = last.minutes - first.minutes;
  const common = { riseRateMicronsPerMinute, finalMicrons, levelledOff, source };
  // The sentence is built from these figures (describeDecay) so a client can word it in pascals.
  const facts = {
    holdMicrons,
    leakRiseMicrons: limits.leakRiseMicrons,
    startMicrons: first.microns,
    finalMicrons,
    riseRateMicronsPerMinute,
    minutes,
    risen: peakMicrons > first.microns,
    twoReadingsOnly: earlierRate === null,
    shortOfMinutes: minutes < SHORTEST_MAKER_HOLD_MINUTES ? SHORTEST_MAKER_HOLD_MINUTES : null,
  };
  const judged = (verdict: DecayAnalysis["verdict"], wordingCase: DecayWording["case"]): DecayAnalysis => {
    const wording = { case: wordingCase, ...facts };
    return { verdict, ...common, reason: describeDecay(wording), wording };
  };

  if (peakMicrons <= holdMicrons) return judged("held", "held");
  if (finalMicrons > limits.leakRiseMicrons) return judged("leak", "leak-past-threshold");
  if (levelledOff) {
    // "Rose above" only when the pull-down had reached the hold limit; otherwise it never got there.
    return judged(
      "moisture",
      first.microns > holdMicrons ? "moisture-never-reached" : facts.risen ? "moisture-rose" : "moisture-stayed-above",
    );
  }
  return judged("leak", "leak-still-rising");
}
