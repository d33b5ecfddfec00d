import { safetyClasses, describeSafetyClass } from "../../content/safety-classes.ts";
import type { SafetyNote } from "../../schemas/casebook.ts";
import type { ChargeState } from "../../schemas/diagnosis.ts";
import { getRefrigerant } from "../properties/get-refrigerant.ts";

/** The job each verdict leads to, and the hazard that job carries (PRODUCT.md "Safety"; TRADE.md §5, §7.3, §9). */
const NEXT_JOB_HAZARD: Partial<Record<ChargeState, SafetyNote>> = {
  undercharged: {
    topic: "liquid-refrigerant",
    reason: "The fix is to find the leak and weigh refrigerant in: liquid refrigerant causes frostbite.",
  },
  overcharged: {
    topic: "recovery-cylinder",
    reason: "The fix is to recover the surplus into a weighed recovery cylinder.",
  },
  "restricted-metering": {
    topic: "pressure",
    reason:
      "Changing a filter drier or metering device means opening the circuit: recover first and keep pressures within the rated limits.",
  },
  "low-evaporator-airflow": {
    topic: "electrical",
    reason: "Filters, belts and the indoor fan are worked on with the unit isolated and proven dead.",
  },
  "condenser-airflow": {
    topic: "electrical",
    reason: "Cleaning the condenser or changing its fan motor is done with the unit isolated and proven dead.",
  },
  "non-condensables": {
    topic: "nitrogen",
    reason: "The fix is to recover, pressure-test with dry nitrogen, evacuate and recharge by weight.",
  },
  "weak-compressor": {
    topic: "electrical",
    reason: "Compressor checks (windings, insulation, contactor) start with isolation and proving dead.",
  },
};

/**
 * The safety notes that apply to a case: the caution of the refrigerant's safety class
 * (flammable for A2L/A3, toxic for B classes), the hazard of the job the verdict leads to
 * (e.g. electrical isolation before cleaning a condenser, recovery cylinders for an
 * overcharge), and any topic the case's author added; with none of those, the gauge-hose
 * pressure caution. Each note says why it applies.
 *
 * Units: none. Range: any refrigerant with a table. Source: ISO 817 / ASHRAE 34 classes
 * (TRADE.md §7), IEC 60335-2-40 servicing text [S84], electrical practice [S115][S116].
 *
 * @throws {PropertyRangeError} for a refrigerant without a table
 * @example caseSafetyNotes("R32", "normal", []).map((note) => note.topic) // ["flammable"]
 */
export function caseSafetyNotes(
  refrigerantId: string,
  chargeState: ChargeState,
  extraTopics: readonly SafetyNote["topic"][],
): SafetyNote[] {
  const safetyClass = getRefrigerant(refrigerantId).safety.class;
  const notes: SafetyNote[] = [];
  const classCaution = safetyClasses[safetyClass].caution;
  if (classCaution)
    notes.push({ topic: classCaution, reason: `${refrigerantId} is ${describeSafetyClass(safetyClass)}.` });
  const job = NEXT_JOB_HAZARD[chargeState];
  if (job) notes.push(job);
  for (const topic of extraTopics)
    notes.push({ topic, reason: "Named by the case: the job in the story carries this hazard." });
  // Gauges go on in every case: with nothing else to say, the hose-handling caution applies.
  if (notes.length === 0)
    notes.push({
      topic: "pressure",
      reason: "Connecting and removing gauge hoses: eye protection and gloves, pressures within the rated limits.",
    });
  // One note per topic, the first reason wins (class, then job, then the author's).
  const seen = new Set<string>();
  return notes.filter((note) => (seen.has(note.topic) ? false : (seen.add(note.topic), true)));
}
