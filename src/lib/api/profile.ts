import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ProfileSchema, type Profile, type UpdateProfile } from "@shared/schemas/profile.ts";
import { apiRequest } from "./api-client.ts";

export function getProfile(signal?: AbortSignal): Promise<Profile> {
  return apiRequest("/profile", { schema: ProfileSchema, signal });
}

/** Saves the profile over the version the form was filled from (409 when another device saved since). */
export function updateProfile({ version, ...input }: UpdateProfile & { version: number }): Promise<Profile> {
  return apiRequest("/profile", { method: "PUT", body: input, schema: ProfileSchema, ifMatch: version });
}

export const profileQueryOptions = () =>
  queryOptions({
    queryKey: ["profile"],
    queryFn: ({ signal }) => getProfile(signal),
  });

export const useProfile = () => useQuery(profileQueryOptions());

export function useUpdateProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProfile,
    meta: { silentErrors: true },
    onSuccess: (profile) => {
      queryClient.setQueryData(profileQueryOptions().queryKey, profile);
      // The name shows in the app shell too.
      return queryClient.invalidateQueries({ queryKey: ["auth"] });
    },
  });
}
