import { Router } from "express";
import { VISIT_EQUIPMENT_HEADER, VISIT_REFRIGERANT_HEADER } from "@shared/http/visit-headers.ts";
import { VisitListQuerySchema } from "@shared/schemas/list-pages.ts";
import {
  AdjustmentCreateSchema,
  CommentCreateSchema,
  isChargeAdjustment,
  PhotoFieldsSchema,
  ReadingBodySchema,
  ReadingsPageQuerySchema,
  ReviewActionSchema,
  SendReportSchema,
  STATUSES_OPEN_FOR_COMMENTS,
  VisitCreateSchema,
  VisitDetailQuerySchema,
  VoidBodySchema,
} from "@shared/schemas/visits.ts";
import { getAuth } from "../auth/session.ts";
import { circuitCharge } from "../db/charge-references.ts";
import { getSite } from "../db/equipment.ts";
import { findEntry } from "../db/store-once.ts";
import {
  adjustmentEntries,
  commentEntries,
  createVisit,
  findPhoto,
  getVisitDelta,
  getVisitDetail,
  getVisitHead,
  insertAdjustment,
  insertComment,
  insertPhoto,
  joinCrew,
  listVisitPage,
  photoEntries,
  visitReadingsPage,
} from "../db/visits.ts";
import { singleFileUpload } from "../http/file-upload.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import { requireWritableVisit } from "../http/require-writable-visit.ts";
import { reviewVisit } from "../visits/review-visit.ts";
import { judgeCsvOffThread } from "../import/csv-import-pool.ts";
import { ImportFieldsSchema } from "../import/readings-csv.ts";
import { storeImportedReadings } from "../import/store-imported-readings.ts";
import { MAX_PHOTO_BYTES } from "../photos/prepare-photo.ts";
import { discardPhoto, readPhoto, storePhoto } from "../photos/stored-photos.ts";
import { visitReportMail } from "../report/visit-report-mail.ts";
import { chargeMovementKind, linkToMovement, recordChargeEntry } from "../register/charge-entry.ts";
import { createReadingSaver } from "../visits/save-readings.ts";
import type { ReadingContext } from "../visits/reading-input.ts";
import { matchesIfNoneMatch, revisionSince, visitEtag } from "../visits/visit-revision.ts";
import { answeredBefore, deviceDate, requireDeviceTime, sendEntry } from "../visits/device-entry.ts";
import { findRepeatedVoid, voidVisitRecord } from "../visits/void-record.ts";
import { writeToVisit } from "../visits/write-to-visit.ts";
import type { AccountRouteDeps } from "./route-deps.ts";
import { loadUnit, loadVisit } from "../visits/load-records.ts";

type Deps = Pick<AccountRouteDeps, "db" | "env">;
type PhotoDeps = Pick<AccountRouteDeps, "db" | "photoStore">;

const FIELDS = "Some fields need attention";
/** A logged series of a few thousand rows is well under 2 MB of CSV. */
const MAX_CSV_BYTES = 2 * 1024 * 1024;

export function visitsRouter({
  db,
  env,
  mailer,
  photoStore,
}: Deps & Pick<AccountRouteDeps, "mailer" | "photoStore">): Router {
  const router = Router();
  const saveReading = createReadingSaver(db);
  const photoUpload = singleFileUpload("photo", "photo", MAX_PHOTO_BYTES);
  const csvUpload = singleFileUpload("file", "CSV file", MAX_CSV_BYTES);

  /** The unit, the circuit's nameplate and charge record, and the site: what the server adds to every reading. */
  async function readingContext(organisationId: string, equipmentId: string, circuit: number): Promise<ReadingContext> {
    const unit = await loadUnit(db, organisationId, equipmentId);
    const nameplate = unit.circuits.find((candidate) => candidate.number === circuit);
    if (!nameplate)
      throw new HttpError(400, FIELDS, { circuit: `${unit.name} has ${unit.circuits.length} circuit(s)` });
    const [site, charge] = await Promise.all([
      getSite(db, organisationId, unit.siteId),
      circuitCharge(db, organisationId, unit.id, nameplate),
    ]);
    if (!site) throw notFound("Site");
    return { unit, nameplate, site, charge };
  }

  // A page at a time, filtered, searched and sorted by the server (see shared/schemas/list-pages.ts).
  router.get("/", async (req, res) => {
    const query = VisitListQuerySchema.parse(req.query);
    const { organisationId, user } = getAuth(res);
    res.json(await listVisitPage(db, organisationId, query, user.id));
  });

  router.post("/", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const values = VisitCreateSchema.parse(req.body);
    const id = await createVisit(db, organisationId, { ...values, createdBy: user.id });
    if (!id) throw new HttpError(400, FIELDS, { equipmentId: "Choose one of your units" });
    res.status(201).json({ visit: await getVisitDetail(db, organisationId, id) });
  });

  // The open visit is polled every few seconds: answer from the visit's row alone when the
  // client already holds its revision (304), else only what changed since the revision it
  // names (a delta), else the whole visit. The ETag is ours (the revision), so Express's own
  // body hash, which needs the body built first, never runs here.
  router.get("/:id", async (req, res) => {
    const { organisationId } = getAuth(res);
    const { since } = VisitDetailQuerySchema.parse(req.query);
    const head = await getVisitHead(db, organisationId, parseId(req.params.id, "Visit"));
    if (!head) throw notFound("Visit");
    const etag = visitEtag(head.token);
    res.setHeader("ETag", etag);
    res.setHeader(VISIT_EQUIPMENT_HEADER, head.equipmentId);
    res.setHeader(VISIT_REFRIGERANT_HEADER, head.refrigerant);
    // Always revalidate: a visit is live, and a cached copy must be checked against its revision.
    res.setHeader("Cache-Control", "private, no-cache");
    if (matchesIfNoneMatch(req.get("if-none-match"), etag)) return void res.status(304).end();
    const sinceRevision = revisionSince(since, head.revision);
    const delta =
      sinceRevision === undefined ? undefined : await getVisitDelta(db, organisationId, head, sinceRevision);
    if (delta) return void res.json({ delta: { ...delta, since } });
    res.json({ visit: await getVisitDetail(db, organisationId, head.id, head) });
  });

  // Older readings of one circuit, a page at a time before the oldest the client holds (the
  // detail carries each circuit's latest page and, in circuitLogs, the cursor to go on from).
  router.get("/:id/readings", async (req, res) => {
    const { organisationId } = getAuth(res);
    // The visit first: another company's visit is missing (404) whatever the query says.
    const visit = await loadVisit(db, organisationId, req.params.id);
    const query = ReadingsPageQuerySchema.parse(req.query);
    res.json(await visitReadingsPage(db, visit.id, query));
  });

  // The body holds measured values only (strict); the server adds the nameplate, the RLA and
  // the site's atmosphere, re-runs the engine and stores input and result together. Concurrent
  // saves are written together, one transaction per batch (server/visits/save-readings.ts).
  router.post("/:id/readings", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visitId = parseId(req.params.id, "Visit");
    // Checked against the visit first (404, 409), then the body's refusal (400), inside the batch.
    const body = ReadingBodySchema.safeParse(req.body);
    let replayed = false;
    const reading = await saveReading({
      organisationId,
      visitId,
      user: { id: user.id, name: user.name },
      body,
      onReplayed: () => (replayed = true),
    });
    sendEntry(res, { reading }, replayed);
  });

  // CSV import: store all rows only if every row is valid, or the valid rows when the user
  // explicitly accepts skipping the others; "preview" judges the file and stores nothing (the
  // run log previews its columns in the browser and sends the file once, to import it). The
  // file is parsed and judged in a worker thread, whatever the browser made of it; the rows are
  // stored in slices.
  router.post("/:id/readings/import", csvUpload, async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    requireWritableVisit(visit.status);
    if (!req.file) throw new HttpError(400, FIELDS, { file: "Choose a CSV file" });
    const fields = ImportFieldsSchema.parse(req.body ?? {});
    const context = await readingContext(organisationId, visit.equipmentId, fields.circuit);
    const { slices, ...summary } = await judgeCsvOffThread({
      text: req.file.buffer.toString("utf8"),
      mapping: fields.mapping,
      context,
      dayStart: fields.dayStart,
      keepRows: fields.mode !== "preview",
    });
    if (fields.mode === "preview") return void res.json({ ...summary, stored: 0 });
    if (fields.mode === "all" && summary.problems.length > 0) {
      return void res.status(422).json({
        message: `${summary.problems.length} row(s) have problems: nothing was stored`,
        ...summary,
        stored: 0,
      });
    }
    const stored = await storeImportedReadings(db, organisationId, {
      visitId: visit.id,
      equipmentId: visit.equipmentId,
      circuit: fields.circuit,
      recordedBy: user.id,
      slices,
    });
    res.status(201).json({ ...summary, stored });
  });

  router.post("/:id/adjustments", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    if (await answeredBefore(db, res, adjustmentEntries, "adjustment", visit.id, req.body)) return;
    requireWritableVisit(visit.status);
    const { clientId, ...values } = AdjustmentCreateSchema.parse(req.body);
    requireDeviceTime("at", values.at, visit, { backDated: true });
    const at = deviceDate(values.at);
    if (isChargeAdjustment(values.kind)) {
      // Refrigerant added or removed is a register movement: both records in one transaction,
      // linked, with one figure; the register's rules refuse it whole or store it whole.
      const unit = await loadUnit(db, organisationId, visit.equipmentId);
      const circuit = values.circuit!;
      if (!unit.circuits.some((candidate) => candidate.number === circuit))
        throw new HttpError(400, FIELDS, { circuit: `${unit.name} has ${unit.circuits.length} circuit(s)` });
      const kind = values.kind;
      const stored = await writeToVisit(db, organisationId, visit.id, async (tx) => {
        // Under the visit's lock, so a repeat racing its first send finds it here.
        const earlier = await findEntry(tx, adjustmentEntries, visit.id, clientId);
        if (earlier) return { entry: earlier, replayed: true };
        const entry = values.movementId
          ? await linkToMovement(tx, organisationId, {
              visitId: visit.id,
              movementId: values.movementId,
              kind,
              amountKg: values.amountKg!,
              circuit,
              description: values.description,
              at,
              recordedBy: user.id,
              clientId,
            })
          : await recordChargeEntry(tx, organisationId, {
              visitId: visit.id,
              unit,
              technicianId: user.id,
              movement: {
                kind: await chargeMovementKind(tx, organisationId, kind, values.cylinderId!),
                kg: values.amountKg!,
                circuit,
                cylinderId: values.cylinderId!,
                at,
                note: values.description,
              },
              adjustment: { description: values.description },
              clientId,
            }).then(({ adjustment, replayed }) => ({ entry: adjustment, replayed }));
        await joinCrew(tx, visit.id, user.id);
        return entry;
      });
      return void sendEntry(res, { adjustment: stored.entry }, stored.replayed);
    }
    const { entry, replayed } = await writeToVisit(db, organisationId, visit.id, async (tx) => {
      const stored = await insertAdjustment(tx, organisationId, {
        visitId: visit.id,
        circuit: values.circuit ?? null,
        at,
        kind: values.kind,
        description: values.description,
        amountKg: values.amountKg ?? null,
        recordedBy: user.id,
        clientId,
      });
      await joinCrew(tx, visit.id, user.id);
      return stored;
    });
    sendEntry(res, { adjustment: entry }, replayed);
  });

  // Corrections: a record is voided with a reason (and entered again if need be), never deleted.
  router.post("/:id/voids", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    const body = VoidBodySchema.parse(req.body);
    const repeated = await findRepeatedVoid(db, organisationId, visit.id, body, user.id);
    if (repeated) return void sendEntry(res, { event: repeated }, true);
    requireWritableVisit(visit.status);
    const { event, replayed } = await writeToVisit(db, organisationId, visit.id, (tx) =>
      voidVisitRecord(tx, organisationId, visit.id, body, user.id),
    );
    sendEntry(res, { event }, replayed);
  });

  router.post("/:id/comments", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    if (await answeredBefore(db, res, commentEntries, "comment", visit.id, req.body)) return;
    const values = CommentCreateSchema.parse(req.body);
    const stored = await writeToVisit(
      db,
      organisationId,
      visit.id,
      (tx) =>
        insertComment(tx, organisationId, {
          visitId: visit.id,
          readingId: values.readingId ?? null,
          authorId: user.id,
          body: values.body,
          clientId: values.clientId,
        }),
      {
        allow: STATUSES_OPEN_FOR_COMMENTS,
        refuse: () => new HttpError(409, "This visit is signed off: comments are closed until it is reopened"),
      },
    );
    if (!stored) throw new HttpError(400, FIELDS, { readingId: "That reading is not part of this visit" });
    sendEntry(res, { comment: stored.entry }, stored.replayed);
  });

  router.post("/:id/review", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    await reviewVisit(db, organisationId, visit.id, ReviewActionSchema.parse(req.body), user);
    res.json({ visit: await getVisitDetail(db, organisationId, visit.id) });
  });

  // The photo is checked and written before the visit is locked (decoding takes a while); if the
  // visit closed meanwhile, the insert is refused under the lock and the files are removed.
  router.post("/:id/photos", photoUpload, async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(db, organisationId, req.params.id);
    // A repeat is answered before the upload is decoded again.
    if (await answeredBefore(db, res, photoEntries, "photo", visit.id, req.body)) return;
    requireWritableVisit(visit.status);
    if (!req.file) throw new HttpError(400, FIELDS, { photo: "Choose a photo to upload" });
    const meta = PhotoFieldsSchema.parse(req.body ?? {});
    requireDeviceTime("takenAt", meta.takenAt, visit);
    const stored = await storePhoto(photoStore, req.file.buffer);
    // Removing files nobody will use must not hide the answer (or the error) of the request: a
    // store that fails here leaves an orphan object, which costs only space.
    const discard = () =>
      discardPhoto(photoStore, stored).catch((failure: unknown) =>
        req.log.warn({ err: failure, name: stored.storedName }, "could not remove the files of a photo not kept"),
      );
    try {
      const { entry, replayed } = await writeToVisit(db, organisationId, visit.id, (tx) =>
        insertPhoto(tx, organisationId, {
          visitId: visit.id,
          kind: meta.kind,
          caption: meta.caption || null,
          ...stored,
          uploadedBy: user.id,
          clientId: meta.clientId,
          takenAt: deviceDate(meta.takenAt),
        }),
      );
      // A send that raced its repeat stored no row: its files are nobody's.
      if (replayed) await discard();
      sendEntry(res, { photo: entry }, replayed);
    } catch (error) {
      await discard();
      throw error;
    }
  });

  router.post("/:id/report/send", async (req, res) => {
    const { organisationId } = getAuth(res);
    const { to, timeZone } = SendReportSchema.parse(req.body);
    const visit = await getVisitDetail(db, organisationId, parseId(req.params.id, "Visit"));
    if (!visit) throw notFound("Visit");
    // The link is built from APP_URL, never from the request's Host header.
    await mailer.send(visitReportMail(visit, `${env.APP_URL}/visits/${visit.id}/report`, to, organisationId, timeZone));
    res.json({ sentTo: to });
  });

  return router;
}

export function photosRouter({ db, photoStore }: PhotoDeps): Router {
  const router = Router();
  const send =
    (variant: "original" | "thumbnail") => async (req: import("express").Request, res: import("express").Response) => {
      const photo = await findPhoto(db, getAuth(res).organisationId, parseId(req.params.id, "Photo"));
      if (!photo) throw notFound("Photo");
      const name = variant === "original" ? photo.storedName : photo.thumbnailName;
      const data = await readPhoto(photoStore, name);
      if (!data) {
        // A row whose bytes are gone (a store restored from an older copy): a 404, and a line for the operator.
        req.log.warn({ photoId: photo.id, name }, "photo not found in the photo store");
        throw notFound("Photo");
      }
      res.setHeader("Content-Type", variant === "original" ? photo.mimeType : "image/webp");
      res.setHeader("Cache-Control", "private, max-age=86400");
      res.send(data);
    };
  router.get("/:id", send("original"));
  router.get("/:id/thumbnail", send("thumbnail"));
  return router;
}
