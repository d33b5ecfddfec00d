import { Router } from "express";
import { EVACUATION_LIMITS } from "@shared/engine/index.ts";
import {
  DEFAULT_ALLOWED_DROP_KPA,
  ProcedureSettingsUpdateSchema,
  type ProcedureSettings,
  type ProcedureSettingsResponse,
} from "@shared/schemas/procedure-records.ts";
import { getAuth } from "../auth/session.ts";
import { getVersionedProcedureSettings, updateProcedureSettings } from "../db/procedures.ts";
import { requireIfMatch, setVersion, staleWrite } from "../http/versioning.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

const respond = ({
  settings,
  version,
}: {
  settings: ProcedureSettings;
  version: number;
}): ProcedureSettingsResponse => ({
  settings: {
    evacuationTargetMicrons: settings.evacuationTargetMicrons ?? null,
    pressureTestAllowedDropKPa: settings.pressureTestAllowedDropKPa ?? null,
  },
  defaults: {
    evacuationTargetMicrons: EVACUATION_LIMITS.targetMicrons,
    pressureTestAllowedDropKPa: DEFAULT_ALLOWED_DROP_KPA,
  },
  version,
});

/**
 * The company's own procedure limits: everyone reads them (forms show them), owners change
 * them one field at a time (PATCH), naming the version they saw (If-Match).
 */
export function organisationRouter({ db }: Pick<AccountRouteDeps, "db">): Router {
  const router = Router();
  router.get("/settings", async (_req, res) => {
    const current = await getVersionedProcedureSettings(db, getAuth(res).organisationId);
    setVersion(res, current.version);
    res.json(respond(current));
  });
  router.patch("/settings", async (req, res) => {
    const update = ProcedureSettingsUpdateSchema.parse(req.body);
    const saved = await updateProcedureSettings(db, getAuth(res).organisationId, update, requireIfMatch(req));
    if (!saved) throw staleWrite("the company limits");
    setVersion(res, saved.version);
    res.json(respond(saved));
  });
  return router;
}
