import { z } from "zod";
import { EmailSchema, NewPasswordSchema, PersonNameSchema, RoleSchema, TokenSchema } from "./auth.ts";

/** How long an invitation link works. Long enough for someone away on a job for a week. */
export const INVITATION_VALID_DAYS = 7;

/** POST /api/invitations (owners only) */
export const CreateInvitationSchema = z.object({ email: EmailSchema, role: RoleSchema });
export type CreateInvitation = z.infer<typeof CreateInvitationSchema>;

/** A pending invitation as owners see it. The token is never shown: it only travels by e-mail. */
export const InvitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: RoleSchema,
  invitedByName: z.string().nullable(),
  expiresAt: z.iso.datetime({ offset: true }),
  createdAt: z.iso.datetime({ offset: true }),
});
export type Invitation = z.infer<typeof InvitationSchema>;

export const InvitationResponseSchema = z.object({ invitation: InvitationSchema });
export type InvitationResponse = z.infer<typeof InvitationResponseSchema>;

/** GET /api/invitations */
export const InvitationsResponseSchema = z.object({ invitations: z.array(InvitationSchema) });
export type InvitationsResponse = z.infer<typeof InvitationsResponseSchema>;

/**
 * POST /api/invitations/preview: what the invitee sees before accepting. The token goes in
 * the body, not the URL, so it never lands in request logs.
 */
export const InvitationPreviewRequestSchema = z.object({ token: TokenSchema });
export type InvitationPreviewRequest = z.infer<typeof InvitationPreviewRequestSchema>;

export const InvitationPreviewSchema = z.object({
  organisationName: z.string(),
  email: z.string(),
  role: RoleSchema,
});
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

/** POST /api/invitations/accept: answers like sign-in, with the new member's session. */
export const AcceptInvitationSchema = z.object({
  token: TokenSchema,
  name: PersonNameSchema,
  password: NewPasswordSchema,
});
export type AcceptInvitation = z.infer<typeof AcceptInvitationSchema>;
