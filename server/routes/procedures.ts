/**
 * A visit's procedure records, beside its readings: /api/visits/:id/electrical-checks,
 * /leak-searches, /standing-pressure-checks, /pressure-tests and /evacuations (with …/:evacuationId/samples to add vacuum
 * readings as they are read, and PATCH …/:evacuationId to valve off the pump). Like readings:
 * bodies are validated with the shared schemas (400 with field messages), the visit is looked
 * up within the caller's organisation (404 otherwise), apprentices only read (403), a visit
 * awaiting review or signed off takes no entries (409; checked again under the visit's lock by
 * writeToVisit), and the stored result is recomputed by the engine on every save. A record is
 * corrected by voiding it (POST /api/visits/:id/voids), never by deleting it.
 */
import { Router } from "express";
import {
  ElectricalCheckBodySchema,
  EvacuationCreateSchema,
  EvacuationSampleBodySchema,
  EvacuationUpdateSchema,
  LeakSearchBodySchema,
  PressureTestBodySchema,
  StandingPressureBodySchema,
  type ElectricalCheck,
  type LeakSearch,
  type PressureTest,
  type StandingPressureCheck,
} from "@shared/schemas/procedure-records.ts";
import { evacuationResult, standingPressureOutcome } from "@shared/engine/index.ts";
import { getAuth } from "../auth/session.ts";
import type { Database } from "../db/client.ts";
import { getSite } from "../db/equipment.ts";
import {
  type CheckKind,
  type CheckTable,
  electricalCheckKind,
  evacuationEntries,
  leakSearchKind,
  pressureTestKind,
  standingPressureKind,
  type EvacuationRow,
  findEvacuation,
  getProcedureSettings,
  insertEvacuation,
  listEvacuations,
  updateEvacuation,
} from "../db/procedures.ts";
import { joinCrew, type VisitRow } from "../db/visits.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import { requireWritableVisit } from "../http/require-writable-visit.ts";
import { requireIfMatch, staleWrite } from "../http/versioning.ts";
import { answeredBefore, clientIdOf, deviceDate, requireDeviceTime, sendEntry } from "../visits/device-entry.ts";
import { siteAtmosphere } from "../visits/reading-input.ts";
import { writeToVisit } from "../visits/write-to-visit.ts";
import { electricalCheckResult, leakSearchResult, pressureTestRecordResult } from "../procedures/record-results.ts";
import { loadUnit, loadVisit } from "../visits/load-records.ts";
import { allowedDropKPa, evacuationTargetMicrons } from "../procedures/company-limits.ts";

const FIELDS = "Some fields need attention";

/** Minutes since a moment, to the tenth, from the server's clock. */
const minutesSince = (start: Date) => Math.round((Date.now() - start.getTime()) / 6_000) / 10;

/** Readings this close before "valve off now" count as the reading at isolation, minutes. */
const ISOLATION_READING_WINDOW_MINUTES = 2;

/** Valving off "now": at the last reading if it was just taken (it starts the decay test), else the clock. */
function isolationNow(startedAt: Date, samples: { minutes: number }[]): number {
  const now = minutesSince(startedAt);
  const last = samples.at(-1)?.minutes;
  return last !== undefined && now - last <= ISOLATION_READING_WINDOW_MINUTES ? last : Math.max(now, last ?? 0);
}

export function proceduresRouter({ db }: { db: Database }): Router {
  const router = Router();

  /** Stores a record under the visit's lock (refused if the visit closed meanwhile) and puts the author on the crew. */
  function recordOnVisit<T>(
    organisationId: string,
    visitId: string,
    userId: string,
    write: (tx: Database) => Promise<T>,
  ): Promise<T> {
    return writeToVisit(db, organisationId, visitId, async (tx) => {
      const stored = await write(tx);
      await joinCrew(tx, visitId, userId);
      return stored;
    });
  }

  /**
   * POST of one kind of check. A repeat of an earlier send (same client id) is answered with the
   * check it stored; otherwise the visit must take entries, the body is parsed with its schema,
   * its device time bounded, `judge` makes the stored input and the engine's result from it (with
   * the unit's and the company's figures), and the check is stored under the visit's lock.
   */
  function postCheck<Table extends CheckTable, Body extends { clientId?: string; takenAt?: string }>(
    path: string,
    key: string,
    kind: CheckKind<Table>,
    schema: { parse: (body: unknown) => Body },
    judge: (
      body: Omit<Body, "clientId" | "takenAt">,
      context: { organisationId: string; visit: VisitRow },
    ) => Promise<{ input: Table["$inferSelect"]["input"]; result: Table["$inferSelect"]["result"] }>,
  ) {
    router.post(path, async (req, res) => {
      const { organisationId, user } = getAuth(res);
      const visit = await loadVisit(db, organisationId, req.params.id);
      if (await answeredBefore(db, res, kind.entries, key, visit.id, req.body)) return;
      requireWritableVisit(visit.status);
      const { clientId, takenAt, ...body } = schema.parse(req.body);
      requireDeviceTime("takenAt", takenAt, visit);
      const { input, result } = await judge(body, { organisationId, visit });
      const { entry, replayed } = await recordOnVisit(organisationId, visit.id, user.id, (tx) =>
        kind.insert(tx, organisationId, {
          visitId: visit.id,
          input,
          result,
          recordedBy: user.id,
          clientId,
          takenAt: deviceDate(takenAt),
        }),
      );
      sendEntry(res, { [key]: entry }, replayed);
    });
  }

  // ---- electrical checks --------------------------------------------------------------------

  router.get("/:id/electrical-checks", async (req, res) => {
    const { organisationId } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    const unit = await loadUnit(db, organisationId, visit.equipmentId);
    res.json({
      electricalChecks: (await electricalCheckKind.list(db, organisationId, visit.id)) satisfies ElectricalCheck[],
      defaults: {
        nameplateV: unit.supplyVoltageV,
        phases: unit.phases,
        compressorRlaA: unit.compressorRlaA,
        fanFlaA: unit.fanFlaA,
      },
    });
  });

  postCheck(
    "/:id/electrical-checks",
    "electricalCheck",
    electricalCheckKind,
    ElectricalCheckBodySchema,
    async (body, { organisationId, visit }) => {
      const unit = await loadUnit(db, organisationId, visit.equipmentId);
      // The nameplate fills in what the technician did not type (as targets do for readings).
      const nameplateV = body.nameplateV ?? unit.supplyVoltageV ?? null;
      const ratedA =
        body.ratedA ??
        (body.target === "compressor" ? unit.compressorRlaA : body.target === "fan" ? unit.fanFlaA : null) ??
        null;
      if (body.runningAmps?.length && ratedA === null) {
        throw new HttpError(400, FIELDS, {
          ratedA: `Enter the nameplate ${body.target === "fan" ? "FLA" : "RLA"}: ${unit.name} has none on record`,
        });
      }
      if (body.supplyVolts?.length && nameplateV === null) {
        throw new HttpError(400, FIELDS, {
          nameplateV: `Enter the nameplate voltage: ${unit.name} has none on record`,
        });
      }
      const input = {
        target: body.target,
        circuit: body.circuit ?? null,
        supplyVolts: body.supplyVolts ?? null,
        nameplateV,
        insulation: (body.insulation ?? []).map((reading) => ({
          megohms: reading.megohms,
          testVoltageV: reading.testVoltageV,
          ...(reading.point ? { point: reading.point } : {}),
        })),
        windingOhms: body.windingOhms ?? null,
        singlePhaseWindingOhms: body.singlePhaseWindingOhms ?? null,
        runningAmps: body.runningAmps ?? null,
        ratedA,
        note: body.note || null,
      };
      const settings = await getProcedureSettings(db, organisationId);
      return { input, result: electricalCheckResult(input, settings.procedureLimits) };
    },
  );

  // ---- leak searches ------------------------------------------------------------------------

  router.get("/:id/leak-searches", async (req, res) => {
    const { organisationId } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    res.json({ leakSearches: (await leakSearchKind.list(db, organisationId, visit.id)) satisfies LeakSearch[] });
  });

  postCheck("/:id/leak-searches", "leakSearch", leakSearchKind, LeakSearchBodySchema, async (input) => ({
    input,
    result: leakSearchResult(input),
  }));

  // ---- standing-pressure checks -------------------------------------------------------------

  router.get("/:id/standing-pressure-checks", async (req, res) => {
    const { organisationId } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    res.json({
      standingPressureChecks: (await standingPressureKind.list(
        db,
        organisationId,
        visit.id,
      )) satisfies StandingPressureCheck[],
    });
  });

  // The body holds the two readings; the refrigerant (the unit's) and the atmosphere (the
  // site's, as for readings) are the server's, so the stored verdict cannot be steered.
  postCheck(
    "/:id/standing-pressure-checks",
    "standingPressureCheck",
    standingPressureKind,
    StandingPressureBodySchema,
    async (body, { organisationId, visit }) => {
      const unit = await loadUnit(db, organisationId, visit.equipmentId);
      const circuit = body.circuit ?? null;
      if (circuit !== null && !unit.circuits.some((candidate) => candidate.number === circuit)) {
        throw new HttpError(400, FIELDS, { circuit: `${unit.name} has ${unit.circuits.length} circuit(s)` });
      }
      const site = await getSite(db, organisationId, unit.siteId);
      if (!site) throw notFound("Site");
      const input = {
        refrigerant: unit.refrigerant,
        standingGaugeKPa: body.standingGaugeKPa,
        equalisedTempC: body.equalisedTempC,
        atmosphericPressureKPa: siteAtmosphere(site).pressureKPa,
        circuit,
        note: body.note || null,
      };
      const outcome = standingPressureOutcome(input);
      if ("problem" in outcome) throw new HttpError(400, FIELDS, { [outcome.problem.field]: outcome.problem.message });
      return { input, result: outcome.result };
    },
  );

  // ---- pressure tests -----------------------------------------------------------------------

  router.get("/:id/pressure-tests", async (req, res) => {
    const { organisationId } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    const unit = await loadUnit(db, organisationId, visit.equipmentId);
    const settings = await getProcedureSettings(db, organisationId);
    res.json({
      pressureTests: (await pressureTestKind.list(db, organisationId, visit.id)) satisfies PressureTest[],
      defaults: {
        allowedDropKPa: allowedDropKPa(settings),
        ratedHighSideKPa: unit.ratedHighSideKPa,
        ratedLowSideKPa: unit.ratedLowSideKPa,
      },
    });
  });

  postCheck(
    "/:id/pressure-tests",
    "pressureTest",
    pressureTestKind,
    PressureTestBodySchema,
    async (body, { organisationId }) => {
      const settings = await getProcedureSettings(db, organisationId);
      const input = {
        ...body,
        testGaugeKPa: body.testGaugeKPa ?? body.startGaugeKPa,
        allowedDropKPa: body.allowedDropKPa ?? allowedDropKPa(settings),
        note: body.note || null,
      };
      return { input, result: pressureTestRecordResult(input, settings.procedureLimits) };
    },
  );

  // ---- evacuations --------------------------------------------------------------------------

  router.get("/:id/evacuations", async (req, res) => {
    const { organisationId } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    const settings = await getProcedureSettings(db, organisationId);
    res.json({
      evacuations: await listEvacuations(db, organisationId, visit.id),
      defaults: { targetMicrons: evacuationTargetMicrons(settings), limits: settings.procedureLimits ?? {} },
    });
  });

  router.post("/:id/evacuations", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    if (await answeredBefore(db, res, evacuationEntries, "evacuation", visit.id, req.body)) return;
    requireWritableVisit(visit.status);
    const { clientId, startedAt, ...body } = EvacuationCreateSchema.parse(req.body);
    requireDeviceTime("startedAt", startedAt, visit);
    const settings = await getProcedureSettings(db, organisationId);
    const target = body.targetMicrons ?? evacuationTargetMicrons(settings);
    const samples = body.samples ?? [];
    const isolatedAtMinutes = body.isolatedAtMinutes ?? null;
    const { entry, replayed } = await recordOnVisit(organisationId, visit.id, user.id, (tx) =>
      insertEvacuation(tx, organisationId, {
        visitId: visit.id,
        targetMicrons: target,
        isolatedAtMinutes,
        samples,
        note: body.note || null,
        result: evacuationResult(samples, target, isolatedAtMinutes, settings.procedureLimits),
        recordedBy: user.id,
        clientId,
        startedAt: deviceDate(startedAt),
      }),
    );
    sendEntry(res, { evacuation: entry }, replayed);
  });

  /** The evacuation as it stands, read under the visit's lock; a voided one takes no more changes. */
  async function loadEvacuation(tx: Database, organisationId: string, visitId: string, rawId: unknown) {
    const row = await findEvacuation(tx, organisationId, visitId, parseId(rawId, "Evacuation"));
    if (!row) throw notFound("Evacuation");
    if (row.voidedAt) throw new HttpError(409, "This evacuation is void: start a new one to record more");
    return row;
  }

  /** The evacuation as the API shows it when it already holds the sample with this client id, if it does. */
  async function holdingSample(tx: Database, row: EvacuationRow | undefined, clientId: string | undefined) {
    if (!row || !clientId || !row.samples.some((sample) => sample.clientId === clientId)) return undefined;
    return evacuationEntries.present(tx, row);
  }

  // Samples are appended under the visit's lock, so two devices adding readings at once both land.
  // A sample is no row of its own but an element of the evacuation's series: a repeated send is
  // told apart by the client id kept on the sample, checked under that same lock (which every
  // change to the series takes), so two sends of one sample add it once (README decision 026).
  router.post("/:id/evacuations/:evacuationId/samples", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    const evacuationId = parseId(req.params.evacuationId, "Evacuation");
    const repeated = await holdingSample(
      db,
      await findEvacuation(db, organisationId, visit.id, evacuationId),
      clientIdOf(req.body),
    );
    if (repeated) return void sendEntry(res, { evacuation: repeated }, true);
    requireWritableVisit(visit.status);
    const { clientId, ...body } = EvacuationSampleBodySchema.parse(req.body);
    const settings = await getProcedureSettings(db, organisationId);
    let replayed = false;
    const evacuation = await recordOnVisit(organisationId, visit.id, user.id, async (tx) => {
      const held = await holdingSample(tx, await findEvacuation(tx, organisationId, visit.id, evacuationId), clientId);
      if (held) {
        replayed = true;
        return held;
      }
      const row = await loadEvacuation(tx, organisationId, visit.id, evacuationId);
      const minutes = body.minutes ?? minutesSince(row.startedAt);
      const last = row.samples.at(-1);
      if (last && minutes <= last.minutes) {
        throw new HttpError(400, FIELDS, {
          minutes: `Each reading must be later than the one before it (${last.minutes} min)`,
        });
      }
      const samples = [...row.samples, { minutes, microns: body.microns, ...(clientId ? { clientId } : {}) }];
      return (await updateEvacuation(tx, organisationId, row.id, {
        targetMicrons: row.targetMicrons,
        isolatedAtMinutes: row.isolatedAtMinutes,
        samples,
        note: row.note,
        result: evacuationResult(samples, row.targetMicrons, row.isolatedAtMinutes, settings.procedureLimits),
      }))!;
    });
    sendEntry(res, { evacuation }, replayed);
  });

  // Valving off, the target and the note change the record: the request names the version it saw.
  router.patch("/:id/evacuations/:evacuationId", async (req, res) => {
    const { organisationId } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    requireWritableVisit(visit.status);
    const body = EvacuationUpdateSchema.parse(req.body);
    const version = requireIfMatch(req);
    const settings = await getProcedureSettings(db, organisationId);
    const evacuation = await writeToVisit(db, organisationId, visit.id, async (tx) => {
      const row = await loadEvacuation(tx, organisationId, visit.id, req.params.evacuationId);
      const isolatedAtMinutes = body.isolateNow
        ? isolationNow(row.startedAt, row.samples)
        : body.isolatedAtMinutes === undefined
          ? row.isolatedAtMinutes
          : body.isolatedAtMinutes;
      const target = body.targetMicrons ?? row.targetMicrons;
      const updated = await updateEvacuation(
        tx,
        organisationId,
        row.id,
        {
          targetMicrons: target,
          isolatedAtMinutes,
          samples: row.samples,
          note: body.note === undefined ? row.note : body.note || null,
          result: evacuationResult(row.samples, target, isolatedAtMinutes, settings.procedureLimits),
        },
        version,
      );
      if (!updated) throw staleWrite("this evacuation");
      return updated;
    });
    res.json({ evacuation });
  });

  return router;
}
