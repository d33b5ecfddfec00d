import { Router } from "express";
import multer from "multer";
import { z } from "zod";
import { diagnose } from "@shared/engine/index.ts";
import { PERMISSIONS } from "@shared/schemas/auth.ts";
import { instant } from "@shared/schemas/dates.ts";
import { DiagnosisInputSchema } from "@shared/schemas/diagnosis.ts";
import { text } from "@shared/schemas/text.ts";
import {
  AdjustmentCreateSchema,
  CommentCreateSchema,
  PHOTO_KINDS,
  ReadingBodySchema,
  ReviewActionSchema,
  SendReportSchema,
  VisitCreateSchema,
  VisitStatusSchema,
  type VisitStatus,
} from "@shared/schemas/visits.ts";
import { getAuth } from "../auth/session.ts";
import { getEquipment } from "../db/equipment.ts";
import {
  createVisit,
  findPhoto,
  findVisit,
  getVisitDetail,
  insertAdjustment,
  insertComment,
  insertPhoto,
  insertReading,
  insertReadingSeries,
  joinCrew,
  listVisits,
  updateVisitStatus,
} from "../db/visits.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import { requireWritableVisit } from "../http/require-writable-visit.ts";
import { ColumnMappingSchema, previewReadingsCsv } from "../import/readings-csv.ts";
import { MAX_PHOTO_BYTES, readPhoto, storePhoto } from "../photos/photo-store.ts";
import { visitReportMail } from "../report/visit-report-mail.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

type Deps = Pick<AccountRouteDeps, "db" | "env">;


const ListQuerySchema = z.object({
  status: VisitStatusSchema.optional(),
  equipmentId: z.uuid().optional(),
});

/** Which review actions each status allows, and where they lead. */
const TRANSITIONS: Record<"submit" | "sign-off" | "send-back", { from: VisitStatus[]; to: VisitStatus }> = {
  submit: { from: ["open", "sent-back"], to: "awaiting-review" },
  "sign-off": { from: ["open", "awaiting-review"], to: "signed-off" },
  "send-back": { from: ["open", "awaiting-review"], to: "sent-back" },
};

export function visitsRouter({ db, env, mailer }: Deps & Pick<AccountRouteDeps, "mailer">): Router {
  const router = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 10 } });
  /** A logged series of a few thousand rows is well under 2 MB of CSV. */
  const csvUpload = multer({ storage: multer.memoryStorage(), limits: { fileSize: 2 * 1024 * 1024, files: 1, fields: 10 } });

  const ImportFieldsSchema = z.object({
    circuit: z.coerce.number().int().min(1),
    dayStart: instant("dayStart must be an ISO date-time"),
    mode: z.enum(["preview", "all", "valid-only"]).default("preview"),
    mapping: text({ multiline: true })
      .optional()
      .transform((json, context) => {
        if (!json) return undefined;
        try {
          return ColumnMappingSchema.parse(JSON.parse(json));
        } catch {
          context.addIssue({ code: "custom", message: "The column mapping is not valid" });
          return z.NEVER;
        }
      }),
  });

  async function loadVisit(organisationId: string, rawId: unknown) {
    const visit = await findVisit(db, organisationId, parseId(rawId, "Visit"));
    if (!visit) throw notFound("Visit");
    return visit;
  }

  router.get("/", async (req, res) => {
    const filter = ListQuerySchema.parse(req.query);
    res.json({ visits: await listVisits(db, getAuth(res).organisationId, filter) });
  });

  router.post("/", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const values = VisitCreateSchema.parse(req.body);
    const id = await createVisit(db, organisationId, { ...values, createdBy: user.id });
    if (!id) throw new HttpError(400, "Some fields need attention", { equipmentId: "Choose one of your units" });
    res.status(201).json({ visit: await getVisitDetail(db, organisationId, id) });
  });

  router.get("/:id", async (req, res) => {
    const visit = await getVisitDetail(db, getAuth(res).organisationId, parseId(req.params.id, "Visit"));
    if (!visit) throw notFound("Visit");
    res.json({ visit });
  });

  router.post("/:id/readings", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(organisationId, req.params.id);
    requireWritableVisit(visit.status);
    const { circuit, takenAt, note, ...readingFields } = ReadingBodySchema.parse(req.body);
    const unit = await getEquipment(db, organisationId, visit.equipmentId);
    if (!unit) throw notFound("Equipment");
    const nameplate = unit.circuits.find((candidate) => candidate.number === circuit);
    if (!nameplate) {
      throw new HttpError(400, "Some fields need attention", { circuit: `${unit.name} has ${unit.circuits.length} circuit(s)` });
    }
    // Refrigerant and metering device always come from the nameplate; targets and RLA too
    // unless the technician entered others (e.g. from the unit's own charging chart).
    const input = DiagnosisInputSchema.parse({
      targetSuperheatK: nameplate.targetSuperheatK ?? undefined,
      targetSubcoolingK: nameplate.targetSubcoolingK ?? undefined,
      compressorRla: unit.compressorRlaA ?? undefined,
      ...readingFields,
      refrigerant: unit.refrigerant,
      meteringDevice: nameplate.meteringDevice,
      application: unit.application,
      liquidLineLengthM: nameplate.liquidLineLengthM ?? undefined,
    });
    const result = diagnose(input);
    const reading = await insertReading(db, organisationId, {
      visitId: visit.id,
      circuit,
      takenAt: takenAt ? new Date(takenAt) : undefined,
      note,
      input,
      result,
      recordedBy: user.id,
    });
    await joinCrew(db, visit.id, user.id);
    res.status(201).json({ reading });
  });

  // CSV import: preview first (nothing stored), then store all rows only if every row is
  // valid, or store the valid rows when the user explicitly accepts skipping the others.
  router.post("/:id/readings/import", csvUpload.single("file"), async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(organisationId, req.params.id);
    requireWritableVisit(visit.status);
    if (!req.file) throw new HttpError(400, "Some fields need attention", { file: "Choose a CSV file" });
    const fields = ImportFieldsSchema.parse(req.body ?? {});
    const unit = await getEquipment(db, organisationId, visit.equipmentId);
    const nameplate = unit?.circuits.find((candidate) => candidate.number === fields.circuit);
    if (!unit || !nameplate) throw new HttpError(400, "Some fields need attention", { circuit: "That circuit is not on this unit" });
    const preview = previewReadingsCsv(req.file.buffer.toString("utf8"), fields.mapping, {
      base: {
        refrigerant: unit.refrigerant,
        meteringDevice: nameplate.meteringDevice,
        targetSuperheatK: nameplate.targetSuperheatK ?? undefined,
        targetSubcoolingK: nameplate.targetSubcoolingK ?? undefined,
        compressorRla: unit.compressorRlaA ?? undefined,
        application: unit.application,
        liquidLineLengthM: nameplate.liquidLineLengthM ?? undefined,
      },
      dayStart: new Date(fields.dayStart),
    });
    const summary = { headers: preview.headers, mapping: preview.mapping, rowCount: preview.rowCount, validCount: preview.valid.length, problems: preview.problems };
    if (fields.mode === "preview") return void res.json({ ...summary, stored: 0 });
    if (fields.mode === "all" && preview.problems.length > 0) {
      return void res.status(422).json({ message: `${preview.problems.length} row(s) have problems: nothing was stored`, ...summary, stored: 0 });
    }
    const stored = await insertReadingSeries(db, organisationId, visit.id, fields.circuit, preview.valid, user.id);
    await joinCrew(db, visit.id, user.id);
    res.status(201).json({ ...summary, stored });
  });

  router.post("/:id/adjustments", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(organisationId, req.params.id);
    requireWritableVisit(visit.status);
    const values = AdjustmentCreateSchema.parse(req.body);
    const adjustment = await insertAdjustment(db, organisationId, {
      visitId: visit.id,
      circuit: values.circuit ?? null,
      at: values.at ? new Date(values.at) : undefined,
      kind: values.kind,
      description: values.description,
      amountKg: values.amountKg ?? null,
      recordedBy: user.id,
    });
    await joinCrew(db, visit.id, user.id);
    res.status(201).json({ adjustment });
  });

  router.post("/:id/comments", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(organisationId, req.params.id);
    const values = CommentCreateSchema.parse(req.body);
    const comment = await insertComment(db, organisationId, {
      visitId: visit.id,
      readingId: values.readingId ?? null,
      authorId: user.id,
      body: values.body,
    });
    if (!comment) throw new HttpError(400, "Some fields need attention", { readingId: "That reading is not part of this visit" });
    res.status(201).json({ comment });
  });

  router.post("/:id/review", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(organisationId, req.params.id);
    const action = ReviewActionSchema.parse(req.body);
    const allowed = action.action === "submit" ? PERMISSIONS.writeRecords : PERMISSIONS.signOff;
    if (!(allowed as readonly string[]).includes(user.role)) {
      throw new HttpError(403, action.action === "submit" ? "Apprentices can read visits but not submit them" : "Only a senior technician or an owner can sign off or send back");
    }
    const transition = TRANSITIONS[action.action];
    if (!transition.from.includes(visit.status)) {
      throw new HttpError(409, `A visit that is ${visit.status.replace("-", " ")} cannot be ${action.action === "submit" ? "submitted" : action.action === "sign-off" ? "signed off" : "sent back"}`);
    }
    if (action.action === "sign-off") {
      await updateVisitStatus(db, visit.id, { status: transition.to, reviewNote: action.note || null, signedOffBy: user.id, signedOffAt: new Date() });
    } else if (action.action === "send-back") {
      await updateVisitStatus(db, visit.id, { status: transition.to, reviewNote: action.reason, signedOffBy: null, signedOffAt: null });
      // The reason also goes on the visit's thread, so the technician sees it in context.
      await insertComment(db, organisationId, { visitId: visit.id, readingId: null, authorId: user.id, body: `Sent back: ${action.reason}` });
    } else {
      await updateVisitStatus(db, visit.id, { status: transition.to });
    }
    res.json({ visit: await getVisitDetail(db, organisationId, visit.id) });
  });

  router.post("/:id/photos", upload.single("photo"), async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const visit = await loadVisit(organisationId, req.params.id);
    requireWritableVisit(visit.status);
    if (!req.file) throw new HttpError(400, "Some fields need attention", { photo: "Choose a photo to upload" });
    const meta = z
      .object({ kind: z.enum(PHOTO_KINDS).default("other"), caption: text().max(200).optional() })
      .parse(req.body ?? {});
    const stored = await storePhoto(env.UPLOADS_DIR, req.file.buffer);
    const photo = await insertPhoto(db, organisationId, { visitId: visit.id, kind: meta.kind, caption: meta.caption || null, ...stored, uploadedBy: user.id });
    res.status(201).json({ photo });
  });

  router.post("/:id/report/send", async (req, res) => {
    const { organisationId } = getAuth(res);
    const { to } = SendReportSchema.parse(req.body);
    const visit = await getVisitDetail(db, organisationId, parseId(req.params.id, "Visit"));
    if (!visit) throw notFound("Visit");
    // The link is built from APP_URL, never from the request's Host header.
    await mailer.send(visitReportMail(visit, `${env.APP_URL}/visits/${visit.id}/report`, to, organisationId));
    res.json({ sentTo: to });
  });

  return router;
}

export function photosRouter({ db, env }: Deps): Router {
  const router = Router();
  const send = (variant: "original" | "thumbnail") =>
    async (req: import("express").Request, res: import("express").Response) => {
      const photo = await findPhoto(db, getAuth(res).organisationId, parseId(req.params.id, "Photo"));
      if (!photo) throw notFound("Photo");
      const data = await readPhoto(env.UPLOADS_DIR, variant === "original" ? photo.storedName : photo.thumbnailName);
      res.setHeader("Content-Type", variant === "original" ? photo.mimeType : "image/webp");
      res.setHeader("Cache-Control", "private, max-age=86400");
      res.send(data);
    };
  router.get("/:id", send("original"));
  router.get("/:id/thumbnail", send("thumbnail"));
  return router;
}
