import { Router } from "express";
import { EVACUATION_LIMITS } from "@shared/engine/index.ts";
import {
  DEFAULT_ALLOWED_DROP_KPA,
  ProcedureSettingsUpdateSchema,
  type ProcedureSettings,
  type ProcedureSettingsResponse,
} from "@shared/schemas/procedure-records.ts";
import { getAuth } from "../auth/session.ts";
import { getProcedureSettings, updateProcedureSettings } from "../db/procedures.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

const respond = (settings: ProcedureSettings): ProcedureSettingsResponse => ({
  settings: {
    evacuationTargetMicrons: settings.evacuationTargetMicrons ?? null,
    pressureTestAllowedDropKPa: settings.pressureTestAllowedDropKPa ?? null,
  },
  defaults: { evacuationTargetMicrons: EVACUATION_LIMITS.targetMicrons, pressureTestAllowedDropKPa: DEFAULT_ALLOWED_DROP_KPA },
});

/** The company's own procedure limits: everyone reads them (forms show them), owners set them. */
export function organisationRouter({ db }: Pick<AccountRouteDeps, "db">): Router {
  const router = Router();
  router.get("/settings", async (_req, res) => {
    res.json(respond(await getProcedureSettings(db, getAuth(res).organisationId)));
  });
  router.put("/settings", async (req, res) => {
    const update = ProcedureSettingsUpdateSchema.parse(req.body);
    res.json(respond(await updateProcedureSettings(db, getAuth(res).organisationId, update)));
  });
  return router;
}
