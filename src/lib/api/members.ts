import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { Role } from "@shared/schemas/auth.ts";
import { MemberResponseSchema, MembersResponseSchema, type Member } from "@shared/schemas/members.ts";
import { apiRequest } from "./api-client.ts";

export async function getMembers(signal?: AbortSignal): Promise<Member[]> {
  return (await apiRequest("/members", { schema: MembersResponseSchema, signal })).members;
}

export async function updateMemberRole({ id, role }: { id: string; role: Role }): Promise<Member> {
  return (await apiRequest(`/members/${id}`, { method: "PATCH", body: { role }, schema: MemberResponseSchema })).member;
}

export function removeMember(id: string): Promise<void> {
  return apiRequest(`/members/${id}`, { method: "DELETE" });
}

export const membersQueryOptions = () =>
  queryOptions({
    queryKey: ["members", "list"],
    queryFn: ({ signal }) => getMembers(signal),
  });

export const useMembers = () => useQuery(membersQueryOptions());

export function useUpdateMemberRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMemberRole,
    // A changed role may be the viewer's own: refresh the session too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["members"] }),
        queryClient.invalidateQueries({ queryKey: ["auth"] }),
      ]),
  });
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["members"] }),
  });
}
