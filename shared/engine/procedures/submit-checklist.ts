import type { VerdictLevel } from "../../schemas/procedures.ts";
import type { AdjustmentCreate, VoidInfo } from "../../schemas/visits.ts";

/**
 * Register and run-log kilograms closer than this are the same figure: the scale reads to
 * 10 g and each side is typed separately (common practice, not a published limit).
 */
export const CHARGE_MATCH_TOLERANCE_KG = 0.01;

/** Something to look at before a visit goes for review. */
export interface SubmitChecklistItem {
  kind: "missing-reason" | "circuit-without-readings" | "failed-test" | "charge-not-in-register";
  /** Blocking items must be put right (the reason); the others the technician may acknowledge. */
  blocking: boolean;
  /** One sentence, in the technician's words, saying what and what to do. */
  message: string;
}

/** A judged record as the procedures answer it: its verdict, and whether it still stands. */
interface JudgedRecord {
  voided: VoidInfo;
  verdict: VerdictLevel | null;
  /** The engine's sentence for the verdict, e.g. "Drop 35 kPa, over the 20 kPa allowed". */
  reason: string;
}

export interface SubmitChecklistInput {
  /** The visit's reason; "" while none was given. */
  reason: string;
  /** The unit's circuit numbers (nameplate). */
  circuits: readonly number[];
  readings: readonly { circuit: number; voided: VoidInfo }[];
  adjustments: readonly { kind: AdjustmentCreate["kind"]; amountKg: number | null; voided: VoidInfo }[];
  /**
   * Kilograms put into the unit according to the register, over the visit: new and reclaimed
   * refrigerant added plus recovered refrigerant reused (the circuit balances, which count
   * every movement, including those the reader may not see listed).
   */
  registerChargedKg: number;
  tests: {
    pressureTests: readonly JudgedRecord[];
    evacuations: readonly JudgedRecord[];
    standingPressureChecks: readonly JudgedRecord[];
    electricalChecks: readonly JudgedRecord[];
  };
}

const TEST_NAMES: Record<keyof SubmitChecklistInput["tests"], string> = {
  pressureTests: "Pressure test",
  evacuations: "Evacuation / decay test",
  standingPressureChecks: "Standing-pressure check",
  electricalChecks: "Electrical check",
};

const kg = (value: number) => `${Number(value.toFixed(2))} kg`;

/**
 * Submit checklist: what a reviewer would send the visit back for, gathered before it goes.
 * A missing reason blocks (a record without its purpose cannot be reviewed); the rest are
 * warnings — a circuit with no standing reading, a failed test still standing on the record,
 * and refrigerant marked as charged on the run log but not (or not all) logged by cylinder in
 * the register, which is the record of every kilogram added (EU F-gas equipment records,
 * Regulation 2024/573 Art. 7 and 517/2014: "quantities added"; TRADE.md §8.2 [S83][S106]).
 * Voided records count for nothing, as everywhere else.
 *
 * Units: kilograms. Pure: plain data in, a new list out, blocking items first.
 *
 * @example submitChecklist({ reason: "", circuits: [1], readings: [], adjustments: [], registerChargedKg: 0, tests: { pressureTests: [], evacuations: [], standingPressureChecks: [], electricalChecks: [] } })
 * // [{ kind: "missing-reason", blocking: true, … }, { kind: "circuit-without-readings", blocking: false, message: "Circuit 1 has no readings" }]
 */
export function submitChecklist(input: SubmitChecklistInput): SubmitChecklistItem[] {
  const items: SubmitChecklistItem[] = [];
  if (input.reason.trim() === "") {
    items.push({
      kind: "missing-reason",
      blocking: true,
      message: "Give the reason for the visit: the reviewer and the customer read it first",
    });
  }

  const read = new Set(input.readings.filter((reading) => reading.voided === null).map((reading) => reading.circuit));
  for (const circuit of [...input.circuits].sort((a, b) => a - b)) {
    if (!read.has(circuit))
      items.push({ kind: "circuit-without-readings", blocking: false, message: `Circuit ${circuit} has no readings` });
  }

  for (const [group, records] of Object.entries(input.tests) as [
    keyof SubmitChecklistInput["tests"],
    readonly JudgedRecord[],
  ][]) {
    for (const record of records) {
      if (record.voided === null && record.verdict === "fail") {
        items.push({ kind: "failed-test", blocking: false, message: `${TEST_NAMES[group]} failed: ${record.reason}` });
      }
    }
  }

  const markedKg = input.adjustments
    .filter((adjustment) => adjustment.voided === null && adjustment.kind === "charge-added")
    .reduce((sum, adjustment) => sum + (adjustment.amountKg ?? 0), 0);
  const missingKg = markedKg - input.registerChargedKg;
  if (markedKg > 0 && missingKg > CHARGE_MATCH_TOLERANCE_KG) {
    items.push({
      kind: "charge-not-in-register",
      blocking: false,
      message:
        input.registerChargedKg > 0
          ? `${kg(markedKg)} charged on the run log, ${kg(input.registerChargedKg)} in the register: log the other ${kg(missingKg)} by cylinder`
          : `${kg(markedKg)} charged on the run log but none in the register: log it by cylinder (Refrigerant section)`,
    });
  }
  return items;
}
