/**
 * A unit's charge reference points, one per circuit (mounted at /api/equipment). Reading them is
 * open to everyone in the company; setting or clearing one by hand is a senior's or an owner's
 * call (route-permissions.ts), because every later charge estimate is measured from it. The
 * history stays: a replaced or cleared reference keeps its row with who, when and why.
 */
import { Router } from "express";
import {
  ChargeReferenceClearSchema,
  ChargeReferenceSetSchema,
  type ChargeReferencesResponse,
} from "@shared/schemas/charge-references.ts";
import { ChargeReferenceSchema, type ChargeReference } from "@shared/schemas/diagnosis.ts";
import { getAuth } from "../auth/session.ts";
import {
  clearChargeReference,
  findUnitReading,
  listChargeReferences,
  setChargeReference,
} from "../db/charge-references.ts";
import type { EquipmentRow } from "../db/equipment.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import type { AccountRouteDeps } from "./route-deps.ts";
import { loadUnit } from "../visits/load-records.ts";

type Deps = Pick<AccountRouteDeps, "db">;

const FIELDS = "Some fields need attention";

/** The circuit number in the path, if the unit has that circuit; otherwise 404 like any missing record. */
function circuitOf(unit: NonNullable<EquipmentRow>, raw: unknown): number {
  const circuit = typeof raw === "string" && /^\d{1,2}$/.test(raw) ? Number(raw) : NaN;
  if (!unit.circuits.some((candidate) => candidate.number === circuit)) throw notFound("Circuit");
  return circuit;
}

/** A reading's reference values: its computed subcooling, superheat and saturation temperatures and its measured air. */
function referenceFromReading(reading: NonNullable<Awaited<ReturnType<typeof findUnitReading>>>): ChargeReference {
  const { result, input } = reading;
  const missing = [
    result.subcoolingK === null && "subcooling",
    result.superheatK === null && "superheat",
    result.evaporatingTempC === null && "evaporating temperature",
    result.condensingTempC === null && "condensing temperature",
  ].filter(Boolean);
  if (missing.length > 0)
    throw new HttpError(400, FIELDS, {
      readingId: `That reading has no valid ${missing.join(", ")}: choose a settled reading with suction and liquid measured`,
    });
  const parsed = ChargeReferenceSchema.safeParse({
    subcoolingK: result.subcoolingK,
    superheatK: result.superheatK,
    evaporatingTempC: result.evaporatingTempC,
    condensingTempC: result.condensingTempC,
    outdoorAirDryBulbC: input.outdoorAirDryBulbC ?? null,
    returnAirDryBulbC: input.returnAirDryBulbC ?? null,
  });
  if (!parsed.success)
    throw new HttpError(400, FIELDS, {
      readingId: `That reading cannot be a reference point: ${parsed.error.issues[0]?.message ?? "its values are out of range"}`,
    });
  return parsed.data;
}

export function chargeReferencesRouter({ db }: Deps): Router {
  const router = Router();

  async function respond(organisationId: string, unit: NonNullable<EquipmentRow>): Promise<ChargeReferencesResponse> {
    return { circuits: await listChargeReferences(db, organisationId, unit.id, unit.circuits) };
  }

  router.get("/:id/charge-references", async (req, res) => {
    const { organisationId } = getAuth(res);
    const unit = await loadUnit(db, organisationId, req.params.id);
    res.json(await respond(organisationId, unit));
  });

  router.put("/:id/charge-references/:circuit", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const unit = await loadUnit(db, organisationId, req.params.id);
    const circuit = circuitOf(unit, req.params.circuit);
    const body = ChargeReferenceSetSchema.parse(req.body);
    let values: ChargeReference;
    let visitId: string | null = null;
    let readingId: string | null = null;
    if ("readingId" in body) {
      const reading = await findUnitReading(db, organisationId, unit.id, body.readingId);
      if (!reading) throw new HttpError(400, FIELDS, { readingId: `Choose a standing reading of ${unit.name}` });
      if (reading.circuit !== circuit)
        throw new HttpError(400, FIELDS, {
          readingId: `That reading is of circuit ${reading.circuit}, not circuit ${circuit}`,
        });
      values = referenceFromReading(reading);
      visitId = reading.visitId;
      readingId = reading.id;
    } else {
      values = body.values;
    }
    await db.transaction((tx) =>
      setChargeReference(tx, organisationId, {
        equipmentId: unit.id,
        circuit,
        values,
        source: "set-by-senior",
        setBy: user.id,
        visitId,
        readingId,
        readingCount: readingId ? 1 : 0,
        note: body.note || null,
      }),
    );
    res.json(await respond(organisationId, unit));
  });

  router.delete("/:id/charge-references/:circuit", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const unit = await loadUnit(db, organisationId, req.params.id);
    const circuit = circuitOf(unit, req.params.circuit);
    const { reason } = ChargeReferenceClearSchema.parse(req.body ?? {});
    const cleared = await clearChargeReference(db, organisationId, {
      equipmentId: unit.id,
      circuit,
      reason,
      clearedBy: user.id,
    });
    if (!cleared) throw new HttpError(404, `Circuit ${circuit} has no reference point to clear`);
    res.json(await respond(organisationId, unit));
  });

  return router;
}
