/**
 * Turns register rows into the engine's inputs and the engine's answers into the register's
 * response shapes. No refrigerant arithmetic is done here beyond summing kilograms: the fill
 * limit, the fill verdict, the balance, the weigh-in check and the leak rate all come from
 * shared/engine (cylinderFillLimit, judgeCylinderFill, refrigerantBalance,
 * chargeAgainstNameplate, annualLeakRate).
 */
import {
  annualLeakRate,
  chargeAgainstNameplate,
  cylinderFillLimit,
  getRefrigerant,
  judgeCylinderFill,
  refrigerantBalance,
} from "@shared/engine/index.ts";
import type { ChargeDeviation } from "@shared/schemas/diagnosis.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import {
  ZEOTROPE_GLIDE_NOTE_K,
  type CircuitBalance,
  type Cylinder,
  type CylinderFill,
  type EquipmentRefrigerant,
  type MovementKind,
} from "@shared/schemas/register.ts";
import type { CylinderRow, MovementRow } from "../db/register.ts";

/** Hottest temperature a cylinder may see in a ute or on a roof, °C (TRADE.md §6 [S79]: 54 °C). */
export const CYLINDER_REFERENCE_TEMP_C = 54;

/**
 * The 80 % liquid fill limit of a cylinder and, for a recovery cylinder, the verdict on the
 * given contents. New and reclaimed cylinders are filled by their supplier to its own filling
 * ratio, so Satura shows their limit but does not judge them (TRADE.md §6 states the 80 %
 * rule for recovery cylinders).
 */
export function cylinderFill(
  cylinder: Pick<CylinderRow, "waterCapacityKg" | "refrigerant" | "kind">,
  contentsKg: number,
): CylinderFill {
  let maxContentsKg: number;
  try {
    maxContentsKg = cylinderFillLimit({
      waterCapacityKg: cylinder.waterCapacityKg,
      refrigerant: cylinder.refrigerant,
      referenceTempC: CYLINDER_REFERENCE_TEMP_C,
    }).maxContentsKg;
  } catch {
    // e.g. R744 is supercritical at 54 °C: there is no liquid density to turn 80 % into kg.
    return {
      maxContentsKg: null,
      referenceTempC: CYLINDER_REFERENCE_TEMP_C,
      check: null,
      note: `Satura's ${cylinder.refrigerant} table has no liquid at ${CYLINDER_REFERENCE_TEMP_C} °C, so no fill limit can be worked out: follow the cylinder's stamped maximum fill.`,
    };
  }
  if (cylinder.kind !== "recovery") {
    return {
      maxContentsKg,
      referenceTempC: CYLINDER_REFERENCE_TEMP_C,
      check: null,
      note: "Filled by the supplier: not judged against the recovery limit.",
    };
  }
  const verdict = judgeCylinderFill({ contentsKg: Math.max(0, contentsKg), maxContentsKg });
  return {
    maxContentsKg,
    referenceTempC: CYLINDER_REFERENCE_TEMP_C,
    check: { verdict: verdict.verdict, reason: verdict.reason, source: verdict.source },
    note: null,
  };
}

export function toCylinder(row: CylinderRow): Cylinder {
  return {
    id: row.id,
    label: row.label,
    serial: row.serial,
    kind: row.kind,
    refrigerant: row.refrigerant,
    waterCapacityKg: row.waterCapacityKg,
    tareKg: row.tareKg,
    initialContentsKg: row.initialContentsKg,
    contentsKg: row.contentsKg,
    grossKg: Math.round((row.tareKg + row.contentsKg) * 1000) / 1000,
    fill: cylinderFill(row, row.contentsKg),
    createdAt: row.createdAt.toISOString(),
  };
}

/** Voided movements stay on the lists, struck through, but count in no sum of kilograms. */
const sumKg = (movements: readonly MovementRow[], kinds: readonly MovementKind[]) =>
  Math.round(
    movements
      .filter((movement) => movement.voided === null && kinds.includes(movement.kind))
      .reduce((sum, movement) => sum + movement.kg, 0) * 1000,
  ) / 1000;

export const ADDED_KINDS: readonly MovementKind[] = ["added-new", "added-reclaimed"];

/**
 * One circuit's balance on a visit. The weigh-in check runs when the circuit was recovered on
 * this visit (emptied and recharged) or the technician declared a full weigh-in; the weighed-in
 * mass is what the register says went in (reused + added), so it is never typed twice.
 */
export function circuitBalance(
  nameplate: CircuitNameplate,
  movements: readonly MovementRow[],
  declared: { id: string; lineAdjustmentKg: number } | undefined,
  estimateBeforeRecovery: ChargeDeviation | null = null,
): CircuitBalance {
  const own = movements.filter((movement) => movement.circuit === nameplate.number);
  const recoveredKg = sumKg(own, ["recovered"]);
  const reusedKg = sumKg(own, ["reused"]);
  const addedKg = sumKg(own, ADDED_KINDS);
  const balance = refrigerantBalance({ nameplateKg: nameplate.factoryChargeKg, recoveredKg, addedKg, reusedKg });
  const weighedInKg = Math.round((reusedKg + addedKg) * 1000) / 1000;
  const fullWeighIn = recoveredKg > 0 || declared !== undefined;
  const lineAdjustmentKg = declared?.lineAdjustmentKg ?? 0;
  const check =
    fullWeighIn && weighedInKg > 0
      ? chargeAgainstNameplate({ nameplateKg: nameplate.factoryChargeKg, weighedInKg, lineAdjustmentKg })
      : null;
  return {
    circuit: nameplate.number,
    nameplateKg: nameplate.factoryChargeKg,
    recoveredKg,
    reusedKg,
    addedKg,
    sentForReclaimKg: sumKg(own, ["sent-for-reclaim"]),
    balance,
    recoveredOnVisit: recoveredKg > 0,
    estimateBeforeRecovery: recoveredKg > 0 ? estimateBeforeRecovery : null,
    charging: check
      ? {
          weighedInKg,
          lineAdjustmentKg,
          declared: declared !== undefined,
          declarationId: declared?.id ?? null,
          check,
        }
      : null,
  };
}

/**
 * The liquid-charging note for zeotropic blends (TRADE.md §6 [S4][S56]): shown when the
 * refrigerant is a blend whose glide at 0 °C is above ZEOTROPE_GLIDE_NOTE_K.
 */
export function liquidChargingNote(refrigerantId: string): { note: string | null; glideK: number | null } {
  const info = getRefrigerant(refrigerantId);
  const glideK = info.kind === "blend" ? (info.glideAt0C?.glideK ?? null) : null;
  if (glideK === null || glideK <= ZEOTROPE_GLIDE_NOTE_K) return { note: null, glideK };
  return {
    glideK,
    note: `${info.id} is a zeotropic blend (glide about ${glideK.toFixed(1)} K at 0 °C): charge it as liquid from the cylinder, never as vapour, or the components separate and both the system and the cylinder end up off-composition. Meter the liquid slowly into the suction side of a running system, or into the liquid line with the unit off.`,
  };
}

/**
 * Refrigerant put back into the unit on each visit beyond what was taken out of it
 * (reused + added − recovered, when positive): the mass that had leaked since the unit was
 * last full. A recovery followed by a recharge to nameplate counts only its shortfall; a
 * plain top-up counts whole. This is the "amount added" basis of the US §82.157 leak-rate
 * calculation (TRADE.md §8.3, [S109]).
 */
export function topUps(movements: readonly MovementRow[]): EquipmentRefrigerant["topUps"] {
  const byVisit = new Map<string, MovementRow[]>();
  for (const movement of movements) {
    if (!movement.visitId || movement.voided !== null) continue;
    byVisit.set(movement.visitId, [...(byVisit.get(movement.visitId) ?? []), movement]);
  }
  const result: EquipmentRefrigerant["topUps"] = [];
  for (const [visitId, own] of byVisit) {
    const net = sumKg(own, ["reused", ...ADDED_KINDS]) - sumKg(own, ["recovered"]);
    const addedKg = Math.round(net * 1000) / 1000;
    const [first] = own;
    if (addedKg > 0 && first) result.push({ visitId, date: first.at, addedKg });
  }
  return result.sort((a, b) => Date.parse(a.date) - Date.parse(b.date));
}

/**
 * The estimated leak rate from the top-ups, or null when there are too few to estimate from.
 * The engine's default period runs from the first top-up to the last, the first one only
 * opening the period (what it replaced leaked over an unknown time), so two top-ups at least
 * a day apart are needed.
 */
export function leakRate(
  events: EquipmentRefrigerant["topUps"],
  nameplateKg: number,
): EquipmentRefrigerant["leakRate"] {
  const first = events[0];
  const last = events.at(-1);
  if (events.length < 2 || !first || !last) return null;
  const span = Date.parse(last.date) - Date.parse(first.date);
  if (span < 86_400_000) return null;
  return annualLeakRate(
    events.map((event) => ({ date: event.date, addedKg: event.addedKg })),
    nameplateKg,
  );
}
