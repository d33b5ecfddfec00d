import { Router } from "express";
import { ProcedureSettingsUpdateSchema } from "@shared/schemas/procedure-records.ts";
import { getAuth } from "../auth/session.ts";
import { getVersionedProcedureSettings, updateProcedureLimits } from "../db/procedures.ts";
import { requireIfMatch, setVersion, staleWrite } from "../http/versioning.ts";
import { applyCompanyLimitsUpdate, companyLimitsResponse } from "../procedures/company-limits.ts";
import type { AccountRouteDeps } from "./route-deps.ts";
/**
 * The company's own procedure limits: everyone reads them (forms show them), owners change
 * them one field at a time (PATCH), naming the version they saw (If-Match).
 */
export function organisationRouter({ db }: Pick<AccountRouteDeps, "db">): Router {
  const router = Router();
  router.get("/settings", async (_req, res) => {
    const current = await getVersionedProcedureSettings(db, getAuth(res).organisationId);
    setVersion(res, current.version);
    res.json(companyLimitsResponse(current.settings, current.version));
  });
  router.patch("/settings", async (req, res) => {
    const update = ProcedureSettingsUpdateSchema.parse(req.body);
    const saved = await updateProcedureLimits(
      db,
      getAuth(res).organisationId,
      (limits) => applyCompanyLimitsUpdate(limits, update),
      requireIfMatch(req),
    );
    if (!saved) throw staleWrite("the company limits");
    setVersion(res, saved.version);
    res.json(companyLimitsResponse(saved.settings, saved.version));
  });
  return router;
}
