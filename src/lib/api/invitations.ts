import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { MeResponseSchema, type AuthUser } from "@shared/schemas/auth.ts";
import {
  InvitationPreviewSchema,
  InvitationResponseSchema,
  InvitationsResponseSchema,
  type AcceptInvitation,
  type CreateInvitation,
  type Invitation,
  type InvitationPreview,
} from "@shared/schemas/invitations.ts";
import { apiRequest } from "./api-client.ts";
import { meQueryOptions } from "./auth.ts";

export async function getInvitations(signal?: AbortSignal): Promise<Invitation[]> {
  return (await apiRequest("/invitations", { schema: InvitationsResponseSchema, signal })).invitations;
}

export async function createInvitation(input: CreateInvitation): Promise<Invitation> {
  return (await apiRequest("/invitations", { method: "POST", body: input, schema: InvitationResponseSchema }))
    .invitation;
}

export function revokeInvitation(id: string): Promise<void> {
  return apiRequest(`/invitations/${id}`, { method: "DELETE" });
}

/** The token goes in a POST body so it never appears in server logs. */
export function previewInvitation(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return apiRequest("/invitations/preview", {
    method: "POST",
    body: { token },
    schema: InvitationPreviewSchema,
    signal,
  });
}

export async function acceptInvitation(input: AcceptInvitation): Promise<AuthUser> {
  return (await apiRequest("/invitations/accept", { method: "POST", body: input, schema: MeResponseSchema })).user;
}

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: ["invitations", "list"],
    queryFn: ({ signal }) => getInvitations(signal),
  });

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ["invitations", "preview", token],
    queryFn: ({ signal }) => previewInvitation(token, signal),
    staleTime: Infinity,
    retry: false,
  });

export const useInvitations = (enabled = true) => useQuery({ ...invitationsQueryOptions(), enabled });
export const useInvitationPreview = (token: string) =>
  useQuery({ ...invitationPreviewQueryOptions(token), enabled: token.length > 0 });

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    meta: { silentErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["invitations", "list"] }),
  });
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["invitations", "list"] }),
  });
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    meta: { silentErrors: true },
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, user);
    },
  });
}
