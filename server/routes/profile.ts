import { Router } from "express";
import { UpdateProfileSchema, type Profile } from "@shared/schemas/profile.ts";
import { getAuth } from "../auth/session.ts";
import { getProfile, updateProfile } from "../db/accounts.ts";
import { notFound } from "../http/http-error.ts";
import { requireIfMatch, setVersion, staleWrite } from "../http/versioning.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

/** Everyone's own settings: display name, display units and default atmospheric pressure. */
export function profileRouter({ db }: AccountRouteDeps): Router {
  const router = Router();

  router.get("/", async (_req, res) => {
    const { user, organisationId } = getAuth(res);
    const profile = await getProfile(db, user.id, organisationId);
    if (!profile) throw notFound("Profile");
    setVersion(res, profile.version);
    res.json(profile satisfies Profile);
  });

  // A stale copy (another tab or device saved since) is refused rather than overwriting it.
  router.put("/", async (req, res) => {
    const { user, organisationId } = getAuth(res);
    const input = UpdateProfileSchema.parse(req.body);
    const profile = await updateProfile(db, user.id, organisationId, input, requireIfMatch(req));
    if (profile === "stale") throw staleWrite("your profile");
    if (!profile) throw notFound("Profile");
    setVersion(res, profile.version);
    res.json(profile satisfies Profile);
  });

  return router;
}
