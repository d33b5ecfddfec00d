/**
 * One charge entry, one number: a register movement on a visit and its run-log charge
 * adjustment are written together, in the caller's transaction (writeToVisit), linked by
 * adjustments.movement_id and carrying the same kilograms. Whichever side the technician logs
 * from — "refrigerant added 0.45 kg" on the run log, or a movement on the Refrigerant section —
 * the register rules (cylinder kind, one refrigerant per cylinder, contents, the 80 % fill limit,
 * reuse no more than was recovered) decide, and a refusal leaves neither record.
 */
import { and, eq } from "drizzle-orm";
import {
  MOVEMENT_CYLINDER_RULES,
  MOVEMENT_DIRECTION,
  MOVEMENT_KIND_LABELS,
  type CylinderKind,
  type MovementKind,
} from "@shared/schemas/register.ts";
import type { Adjustment, ChargeAdjustmentKind } from "@shared/schemas/visits.ts";
import type { Database } from "../db/client.ts";
import {
  getCylinder,
  insertMovement,
  movementEntries,
  visitMovements,
  type CylinderRow,
  type MovementRow,
} from "../db/register.ts";
import { adjustments } from "../db/schema.ts";
import { findEntry, type StoredEntry } from "../db/store-once.ts";
import { adjustmentEntries, insertAdjustment } from "../db/visits.ts";
import { HttpError } from "../http/http-error.ts";
import { cylinderFill } from "./register-checks.ts";

export const fieldError = (field: string, message: string) =>
  new HttpError(400, "Some fields need attention", { [field]: message });
const kg = (value: number) => `${Number(value.toFixed(2))} kg`;
/** The scale's resolution: two figures within half a gram are the same weighing. */
const SAME_MASS_KG = 0.0005;

const KIND_NAMES: Record<CylinderKind, string> = {
  recovery: "a recovery",
  new: "a new-refrigerant",
  reclaimed: "a reclaimed-refrigerant",
};

/**
 * Checks that a movement may use this cylinder and that its contents allow it: one
 * refrigerant per cylinder (TRADE.md §6), the cylinder kind fits the movement, nothing drawn
 * that is not in it, and no recovery that takes a recovery cylinder past its 80 % liquid
 * limit. The client shows the same fill check live before the technician saves.
 */
export function checkCylinder(cylinder: CylinderRow, kind: MovementKind, refrigerant: string, massKg: number) {
  if (cylinder.refrigerant !== refrigerant) {
    throw fieldError(
      "cylinderId",
      `${cylinder.label} holds ${cylinder.refrigerant}, not ${refrigerant}: never mix refrigerants in one cylinder. Choose a ${refrigerant} cylinder.`,
    );
  }
  const rule = MOVEMENT_CYLINDER_RULES[kind];
  if (!rule.cylinderKinds.includes(cylinder.kind)) {
    throw fieldError(
      "cylinderId",
      `${MOVEMENT_KIND_LABELS[kind]} needs ${rule.cylinderKinds.map((candidate) => KIND_NAMES[candidate]).join(" or ")} cylinder; ${cylinder.label} is ${KIND_NAMES[cylinder.kind]} cylinder.`,
    );
  }
  if (!rule.intoCylinder && massKg > cylinder.contentsKg + 1e-9) {
    throw fieldError(
      "kg",
      `${cylinder.label} holds only ${kg(cylinder.contentsKg)} by the register: weigh it and check the figure.`,
    );
  }
  if (rule.intoCylinder) {
    const after = cylinderFill(cylinder, cylinder.contentsKg + massKg);
    if (after.check?.verdict === "fail" && after.maxContentsKg !== null) {
      const room = Math.max(0, after.maxContentsKg - cylinder.contentsKg);
      throw fieldError(
        "kg",
        `That would fill ${cylinder.label} past its 80 % limit of ${kg(after.maxContentsKg)} (it holds ${kg(cylinder.contentsKg)}, room for ${kg(room)}). Stop and switch to another recovery cylinder, then log each cylinder's share.`,
      );
    }
  }
}

/**
 * The register movement a run-log charge adjustment is, from the cylinder chosen: refrigerant
 * removed goes into a recovery cylinder; refrigerant added comes from a new or reclaimed
 * cylinder, or back out of a recovery cylinder as reuse.
 */
export function movementKindFor(kind: ChargeAdjustmentKind, cylinderKind: CylinderKind): MovementKind {
  if (kind === "charge-removed") return "recovered";
  return cylinderKind === "new" ? "added-new" : cylinderKind === "reclaimed" ? "added-reclaimed" : "reused";
}

/** movementKindFor with the chosen cylinder read in the transaction; a cylinder of another company is no cylinder. */
export async function chargeMovementKind(
  tx: Database,
  organisationId: string,
  kind: ChargeAdjustmentKind,
  cylinderId: string,
): Promise<MovementKind> {
  const cylinder = await getCylinder(tx, organisationId, cylinderId);
  if (!cylinder) throw fieldError("cylinderId", "Choose one of your company's cylinders");
  return movementKindFor(kind, cylinder.kind);
}

/** The run-log line for a movement logged on the Refrigerant section. */
export function describeMovement(kind: MovementKind, massKg: number, cylinderLabel: string | null): string {
  return `${kg(massKg)} ${MOVEMENT_KIND_LABELS[kind].toLowerCase()}${cylinderLabel ? ` (cylinder ${cylinderLabel})` : ""}`;
}

interface VisitUnit {
  id: string;
  refrigerant: string;
  circuits: { number: number }[];
}

export interface MovementEntry {
  kind: MovementKind;
  kg: number;
  circuit: number;
  cylinderId: string | null;
  at?: Date;
  note: string | null;
}

/** A charge entry as stored: the movement, its run-log adjustment and the cylinder it used. */
export interface ChargeEntry {
  movement: MovementRow;
  adjustment: Adjustment;
  cylinder: CylinderRow | undefined;
  /** Stored by an earlier send of the same client id (README decision 026): nothing was stored now. */
  replayed: boolean;
}

/** The charge entry of the visit a device stored under this client id (on its movement), if any. */
export async function findChargeEntry(
  db: Database,
  organisationId: string,
  visitId: string,
  clientId: string | undefined,
): Promise<ChargeEntry | undefined> {
  const movement = await findEntry(db, movementEntries, visitId, clientId);
  return movement ? storedChargeEntry(db, organisationId, movement) : undefined;
}

/** A stored movement with its linked run-log adjustment and its cylinder as they stand now. */
async function storedChargeEntry(db: Database, organisationId: string, movement: MovementRow): Promise<ChargeEntry> {
  const [row] = await db
    .select()
    .from(adjustments)
    .where(and(eq(adjustments.organisationId, organisationId), eq(adjustments.movementId, movement.id)));
  if (!row) throw new Error(`Movement ${movement.id} has no run-log adjustment`);
  const cylinder = movement.cylinder ? await getCylinder(db, organisationId, movement.cylinder.id) : undefined;
  return { movement, adjustment: await adjustmentEntries.present(db, row), cylinder, replayed: true };
}

/**
 * Checks a visit movement against the register rules and stores it, with its run-log charge
 * adjustment linked to it. Call inside writeToVisit: the cylinder's contents are read in the
 * same transaction, and a refusal (thrown) rolls both records back. With a client id, both
 * records carry it and the movement's insert decides (its unique index): a movement the visit
 * already holds under the id is answered with its adjustment, and nothing is stored.
 */
export async function recordChargeEntry(
  tx: Database,
  organisationId: string,
  values: {
    visitId: string;
    unit: VisitUnit;
    technicianId: string;
    movement: MovementEntry;
    adjustment?: { description: string };
    clientId?: string;
  },
): Promise<ChargeEntry> {
  const { unit, movement: entry } = values;
  if (entry.kind === "sent-for-reclaim")
    throw fieldError("kind", "A cylinder is sent for reclaim from the Cylinders page, not from a visit");
  let cylinder: CylinderRow | undefined;
  if (entry.cylinderId) {
    cylinder = await getCylinder(tx, organisationId, entry.cylinderId);
    if (!cylinder) throw fieldError("cylinderId", "Choose one of your company's cylinders");
    checkCylinder(cylinder, entry.kind, unit.refrigerant, entry.kg);
  } else if (MOVEMENT_CYLINDER_RULES[entry.kind].cylinderRequired) {
    throw fieldError("cylinderId", "Choose the cylinder it went into or came from");
  }
  if (entry.kind === "reused") {
    // Reused refrigerant is what was recovered from this circuit and put back (TRADE.md §6 records: destination "reuse in same system").
    const own = (await visitMovements(tx, organisationId, values.visitId)).filter(
      (movement) => movement.circuit === entry.circuit && movement.voided === null,
    );
    const recovered = own
      .filter((movement) => movement.kind === "recovered")
      .reduce((sum, movement) => sum + movement.kg, 0);
    const reused = own.filter((movement) => movement.kind === "reused").reduce((sum, movement) => sum + movement.kg, 0);
    if (reused + entry.kg > recovered + 1e-9) {
      throw fieldError(
        "kg",
        recovered === 0
          ? `Nothing has been recovered from circuit ${entry.circuit} on this visit, so nothing can be reused: log the recovery first, or log new refrigerant as added`
          : `Only ${kg(recovered - reused)} recovered from circuit ${entry.circuit} on this visit is left to reuse`,
      );
    }
  }
  const { entry: movement, replayed } = await insertMovement(tx, organisationId, {
    clientId: values.clientId,
    visitId: values.visitId,
    equipmentId: unit.id,
    circuit: entry.circuit,
    refrigerant: unit.refrigerant,
    kind: entry.kind,
    kg: entry.kg,
    cylinderId: cylinder?.id ?? null,
    technicianId: values.technicianId,
    at: entry.at,
    note: entry.note,
  });
  if (replayed) return storedChargeEntry(tx, organisationId, movement);
  const { entry: adjustment } = await insertAdjustment(tx, organisationId, {
    clientId: values.clientId,
    visitId: values.visitId,
    circuit: entry.circuit,
    at: new Date(movement.at),
    kind: MOVEMENT_DIRECTION[entry.kind],
    description:
      values.adjustment?.description ?? entry.note ?? describeMovement(entry.kind, entry.kg, cylinder?.label ?? null),
    amountKg: entry.kg,
    movementId: movement.id,
    recordedBy: values.technicianId,
  });
  return { movement, adjustment, cylinder, replayed: false };
}

/**
 * Links a run-log charge adjustment to a movement already in the visit's register, so a
 * kilogram logged on the Refrigerant section first is not entered a second time. The movement
 * must stand, go the same way, weigh the same and not already have its run-log entry.
 */
export async function linkToMovement(
  tx: Database,
  organisationId: string,
  values: {
    visitId: string;
    movementId: string;
    kind: ChargeAdjustmentKind;
    amountKg: number;
    circuit: number;
    description: string;
    at?: Date;
    recordedBy: string;
    clientId?: string;
  },
): Promise<StoredEntry<Adjustment>> {
  const movement = (await visitMovements(tx, organisationId, values.visitId)).find(
    (candidate) => candidate.id === values.movementId,
  );
  if (!movement || movement.voided !== null)
    throw fieldError("movementId", "Choose a standing register line of this visit");
  if (movement.kind === "sent-for-reclaim" || MOVEMENT_DIRECTION[movement.kind] !== values.kind) {
    throw fieldError(
      "movementId",
      `That register line is ${MOVEMENT_KIND_LABELS[movement.kind].toLowerCase()}, not ${values.kind === "charge-added" ? "refrigerant added" : "refrigerant removed"}`,
    );
  }
  if (Math.abs(movement.kg - values.amountKg) > SAME_MASS_KG)
    throw fieldError("amountKg", `That register line says ${kg(movement.kg)}: one entry, one number`);
  if (movement.circuit !== values.circuit)
    throw fieldError("movementId", `That register line is on circuit ${movement.circuit}`);
  const [linked] = await tx
    .select({ id: adjustments.id })
    .from(adjustments)
    .where(and(eq(adjustments.organisationId, organisationId), eq(adjustments.movementId, movement.id)));
  if (linked) throw fieldError("movementId", "That register line is already on the run log");
  return insertAdjustment(tx, organisationId, {
    visitId: values.visitId,
    circuit: values.circuit,
    at: values.at ?? new Date(movement.at),
    kind: values.kind,
    description: values.description,
    amountKg: movement.kg,
    movementId: movement.id,
    recordedBy: values.recordedBy,
    clientId: values.clientId,
  });
}
