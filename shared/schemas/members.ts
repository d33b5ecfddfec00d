import { z } from "zod";
import { RoleSchema } from "./auth.ts";

/** One person of the organisation, as the members table lists them. */
export const MemberSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  email: z.string(),
  role: RoleSchema,
  /** ISO 8601 date-time of joining. */
  createdAt: z.iso.datetime({ offset: true }),
});
export type Member = z.infer<typeof MemberSchema>;

/** GET /api/members */
export const MembersResponseSchema = z.object({ members: z.array(MemberSchema) });
export type MembersResponse = z.infer<typeof MembersResponseSchema>;

/** PATCH /api/members/:id (owners only) */
export const UpdateMemberSchema = z.object({ role: RoleSchema });
export type UpdateMember = z.infer<typeof UpdateMemberSchema>;

/** PATCH answer */
export const MemberResponseSchema = z.object({ member: MemberSchema });
export type MemberResponse = z.infer<typeof MemberResponseSchema>;
