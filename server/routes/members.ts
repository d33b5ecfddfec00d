import { Router } from "express";
import { UpdateMemberSchema, type MemberResponse, type MembersResponse } from "@shared/schemas/members.ts";
import { getAuth } from "../auth/session.ts";
import { changeMemberRole, LastOwnerError, listMembers, removeMember } from "../db/members.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

const lastOwner = (error: unknown) => {
  if (error instanceof LastOwnerError) {
    return new HttpError(409, "There must always be at least one owner. Make someone else an owner first.");
  }
  return error;
};

export function membersRouter({ db }: AccountRouteDeps): Router {
  const router = Router();

  // Every member may see who works in the company; only owners change it.
  router.get("/", async (_req, res) => {
    const { organisationId } = getAuth(res);
    res.json({ members: await listMembers(db, organisationId) } satisfies MembersResponse);
  });

  router.patch("/:id", async (req, res) => {
    const { organisationId } = getAuth(res);
    const id = parseId(req.params.id, "Member");
    const { role } = UpdateMemberSchema.parse(req.body);
    const member = await changeMemberRole(db, organisationId, id, role).catch((error) =>
      Promise.reject(lastOwner(error)),
    );
    if (!member) throw notFound("Member");
    res.json({ member } satisfies MemberResponse);
  });

  router.delete("/:id", async (req, res) => {
    const { organisationId } = getAuth(res);
    const id = parseId(req.params.id, "Member");
    const removed = await removeMember(db, organisationId, id).catch((error) => Promise.reject(lastOwner(error)));
    if (!removed) throw notFound("Member");
    res.status(204).end();
  });

  return router;
}
