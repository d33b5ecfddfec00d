/**
 * Meaning of the ISO 817 / ASHRAE 34 safety classes (AS/NZS ISO 817:2016 in Australia and
 * New Zealand): a letter for toxicity and a number for flammability.
 */
import type { CautionTopic } from "./cautions.ts";

export type SafetyClass = "A1" | "A2L" | "A2" | "A3" | "B1" | "B2L" | "B2" | "B3";

export interface SafetyClassInfo {
  toxicity: string;
  flammability: string;
  /** The caution to show beside a refrigerant of this class, if any. */
  caution: CautionTopic | null;
}

const LOWER = "lower toxicity";
const HIGHER = "higher toxicity";

export const safetyClasses: Record<SafetyClass, SafetyClassInfo> = {
  A1: { toxicity: LOWER, flammability: "no flame propagation", caution: null },
  A2L: { toxicity: LOWER, flammability: "lower flammability", caution: "flammable" },
  A2: { toxicity: LOWER, flammability: "flammable", caution: "flammable" },
  A3: { toxicity: LOWER, flammability: "higher flammability", caution: "flammable" },
  B1: { toxicity: HIGHER, flammability: "no flame propagation", caution: "toxic" },
  B2L: { toxicity: HIGHER, flammability: "lower flammability", caution: "toxic" },
  B2: { toxicity: HIGHER, flammability: "flammable", caution: "toxic" },
  B3: { toxicity: HIGHER, flammability: "higher flammability", caution: "toxic" },
};

/** "A2L — lower toxicity, lower flammability" */
export function describeSafetyClass(safetyClass: SafetyClass): string {
  const info = safetyClasses[safetyClass];
  return `${safetyClass} — ${info.toxicity}, ${info.flammability}`;
}
