/**
 * The fault signatures: for every state the engine can name, what each reading does when that
 * state is present. Every checking rule classifies its reading against its band (low, in band,
 * high, with a strength) and this table turns that into evidence for each state, so the rules,
 * the verdict and docs/diagnosis-signatures.md all read one table (a test keeps the document in
 * step with it). Sources per row: TRADE.md §2 symptom table and §3.
 */
import type { EvidenceState } from "../../schemas/diagnosis.ts";
import { cite } from "../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";

/** The readings a signature is made of, in the order the table shows them. */
export const SIGNATURE_FEATURES = [
  "superheat",
  "subcooling",
  "evaporatorTd",
  "condensingOverAmbient",
  "condenserApproach",
  "temperatureSplit",
  "compressorCurrent",
  "dischargeLine",
  "compressionRatio",
  "compressorEfficiency",
] as const;
export type SignatureFeature = (typeof SIGNATURE_FEATURES)[number];

/** What a reading does under a state, judged against its band (or, for the pivots, its target). */
export const EXPECTATIONS = [
  "low",
  "low-or-normal",
  "normal",
  "normal-or-high",
  "high",
  "below-pivot",
  "above-pivot",
] as const;
export type Expectation = (typeof EXPECTATIONS)[number];

/** One cell: the expectation and how much that reading counts for the state. */
export interface SignatureCell {
  expect: Expectation;
  weight: number;
}

/** A cell that differs by metering family (a TXV/EEV holds superheat; a fixed device cannot). */
export interface FamilyCell {
  valve: SignatureCell | null;
  fixed: SignatureCell | null;
}

export interface Signature {
  cells: Partial<Record<SignatureFeature, SignatureCell | FamilyCell>>;
  /** Where the row comes from. */
  source: string;
}

export type MeteringFamily = "expansion-valve" | "fixed";

const cell = (expect: Expectation, weight: number): SignatureCell => ({ expect, weight });
const byFamily = (valve: SignatureCell | null, fixed: SignatureCell | null): FamilyCell => ({ valve, fixed });

/**
 * The signature table. Weights: about 1–1.5 for the readings that identify a state, 0.3–0.8 for
 * supporting ones. The subcooling pivot (target − 1 K) separates a shortage (below) from a
 * restriction (at or above) when superheat is high [S24][S25]. The approach pivot (its expected
 * value) separates a condenser stacked with liquid (overcharge: the liquid leaves close to the
 * outdoor air) from air in the circuit (the gauge, and so the computed subcooling, reads high
 * while the liquid itself is no colder than usual).
 */
export const SIGNATURES: Readonly<Record<EvidenceState, Signature>> = {
  normal: {
    cells: {
      superheat: byFamily(cell("normal", 1.2), cell("normal", 1.5)),
      subcooling: byFamily(cell("normal", 1.5), cell("normal", 0.8)),
      evaporatorTd: cell("normal", 0.8),
      condensingOverAmbient: cell("normal", 0.8),
      condenserApproach: cell("normal", 0.5),
      temperatureSplit: cell("normal", 0.6),
      compressorCurrent: cell("normal", 0.3),
      dischargeLine: cell("normal", 0.5),
    },
    source: `every reading in its band ${cite(DIAGNOSIS_SOURCES, ["S9", "S10", "S26", "S33"])}`,
  },
  undercharged: {
    cells: {
      superheat: byFamily(cell("high", 0.8), cell("high", 1.5)),
      subcooling: byFamily(cell("below-pivot", 1.5), cell("below-pivot", 1)),
      evaporatorTd: cell("high", 0.8),
      condensingOverAmbient: cell("low", 0.7),
      temperatureSplit: cell("low-or-normal", 0.5),
      compressorCurrent: cell("low-or-normal", 0.4),
      dischargeLine: cell("normal-or-high", 0.3),
    },
    source: cite(DIAGNOSIS_SOURCES, ["S21", "S22", "S24"]),
  },
  overcharged: {
    cells: {
      superheat: byFamily(cell("low-or-normal", 0.6), cell("low", 1.5)),
      subcooling: byFamily(cell("high", 1.5), cell("high", 1)),
      evaporatorTd: cell("low-or-normal", 0.5),
      condensingOverAmbient: cell("high", 0.8),
      condenserApproach: cell("below-pivot", 0.8),
      temperatureSplit: cell("low-or-normal", 0.3),
      compressorCurrent: cell("normal-or-high", 0.5),
    },
    source: `${cite(DIAGNOSIS_SOURCES, ["S21", "S23", "S20"])}; a condenser full of liquid cools it close to the outdoor air (small approach ${cite(DIAGNOSIS_SOURCES, ["S26"])})`,
  },
  "restricted-metering": {
    cells: {
      superheat: byFamily(cell("high", 1), cell("high", 1.5)),
      subcooling: byFamily(cell("above-pivot", 1.2), cell("above-pivot", 1)),
      evaporatorTd: cell("high", 0.8),
      condensingOverAmbient: cell("low-or-normal", 0.5),
      condenserApproach: cell("low-or-normal", 0.3),
      temperatureSplit: cell("low", 0.5),
      compressorCurrent: cell("low-or-normal", 0.4),
      dischargeLine: cell("normal-or-high", 0.4),
    },
    source: cite(DIAGNOSIS_SOURCES, ["S21", "S24", "S25"]),
  },
  "low-evaporator-airflow": {
    cells: {
      superheat: byFamily(cell("low-or-normal", 0.5), cell("low", 1.2)),
      subcooling: cell("normal-or-high", 0.5),
      evaporatorTd: cell("high", 1.2),
      condensingOverAmbient: cell("low-or-normal", 0.4),
      temperatureSplit: cell("high", 1.2),
      compressorCurrent: cell("low-or-normal", 0.3),
      dischargeLine: cell("low-or-normal", 0.3),
    },
    source: `${cite(DIAGNOSIS_SOURCES, ["S21", "S33", "S15"])}; an iced or air-starved coil runs far below the room`,
  },
  "overfeeding-metering": {
    cells: {
      superheat: byFamily(cell("low", 1.5), cell("low", 1.5)),
      subcooling: cell("normal", 0.8),
      evaporatorTd: cell("low-or-normal", 0.6),
      condensingOverAmbient: cell("normal", 0.6),
      condenserApproach: cell("normal", 0.3),
      temperatureSplit: cell("low-or-normal", 0.5),
      compressorCurrent: cell("normal", 0.2),
      dischargeLine: cell("low", 0.6),
    },
    source: `${cite(DIAGNOSIS_SOURCES, ["S17", "S21"])}; a valve whose bulb is loose or misplaced, stuck open or oversized (or an oversized orifice) floods the coil while charge and head stay normal (${COMMON_PRACTICE})`,
  },
  "condenser-airflow": {
    cells: {
      superheat: cell("low-or-normal", 0.2),
      subcooling: cell("low-or-normal", 0.6),
      evaporatorTd: cell("low-or-normal", 0.3),
      condensingOverAmbient: cell("high", 1.2),
      condenserApproach: cell("high", 1.2),
      temperatureSplit: cell("low-or-normal", 0.3),
      compressorCurrent: cell("normal-or-high", 0.6),
      dischargeLine: cell("normal-or-high", 0.4),
    },
    source: `${cite(DIAGNOSIS_SOURCES, ["S21", "S26"])}; the liquid leaves a condenser that cannot reject heat far above the outdoor air (high approach)`,
  },
  "non-condensables": {
    cells: {
      superheat: cell("normal", 0.5),
      subcooling: cell("high", 1),
      evaporatorTd: cell("normal", 0.3),
      condensingOverAmbient: cell("high", 1.2),
      condenserApproach: cell("above-pivot", 0.8),
      temperatureSplit: cell("low-or-normal", 0.2),
      compressorCurrent: cell("normal-or-high", 0.5),
      dischargeLine: cell("normal-or-high", 0.4),
    },
    source: `${cite(DIAGNOSIS_SOURCES, ["S27", "S28", "S20"])}; air adds its own pressure, so the subcooling worked out from the gauge reads high while the liquid itself is not unusually cold; confirm with a standing-pressure check`,
  },
  "weak-compressor": {
    cells: {
      superheat: cell("low-or-normal", 0.4),
      subcooling: cell("normal-or-high", 0.4),
      evaporatorTd: cell("low", 1.2),
      condensingOverAmbient: cell("low", 1),
      condenserApproach: cell("low-or-normal", 0.3),
      temperatureSplit: cell("low", 0.6),
      compressorCurrent: cell("low", 0.8),
      compressionRatio: cell("low", 0.8),
      compressorEfficiency: cell("low", 0.8),
    },
    source: cite(DIAGNOSIS_SOURCES, ["S21", "S29", "S30", "S122"]),
  },
};
