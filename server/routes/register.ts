/**
 * The refrigerant register: /api/cylinders, /api/visits/:id/refrigerant,
 * /api/equipment/:id/refrigerant and /api/register (list and CSV export).
 *
 * The register is the record of truth for refrigerant. A movement logged on a visit and the
 * run log's charge adjustment (charge-added / charge-removed on /api/visits/:id/adjustments)
 * are one entry: either route writes both, linked, with one figure (server/register/charge-entry.ts).
 */
import { Router, type Response } from "express";
import { z } from "zod";
import { boundEnd, boundStart } from "@shared/schemas/dates.ts";
import { text } from "@shared/schemas/text.ts";
import { VoidReasonSchema } from "@shared/schemas/visits.ts";
import {
  ChargingUpdateSchema,
  CylinderCreateSchema,
  MovementCreateSchema,
  ReclaimCreateSchema,
  RegisterQuerySchema,
} from "@shared/schemas/register.ts";
import { RegisterPageQuerySchema } from "@shared/schemas/list-pages.ts";
import { getAuth } from "../auth/session.ts";
import { getEquipment } from "../db/equipment.ts";
import {
  createCylinder,
  cylinderMovements,
  declareCircuitCharge,
  equipmentMovements,
  findMember,
  getCylinder,
  insertMovement,
  listCylinders,
  registerChunks,
  registerPage,
  registerTotals,
  type MovementRow,
  type RegisterFilter,
  runLogChargeCheck,
  visitCircuitCharges,
  visitMovements,
  voidReclaim,
} from "../db/register.ts";
import { chargeEstimateBefore } from "../db/latest-readings.ts";
import { insertVisitEvent } from "../db/visit-events.ts";
import { joinCrew } from "../db/visits.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import { requireWritableVisit } from "../http/require-writable-visit.ts";
import { checkCylinder, fieldError, findChargeEntry, recordChargeEntry } from "../register/charge-entry.ts";
import { clientIdOf, deviceDate, requireDeviceTime, sendEntry } from "../visits/device-entry.ts";
import { calibrateAfterWeighIn } from "../visits/calibrate-after-weigh-in.ts";
import { writeToVisit } from "../visits/write-to-visit.ts";
import { circuitBalance, leakRate, liquidChargingNote, toCylinder, topUps } from "../register/register-checks.ts";
import { registerCsvLine } from "../register/register-csv.ts";
import { EXPORT_CHUNK_LINES, FIRST_EXPORT_CHUNK_LINES, registerCsvText } from "../register/register-csv-text.ts";
import { streamPieces } from "../http/stream-pieces.ts";
import {
  mayReadRegisterLine,
  readsWholeRegister,
  visibleRegisterLines,
  type RegisterReader,
} from "../register/register-visibility.ts";
import { licenceNumbers } from "../db/licence-numbers.ts";
import type { AccountRouteDeps } from "./route-deps.ts";
import { loadUnit, loadVisitAndUnit } from "../visits/load-records.ts";

type Deps = Pick<AccountRouteDeps, "db">;

/**
 * The register's technician filter within what the reader may see (server/register/register-visibility.ts):
 * the whole register reads anyone's lines or everyone's; otherwise only one's own.
 */
function registerScope(
  res: Response,
  requested: string | undefined,
): { technicianId?: string; allTechnicians: boolean } {
  const { user } = getAuth(res);
  if (readsWholeRegister(user)) return { technicianId: requested, allTechnicians: true };
  const technicianId = requested ?? user.id;
  if (!mayReadRegisterLine(user, technicianId))
    throw new HttpError(403, "You can see and export only your own refrigerant records");
  return { technicianId, allTechnicians: false };
}

export function cylindersRouter({ db }: Deps): Router {
  const router = Router();
  const ListQuery = z.object({ refrigerant: text().min(1).optional() });

  router.get("/", async (req, res) => {
    const filter = ListQuery.parse(req.query);
    const rows = await listCylinders(db, getAuth(res).organisationId, filter);
    res.json({ cylinders: rows.map(toCylinder) });
  });

  router.post("/", async (req, res) => {
    const values = CylinderCreateSchema.parse(req.body);
    const row = await createCylinder(db, getAuth(res).organisationId, values);
    if (!row) throw fieldError("label", "Your company already has a cylinder with this label");
    res.status(201).json({ cylinder: toCylinder(row) });
  });

  router.get("/:id", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const row = await getCylinder(db, organisationId, parseId(req.params.id, "Cylinder"));
    if (!row) throw notFound("Cylinder");
    res.json({
      cylinder: toCylinder(row),
      ...visibleRegisterLines(user, await cylinderMovements(db, organisationId, row.id)),
    });
  });

  // A recovery cylinder's contents handed to a reclaimer: a register entry with no visit.
  router.post("/:id/reclaim", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const row = await getCylinder(db, organisationId, parseId(req.params.id, "Cylinder"));
    if (!row) throw notFound("Cylinder");
    const values = ReclaimCreateSchema.parse(req.body);
    checkCylinder(row, "sent-for-reclaim", row.refrigerant, values.kg);
    const { entry: movement } = await insertMovement(db, organisationId, {
      visitId: null,
      equipmentId: null,
      circuit: null,
      refrigerant: row.refrigerant,
      kind: "sent-for-reclaim",
      kg: values.kg,
      cylinderId: row.id,
      technicianId: user.id,
      at: values.at ? new Date(values.at) : undefined,
      note: values.note,
    });
    const after = await getCylinder(db, organisationId, row.id);
    res.status(201).json({ movement, cylinder: after ? toCylinder(after) : null });
  });

  // A reclaim entered wrongly is voided with a reason, like any register movement; one made on
  // a visit is voided there (POST /api/visits/:id/voids), under that visit's open/closed rule.
  router.post("/:id/movements/:movementId/void", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const row = await getCylinder(db, organisationId, parseId(req.params.id, "Cylinder"));
    if (!row) throw notFound("Cylinder");
    const { reason } = VoidReasonSchema.parse(req.body);
    const outcome = await voidReclaim(db, organisationId, {
      cylinderId: row.id,
      movementId: parseId(req.params.movementId, "Movement"),
      reason,
      voidedBy: user.id,
    });
    if (outcome === "missing") throw notFound("Movement");
    if (outcome === "on-a-visit")
      throw new HttpError(409, "This movement was logged on a visit: void it on that visit's Refrigerant section");
    if (outcome === "already-void") throw new HttpError(409, "This movement is already void");
    const after = await getCylinder(db, organisationId, row.id);
    res.status(201).json({ movement: outcome, cylinder: after ? toCylinder(after) : null });
  });

  return router;
}

/** The `:circuit` of a path, as a circuit of the unit's nameplate; anything else (2.5, "x", 9) is no circuit of it. */
function circuitOf(unit: { circuits: { number: number }[] }, raw: unknown): number {
  const circuit = typeof raw === "string" && /^\d{1,2}$/.test(raw) ? Number(raw) : NaN;
  if (!unit.circuits.some((candidate) => candidate.number === circuit)) throw notFound("Circuit");
  return circuit;
}

/** Mounted at /api/visits beside the visits router. */
export function visitRefrigerantRouter({ db }: Deps): Router {
  const router = Router();

  /** The readings' charge estimate just before the circuit's first standing recovery on the visit, or null. */
  async function estimateAtFirstRecovery(visitId: string, circuit: number, movements: readonly MovementRow[]) {
    const recoveries = movements.filter(
      (movement) => movement.kind === "recovered" && movement.circuit === circuit && movement.voided === null,
    );
    if (recoveries.length === 0) return null;
    const firstRecovery = Math.min(...recoveries.map((movement) => Date.parse(movement.at)));
    return chargeEstimateBefore(db, visitId, circuit, new Date(firstRecovery));
  }

  /** The visit's refrigerant as `reader` may see it: their lines, balances over all of them. */
  async function visitRefrigerant(
    reader: RegisterReader,
    organisationId: string,
    visitId: string,
    unit: NonNullable<Awaited<ReturnType<typeof getEquipment>>>,
  ) {
    const [movements, charges] = await Promise.all([
      visitMovements(db, organisationId, visitId),
      visitCircuitCharges(db, organisationId, visitId),
    ]);
    // Over every movement, like the balances: the check compares totals, not the lines shown.
    const runLogCheck = await runLogChargeCheck(db, organisationId, visitId, movements);
    const { note, glideK } = liquidChargingNote(unit.refrigerant);
    const estimates = await Promise.all(
      unit.circuits.map((nameplate) => estimateAtFirstRecovery(visitId, nameplate.number, movements)),
    );
    return {
      refrigerant: unit.refrigerant,
      liquidChargingNote: note,
      glideK,
      ...visibleRegisterLines(reader, movements),
      circuits: unit.circuits.map((nameplate, index) =>
        circuitBalance(
          nameplate,
          movements,
          charges.find((charge) => charge.circuit === nameplate.number),
          estimates[index],
        ),
      ),
      runLogCheck,
    };
  }

  router.get("/:id/refrigerant", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const { visit, unit } = await loadVisitAndUnit(db, organisationId, req.params.id);
    res.json(await visitRefrigerant(user, organisationId, visit.id, unit));
  });

  router.post("/:id/refrigerant", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const { visit, unit } = await loadVisitAndUnit(db, organisationId, req.params.id);
    // A repeated send (README decision 026) is answered with the entry stored first, whatever the visit's status now.
    const earlier = await findChargeEntry(db, organisationId, visit.id, clientIdOf(req.body));
    if (earlier)
      return void sendEntry(
        res,
        { movement: earlier.movement, cylinder: earlier.cylinder ? toCylinder(earlier.cylinder) : null },
        true,
      );
    requireWritableVisit(visit.status);
    const values = MovementCreateSchema.parse(req.body);
    requireDeviceTime("at", values.at, visit, { backDated: true });
    if (!unit.circuits.some((circuit) => circuit.number === values.circuit)) {
      throw fieldError("circuit", `${unit.name} has ${unit.circuits.length} circuit(s)`);
    }
    // The movement and its run-log charge adjustment, checked and stored together (server/register/charge-entry.ts).
    const { movement, cylinder, replayed } = await writeToVisit(db, organisationId, visit.id, async (tx) => {
      const stored = await recordChargeEntry(tx, organisationId, {
        visitId: visit.id,
        unit,
        technicianId: user.id,
        movement: {
          kind: values.kind,
          kg: values.kg,
          circuit: values.circuit,
          cylinderId: values.cylinderId ?? null,
          at: deviceDate(values.at),
          note: values.note,
        },
        clientId: values.clientId,
      });
      await joinCrew(tx, visit.id, user.id);
      return stored;
    });
    const after = cylinder ? await getCylinder(db, organisationId, cylinder.id) : undefined;
    sendEntry(res, { movement, cylinder: after ? toCylinder(after) : null }, replayed);
  });

  // Declares that the circuit had a full weigh-in; the weighed-in mass is the register's
  // reused + added kg, so only the line-length adjustment is entered. A changed figure voids
  // the standing declaration (kept, with what changed); withdrawing one is a void with a reason.
  router.put("/:id/refrigerant/charging/:circuit", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const { visit, unit } = await loadVisitAndUnit(db, organisationId, req.params.id);
    requireWritableVisit(visit.status);
    const circuit = circuitOf(unit, req.params.circuit);
    const values = ChargingUpdateSchema.parse(req.body);
    await writeToVisit(db, organisationId, visit.id, async (tx) => {
      const replaced = await declareCircuitCharge(tx, organisationId, {
        visitId: visit.id,
        circuit,
        lineAdjustmentKg: values.lineAdjustmentKg,
        recordedBy: user.id,
      });
      if (replaced) {
        await insertVisitEvent(tx, organisationId, {
          visitId: visit.id,
          action: "voided",
          recordKind: "charging",
          recordId: replaced.replacedId,
          summary: `Full weigh-in of circuit ${circuit}`,
          reason: replaced.reason,
          actorId: user.id,
        });
      }
      // Readings logged before the declaration may already show the circuit settled on its new charge.
      await calibrateAfterWeighIn(tx, organisationId, {
        visitId: visit.id,
        equipmentId: unit.id,
        circuit,
        actorId: user.id,
      });
    });
    res.json(await visitRefrigerant(user, organisationId, visit.id, unit));
  });

  return router;
}

/** Mounted at /api/equipment beside the equipment router. */
export function equipmentRefrigerantRouter({ db }: Deps): Router {
  const router = Router();
  router.get("/:id/refrigerant", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const unit = await loadUnit(db, organisationId, req.params.id);
    const movements = await equipmentMovements(db, organisationId, unit.id);
    const nameplateKg = unit.circuits.reduce((sum, circuit) => sum + circuit.factoryChargeKg, 0);
    const events = topUps(movements);
    res.json({
      refrigerant: unit.refrigerant,
      nameplateKg,
      ...visibleRegisterLines(user, movements),
      topUps: events,
      leakRate: leakRate(events, nameplateKg),
    });
  });
  return router;
}

export function registerRouter({ db }: Deps): Router {
  const router = Router();

  /** The period and technician asked for, within what the reader may see. */
  async function filterFor(res: Response, query: { from?: string; to?: string; technicianId?: string }) {
    const { organisationId } = getAuth(res);
    const scope = registerScope(res, query.technicianId);
    if (scope.technicianId && !(await findMember(db, organisationId, scope.technicianId)))
      throw fieldError("technicianId", "Choose one of your company's people");
    const filter: RegisterFilter = {
      fromMs: query.from ? boundStart(query.from) : undefined,
      toMs: query.to ? boundEnd(query.to) : undefined,
      technicianId: scope.technicianId,
    };
    return { filter, allTechnicians: scope.allTechnicians };
  }

  // A page of lines, with the totals of the whole period (summed in the database).
  router.get("/", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const query = RegisterPageQuerySchema.parse(req.query);
    const { filter, allTechnicians } = await filterFor(res, query);
    const [page, totals] = await Promise.all([
      registerPage(db, organisationId, {
        ...filter,
        direction: query.dir ?? "asc",
        cursor: query.cursor,
        limit: query.limit,
      }),
      registerTotals(db, organisationId, filter),
    ]);
    // The filter above already keeps a technician to their own lines; the rule is still the one that decides.
    const { movements } = visibleRegisterLines(user, page.rows);
    res.json({ movements, totals, allTechnicians, nextCursor: page.nextCursor });
  });

  // The whole period, streamed as it is read (serv../register/register-csv-text.ts).
  router.get("/export.csv", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const query = RegisterQuerySchema.parse(req.query);
    const { filter } = await filterFor(res, query);
    const licences = await licenceNumbers(db, organisationId);
    const name = ["refrigerant-register", query.from, query.to]
      .filter(Boolean)
      .join("_")
      .replace(/[^0-9A-Za-z_-]/g, "-");
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    res.setHeader("Content-Disposition", `attachment; filename="${name}.csv"`);
    res.setHeader("Cache-Control", "private, no-store");
    try {
      const lines = registerCsvText(
        registerChunks(db, organisationId, filter, EXPORT_CHUNK_LINES, FIRST_EXPORT_CHUNK_LINES),
        (movement) =>
          mayReadRegisterLine(user, movement.technician?.id ?? null) ? registerCsvLine(movement, licences) : undefined,
      );
      await streamPieces(res, lines);
    } catch (error) {
      // Once the header is out the status is sent: the response is cut short (streamPieces
      // destroys it), so the download fails instead of ending a partial file that looks whole.
      if (!res.headersSent) throw error;
      req.log?.error({ err: error }, "register export stopped part-way");
    }
  });

  return router;
}
