import { Router } from "express";
import { UpdateProfileSchema, type Profile } from "@shared/schemas/profile.ts";
import { getAuth } from "../auth/session.ts";
import { getProfile, updateProfile } from "../db/accounts.ts";
import { notFound } from "../http/http-error.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

/** Everyone's own settings: display name, display units and default atmospheric pressure. */
export function profileRouter({ db }: AccountRouteDeps): Router {
  const router = Router();

  router.get("/", async (_req, res) => {
    const { user, organisationId } = getAuth(res);
    const profile = await getProfile(db, user.id, organisationId);
    if (!profile) throw notFound("Profile");
    res.json(profile satisfies Profile);
  });

  router.put("/", async (req, res) => {
    const { user, organisationId } = getAuth(res);
    const input = UpdateProfileSchema.parse(req.body);
    const profile = await updateProfile(db, user.id, organisationId, input);
    if (!profile) throw notFound("Profile");
    res.json(profile satisfies Profile);
  });

  return router;
}
